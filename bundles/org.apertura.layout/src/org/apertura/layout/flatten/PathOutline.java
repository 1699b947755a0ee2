/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

import java.util.Arrays;

import org.apertura.layout.PointList;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.PathType;

/**
 * Converts a GDSII path (a centre line with a width) into the outline polygon it covers.
 * <p>
 * Ends: FLUSH ends at the first and last point; HALF_WIDTH extends both ends by half the width;
 * CUSTOM extends them by the begin and end extensions (negative values shorten); ROUND adds a half
 * circle of radius half the width, approximated by {@code roundSegments} straight segments whose
 * vertices lie on the circle. Joins are mitred (the offset lines meet at their intersection); on the
 * outer side of a turn sharper than 120 degrees (mitre longer than twice the half width) the corner
 * is bevelled instead, and a full reversal is bevelled on both sides.
 * <p>
 * Exactness: for a centre line of horizontal and vertical segments with an even width (the usual
 * case) every vertex is computed exactly in database units. Otherwise vertices are computed in
 * double precision and rounded to the nearest database unit with {@link Math#round(double)} (halves round up). The outline is counter-clockwise for a path that does not cross
 * itself; paths that cross themselves give self-intersecting outlines, as the format allows.
 */
public final class PathOutline {

    /** Default number of segments approximating each half-circle end of a ROUND path. */
    public static final int DEFAULT_ROUND_SEGMENTS = 16;

    private static final double MITRE_LIMIT = 2.0;

    private PathOutline() {
    }

    /**
     * Outline of a path with its own width (sign ignored: an absolute width is still the width).
     *
     * @return interleaved vertices {@code x0, y0, x1, y1, ...} without a closing vertex, or null when
     *         the path covers no area (width 0, fewer than two distinct points)
     */
    public static long[] outline(Path path, int roundSegments) {
        return outline(path.getPoints(), Math.abs((double) path.getWidth()) / 2.0, path.getPathType(),
                path.getBeginExtension(), path.getEndExtension(), roundSegments);
    }

    /**
     * Outline of a path with an absolute width whose centre line was placed first (a placement scales
     * and turns the centre line but not the width): the placed centre line as interleaved coordinates,
     * which the placement has checked to fit in 32 bits, and the path's own width (sign ignored).
     */
    public static long[] outlinePlaced(long[] centre, int width, PathType type, double beginExtension,
            double endExtension, int roundSegments) {
        int[] placed = new int[centre.length];
        for (int i = 0; i < centre.length; i++) {
            placed[i] = (int) centre[i];
        }
        return outline(PointList.wrap(placed), Math.abs((double) width) / 2.0, type, beginExtension, endExtension,
                roundSegments);
    }

    /**
     * Outline of a centre line with the given half width.
     *
     * @param halfWidth     half the width in database units
     * @param beginExtension only for CUSTOM: extension beyond the first point
     * @param endExtension   only for CUSTOM: extension beyond the last point
     * @param roundSegments  segments per half circle for ROUND ends, at least 2
     * @return interleaved vertices without a closing vertex, or null when there is no area
     */
    public static long[] outline(PointList points, double halfWidth, PathType type, double beginExtension,
            double endExtension, int roundSegments) {
        if (roundSegments < 2) {
            throw new IllegalArgumentException("round ends need at least 2 segments, got " + roundSegments);
        }
        if (points == null || !(halfWidth > 0)) {
            return null;
        }
        double[] p = distinctPoints(points);
        int n = p.length / 2;
        if (n < 2) {
            return null;
        }
        double extB;
        double extE;
        switch (type) {
            case HALF_WIDTH -> {
                extB = halfWidth;
                extE = halfWidth;
            }
            case CUSTOM -> {
                extB = beginExtension;
                extE = endExtension;
            }
            default -> {
                extB = 0;
                extE = 0;
            }
        }
        // unit directions and left normals of the segments
        double[] dx = new double[n - 1];
        double[] dy = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            double ex = p[2 * i + 2] - p[2 * i];
            double ey = p[2 * i + 3] - p[2 * i + 1];
            double len = ex == 0 ? Math.abs(ey) : ey == 0 ? Math.abs(ex) : Math.hypot(ex, ey);
            dx[i] = ex / len;
            dy[i] = ey / len;
        }
        p[0] -= extB * dx[0];
        p[1] -= extB * dy[0];
        p[2 * n - 2] += extE * dx[n - 2];
        p[2 * n - 1] += extE * dy[n - 2];

        Ring right = new Ring(4 * n + 2 * roundSegments + 8);
        Ring left = new Ring(4 * n + 8);
        for (int i = 0; i < n; i++) {
            double x = p[2 * i];
            double y = p[2 * i + 1];
            if (i == 0 || i == n - 1) {
                int s = i == 0 ? 0 : n - 2;
                double nx = -dy[s] * halfWidth;
                double ny = dx[s] * halfWidth;
                right.add(x - nx, y - ny);
                left.add(x + nx, y + ny);
                continue;
            }
            double n1x = -dy[i - 1], n1y = dx[i - 1];
            double n2x = -dy[i], n2y = dx[i];
            double dot = n1x * n2x + n1y * n2y;
            double cross = dx[i - 1] * dy[i] - dy[i - 1] * dx[i];
            if (1 + dot < 1e-12) {
                right.add(x - halfWidth * n1x, y - halfWidth * n1y);
                right.add(x - halfWidth * n2x, y - halfWidth * n2y);
                left.add(x + halfWidth * n1x, y + halfWidth * n1y);
                left.add(x + halfWidth * n2x, y + halfWidth * n2y);
                continue;
            }
            double k = halfWidth / (1 + dot);
            double mx = (n1x + n2x) * k;
            double my = (n1y + n2y) * k;
            boolean sharp = Math.sqrt(2 / (1 + dot)) > MITRE_LIMIT;
            if (sharp && cross < 0) { // right turn: left side is outer
                left.add(x + halfWidth * n1x, y + halfWidth * n1y);
                left.add(x + halfWidth * n2x, y + halfWidth * n2y);
            } else {
                left.add(x + mx, y + my);
            }
            if (sharp && cross > 0) { // left turn: right side is outer
                right.add(x - halfWidth * n1x, y - halfWidth * n1y);
                right.add(x - halfWidth * n2x, y - halfWidth * n2y);
            } else {
                right.add(x - mx, y - my);
            }
        }
        // assemble counter-clockwise: right side forward, end cap, left side backward, start cap
        Ring ring = new Ring(right.size + left.size + 2 * roundSegments + 4);
        ring.addAll(right);
        if (type == PathType.ROUND) {
            cap(ring, p[2 * n - 2], p[2 * n - 1], Math.atan2(dx[n - 2], -dy[n - 2]) - Math.PI, halfWidth, roundSegments);
        }
        ring.addReversed(left);
        if (type == PathType.ROUND) {
            cap(ring, p[0], p[1], Math.atan2(dx[0], -dy[0]), halfWidth, roundSegments);
        }
        return ring.toRoundedVertices();
    }

    /** Adds the inner vertices of a half circle starting at angle {@code from}, counter-clockwise. */
    private static void cap(Ring ring, double cx, double cy, double from, double r, int segments) {
        for (int k = 1; k < segments; k++) {
            double a = from + Math.PI * k / segments;
            ring.add(cx + r * Math.cos(a), cy + r * Math.sin(a));
        }
    }

    private static double[] distinctPoints(PointList points) {
        double[] p = new double[points.size() * 2];
        int n = 0;
        for (int i = 0; i < points.size(); i++) {
            int x = points.x(i);
            int y = points.y(i);
            if (n > 0 && p[2 * n - 2] == x && p[2 * n - 1] == y) {
                continue;
            }
            p[2 * n] = x;
            p[2 * n + 1] = y;
            n++;
        }
        return Arrays.copyOf(p, 2 * n);
    }

    private static final class Ring {
        double[] v;
        int size;

        Ring(int capacity) {
            v = new double[2 * capacity];
        }

        void add(double x, double y) {
            if (2 * size + 2 > v.length) {
                v = Arrays.copyOf(v, v.length * 2 + 4);
            }
            v[2 * size] = x;
            v[2 * size + 1] = y;
            size++;
        }

        void addAll(Ring r) {
            for (int i = 0; i < r.size; i++) {
                add(r.v[2 * i], r.v[2 * i + 1]);
            }
        }

        void addReversed(Ring r) {
            for (int i = r.size - 1; i >= 0; i--) {
                add(r.v[2 * i], r.v[2 * i + 1]);
            }
        }

        /** Rounded vertices with consecutive duplicates (and a closing duplicate) removed; null if < 3. */
        long[] toRoundedVertices() {
            long[] out = new long[2 * size];
            int n = 0;
            for (int i = 0; i < size; i++) {
                long x = Math.round(v[2 * i]);
                long y = Math.round(v[2 * i + 1]);
                if (n > 0 && out[2 * n - 2] == x && out[2 * n - 1] == y) {
                    continue;
                }
                out[2 * n] = x;
                out[2 * n + 1] = y;
                n++;
            }
            while (n > 1 && out[0] == out[2 * n - 2] && out[1] == out[2 * n - 1]) {
                n--;
            }
            return n < 3 ? null : Arrays.copyOf(out, 2 * n);
        }
    }
}
