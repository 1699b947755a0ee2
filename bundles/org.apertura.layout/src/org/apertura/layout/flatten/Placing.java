/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

import org.apertura.layout.model.Placement;

/**
 * An accumulated placement: p -> translation + rotate(angle) * mag * reflect(p). Keeps an exact
 * integer form when the angle is a multiple of 90 degrees, the magnification an integer and the
 * translation integral.
 */
final class Placing {

    static final Placing IDENTITY = new Placing(false, 0.0, 1.0, 0.0, 0.0);

    final boolean reflected;
    final double angle;
    final double mag;
    final double dtx;
    final double dty;
    final int quadrant;
    final double cos;
    final double sin;
    final boolean exact;
    final long intMag;
    final long tx;
    final long ty;

    private Placing(boolean reflected, double angle, double mag, double dtx, double dty) {
        this.reflected = reflected;
        double a = angle % 360.0;
        if (a < 0) {
            a += 360.0;
        }
        this.angle = a;
        this.mag = mag;
        this.dtx = dtx;
        this.dty = dty;
        double q = a / 90.0;
        if (q == Math.rint(q)) {
            quadrant = ((int) q) & 3;
            cos = new double[] {1, 0, -1, 0}[quadrant];
            sin = new double[] {0, 1, 0, -1}[quadrant];
        } else {
            quadrant = -1;
            cos = Math.cos(Math.toRadians(a));
            sin = Math.sin(Math.toRadians(a));
        }
        boolean integralMag = mag == Math.rint(mag) && mag >= 1 && mag <= 1 << 20;
        boolean integralT = dtx == Math.rint(dtx) && dty == Math.rint(dty) && Math.abs(dtx) < 1L << 52
                && Math.abs(dty) < 1L << 52;
        exact = quadrant >= 0 && integralMag && integralT;
        intMag = exact ? (long) mag : 0;
        tx = exact ? (long) dtx : 0;
        ty = exact ? (long) dty : 0;
    }

    /** This placing followed inside by a child placement whose origin (in this space's input) is (ox, oy). */
    Placing then(Placement child, double ox, double oy) {
        double x = ox * mag;
        double y = (reflected ? -oy : oy) * mag;
        double nx = x * cos - y * sin + dtx;
        double ny = x * sin + y * cos + dty;
        double childAngle = child.getAngle();
        double a = child.isAbsoluteAngle() ? childAngle : angle + (reflected ? -childAngle : childAngle);
        double m = child.isAbsoluteMagnification() ? child.getMagnification() : mag * child.getMagnification();
        return new Placing(reflected ^ child.isReflected(), a, m, nx, ny);
    }
}
