/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

/**
 * A coarse bitmap of where a layer has material: the layer's extent cut into at most
 * {@value #MAX_SIDE} x {@value #MAX_SIDE} square cells, a bit set for each cell that some shape's
 * bounding box touches. When the viewer zooms out so far that a screen pixel holds at least one cell,
 * the layer is drawn from this bitmap in time proportional to the cells in view, whatever the number
 * of shapes (the aggregated level of detail). Conservative: a cell is set if any bounding box
 * touches it. About 512 KiB per layer at most. Immutable after construction.
 */
final class CoverageRaster {

    static final int MAX_SIDE = 2048;

    final long originX;
    final long originY;
    final long cell;
    final int nx;
    final int ny;
    private final int words;
    private final long[] bits;

    CoverageRaster(SceneLayer layer) {
        int n = layer.size();
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            minX = Math.min(minX, layer.minX(i));
            minY = Math.min(minY, layer.minY(i));
            maxX = Math.max(maxX, layer.maxX(i));
            maxY = Math.max(maxY, layer.maxY(i));
        }
        if (n == 0) {
            minX = minY = maxX = maxY = 0;
        }
        originX = minX;
        originY = minY;
        long extent = Math.max(maxX - minX, maxY - minY) + 1;
        cell = Math.max(1, (extent + MAX_SIDE - 1) / MAX_SIDE);
        nx = (int) ((maxX - minX) / cell) + 1;
        ny = (int) ((maxY - minY) / cell) + 1;
        words = (nx + 63) >>> 6;
        bits = new long[words * ny];
        for (int i = 0; i < n; i++) {
            int x0 = (int) ((layer.minX(i) - originX) / cell);
            int x1 = (int) ((layer.maxX(i) - originX) / cell);
            int y0 = (int) ((layer.minY(i) - originY) / cell);
            int y1 = (int) ((layer.maxY(i) - originY) / cell);
            for (int y = y0; y <= y1; y++) {
                setRange(y * words, x0, x1);
            }
        }
    }

    private void setRange(int row, int x0, int x1) {
        int w0 = x0 >>> 6, w1 = x1 >>> 6;
        long first = -1L << (x0 & 63);
        long last = -1L >>> (63 - (x1 & 63));
        if (w0 == w1) {
            bits[row + w0] |= first & last;
            return;
        }
        bits[row + w0] |= first;
        for (int w = w0 + 1; w < w1; w++) {
            bits[row + w] = -1L;
        }
        bits[row + w1] |= last;
    }

    boolean get(int x, int y) {
        return (bits[y * words + (x >>> 6)] & (1L << (x & 63))) != 0;
    }

    /**
     * Sets in the mask the pixel of every set cell the view shows.
     *
     * @return the number of cells drawn
     */
    int draw(View view, byte[] mask, int w, int h) {
        double wx0 = view.worldX(0), wx1 = view.worldX(w);
        double wy0 = view.worldY(h), wy1 = view.worldY(0);
        int cx0 = (int) Math.max(0, Math.floor((wx0 - originX) / cell));
        int cx1 = (int) Math.min(nx - 1, Math.floor((wx1 - originX) / cell));
        int cy0 = (int) Math.max(0, Math.floor((wy0 - originY) / cell));
        int cy1 = (int) Math.min(ny - 1, Math.floor((wy1 - originY) / cell));
        int drawn = 0;
        int[] columnPixel = new int[Math.max(0, cx1 - cx0 + 1)];
        for (int cx = cx0; cx <= cx1; cx++) {
            columnPixel[cx - cx0] = (int) Math.floor(view.screenX(originX + (cx + 0.5) * cell));
        }
        for (int cy = cy0; cy <= cy1; cy++) {
            int py = (int) Math.floor(view.screenY(originY + (cy + 0.5) * cell));
            if (py < 0 || py >= h) {
                continue;
            }
            int row = cy * words;
            for (int wi = cx0 >>> 6; wi <= cx1 >>> 6; wi++) {
                long word = bits[row + wi];
                while (word != 0) {
                    int bit = Long.numberOfTrailingZeros(word);
                    word &= word - 1;
                    int cx = (wi << 6) + bit;
                    if (cx < cx0 || cx > cx1) {
                        continue;
                    }
                    int px = columnPixel[cx - cx0];
                    if (px >= 0 && px < w) {
                        mask[py * w + px] = 1;
                        drawn++;
                    }
                }
            }
        }
        return drawn;
    }
}
