/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests.viewer;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.apertura.engine.geom.Polygon;
import org.apertura.ui.viewer.LayoutScene;
import org.apertura.ui.viewer.SceneLayer;

/**
 * A seeded routing-like layout for viewer tests and benchmarks: horizontal wires on one layer,
 * vertical wires on another, square vias where they cross, and a few 45-degree jogs. Nanometre
 * database units.
 */
public final class SyntheticLayout {

    private SyntheticLayout() {
    }

    /** About {@code shapes} shapes spread over three layers. */
    public static LayoutScene scene(int shapes, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        int perLayer = Math.max(1, shapes / 3);
        // a square block where wires on a 40 nm pitch give roughly perLayer wires of ~1 µm
        long side = (long) Math.sqrt(perLayer * 40.0 * 1000.0);
        List<Polygon> h = new ArrayList<>(perLayer);
        List<Polygon> v = new ArrayList<>(perLayer);
        List<Polygon> vias = new ArrayList<>(perLayer);
        for (int i = 0; i < perLayer; i++) {
            long track = random.nextLong(side / 40) * 40;
            long from = random.nextLong(side);
            long len = 200 + random.nextLong(1800);
            if (i % 97 == 0) {
                // a 45-degree jog: a parallelogram rising by its own width
                h.add(Polygon.of(from, track, from + len, track + len / 4, from + len, track + len / 4 + 20, from,
                        track + 20));
            } else {
                h.add(Polygon.rectangle(from, track, from + len, track + 20));
            }
            long col = random.nextLong(side / 40) * 40;
            long vFrom = random.nextLong(side);
            v.add(Polygon.rectangle(col, vFrom, col + 20, vFrom + 200 + random.nextLong(1800)));
            vias.add(Polygon.rectangle(col, track, col + 20, track + 20));
        }
        return new LayoutScene("synthetic " + shapes, 1e-9, List.of(new SceneLayer("M1", 31, 0, h),
                new SceneLayer("M2", 32, 0, v), new SceneLayer("V1", 51, 0, vias)));
    }
}
