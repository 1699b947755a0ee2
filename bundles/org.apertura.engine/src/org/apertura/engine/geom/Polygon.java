/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.geom;

import java.util.Arrays;

/**
 * A simple polygon with integer vertices in database units, stored as one interleaved array
 * {@code x0, y0, x1, y1, ...}. The ring is closed implicitly: the last vertex is not repeated.
 * <p>
 * Vertices are kept as given (orientation is not normalised here); {@link #signedArea2()} tells the
 * orientation (positive = counter-clockwise). Coordinates are {@code long} so that transformed and
 * summed values never overflow in intermediate arithmetic; layout readers keep them within the
 * 32-bit range of the GDSII stream format.
 */
public final class Polygon {

    private final long[] xy;

    private Polygon(long[] xy) {
        this.xy = xy;
    }

    /**
     * Creates a polygon from interleaved coordinates. A closing vertex equal to the first is dropped.
     *
     * @throws IllegalArgumentException if fewer than three vertices or an odd number of values
     */
    public static Polygon of(long... xy) {
        if (xy.length % 2 != 0) {
            throw new IllegalArgumentException("odd number of coordinates: " + xy.length);
        }
        int n = xy.length;
        if (n >= 4 && xy[0] == xy[n - 2] && xy[1] == xy[n - 1]) {
            n -= 2;
        }
        if (n < 6) {
            throw new IllegalArgumentException("a polygon needs at least 3 vertices, got " + n / 2);
        }
        return new Polygon(Arrays.copyOf(xy, n));
    }

    /** An axis-parallel rectangle with corners (x0, y0) and (x1, y1), counter-clockwise. */
    public static Polygon rectangle(long x0, long y0, long x1, long y1) {
        long lx = Math.min(x0, x1), hx = Math.max(x0, x1);
        long ly = Math.min(y0, y1), hy = Math.max(y0, y1);
        return new Polygon(new long[] {lx, ly, hx, ly, hx, hy, lx, hy});
    }

    /** Number of vertices. */
    public int size() {
        return xy.length / 2;
    }

    public long x(int i) {
        return xy[2 * i];
    }

    public long y(int i) {
        return xy[2 * i + 1];
    }

    /** A copy of the interleaved coordinates. */
    public long[] coordinates() {
        return xy.clone();
    }

    /** Twice the signed area (shoelace formula); positive for counter-clockwise rings. */
    public long signedArea2() {
        long sum = 0;
        int n = size();
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            sum += x(i) * y(j) - x(j) * y(i);
        }
        return sum;
    }

    /** True when every edge is horizontal or vertical. */
    public boolean isManhattan() {
        int n = size();
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            if (x(i) != x(j) && y(i) != y(j)) {
                return false;
            }
        }
        return true;
    }

    /** Bounding box as {@code [minX, minY, maxX, maxY]}. */
    public long[] bounds() {
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (int i = 0; i < xy.length; i += 2) {
            minX = Math.min(minX, xy[i]);
            maxX = Math.max(maxX, xy[i]);
            minY = Math.min(minY, xy[i + 1]);
            maxY = Math.max(maxY, xy[i + 1]);
        }
        return new long[] {minX, minY, maxX, maxY};
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Polygon p && Arrays.equals(xy, p.xy);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(xy);
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("Polygon[");
        for (int i = 0; i < xy.length; i += 2) {
            if (i > 0) {
                sb.append(", ");
            }
            sb.append(xy[i]).append(' ').append(xy[i + 1]);
        }
        return sb.append(']').toString();
    }
}
