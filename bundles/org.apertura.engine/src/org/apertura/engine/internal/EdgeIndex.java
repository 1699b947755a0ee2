/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import java.util.Arrays;

import org.apertura.engine.region.MergedLayer;

/**
 * The boundary edges of one layer, sorted for neighbour searches; built once, then read by many threads.
 * <p>
 * Horizontal edges are grouped in rows of equal y and sorted by x within a row, vertical edges in
 * columns of equal x sorted by y. Boundary edges of merged shapes never overlap, so within a row the
 * edges' right ends ascend with their left ends and a binary search finds the first edge reaching a
 * given x; a search around an edge or a vertex then touches the few rows within reach instead of a
 * grid cell's worth of unrelated edges. Coordinates are kept as 32-bit offsets from the layer's lower
 * left corner (12 bytes per edge with its number). Edges at other angles go to a uniform grid of
 * power-of-two cells. When a layer does not fit this form (coordinates spanning more than 2^31, or
 * overlapping edges in a row, which merged layers never have) every edge goes to the grid.
 */
public final class EdgeIndex {

    private static final int EDGES_PER_CELL = 4;
    private static final int MAX_CELLS = 1 << 26;

    final MergedLayer layer;
    final long baseX, baseY;
    /** rows of horizontal edges: y, first slot; per slot left x, right x (offsets), edge (~edge if leftwards) */
    final long[] rowY;
    final int[] rowStart;
    final int[] hLo, hHi, hEdge;
    /** columns of vertical edges: x, first slot; per slot lower y, upper y (offsets), edge (~edge if downwards) */
    final long[] colX;
    final int[] colStart;
    final int[] vLo, vHi, vEdge;
    /** edges kept in the grid: those neither horizontal nor vertical, or all when rows cannot be used */
    final int[] gridEdges;
    private final boolean allInGrid;
    private final Grid grid;

    public EdgeIndex(MergedLayer layer) {
        this(layer, false);
    }

    /**
     * An index that keeps every edge in the grid, so that {@link PairSearch} finds every pair by box
     * search: the plain reference the sorted search is tested against.
     */
    public static EdgeIndex gridOnly(MergedLayer layer) {
        return new EdgeIndex(layer, true);
    }

    private EdgeIndex(MergedLayer layer, boolean gridOnly) {
        this.layer = layer;
        int n = layer.edgeCount();
        long x0 = Long.MAX_VALUE, y0 = Long.MAX_VALUE, x1 = Long.MIN_VALUE, y1 = Long.MIN_VALUE;
        int nh = 0, nv = 0;
        for (int e = 0; e < n; e++) {
            x0 = Math.min(x0, Math.min(layer.x0(e), layer.x1(e)));
            x1 = Math.max(x1, Math.max(layer.x0(e), layer.x1(e)));
            y0 = Math.min(y0, Math.min(layer.y0(e), layer.y1(e)));
            y1 = Math.max(y1, Math.max(layer.y0(e), layer.y1(e)));
            switch (kind(layer, e)) {
                case HORIZONTAL -> nh++;
                case VERTICAL -> nv++;
                default -> {
                }
            }
        }
        if (n == 0) {
            x0 = y0 = x1 = y1 = 0;
        }
        baseX = x0;
        baseY = y0;
        boolean fits = !gridOnly && x1 - x0 < Integer.MAX_VALUE && y1 - y0 < Integer.MAX_VALUE;
        Lines h = null, v = null;
        if (fits) {
            // one pass over the edges fills both kinds: line offset, lower and upper end, edge (~edge if backwards)
            int[] hAt = new int[nh], hLow = new int[nh], hHigh = new int[nh], hE = new int[nh];
            int[] vAt = new int[nv], vLow = new int[nv], vHigh = new int[nv], vE = new int[nv];
            int kh = 0, kv = 0;
            for (int e = 0; e < n; e++) {
                long ax = layer.x0(e), ay = layer.y0(e), bx = layer.x1(e), by = layer.y1(e);
                if (ay == by && ax != bx) {
                    hAt[kh] = (int) (ay - y0);
                    hLow[kh] = (int) (Math.min(ax, bx) - x0);
                    hHigh[kh] = (int) (Math.max(ax, bx) - x0);
                    hE[kh++] = ax < bx ? e : ~e;
                } else if (ax == bx && ay != by) {
                    vAt[kv] = (int) (ax - x0);
                    vLow[kv] = (int) (Math.min(ay, by) - y0);
                    vHigh[kv] = (int) (Math.max(ay, by) - y0);
                    vE[kv++] = ay < by ? e : ~e;
                }
            }
            h = lines(hAt, hLow, hHigh, hE, y0);
            v = h == null ? null : lines(vAt, vLow, vHigh, vE, x0);
        }
        if (h == null || v == null) {
            h = Lines.EMPTY;
            v = Lines.EMPTY;
            nh = nv = 0;
        }
        rowY = h.at;
        rowStart = h.start;
        hLo = h.lo;
        hHi = h.hi;
        hEdge = h.edge;
        colX = v.at;
        colStart = v.start;
        vLo = v.lo;
        vHi = v.hi;
        vEdge = v.edge;
        int[] other = new int[n - nh - nv];
        int k = 0;
        for (int e = 0; e < n; e++) {
            if (nh + nv == 0 || kind(layer, e) == OBLIQUE) {
                other[k++] = e;
            }
        }
        gridEdges = other;
        allInGrid = nh + nv == 0;
        grid = other.length == 0 ? null : new Grid(layer, other, x0, y0, x1, y1);
    }

    static final int HORIZONTAL = 0, VERTICAL = 1, OBLIQUE = 2;

    static int kind(MergedLayer layer, int e) {
        boolean flatY = layer.y0(e) == layer.y1(e), flatX = layer.x0(e) == layer.x1(e);
        if (flatY && !flatX) {
            return HORIZONTAL;
        }
        return flatX && !flatY ? VERTICAL : OBLIQUE;
    }

    /** True when edge e is kept in the grid, not in a row or column. */
    boolean inGrid(int e) {
        return allInGrid || kind(layer, e) == OBLIQUE;
    }

    /**
     * Sorted lines of horizontal (rows) or vertical (columns) edges from their line offsets, lower and
     * upper ends (offsets) and slot entries; null when two edges of a line overlap. Edges are bucketed by
     * line offset (a counting sort when the offsets span little more than the edge count, else a radix
     * sort), then each line is sorted along by its lower ends.
     */
    private static Lines lines(int[] at, int[] low, int[] high, int[] edge, long base) {
        int count = at.length;
        int maxAt = 0;
        for (int a : at) {
            maxAt = Math.max(maxAt, a);
        }
        int[] order;
        if (maxAt <= 4L * count + 4096) {
            int[] pos = new int[maxAt + 2];
            for (int a : at) {
                pos[a + 1]++;
            }
            for (int i = 0; i <= maxAt; i++) {
                pos[i + 1] += pos[i];
            }
            order = new int[count];
            for (int i = 0; i < count; i++) {
                order[pos[at[i]]++] = i;
            }
        } else {
            long[] key = new long[count];
            for (int i = 0; i < count; i++) {
                key[i] = at[i];
            }
            order = RadixSort.order(key);
        }
        // within each line by lower end; a key packs the lower end above the position
        long[] along = new long[count];
        int lines = 0;
        for (int i = 0, j; i < count; i = j) {
            int a = at[order[i]];
            j = i + 1;
            while (j < count && at[order[j]] == a) {
                j++;
            }
            lines++;
            if (j - i > 1) {
                for (int k = i; k < j; k++) {
                    along[k] = (long) low[order[k]] << 32 | order[k];
                }
                Arrays.sort(along, i, j);
                for (int k = i; k < j; k++) {
                    order[k] = (int) along[k];
                }
            }
        }
        along = null;
        long[] lineAt = new long[lines];
        int[] start = new int[lines + 1];
        int[] lo = new int[count], hi = new int[count], sortedEdge = new int[count];
        int line = -1;
        for (int i = 0; i < count; i++) {
            int o = order[i];
            if (i == 0 || at[o] != at[order[i - 1]]) {
                line++;
                lineAt[line] = at[o] + base;
                start[line] = i;
            }
            sortedEdge[i] = edge[o];
            lo[i] = low[o];
            hi[i] = high[o];
            if (i > start[line] && lo[i] < hi[i - 1]) {
                return null;
            }
        }
        start[lines] = count;
        return new Lines(lineAt, start, lo, hi, sortedEdge);
    }

    private record Lines(long[] at, int[] start, int[] lo, int[] hi, int[] edge) {
        static final Lines EMPTY = new Lines(new long[0], new int[] {0}, new int[0], new int[0], new int[0]);
    }

    /** The edge number of a slot entry (entries of edges running towards lower coordinates are complemented). */
    static int edgeOf(int entry) {
        return entry < 0 ? ~entry : entry;
    }

    /** First line whose coordinate is at or above {@code c}. */
    static int firstLine(long[] lines, long c) {
        int i = Arrays.binarySearch(lines, c);
        return i >= 0 ? i : -i - 1;
    }

    /** First slot in [from, to) whose upper end is at or above {@code c} (upper ends ascend in a line). */
    static int firstReaching(int[] hi, int from, int to, long c) {
        int a = from, b = to;
        while (a < b) {
            int m = (a + b) >>> 1;
            if (hi[m] < c) {
                a = m + 1;
            } else {
                b = m;
            }
        }
        return a;
    }

    /** A reusable query buffer for one thread. */
    public static int[][] buffer() {
        return new int[][] {new int[64]};
    }

    /**
     * Writes into {@code holder[0]} every edge whose bounding box meets the closed query box (and, for
     * edges kept in the grid, possibly a few more), once each, ascending; returns the count.
     */
    public int query(long qx0, long qy0, long qx1, long qy1, int[][] holder) {
        int[] out = holder[0];
        int count = 0;
        for (int l = firstLine(rowY, qy0); l < rowY.length && rowY[l] <= qy1; l++) {
            for (int i = firstReaching(hHi, rowStart[l], rowStart[l + 1], qx0 - baseX); i < rowStart[l + 1]
                    && hLo[i] <= qx1 - baseX; i++) {
                if (count == out.length) {
                    out = Arrays.copyOf(out, 2 * count);
                }
                out[count++] = edgeOf(hEdge[i]);
            }
        }
        for (int l = firstLine(colX, qx0); l < colX.length && colX[l] <= qx1; l++) {
            for (int i = firstReaching(vHi, colStart[l], colStart[l + 1], qy0 - baseY); i < colStart[l + 1]
                    && vLo[i] <= qy1 - baseY; i++) {
                if (count == out.length) {
                    out = Arrays.copyOf(out, 2 * count);
                }
                out[count++] = edgeOf(vEdge[i]);
            }
        }
        if (grid != null) {
            holder[0] = out;
            count = grid.query(qx0, qy0, qx1, qy1, holder, count);
            out = holder[0];
        }
        Arrays.sort(out, 0, count);
        int u = 0;
        for (int i = 0; i < count; i++) {
            if (u == 0 || out[i] != out[u - 1]) {
                out[u++] = out[i];
            }
        }
        holder[0] = out;
        return u;
    }

    /** Heap bytes of the index arrays. */
    public long retainedBytes() {
        return 8L * (rowY.length + colX.length) + 4L * (rowStart.length + colStart.length + hLo.length + hHi.length
                + hEdge.length + vLo.length + vHi.length + vEdge.length + gridEdges.length)
                + (grid == null ? 0 : grid.retainedBytes()) + 160;
    }

    /**
     * A uniform grid over a subset of edges. The cell side is the power of two at or above the side that
     * gives about {@value EdgeIndex#EDGES_PER_CELL} edges per cell; an edge is registered in every cell
     * its bounding box touches.
     */
    static final class Grid {
        private final long minX, minY;
        private final int shift;
        final int cols, rows;
        final int[] cellStart;
        final int[] items;

        Grid(MergedLayer layer, int[] edges, long x0, long y0, long x1, long y1) {
            int n = edges.length;
            minX = x0;
            minY = y0;
            double area = (double) (x1 - x0 + 1) * (y1 - y0 + 1);
            long side = Math.max(1, (long) Math.ceil(Math.sqrt(area * EDGES_PER_CELL / Math.max(1, n))));
            int sh = 63 - Long.numberOfLeadingZeros(side);
            if ((1L << sh) < side) {
                sh++;
            }
            while ((((x1 - x0) >> sh) + 1) * (((y1 - y0) >> sh) + 1) > MAX_CELLS) {
                sh++;
            }
            shift = sh;
            cols = (int) (((x1 - x0) >> sh) + 1);
            rows = (int) (((y1 - y0) >> sh) + 1);
            cellStart = new int[cols * rows + 1];
            for (int e : edges) {
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
            for (int e : edges) {
                int ca = col(Math.min(layer.x0(e), layer.x1(e))), cb = col(Math.max(layer.x0(e), layer.x1(e)));
                int ra = row(Math.min(layer.y0(e), layer.y1(e))), rb = row(Math.max(layer.y0(e), layer.y1(e)));
                for (int r = ra; r <= rb; r++) {
                    for (int c = ca; c <= cb; c++) {
                        items[fill[r * cols + c]++] = e;
                    }
                }
            }
        }

        int col(long x) {
            return (int) Math.min(cols - 1, Math.max(0, (x - minX) >> shift));
        }

        int row(long y) {
            return (int) Math.min(rows - 1, Math.max(0, (y - minY) >> shift));
        }

        /** Appends the edges of every cell the box touches after {@code count}; returns the new count. */
        int query(long qx0, long qy0, long qx1, long qy1, int[][] holder, int count) {
            int[] out = holder[0];
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
            holder[0] = out;
            return count;
        }

        long retainedBytes() {
            return 4L * (cellStart.length + items.length) + 48;
        }
    }
}
