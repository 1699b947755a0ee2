/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.Placement;

/**
 * An accumulated placement: p -> translation + rotate(angle) * mag * reflect(p). Keeps an exact
 * integer form when the angle is a multiple of 90 degrees, the magnification an integer and the
 * translation integral. Shared by the EMF flattener and the streaming flattener, so that both place
 * shapes bit for bit alike.
 */
public final class Placing {

    /** The top cell's placement. */
    public static final Placing IDENTITY = new Placing(false, 0.0, 1.0, 0.0, 0.0);

    /** Counts of shapes placed off the exact integer path, for {@link FlattenResult}. */
    public static final class Tally {
        long rotated;
        long rounded;

        /** Shapes placed at an angle that is not a multiple of 90 degrees (always rounded). */
        public long rotated() {
            return rotated;
        }

        /** Shapes at a multiple of 90 degrees whose magnification or offset needed rounding. */
        public long rounded() {
            return rounded;
        }
    }

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
        return then(child.isReflected(), child.getAngle(), child.isAbsoluteAngle(), child.getMagnification(),
                child.isAbsoluteMagnification(), ox, oy);
    }

    /**
     * This placing followed inside by a child placement (GDSII STRANS semantics: reflection about x
     * first, then magnification and counter-clockwise rotation in degrees, each relative to the
     * parent unless absolute) whose origin, in this space's input, is (ox, oy).
     */
    public Placing then(boolean childReflected, double childAngle, boolean absoluteAngle, double childMag,
            boolean absoluteMag, double ox, double oy) {
        double x = ox * mag;
        double y = (reflected ? -oy : oy) * mag;
        double nx = x * cos - y * sin + dtx;
        double ny = x * sin + y * cos + dty;
        double a = absoluteAngle ? childAngle : angle + (reflected ? -childAngle : childAngle);
        double m = absoluteMag ? childMag : mag * childMag;
        return new Placing(reflected ^ childReflected, a, m, nx, ny);
    }

    /**
     * Places interleaved local coordinates: exactly in 64-bit integers on the exact path, otherwise
     * in double precision rounded to the nearest database unit and counted in {@code tally}.
     *
     * @param cellPath the cells from the top down to the one placed, named in errors
     * @throws LayoutHierarchyException when a placed coordinate leaves the 32-bit range
     */
    public long[] apply(long[] local, Iterable<String> cellPath, Tally tally) {
        long[] t = new long[local.length];
        if (exact) {
            for (int i = 0; i < local.length; i += 2) {
                long x = local[i];
                long y = reflected ? -local[i + 1] : local[i + 1];
                x *= intMag;
                y *= intMag;
                long rx;
                long ry;
                switch (quadrant) {
                    case 1 -> {
                        rx = -y;
                        ry = x;
                    }
                    case 2 -> {
                        rx = -x;
                        ry = -y;
                    }
                    case 3 -> {
                        rx = y;
                        ry = -x;
                    }
                    default -> {
                        rx = x;
                        ry = y;
                    }
                }
                t[i] = checked(rx + tx, cellPath);
                t[i + 1] = checked(ry + ty, cellPath);
            }
            return t;
        }
        boolean changed = false;
        for (int i = 0; i < local.length; i += 2) {
            double x = local[i] * mag;
            double y = (reflected ? -local[i + 1] : local[i + 1]) * mag;
            double rx = x * cos - y * sin + dtx;
            double ry = x * sin + y * cos + dty;
            long lx = Math.round(rx);
            long ly = Math.round(ry);
            changed |= Math.abs(rx - lx) > 1e-9 || Math.abs(ry - ly) > 1e-9;
            t[i] = checked(lx, rx, cellPath);
            t[i + 1] = checked(ly, ry, cellPath);
        }
        if (quadrant < 0) {
            tally.rotated++;
        } else if (changed) {
            tally.rounded++;
        }
        return t;
    }

    private static long checked(long v, Iterable<String> cellPath) {
        if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
            throw new LayoutHierarchyException(String.join("/", cellPath),
                    "coordinate " + v + " outside the 32-bit range after transformation");
        }
        return v;
    }

    private static long checked(long v, double raw, Iterable<String> cellPath) {
        if (!(Math.abs(raw) <= Integer.MAX_VALUE + 1.0)) {
            throw new LayoutHierarchyException(String.join("/", cellPath),
                    "coordinate " + raw + " outside the 32-bit range after transformation");
        }
        return checked(v, cellPath);
    }
}
