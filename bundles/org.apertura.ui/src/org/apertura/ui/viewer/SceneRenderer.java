/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.Arrays;
import java.util.function.BooleanSupplier;

import org.apertura.engine.geom.Box;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;

/**
 * Draws the visible part of a {@link LayoutScene} into an off-screen RGB picture, in plain Java, so
 * that it can run on a background thread (SWT {@link ImageData} needs no display).
 * <p>
 * Level of detail: only shapes the {@link GridIndex} finds in the window are touched; a shape whose
 * box is smaller than a pixel in both directions becomes a single pixel (so a million shapes seen
 * from afar cost one pixel each, not one polygon fill each); axis-parallel rectangles are filled as
 * pixel spans directly; other polygons by an even-odd scanline at pixel-row centres, never thinner
 * than one pixel. Zoomed out so far that a pixel holds a whole cell of a layer's coverage bitmap,
 * the layer is drawn from that bitmap instead of its shapes (aggregated: cost proportional to the
 * pixels, not the shapes). Each layer is first drawn into a coverage mask, then laid over the picture: mask
 * pixels at the boundary of the covered area get the full layer colour (an outline of the merged
 * shapes for free), inner pixels the layer's hatch ink or its light wash.
 * <p>
 * The renderer holds working buffers and is not thread-safe; use one per thread.
 */
public final class SceneRenderer {

    /** Opacity of the outline, the hatch ink and the wash, out of 256. */
    private static final int EDGE_ALPHA = 245;
    private static final int INK_ALPHA = 190;
    private static final int WASH_ALPHA = 70;

    /** Layers with at most this many shapes are always drawn shape by shape. */
    private static final int AGGREGATE_ABOVE = 20_000;

    private byte[] mask = new byte[0];
    private int[] rgb = new int[0];
    private double[] crossings = new double[16];

    /**
     * What a render produced.
     *
     * @param view         the view drawn
     * @param image        the picture, {@code view.width() x view.height()}, 24-bit RGB; null when
     *                     cancelled
     * @param shapesDrawn  shapes drawn as polygons or rectangles
     * @param shapesAsDots shapes smaller than a pixel drawn as one pixel
     * @param aggregatedLayers layers drawn from their coverage bitmap instead of their shapes
     */
    public record Frame(View view, ImageData image, long shapesDrawn, long shapesAsDots, int aggregatedLayers) {
    }

    /**
     * Draws a scene.
     *
     * @param scene     what to draw
     * @param view      where and how large
     * @param visible   per layer of the scene, whether to draw it (missing entries count as visible)
     * @param palette   colours and hatches; layer i gets {@link Palette#layerColour(int)} i
     * @param cancelled polled while drawing; when it turns true the render stops and returns a
     *                  frame without image
     */
    public Frame render(LayoutScene scene, View view, boolean[] visible, Palette palette, BooleanSupplier cancelled) {
        int w = view.width();
        int h = view.height();
        int pixels = w * h;
        if (mask.length < pixels) {
            mask = new byte[pixels];
            rgb = new int[pixels];
        }
        Arrays.fill(rgb, 0, pixels, palette.background());
        Box window = view.window();
        long drawn = 0;
        long dots = 0;
        int aggregated = 0;
        int layerIndex = 0;
        for (SceneLayer layer : scene.layers()) {
            int li = layerIndex++;
            if (li < visible.length && !visible[li]) {
                continue;
            }
            Arrays.fill(mask, 0, pixels, (byte) 0);
            CoverageRaster coverage = layer.coverage();
            if (coverage.cell * view.scale() <= 1.0 && layer.size() > AGGREGATE_ABOVE) {
                coverage.draw(view, mask, w, h);
                aggregated++;
                compose(w, h, palette.layerColour(li), palette.layerHatch(li));
                continue;
            }
            int[] counters = new int[2];
            int[] seen = {0};
            boolean[] stop = {false};
            layer.index().query(window.minX(), window.minY(), window.maxX(), window.maxY(), i -> {
                if (stop[0]) {
                    return;
                }
                if ((++seen[0] & 4095) == 0 && cancelled.getAsBoolean()) {
                    stop[0] = true;
                    return;
                }
                drawShape(layer, i, view, w, h, counters);
            });
            if (stop[0] || cancelled.getAsBoolean()) {
                return new Frame(view, null, drawn, dots, aggregated);
            }
            drawn += counters[0];
            dots += counters[1];
            compose(w, h, palette.layerColour(li), palette.layerHatch(li));
        }
        ImageData image = new ImageData(w, h, 24, new PaletteData(0xFF0000, 0x00FF00, 0x0000FF));
        for (int y = 0; y < h; y++) {
            image.setPixels(0, y, w, rgb, y * w);
        }
        return new Frame(view, image, drawn, dots, aggregated);
    }

    private void drawShape(SceneLayer layer, int i, View view, int w, int h, int[] counters) {
        double sx0 = view.screenX(layer.minX(i));
        double sx1 = view.screenX(layer.maxX(i));
        double sy0 = view.screenY(layer.maxY(i)); // top row
        double sy1 = view.screenY(layer.minY(i));
        if (sx1 - sx0 < 1 && sy1 - sy0 < 1) {
            int px = (int) Math.floor((sx0 + sx1) / 2);
            int py = (int) Math.floor((sy0 + sy1) / 2);
            if (px >= 0 && px < w && py >= 0 && py < h) {
                mask[py * w + px] = 1;
            }
            counters[1]++;
            return;
        }
        counters[0]++;
        if (layer.isRectangle(i) || sy1 - sy0 < 1 || sx1 - sx0 < 1) {
            fillSpan(sx0, sy0, sx1, sy1, w, h);
            return;
        }
        fillPolygon(layer, i, view, sy0, sy1, w, h);
    }

    /** Fills every pixel the box touches, at least one pixel in each direction. */
    private void fillSpan(double sx0, double sy0, double sx1, double sy1, int w, int h) {
        int x0 = (int) Math.max(0, Math.floor(sx0));
        int x1 = (int) Math.min(w - 1, Math.max(Math.floor(sx0), Math.ceil(sx1) - 1));
        int y0 = (int) Math.max(0, Math.floor(sy0));
        int y1 = (int) Math.min(h - 1, Math.max(Math.floor(sy0), Math.ceil(sy1) - 1));
        for (int y = y0; y <= y1; y++) {
            Arrays.fill(mask, y * w + x0, y * w + x1 + 1, (byte) 1);
        }
    }

    private void fillPolygon(SceneLayer layer, int i, View view, double sy0, double sy1, int w, int h) {
        int n = layer.vertexCount(i);
        if (crossings.length < n) {
            crossings = new double[Math.max(n, 2 * crossings.length)];
        }
        int[] xy = layer.vertices();
        int base = layer.start(i);
        int row0 = (int) Math.max(0, Math.floor(sy0));
        int row1 = (int) Math.min(h - 1, Math.ceil(sy1));
        for (int row = row0; row <= row1; row++) {
            double wy = view.worldY(row + 0.5);
            int k = 0;
            for (int a = 0; a < n; a++) {
                int b = a + 1 == n ? 0 : a + 1;
                double ya = xy[base + 2 * a + 1];
                double yb = xy[base + 2 * b + 1];
                if ((ya <= wy && wy < yb) || (yb <= wy && wy < ya)) {
                    double xa = xy[base + 2 * a];
                    double xb = xy[base + 2 * b];
                    crossings[k++] = view.screenX(xa + (wy - ya) * (xb - xa) / (yb - ya));
                }
            }
            Arrays.sort(crossings, 0, k);
            for (int c = 0; c + 1 < k; c += 2) {
                int x0 = (int) Math.floor(crossings[c]);
                int x1 = Math.max(x0, (int) Math.ceil(crossings[c + 1]) - 1);
                x0 = Math.max(0, x0);
                x1 = Math.min(w - 1, x1);
                if (x0 <= x1) {
                    Arrays.fill(mask, row * w + x0, row * w + x1 + 1, (byte) 1);
                }
            }
        }
    }

    private void compose(int w, int h, int colour, Hatch hatch) {
        for (int y = 0; y < h; y++) {
            int rowStart = y * w;
            for (int x = 0; x < w; x++) {
                int p = rowStart + x;
                if (mask[p] == 0) {
                    continue;
                }
                boolean edge = (x > 0 && mask[p - 1] == 0) || (x + 1 < w && mask[p + 1] == 0)
                        || (y > 0 && mask[p - w] == 0) || (y + 1 < h && mask[p + w] == 0);
                int alpha = edge ? EDGE_ALPHA : hatch.ink(x, y) ? INK_ALPHA : WASH_ALPHA;
                rgb[p] = blend(rgb[p], colour, alpha);
            }
        }
    }

    /** Mixes colour over base with an opacity out of 256. */
    static int blend(int base, int colour, int alpha) {
        int inv = 256 - alpha;
        int r = (((base >> 16) & 0xFF) * inv + ((colour >> 16) & 0xFF) * alpha) >> 8;
        int g = (((base >> 8) & 0xFF) * inv + ((colour >> 8) & 0xFF) * alpha) >> 8;
        int b = ((base & 0xFF) * inv + (colour & 0xFF) * alpha) >> 8;
        return (r << 16) | (g << 8) | b;
    }
}
