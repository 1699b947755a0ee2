/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/**
 * A distance that may differ by the axis it is measured along: {@code x} applies to separations along
 * x (between vertical edges), {@code y} to separations along y (between horizontal edges). A separation
 * in another direction (u_x, u_y) (unit vector) needs {@code 1 / sqrt(u_x²/x² + u_y²/y²)}, the radius
 * of the ellipse with half-axes x and y, which is x or y on the axes and the plain value when x = y.
 */
public record AxisValue(long x, long y) {

    public AxisValue {
        Rule.requirePositive(x, "x value");
        Rule.requirePositive(y, "y value");
    }

    /** The same value along both axes. */
    public static AxisValue of(long value) {
        return new AxisValue(value, value);
    }

    public boolean isotropic() {
        return x == y;
    }

    public long max() {
        return Math.max(x, y);
    }

    /** Required distance for a separation vector (dx, dy); the plain value when isotropic. */
    public double along(double dx, double dy) {
        if (isotropic() || (dx == 0 && dy == 0)) {
            return x;
        }
        double len2 = dx * dx + dy * dy;
        double ux2 = dx * dx / len2, uy2 = dy * dy / len2;
        return 1 / Math.sqrt(ux2 / ((double) x * x) + uy2 / ((double) y * y));
    }
}
