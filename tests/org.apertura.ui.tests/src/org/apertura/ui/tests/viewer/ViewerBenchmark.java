/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests.viewer;

import java.util.Locale;

import org.apertura.engine.geom.Box;
import org.apertura.ui.viewer.LayoutScene;
import org.apertura.ui.viewer.Palette;
import org.apertura.ui.viewer.SceneLayer;
import org.apertura.ui.viewer.SceneRenderer;
import org.apertura.ui.viewer.View;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.widgets.Display;

/**
 * Benchmark, not a test: renders a seeded routing-like layout of 1 M shapes (argument 0 changes the
 * count) with the viewer's renderer at several zooms and pans, beside the plain way of drawing every
 * polygon with SWT's {@link GC#fillPolygon} into an image on the UI thread, and prints times and
 * ratios. Needs a display (run under Xvfb). Run with
 * {@code java -cp ... org.apertura.ui.tests.viewer.ViewerBenchmark [shapes]}.
 */
public final class ViewerBenchmark {

    private ViewerBenchmark() {
    }

    public static void main(String[] args) {
        int shapes = args.length > 0 ? Integer.parseInt(args[0]) : 1_000_000;
        long t0 = System.nanoTime();
        LayoutScene scene = SyntheticLayout.scene(shapes, 42);
        long build = System.nanoTime() - t0;
        Box all = scene.bounds().orElseThrow();
        System.out.printf(Locale.ROOT, "scene: %,d shapes, %.1f x %.1f um, packed and indexed in %d ms%n",
                scene.shapeCount(), all.width() / 1000.0, all.height() / 1000.0, build / 1_000_000);
        int w = 1400, h = 900;
        SceneRenderer r = new SceneRenderer();
        View fit = View.fit(all, w, h);
        View[] views = {fit, fit.zoomAbout(w / 2.0, h / 2.0, 10), fit.zoomAbout(w / 2.0, h / 2.0, 100),
                fit.zoomAbout(w / 2.0, h / 2.0, 100).panBy(300, 0)};
        String[] names = {"fit (whole layout)", "zoom 10x", "zoom 100x", "zoom 100x, panned 300 px"};
        for (int round = 0; round < 2; round++) { // the first round warms up the JIT
            for (int i = 0; i < views.length; i++) {
                long s = System.nanoTime();
                SceneRenderer.Frame f = r.render(scene, views[i], new boolean[0], Palette.HARBOUR, () -> false);
                long ms = (System.nanoTime() - s) / 1_000_000;
                if (round == 1) {
                    System.out.printf(Locale.ROOT, "viewer renderer, %-26s %5d ms  (%,d drawn, %,d as dots)%n",
                            names[i], ms, f.shapesDrawn(), f.shapesAsDots());
                }
            }
        }
        Display display = Display.getDefault();
        long s = System.nanoTime();
        Image image = new Image(display, w, h);
        GC gc = new GC(image);
        int[] pts = new int[64];
        for (SceneLayer layer : scene.layers()) {
            for (int i = 0; i < layer.size(); i++) {
                int n = layer.vertexCount(i);
                if (pts.length < 2 * n) {
                    pts = new int[2 * n];
                }
                for (int v = 0; v < n; v++) {
                    pts[2 * v] = (int) fit.screenX(layer.x(i, v));
                    pts[2 * v + 1] = (int) fit.screenY(layer.y(i, v));
                }
                gc.fillPolygon(n == pts.length / 2 ? pts : java.util.Arrays.copyOf(pts, 2 * n));
            }
        }
        gc.dispose();
        image.getImageData();
        image.dispose();
        long plain = (System.nanoTime() - s) / 1_000_000;
        long s2 = System.nanoTime();
        r.render(scene, fit, new boolean[0], Palette.HARBOUR, () -> false);
        long ours = Math.max(1, (System.nanoTime() - s2) / 1_000_000);
        System.out.printf(Locale.ROOT, "plain GC.fillPolygon of every shape at fit: %d ms; viewer renderer %d ms; ratio %.1fx%n",
                plain, ours, (double) plain / ours);
        display.dispose();
    }
}
