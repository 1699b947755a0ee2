/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import java.util.ArrayList;
import java.util.List;

import org.apertura.engine.region.MergedLayer;

/**
 * Finds facing edge pairs closer than a reach, tile by tile in parallel. The layer's extent is cut into
 * square tiles holding about a given number of edges each; a tile owns the edges that start in
 * it, and queries the shared read-only {@link EdgeIndex} with its edges' boxes grown by the reach (the
 * tile's halo reaches into its neighbours). Within one layer a pair is evaluated only from its lower
 * edge number, so a pair straddling a tile border is found exactly once; results are concatenated in
 * tile order and are the same for every thread count.
 */
public final class PairSearch {

    /** Receives one facing pair; appends results to {@code out}. */
    @FunctionalInterface
    public interface Sink<T> {
        void accept(int e, int f, FacingPair pair, List<T> out);
    }

    private PairSearch() {
    }

    /**
     * Calls {@code sink} for each facing pair (e of {@code layer}, f of {@code other}) with distance
     * below {@code reach} (strictly) on the given side (+1 spacing, -1 width). When
     * {@code other == layer} each unordered pair is reported once with e < f.
     */
    public static <T> List<T> run(MergedLayer layer, MergedLayer other, EdgeIndex otherIndex, long reach, int side,
            Exec exec, Sink<T> sink) {
        int[][] tiles = tiles(layer, exec.edgesPerTile());
        exec.expect(tiles.length);
        boolean same = layer == other;
        double reach2 = (double) reach * reach;
        return exec.map(tiles.length, t -> {
            List<T> out = new ArrayList<>();
            FacingPair pair = new FacingPair();
            int cols = otherIndex.cols;
            int[] cellStart = otherIndex.cellStart, items = otherIndex.items;
            for (int e : tiles[t]) {
                long ex0 = Math.min(layer.x0(e), layer.x1(e)), ex1 = Math.max(layer.x0(e), layer.x1(e));
                long ey0 = Math.min(layer.y0(e), layer.y1(e)), ey1 = Math.max(layer.y0(e), layer.y1(e));
                int ca = otherIndex.col(ex0 - reach), cb = otherIndex.col(ex1 + reach);
                int ra = otherIndex.row(ey0 - reach), rb = otherIndex.row(ey1 + reach);
                for (int r = ra; r <= rb; r++) {
                    for (int c = ca; c <= cb; c++) {
                        int to = cellStart[r * cols + c + 1];
                        for (int k = cellStart[r * cols + c]; k < to; k++) {
                            int f = items[k];
                            if (same && f <= e) {
                                continue;
                            }
                            long fx0 = Math.min(other.x0(f), other.x1(f)), fx1 = Math.max(other.x0(f), other.x1(f));
                            long fy0 = Math.min(other.y0(f), other.y1(f)), fy1 = Math.max(other.y0(f), other.y1(f));
                            long gx = Math.max(0, Math.max(fx0 - ex1, ex0 - fx1));
                            long gy = Math.max(0, Math.max(fy0 - ey1, ey0 - fy1));
                            if (gx >= reach || gy >= reach || (double) gx * gx + (double) gy * gy >= reach2) {
                                continue;
                            }
                            // f is registered in every cell of its box; the query meets it in each cell of
                            // the overlap of both cell ranges: evaluate only in the overlap's first cell
                            if (Math.max(ca, otherIndex.col(fx0)) != c
                                    || Math.max(ra, otherIndex.row(fy0)) != r) {
                                continue;
                            }
                            if (pair.evaluate(layer, e, other, f, side) != FacingPair.NONE && pair.distance < reach) {
                                sink.accept(e, f, pair, out);
                            }
                        }
                    }
                }
            }
            return out;
        });
    }

    /** Edge numbers grouped by the tile of their start vertex, tiles in row-major order. */
    public static int[][] tiles(MergedLayer layer, int edgesPerTile) {
        int n = layer.edgeCount();
        if (n == 0) {
            return new int[0][];
        }
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (int e = 0; e < n; e++) {
            minX = Math.min(minX, layer.x0(e));
            maxX = Math.max(maxX, layer.x0(e));
            minY = Math.min(minY, layer.y0(e));
            maxY = Math.max(maxY, layer.y0(e));
        }
        int side = Math.max(1, (int) Math.ceil(Math.sqrt((double) n / edgesPerTile)));
        double w = (double) (maxX - minX + 1) / side, h = (double) (maxY - minY + 1) / side;
        int[] tileOf = new int[n];
        int[] count = new int[side * side + 1];
        for (int e = 0; e < n; e++) {
            int tx = Math.min(side - 1, (int) ((layer.x0(e) - minX) / w));
            int ty = Math.min(side - 1, (int) ((layer.y0(e) - minY) / h));
            tileOf[e] = ty * side + tx;
            count[tileOf[e] + 1]++;
        }
        int nonEmpty = 0;
        for (int t = 0; t < side * side; t++) {
            if (count[t + 1] > 0) {
                nonEmpty++;
            }
        }
        int[][] tiles = new int[nonEmpty][];
        int[] slot = new int[side * side];
        int k = 0;
        for (int t = 0; t < side * side; t++) {
            if (count[t + 1] > 0) {
                tiles[k] = new int[count[t + 1]];
                slot[t] = k++;
            }
        }
        int[] fill = new int[nonEmpty];
        for (int e = 0; e < n; e++) {
            int s = slot[tileOf[e]];
            tiles[s][fill[s]++] = e;
        }
        return tiles;
    }
}
