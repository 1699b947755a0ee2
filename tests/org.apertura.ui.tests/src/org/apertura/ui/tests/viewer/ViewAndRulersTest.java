/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apertura.engine.geom.Box;
import org.apertura.ui.viewer.Rulers;
import org.apertura.ui.viewer.View;
import org.junit.jupiter.api.Test;

/** View arithmetic (world y up, screen y down) and ruler steps and labels. */
class ViewAndRulersTest {

    @Test
    void screenAndWorldAreInverse() {
        View v = new View(1000, -500, 0.25, 800, 600);
        assertEquals(400, v.screenX(1000), 1e-9);
        assertEquals(300, v.screenY(-500), 1e-9);
        // y grows upwards in the world, downwards on screen
        assertTrue(v.screenY(0) < v.screenY(-500));
        for (double px : new double[] {0, 17.5, 799}) {
            assertEquals(px, v.screenX(v.worldX(px)), 1e-9);
            assertEquals(px, v.screenY(v.worldY(px)), 1e-9);
        }
    }

    @Test
    void zoomKeepsThePointUnderThePointer() {
        View v = new View(0, 0, 1, 800, 600);
        double wx = v.worldX(123), wy = v.worldY(456);
        View z = v.zoomAbout(123, 456, 3.7);
        assertEquals(3.7, z.scale(), 1e-12);
        assertEquals(wx, z.worldX(123), 1e-9);
        assertEquals(wy, z.worldY(456), 1e-9);
    }

    @Test
    void panFollowsTheDrag() {
        View v = new View(0, 0, 2, 800, 600);
        double wx = v.worldX(100), wy = v.worldY(100);
        View p = v.panBy(30, -40);
        // the world point that was under (100, 100) is now under (130, 60)
        assertEquals(130, p.screenX(wx), 1e-9);
        assertEquals(60, p.screenY(wy), 1e-9);
    }

    @Test
    void fitShowsTheWholeBoxCentred() {
        Box b = new Box(-1000, 0, 3000, 1000);
        View v = View.fit(b, 800, 600);
        assertTrue(v.screenX(-1000) >= 0 && v.screenX(3000) <= 800);
        assertTrue(v.screenY(1000) >= 0 && v.screenY(0) <= 600);
        assertEquals(400, v.screenX(1000), 1e-9);
        assertEquals(300, v.screenY(500), 1e-9);
    }

    @Test
    void rulerStepsAreOneTwoFiveDecades() {
        assertEquals(100, Rulers.stepNm(1, 70), 1e-9);
        assertEquals(200, Rulers.stepNm(2, 70), 1e-9);
        assertEquals(500, Rulers.stepNm(5, 90), 1e-9);
        assertEquals(1000, Rulers.stepNm(10, 100), 1e-9);
        assertEquals(5e6, Rulers.stepNm(40_000, 90), 1e-3);
    }

    @Test
    void labelsUseNanometresBelowAMicrometre() {
        assertEquals("350 nm", Rulers.label(350, 50));
        assertEquals("1.5 µm", Rulers.label(1500, 500));
        assertEquals("3 µm", Rulers.label(3000, 1000));
        assertEquals("-12.5 µm", Rulers.label(-12_500, 500));
        assertEquals("1.02 µm", Rulers.label(1020, 20));
        assertEquals("12 µm", Rulers.label(12_000, 2000));
        assertEquals("0.25 nm", Rulers.label(0.25, 0.05));
        assertEquals("x 12.345 µm  y -0.020 µm", Rulers.position(12_345, -20, 1));
        assertEquals("x 0.0005 µm  y 0.0000 µm", Rulers.position(0.5, 0, 0.25));
    }
}
