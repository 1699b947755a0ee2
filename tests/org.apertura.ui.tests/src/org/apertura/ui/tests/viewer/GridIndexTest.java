/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests.viewer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.apertura.ui.viewer.GridIndex;
import org.junit.jupiter.api.Test;

/** The grid index reports exactly the boxes a brute-force scan finds, each once. */
class GridIndexTest {

    @Test
    void queriesMatchABruteForceScan() {
        SplittableRandom random = new SplittableRandom(7);
        int n = 20_000;
        int[] box = new int[4 * n];
        for (int i = 0; i < n; i++) {
            int x = random.nextInt(-50_000, 50_000);
            int y = random.nextInt(-50_000, 50_000);
            // mostly small boxes, some long wires and a few huge ones that span many cells
            int w = i % 500 == 0 ? random.nextInt(20_000, 90_000) : random.nextInt(0, 400);
            int h = i % 7 == 0 ? random.nextInt(0, 3000) : random.nextInt(0, 60);
            box[4 * i] = x;
            box[4 * i + 1] = y;
            box[4 * i + 2] = x + w;
            box[4 * i + 3] = y + h;
        }
        GridIndex index = new GridIndex(box, n);
        assertTrue(index.largeCount() > 0, "the huge boxes go to the list outside the grid");
        for (int q = 0; q < 300; q++) {
            long x0 = random.nextInt(-70_000, 70_000);
            long y0 = random.nextInt(-70_000, 70_000);
            long x1 = x0 + random.nextInt(0, q % 10 == 0 ? 150_000 : 5_000);
            long y1 = y0 + random.nextInt(0, q % 10 == 0 ? 150_000 : 5_000);
            List<Integer> expected = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                if (box[4 * i] <= x1 && box[4 * i + 2] >= x0 && box[4 * i + 1] <= y1 && box[4 * i + 3] >= y0) {
                    expected.add(i);
                }
            }
            List<Integer> found = new ArrayList<>();
            index.query(x0, y0, x1, y1, found::add);
            found.sort(null);
            assertEquals(expected, found, "window " + x0 + "," + y0 + " .. " + x1 + "," + y1);
        }
    }

    @Test
    void touchingBoxesCountAndEmptyWindowsReportNothing() {
        int[] box = {0, 0, 10, 10, 20, 20, 30, 30};
        GridIndex index = new GridIndex(box, 2);
        List<Integer> found = new ArrayList<>();
        index.query(10, 10, 20, 20, found::add);
        found.sort(null);
        assertEquals(List.of(0, 1), found);
        found.clear();
        index.query(11, 11, 19, 19, found::add);
        assertEquals(List.of(), found);
        index.query(5, 5, 4, 4, found::add);
        assertEquals(List.of(), found);
        new GridIndex(new int[0], 0).query(0, 0, 1, 1, found::add);
        assertEquals(List.of(), found);
    }
}
