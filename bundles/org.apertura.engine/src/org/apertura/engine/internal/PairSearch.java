/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import java.util.ArrayList;
import java.util.List;

import org.apertura.engine.region.MergedLayer;

/**
 * Finds the facing edge pairs of one layer closer than a reach, in parallel over fixed chunks of the
 * {@link EdgeIndex}'s sorted edges, so the result is the same for every thread count.
 * <p>
 * Two segments closer than the reach either run parallel with overlapping projections, or an end point
 * of one lies within the reach of the other. For horizontal and vertical edges the search follows
 * exactly these cases while it walks each row (column) of edges in order: for an edge it visits the
 * edges of the rows within the reach whose x-range comes within the reach, which are both its parallel
 * partners and every parallel edge its two end points are near. A vertex of a Manhattan ring joins one
 * horizontal and one vertical edge, so each (vertex, nearby edge) is met exactly once: in the sweep of
 * the vertex's edge parallel to the nearby one (a vertex next to an edge at another angle is looked up
 * from that edge instead). A pair that is not parallel and overlapping is evaluated only at the first
 * of its end points (start and end of the lower edge, then of the higher) that lies within the reach;
 * a parallel overlapping pair only from its lower edge. Pairs with an edge at another angle are found by
 * a box search from that edge. Each unordered pair is reported once, with e &lt; f.
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
     * Calls {@code sink} for each facing pair (e, f) of {@code layer}, e &lt; f, whose distance is below
     * {@code reach} (strictly) on the given side (+1 spacing, -1 width).
     */
    public static <T> List<T> run(MergedLayer layer, EdgeIndex index, long reach, int side, Exec exec, Sink<T> sink) {
        if (index.layer != layer) {
            throw new IllegalArgumentException("index of another layer");
        }
        if (reach > Integer.MAX_VALUE) {
            // squared distances are compared in 64-bit integers
            throw new IllegalArgumentException("search reach above 2^31 - 1 database units: " + reach);
        }
        if (reach < 1) {
            return new ArrayList<>();
        }
        int chunk = exec.edgesPerTile();
        int hChunks = chunks(index.hEdge.length, chunk), vChunks = chunks(index.vEdge.length, chunk);
        int gChunks = chunks(index.gridEdges.length, chunk);
        int tasks = hChunks + vChunks + gChunks;
        exec.expect(tasks);
        return exec.map(tasks, t -> {
            Search<T> s = new Search<>(layer, index, reach, side, sink);
            if (t < hChunks) {
                s.sweep(true, t * chunk, Math.min(index.hEdge.length, (t + 1) * chunk));
            } else if (t < hChunks + vChunks) {
                int c = t - hChunks;
                s.sweep(false, c * chunk, Math.min(index.vEdge.length, (c + 1) * chunk));
            } else {
                int c = t - hChunks - vChunks;
                for (int i = c * chunk, to = Math.min(index.gridEdges.length, (c + 1) * chunk); i < to; i++) {
                    s.fromGridEdge(index.gridEdges[i]);
                }
            }
            return s.out;
        });
    }

    private static int chunks(int n, int size) {
        return (n + size - 1) / size;
    }

    /** One task's search state. */
    private static final class Search<T> {
        private final MergedLayer layer;
        private final EdgeIndex ix;
        private final long reach, reach2;
        private final int side;
        private final Sink<T> sink;
        private final FacingPair pair = new FacingPair();
        private final int[][] buf = EdgeIndex.buffer();
        final List<T> out = new ArrayList<>();

        Search(MergedLayer layer, EdgeIndex ix, long reach, int side, Sink<T> sink) {
            this.layer = layer;
            this.ix = ix;
            this.reach = reach;
            this.reach2 = reach * reach;
            this.side = side;
            this.sink = sink;
        }

        /** Walks the row (horizontal) or column slots [from, to). */
        void sweep(boolean horizontal, int from, int to) {
            long[] at = horizontal ? ix.rowY : ix.colX;
            int[] start = horizontal ? ix.rowStart : ix.colStart;
            int[] lo = horizontal ? ix.hLo : ix.vLo, hi = horizontal ? ix.hHi : ix.vHi;
            int[] entry = horizontal ? ix.hEdge : ix.vEdge;
            int line = lineOf(start, from);
            int near0 = -1, near1 = -1;
            // per line within the reach: the first slot that can still reach the current edge; slots of
            // a line come in ascending order, so these cursors only move forward
            int[] cursor = new int[4];
            for (int i = from; i < to; i++) {
                if (near0 < 0 || start[line + 1] <= i) {
                    while (start[line + 1] <= i) {
                        line++;
                    }
                    near0 = EdgeIndex.firstLine(at, at[line] - reach + 1);
                    near1 = EdgeIndex.firstLine(at, at[line] + reach);
                    if (cursor.length < near1 - near0) {
                        cursor = new int[2 * (near1 - near0)];
                    }
                    for (int l = near0; l < near1; l++) {
                        cursor[l - near0] = EdgeIndex.firstReaching(hi, start[l], start[l + 1], lo[i] - reach + 1);
                    }
                }
                int e = EdgeIndex.edgeOf(entry[i]);
                boolean forward = entry[i] >= 0;
                long a = lo[i], b = hi[i];
                long s = forward ? a : b, t = forward ? b : a;
                for (int l = near0; l < near1; l++) {
                    long d1 = Math.abs(at[l] - at[line]);
                    long d1sq = d1 * d1;
                    int end = start[l + 1];
                    int j = cursor[l - near0];
                    while (j < end && hi[j] < a - reach + 1) {
                        j++;
                    }
                    cursor[l - near0] = j;
                    for (; j < end && lo[j] < b + reach; j++) {
                        if (j == i) {
                            continue;
                        }
                        long fa = lo[j], fb = hi[j];
                        int f = EdgeIndex.edgeOf(entry[j]);
                        if (fb > a && fa < b && f > e) {
                            report(e, f);
                        }
                        long ds = Math.max(0, Math.max(fa - s, s - fb));
                        if (ds * ds + d1sq < reach2) {
                            vertexNear(e, true, f);
                        }
                        long dt = Math.max(0, Math.max(fa - t, t - fb));
                        if (dt * dt + d1sq < reach2) {
                            vertexNear(e, false, f);
                        }
                    }
                }
            }
        }

        private static int lineOf(int[] start, int slot) {
            int a = 0, b = start.length - 2;
            while (a < b) {
                int m = (a + b + 1) >>> 1;
                if (start[m] <= slot) {
                    a = m;
                } else {
                    b = m - 1;
                }
            }
            return a;
        }

        /**
         * The start (atStart) or end vertex of e is near f: candidate pairs of f with e and with the other
         * edge at that vertex.
         */
        private void vertexNear(int e, boolean atStart, int f) {
            int w = atStart ? layer.previous(e) : layer.next(e);
            if (f == w) {
                return;
            }
            fromVertex(e, atStart, f);
            if (!ix.inGrid(w)) {
                fromVertex(w, !atStart, f);
            }
        }

        /** Pair (g, f) met at g's start (atStart) or end vertex; evaluated there if that is its first near end. */
        private void fromVertex(int g, boolean atStart, int f) {
            if (parallelOverlap(g, f)) {
                return;
            }
            int a = Math.min(g, f), b = Math.max(g, f);
            int here = (g == a ? 0 : 2) + (atStart ? 0 : 1);
            for (int k = 0; k < here; k++) {
                int owner = k < 2 ? a : b, seg = k < 2 ? b : a;
                long px = k % 2 == 0 ? layer.x0(owner) : layer.x1(owner), py = k % 2 == 0 ? layer.y0(owner) : layer.y1(owner);
                if (near(px, py, seg)) {
                    return;
                }
            }
            report(a, b);
        }

        /** Point within the reach of an axis-parallel edge (exact integer test). */
        private boolean near(long px, long py, int s) {
            long dx = Math.max(0, Math.max(Math.min(layer.x0(s), layer.x1(s)) - px, px - Math.max(layer.x0(s), layer.x1(s))));
            long dy = Math.max(0, Math.max(Math.min(layer.y0(s), layer.y1(s)) - py, py - Math.max(layer.y0(s), layer.y1(s))));
            return dx < reach && dy < reach && dx * dx + dy * dy < reach2;
        }

        /** Both horizontal or both vertical, overlapping in projection by a positive length. */
        private boolean parallelOverlap(int g, int f) {
            if (layer.y0(g) == layer.y1(g) && layer.y0(f) == layer.y1(f)) {
                return Math.min(Math.max(layer.x0(g), layer.x1(g)), Math.max(layer.x0(f), layer.x1(f)))
                        > Math.max(Math.min(layer.x0(g), layer.x1(g)), Math.min(layer.x0(f), layer.x1(f)));
            }
            if (layer.x0(g) == layer.x1(g) && layer.x0(f) == layer.x1(f)) {
                return Math.min(Math.max(layer.y0(g), layer.y1(g)), Math.max(layer.y0(f), layer.y1(f)))
                        > Math.max(Math.min(layer.y0(g), layer.y1(g)), Math.min(layer.y0(f), layer.y1(f)));
            }
            return false;
        }

        /**
         * An edge kept in the grid: a box search for its pairs with every edge, and, at each end whose
         * other edge is horizontal or vertical, the lookup the sweeps cannot do for that vertex (it has no
         * edge parallel to the lines searched).
         */
        void fromGridEdge(int e) {
            box(e);
            int p = layer.previous(e), n = layer.next(e);
            if (!ix.inGrid(p)) {
                pointLookup(p, false, layer.x0(e), layer.y0(e));
            }
            if (!ix.inGrid(n)) {
                pointLookup(n, true, layer.x1(e), layer.y1(e));
            }
        }

        /** Edges of the lines perpendicular to g near its start or end vertex (vx, vy). */
        private void pointLookup(int g, boolean atStart, long vx, long vy) {
            boolean gHorizontal = layer.y0(g) == layer.y1(g);
            // g horizontal: its vertex is met by the row sweep for rows; look up the columns, and vice versa
            boolean rows = !gHorizontal;
            long[] at = rows ? ix.rowY : ix.colX;
            int[] start = rows ? ix.rowStart : ix.colStart;
            int[] lo = rows ? ix.hLo : ix.vLo, hi = rows ? ix.hHi : ix.vHi;
            int[] entry = rows ? ix.hEdge : ix.vEdge;
            long across = rows ? vy : vx;
            long along = rows ? vx - ix.baseX : vy - ix.baseY;
            for (int l = EdgeIndex.firstLine(at, across - reach + 1); l < at.length && at[l] < across + reach; l++) {
                long d1 = Math.abs(at[l] - across);
                for (int j = EdgeIndex.firstReaching(hi, start[l], start[l + 1], along - reach + 1); j < start[l + 1]
                        && lo[j] < along + reach; j++) {
                    long d0 = Math.max(0, Math.max(lo[j] - along, along - hi[j]));
                    int f = EdgeIndex.edgeOf(entry[j]);
                    if (d0 * d0 + d1 * d1 < reach2 && f != g) {
                        fromVertex(g, atStart, f);
                    }
                }
            }
        }

        /** Box search from an edge kept in the grid: pairs with every edge whose box is within the reach. */
        private void box(int e) {
            long ex0 = Math.min(layer.x0(e), layer.x1(e)), ex1 = Math.max(layer.x0(e), layer.x1(e));
            long ey0 = Math.min(layer.y0(e), layer.y1(e)), ey1 = Math.max(layer.y0(e), layer.y1(e));
            int k = ix.query(ex0 - reach, ey0 - reach, ex1 + reach, ey1 + reach, buf);
            double r2 = (double) reach * reach;
            int[] found = buf[0];
            for (int i = 0; i < k; i++) {
                int f = found[i];
                if (f == e || f < e && ix.inGrid(f)) {
                    continue;
                }
                long fx0 = Math.min(layer.x0(f), layer.x1(f)), fx1 = Math.max(layer.x0(f), layer.x1(f));
                long fy0 = Math.min(layer.y0(f), layer.y1(f)), fy1 = Math.max(layer.y0(f), layer.y1(f));
                long gx = Math.max(0, Math.max(fx0 - ex1, ex0 - fx1));
                long gy = Math.max(0, Math.max(fy0 - ey1, ey0 - fy1));
                if (gx >= reach || gy >= reach || (double) gx * gx + (double) gy * gy >= r2) {
                    continue;
                }
                report(Math.min(e, f), Math.max(e, f));
            }
        }

        private void report(int e, int f) {
            if (pair.evaluate(layer, e, layer, f, side) != FacingPair.NONE && pair.distance < reach) {
                sink.accept(e, f, pair, out);
            }
        }
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
