/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import java.util.Arrays;

import org.apertura.engine.region.MergedLayer;

/**
 * A uniform grid over a layer's edges, built once (O(n + registrations)) and then read by many threads.
 * The cell side is the power of two at or above the side that gives about {@value #EDGES_PER_CELL}
 * edges per cell on average (a shift instead of a division per lookup); an edge is registered in every
 * cell its bounding box touches, so long wires appear in several cells. Cells are stored compressed
 * (cell start offsets into one item array). {@link PairSearch} walks the cells directly and evaluates a
 * pair only in the first cell shared by both boxes' cell ranges, so it needs no per-query sort.
 */
public final class EdgeIndex {

    private static final int EDGES_PER_CELL = 4;
    private static final int MAX_CELLS = 1 << 26;

    private final long minX, minY, cell;
    /** log2 of the cell side: cells are powers of two so that a cell number is a shift, not a division */
    private final int shift;
    final int cols, rows;
    final int[] cellStart;
    final int[] items;

    public EdgeIndex(MergedLayer layer) {
        int n = layer.edgeCount();
        long x0 = Long.MAX_VALUE, y0 = Long.MAX_VALUE, x1 = Long.MIN_VALUE, y1 = Long.MIN_VALUE;
        for (int e = 0; e < n; e++) {
            x0 = Math.min(x0, Math.min(layer.x0(e), layer.x1(e)));
            x1 = Math.max(x1, Math.max(layer.x0(e), layer.x1(e)));
            y0 = Math.min(y0, Math.min(layer.y0(e), layer.y1(e)));
            y1 = Math.max(y1, Math.max(layer.y0(e), layer.y1(e)));
        }
        if (n == 0) {
            x0 = y0 = x1 = y1 = 0;
        }
        minX = x0;
        minY = y0;
        double area = (double) (x1 - x0 + 1) * (y1 - y0 + 1);
        long side = (long) Math.ceil(Math.sqrt(area * EDGES_PER_CELL / Math.max(1, n)));
        side = Math.max(side, 1);
        int sh = 63 - Long.numberOfLeadingZeros(side);
        if ((1L << sh) < side) {
            sh++;
        }
        while ((((x1 - x0) >> sh) + 1) * (((y1 - y0) >> sh) + 1) > MAX_CELLS) {
            sh++;
        }
        shift = sh;
        cell = 1L << sh;
        cols = (int) (((x1 - x0) >> sh) + 1);
        rows = (int) (((y1 - y0) >> sh) + 1);
        cellStart = new int[cols * rows + 1];
        for (int e = 0; e < n; e++) {
            int ca = col(Math.min(layer.x0(e), layer.x1(e))), cb = col(Math.max(layer.x0(e), layer.x1(e)));
            int ra = row(Math.min(layer.y0(e), layer.y1(e))), rb = row(Math.max(layer.y0(e), layer.y1(e)));
            for (int r = ra; r <= rb; r++) {
                for (int c = ca; c <= cb; c++) {
                    cellStart[r * cols + c + 1]++;
                }
            }
        }
        for (int i = 0; i < cols * rows; i++) {
            cellStart[i + 1] += cellStart[i];
        }
        items = new int[cellStart[cols * rows]];
        int[] fill = Arrays.copyOf(cellStart, cols * rows);
        for (int e = 0; e < n; e++) {
            int ca = col(Math.min(layer.x0(e), layer.x1(e))), cb = col(Math.max(layer.x0(e), layer.x1(e)));
            int ra = row(Math.min(layer.y0(e), layer.y1(e))), rb = row(Math.max(layer.y0(e), layer.y1(e)));
            for (int r = ra; r <= rb; r++) {
                for (int c = ca; c <= cb; c++) {
                    items[fill[r * cols + c]++] = e;
                }
            }
        }
    }

    /** Column of x, clamped to the grid. */
    int col(long x) {
        return (int) Math.min(cols - 1, Math.max(0, (x - minX) >> shift));
    }

    /** Row of y, clamped to the grid. */
    int row(long y) {
        return (int) Math.min(rows - 1, Math.max(0, (y - minY) >> shift));
    }

    /** The cell side in database units (a power of two). */
    public long cellSide() {
        return cell;
    }

    /** A reusable query buffer for one thread. */
    public static int[][] buffer() {
        return new int[][] {new int[64]};
    }

    /**
     * Writes into {@code holder[0]} each edge registered in a cell the query box (closed) touches, once,
     * ascending (a superset of the edges whose boxes intersect the query box); returns the count.
     */
    public int query(long qx0, long qy0, long qx1, long qy1, int[][] holder) {
        int[] out = holder[0];
        int count = 0;
        int ca = col(qx0), cb = col(qx1), ra = row(qy0), rb = row(qy1);
        for (int r = ra; r <= rb; r++) {
            for (int c = ca; c <= cb; c++) {
                int from = cellStart[r * cols + c], to = cellStart[r * cols + c + 1];
                if (count + to - from > out.length) {
                    out = Arrays.copyOf(out, Math.max(2 * out.length, count + to - from));
                }
                System.arraycopy(items, from, out, count, to - from);
                count += to - from;
            }
        }
        if (ca != cb || ra != rb) {
            Arrays.sort(out, 0, count);
            int u = 0;
            for (int i = 0; i < count; i++) {
                if (u == 0 || out[i] != out[u - 1]) {
                    out[u++] = out[i];
                }
            }
            count = u;
        }
        holder[0] = out;
        return count;
    }

    /** Heap bytes of the index arrays. */
    public long retainedBytes() {
        return 4L * (cellStart.length + items.length) + 64;
    }
}
