/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.geom;

/**
 * A directed boundary edge from (x0, y0) to (x1, y1) in database units. Edges of merged regions are
 * directed with the material on their left (outer rings counter-clockwise, holes clockwise).
 */
public record Segment(long x0, long y0, long x1, long y1) implements Comparable<Segment> {

    /** Euclidean length in database units. */
    public double length() {
        return Math.hypot(x1 - x0, y1 - y0);
    }

    public boolean isHorizontal() {
        return y0 == y1;
    }

    public boolean isVertical() {
        return x0 == x1;
    }

    /** Orders by x0, y0, x1, y1. */
    @Override
    public int compareTo(Segment o) {
        int c = Long.compare(x0, o.x0);
        if (c == 0) {
            c = Long.compare(y0, o.y0);
        }
        if (c == 0) {
            c = Long.compare(x1, o.x1);
        }
        return c != 0 ? c : Long.compare(y1, o.y1);
    }
}
