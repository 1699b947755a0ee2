/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/**
 * An axis-parallel box in nanometres; the constructor orders the corners so that {@code x1 <= x2} and
 * {@code y1 <= y2}. A box may be degenerate (a line or a point), as a marker of a zero gap is.
 */
public record NmBox(double x1, double y1, double x2, double y2) {

    /** Orders the corners and rejects non-finite values. */
    public NmBox {
        if (!Double.isFinite(x1) || !Double.isFinite(y1) || !Double.isFinite(x2) || !Double.isFinite(y2)) {
            throw new IllegalArgumentException("box corners must be finite: " + x1 + "," + y1 + "," + x2 + "," + y2);
        }
        if (x1 > x2) {
            double t = x1;
            x1 = x2;
            x2 = t;
        }
        if (y1 > y2) {
            double t = y1;
            y1 = y2;
            y2 = t;
        }
    }

    /** Extent along x, nm. */
    public double width() {
        return x2 - x1;
    }

    /** Extent along y, nm. */
    public double height() {
        return y2 - y1;
    }

    /** True when the boxes share at least a boundary point. */
    public boolean intersects(NmBox o) {
        return x1 <= o.x2 && o.x1 <= x2 && y1 <= o.y2 && o.y1 <= y2;
    }

    /** The smallest box holding both. */
    public NmBox union(NmBox o) {
        return new NmBox(Math.min(x1, o.x1), Math.min(y1, o.y1), Math.max(x2, o.x2), Math.max(y2, o.y2));
    }

    /** This box grown by {@code d} nm on every side. */
    public NmBox expand(double d) {
        return new NmBox(x1 - d, y1 - d, x2 + d, y2 + d);
    }

    /** True when every corner coordinate differs by at most {@code tolerance} nm. */
    public boolean sameAs(NmBox o, double tolerance) {
        return Math.abs(x1 - o.x1) <= tolerance && Math.abs(y1 - o.y1) <= tolerance
                && Math.abs(x2 - o.x2) <= tolerance && Math.abs(y2 - o.y2) <= tolerance;
    }
}
