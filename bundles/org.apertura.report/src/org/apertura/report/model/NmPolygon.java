/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Arrays;

/**
 * A simple polygon in nm, vertices as {@code x0,y0,x1,y1,...} without repeating the first vertex. The
 * record keeps its own copy; {@link #xy()} returns a copy, {@link #x(int)}/{@link #y(int)} read in place.
 */
public record NmPolygon(double[] xy) {

    /** Copies the coordinates; at least three vertices. */
    public NmPolygon {
        if (xy.length < 6 || xy.length % 2 != 0) {
            throw new IllegalArgumentException("a polygon needs at least 3 vertices as x,y pairs, got " + xy.length
                    + " numbers");
        }
        xy = xy.clone();
    }

    /** An axis-parallel rectangle. */
    public static NmPolygon rectangle(NmBox b) {
        return new NmPolygon(new double[] { b.x1(), b.y1(), b.x2(), b.y1(), b.x2(), b.y2(), b.x1(), b.y2() });
    }

    @Override
    public double[] xy() {
        return xy.clone();
    }

    /** Number of vertices. */
    public int size() {
        return xy.length / 2;
    }

    /** x of vertex {@code i}. */
    public double x(int i) {
        return xy[2 * i];
    }

    /** y of vertex {@code i}. */
    public double y(int i) {
        return xy[2 * i + 1];
    }

    /** The bounding box. */
    public NmBox bounds() {
        double x1 = xy[0], y1 = xy[1], x2 = x1, y2 = y1;
        for (int i = 2; i < xy.length; i += 2) {
            x1 = Math.min(x1, xy[i]);
            x2 = Math.max(x2, xy[i]);
            y1 = Math.min(y1, xy[i + 1]);
            y2 = Math.max(y2, xy[i + 1]);
        }
        return new NmBox(x1, y1, x2, y2);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NmPolygon p && Arrays.equals(xy, p.xy);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(xy);
    }

    @Override
    public String toString() {
        return "NmPolygon" + Arrays.toString(xy);
    }
}
