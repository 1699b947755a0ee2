/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.function.IntConsumer;

/**
 * A uniform-grid spatial index over bounding boxes in database units. Each box is listed in every
 * grid cell it overlaps, in one compact array (compressed rows: cell i owns
 * {@code ids[start[i] .. start[i+1])}); boxes that would cover more than {@link #MAX_CELLS_PER_BOX}
 * cells are kept in a separate list that every query scans. A query visits only the cells the
 * window overlaps and reports each intersecting box once, without a visited set: a box is reported
 * from its first cell inside the window only.
 * <p>
 * The cell size is chosen from the boxes: about two boxes per cell on average, and never smaller
 * than the mean box extent, so a query costs O(cells in window + boxes reported). Building is
 * O(n) in time and memory. Instances are immutable and safe for concurrent queries.
 */
public final class GridIndex {

    /** Boxes covering more grid cells than this go to the list scanned by every query. */
    public static final int MAX_CELLS_PER_BOX = 16;

    /** Upper bound on the number of grid cells, so that sparse huge layouts stay small. */
    static final int MAX_CELLS = 1 << 22;

    private final int[] box;
    private final int count;
    private final long originX;
    private final long originY;
    private final long cellSize;
    private final int nx;
    private final int ny;
    private final int[] start;
    private final int[] ids;
    private final int[] large;

    /**
     * Builds the index.
     *
     * @param box   bounding boxes as {@code minX, minY, maxX, maxY} per entry, inclusive, in
     *              database units; kept by reference (not copied), so do not change it afterwards
     * @param count number of entries (the array may be longer)
     */
    public GridIndex(int[] box, int count) {
        if (count < 0 || box.length < 4L * count) {
            throw new IllegalArgumentException("box array holds fewer than " + count + " entries");
        }
        this.box = box;
        this.count = count;
        if (count == 0) {
            originX = originY = 0;
            cellSize = 1;
            nx = ny = 1;
            start = new int[2];
            ids = new int[0];
            large = new int[0];
            return;
        }
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        double extentSum = 0;
        for (int i = 0; i < count; i++) {
            int o = 4 * i;
            minX = Math.min(minX, box[o]);
            minY = Math.min(minY, box[o + 1]);
            maxX = Math.max(maxX, box[o + 2]);
            maxY = Math.max(maxY, box[o + 3]);
            extentSum += Math.max((long) box[o + 2] - box[o], (long) box[o + 3] - box[o + 1]);
        }
        double width = maxX - minX + 1.0;
        double height = maxY - minY + 1.0;
        double bySpread = Math.sqrt(width * height * 2.0 / count);
        double byExtent = extentSum / count;
        long size = (long) Math.ceil(Math.max(1.0, Math.max(bySpread, byExtent)));
        while ((Math.ceil(width / size) * Math.ceil(height / size)) > MAX_CELLS) {
            size *= 2;
        }
        originX = minX;
        originY = minY;
        cellSize = size;
        nx = (int) Math.ceil(width / size);
        ny = (int) Math.ceil(height / size);

        int cells = nx * ny;
        int[] counts = new int[cells + 1];
        int largeCount = 0;
        for (int i = 0; i < count; i++) {
            int o = 4 * i;
            int cx0 = cellX(box[o]), cx1 = cellX(box[o + 2]);
            int cy0 = cellY(box[o + 1]), cy1 = cellY(box[o + 3]);
            if ((long) (cx1 - cx0 + 1) * (cy1 - cy0 + 1) > MAX_CELLS_PER_BOX) {
                largeCount++;
                continue;
            }
            for (int cy = cy0; cy <= cy1; cy++) {
                for (int cx = cx0; cx <= cx1; cx++) {
                    counts[cy * nx + cx + 1]++;
                }
            }
        }
        for (int c = 0; c < cells; c++) {
            counts[c + 1] += counts[c];
        }
        start = counts;
        int[] fill = new int[cells];
        ids = new int[start[cells]];
        large = new int[largeCount];
        int l = 0;
        for (int i = 0; i < count; i++) {
            int o = 4 * i;
            int cx0 = cellX(box[o]), cx1 = cellX(box[o + 2]);
            int cy0 = cellY(box[o + 1]), cy1 = cellY(box[o + 3]);
            if ((long) (cx1 - cx0 + 1) * (cy1 - cy0 + 1) > MAX_CELLS_PER_BOX) {
                large[l++] = i;
                continue;
            }
            for (int cy = cy0; cy <= cy1; cy++) {
                for (int cx = cx0; cx <= cx1; cx++) {
                    int c = cy * nx + cx;
                    ids[start[c] + fill[c]++] = i;
                }
            }
        }
    }

    private int cellX(long x) {
        return (int) Math.min(nx - 1, Math.max(0, Math.floorDiv(x - originX, cellSize)));
    }

    private int cellY(long y) {
        return (int) Math.min(ny - 1, Math.max(0, Math.floorDiv(y - originY, cellSize)));
    }

    /** Number of indexed boxes. */
    public int size() {
        return count;
    }

    /** Edge length of a grid cell in database units. */
    public long cellSize() {
        return cellSize;
    }

    /** Number of boxes kept outside the grid because they span too many cells. */
    public int largeCount() {
        return large.length;
    }

    /**
     * Reports, once each, the entries whose box intersects the window (touching counts). The
     * window is inclusive, in database units; an empty window (min above max) reports nothing.
     */
    public void query(long minX, long minY, long maxX, long maxY, IntConsumer sink) {
        if (count == 0 || minX > maxX || minY > maxY) {
            return;
        }
        long gx0 = Math.floorDiv(minX - originX, cellSize), gx1 = Math.floorDiv(maxX - originX, cellSize);
        long gy0 = Math.floorDiv(minY - originY, cellSize), gy1 = Math.floorDiv(maxY - originY, cellSize);
        if (gx1 >= 0 && gy1 >= 0 && gx0 < nx && gy0 < ny) {
            int qx0 = (int) Math.max(0, gx0), qx1 = (int) Math.min(nx - 1, gx1);
            int qy0 = (int) Math.max(0, gy0), qy1 = (int) Math.min(ny - 1, gy1);
            for (int cy = qy0; cy <= qy1; cy++) {
                for (int cx = qx0; cx <= qx1; cx++) {
                    int c = cy * nx + cx;
                    for (int k = start[c], end = start[c + 1]; k < end; k++) {
                        int i = ids[k];
                        int o = 4 * i;
                        if (box[o] > maxX || box[o + 2] < minX || box[o + 1] > maxY || box[o + 3] < minY) {
                            continue;
                        }
                        // report from the first cell of the box that lies inside the window
                        if (Math.max(cellX(box[o]), qx0) == cx && Math.max(cellY(box[o + 1]), qy0) == cy) {
                            sink.accept(i);
                        }
                    }
                }
            }
        }
        for (int i : large) {
            int o = 4 * i;
            if (box[o] <= maxX && box[o + 2] >= minX && box[o + 1] <= maxY && box[o + 3] >= minY) {
                sink.accept(i);
            }
        }
    }
}
