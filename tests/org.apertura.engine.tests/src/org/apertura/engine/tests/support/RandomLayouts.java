/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests.support;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.apertura.engine.geom.Polygon;

/** Seeded small random layouts for property tests. */
public final class RandomLayouts {

    private RandomLayouts() {
    }

    /** {@code n} rectangles in a 200 x 200 field, sides 1..50 (some thin), so they overlap, abut and nest. */
    public static List<Polygon> manhattan(Random r, int n) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            long x = r.nextInt(200), y = r.nextInt(200);
            long w = 1 + r.nextInt(r.nextInt(4) == 0 ? 8 : 50), h = 1 + r.nextInt(r.nextInt(4) == 0 ? 8 : 50);
            out.add(Polygon.rectangle(x, y, x + w, y + h));
        }
        return out;
    }

    /**
     * Rectangles mixed with 45-degree shapes (chamfered boxes and 45-degree wire pieces), all vertices
     * on even coordinates so that every crossing of two 45-degree edges lies on the integer grid.
     */
    public static List<Polygon> octilinear(Random r, int n) {
        List<Polygon> out = new ArrayList<>();
        for (Polygon p : octilinearHalf(r, n)) {
            long[] c = p.coordinates();
            for (int i = 0; i < c.length; i++) {
                c[i] *= 2;
            }
            out.add(Polygon.of(c));
        }
        return out;
    }

    private static List<Polygon> octilinearHalf(Random r, int n) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            long x = r.nextInt(200), y = r.nextInt(200);
            int kind = r.nextInt(3);
            if (kind == 0) {
                out.add(Polygon.rectangle(x, y, x + 1 + r.nextInt(40), y + 1 + r.nextInt(40)));
            } else if (kind == 1) {
                long w = 6 + r.nextInt(40), h = 6 + r.nextInt(40), c = 1 + r.nextInt((int) Math.min(w, h) / 2);
                out.add(Polygon.of(x + c, y, x + w - c, y, x + w, y + c, x + w, y + h - c, x + w - c, y + h, x + c, y + h,
                        x, y + h - c, x, y + c));
            } else {
                long len = 5 + r.nextInt(40), t = 2 + r.nextInt(8);
                if (r.nextBoolean()) {
                    out.add(Polygon.of(x, y, x + t, y, x + t + len, y + len, x + len, y + len));
                } else {
                    out.add(Polygon.of(x, y + len, x + len, y, x + len + t, y, x + t, y + len));
                }
            }
        }
        return out;
    }
}
