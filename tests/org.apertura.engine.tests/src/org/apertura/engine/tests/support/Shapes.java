/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests.support;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.rule.Rule;

/** Short helpers to write test layouts inline. */
public final class Shapes {

    private Shapes() {
    }

    /** Rectangles from groups of four numbers x0 y0 x1 y1. */
    public static List<Polygon> rects(long... c) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < c.length; i += 4) {
            out.add(Polygon.rectangle(c[i], c[i + 1], c[i + 2], c[i + 3]));
        }
        return out;
    }

    /** Checks one layer "L" with one thread. */
    public static List<Violation> check(List<Polygon> shapes, Rule... rules) {
        return new CheckEngine(CheckOptions.threads(1)).check(Map.of("L", shapes), List.of(rules));
    }
}
