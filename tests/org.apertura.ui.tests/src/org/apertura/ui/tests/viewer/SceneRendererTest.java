/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.ui.viewer.LayoutScene;
import org.apertura.ui.viewer.Palette;
import org.apertura.ui.viewer.SceneLayer;
import org.apertura.ui.viewer.SceneRenderer;
import org.apertura.ui.viewer.View;
import org.eclipse.swt.graphics.ImageData;
import org.junit.jupiter.api.Test;

/** What the off-screen renderer paints where, and its level of detail. */
class SceneRendererTest {

    private static final Palette P = Palette.HARBOUR;

    /** A 1000 x 1000 square on layer 0 and a triangle on layer 1, seen at 0.1 px per unit. */
    private static LayoutScene squareAndTriangle() {
        return new LayoutScene("t", 1e-9, List.of(
                new SceneLayer("A", 1, 0, List.of(Polygon.rectangle(0, 0, 1000, 1000))),
                new SceneLayer("B", 2, 0, List.of(Polygon.of(2000, 0, 3000, 0, 2000, 1000)))));
    }

    @Test
    void shapesArePaintedWhereTheyAreAndNowhereElse() {
        View view = new View(1500, 500, 0.1, 400, 200);
        SceneRenderer.Frame f = new SceneRenderer().render(squareAndTriangle(), view, new boolean[] {true, true}, P,
                () -> false);
        ImageData img = f.image();
        assertEquals(400, img.width);
        assertEquals(2, f.shapesDrawn());
        // inside the square (world 500,500): outline or fill of layer A, never the background
        int inside = img.getPixel((int) view.screenX(500), (int) view.screenY(500));
        assertNotEquals(P.background(), inside);
        // the square's edge carries (nearly) the full layer colour
        int edge = img.getPixel((int) view.screenX(0), (int) view.screenY(500));
        assertClose(P.layerColour(0), edge, 16);
        // between the shapes, and in the triangle's empty upper-right half: background
        assertEquals(P.background(), img.getPixel((int) view.screenX(1500), (int) view.screenY(500)));
        assertEquals(P.background(), img.getPixel((int) view.screenX(2900), (int) view.screenY(900)));
        // inside the triangle's lower-left part: layer B
        assertNotEquals(P.background(), img.getPixel((int) view.screenX(2200), (int) view.screenY(200)));
    }

    @Test
    void hiddenLayersAreNotPainted() {
        View view = new View(1500, 500, 0.1, 400, 200);
        SceneRenderer.Frame f = new SceneRenderer().render(squareAndTriangle(), view, new boolean[] {false, true}, P,
                () -> false);
        assertEquals(P.background(), f.image().getPixel((int) view.screenX(500), (int) view.screenY(500)));
        assertEquals(1, f.shapesDrawn());
    }

    @Test
    void subPixelShapesBecomeDotsAndFarAwayShapesAreNotTouched() {
        LayoutScene scene = SyntheticLayout.scene(30_000, 1);
        Box all = scene.bounds().orElseThrow();
        SceneRenderer r = new SceneRenderer();
        // 1 px = 4 µm: the 20 µm block is a handful of pixels, wires of 0.2 to 2 µm are dots
        View far = new View(all.minX() + all.width() / 2.0, all.minY() + all.height() / 2.0, 1 / 4000.0, 60, 60);
        SceneRenderer.Frame whole = r.render(scene, far, new boolean[0], P, () -> false);
        assertEquals(scene.shapeCount(), whole.shapesDrawn() + whole.shapesAsDots());
        assertTrue(whole.shapesAsDots() > scene.shapeCount() / 2, "most shapes are below a pixel from afar");
        // a close-up of a 2 µm window touches only the few shapes near it
        View close = new View(all.minX() + all.width() / 2.0, all.minY() + all.height() / 2.0, 0.2, 400, 400);
        SceneRenderer.Frame near = r.render(scene, close, new boolean[0], P, () -> false);
        assertTrue(near.shapesDrawn() + near.shapesAsDots() < scene.shapeCount() / 20,
                "a close-up draws a small part: " + near.shapesDrawn());
        assertEquals(0, near.shapesAsDots());
    }

    @Test
    void farZoomOfALargeLayoutIsDrawnFromTheCoverageBitmap() {
        LayoutScene scene = SyntheticLayout.scene(90_000, 3);
        Box all = scene.bounds().orElseThrow();
        // the whole block in the middle 40 x 40 pixels of a 200 x 200 picture
        View far = new View(all.minX() + all.width() / 2.0, all.minY() + all.height() / 2.0,
                40.0 / Math.max(all.width(), all.height()), 200, 200);
        SceneRenderer.Frame f = new SceneRenderer().render(scene, far, new boolean[0], P, () -> false);
        assertEquals(3, f.aggregatedLayers());
        assertEquals(0, f.shapesDrawn() + f.shapesAsDots());
        assertNotEquals(P.background(), f.image().getPixel(100, 100), "the dense block is drawn");
        assertEquals(P.background(), f.image().getPixel(10, 10), "outside the block nothing is drawn");
        assertEquals(P.background(), f.image().getPixel(190, 100));
    }

    @Test
    void cancellingGivesNoPicture() {
        SceneRenderer.Frame f = new SceneRenderer().render(SyntheticLayout.scene(30_000, 1),
                new View(0, 0, 1e-3, 300, 300), new boolean[0], P, () -> true);
        assertNull(f.image());
    }

    private static void assertClose(int expected, int actual, int tolerance) {
        for (int shift : new int[] {16, 8, 0}) {
            int e = (expected >> shift) & 0xFF, a = (actual >> shift) & 0xFF;
            assertTrue(Math.abs(e - a) <= tolerance,
                    String.format("colour %06x is not close to %06x", actual, expected));
        }
    }
}
