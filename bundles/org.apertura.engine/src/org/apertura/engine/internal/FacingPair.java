/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import org.apertura.engine.geom.Box;
import org.apertura.engine.region.MergedLayer;

/**
 * Decides whether two boundary edges of a merged layer face each other and how far apart they are.
 * <p>
 * With {@code side = +1} (spacing) the edges must face each other across empty space, with
 * {@code side = -1} (width) across material; width is spacing of the complement. Two cases:
 * <ul>
 * <li>a <b>run</b>: the edges are antiparallel, overlap in projection by a positive length and each
 * lies strictly on the measured side of the other; the distance is perpendicular;</li>
 * <li>a <b>point pair</b>: otherwise the closest points p, q of the two segments. A closest point
 * inside an edge needs the other point strictly on the measured side of that edge. A closest point
 * at a vertex needs the vertex to be convex on the measured side and the other point inside the
 * vertex's normal cone (else an adjacent edge is closer and reports instead). To report a vertex
 * once, only the edge that starts at the vertex reports it.</li>
 * </ul>
 * Edges adjacent along a ring never pair. A mutable result holder, one per thread.
 */
public final class FacingPair {

    public static final int NONE = 0, RUN = 1, POINT = 2;

    public int type;
    /** distance in database units */
    public double distance;
    /** closest points (POINT) or the run's end points on the first edge (RUN) */
    public double px, py, qx, qy;
    /** RUN: overlap length along the edges */
    public double runLength;
    /** marker box corners */
    public double bx0, by0, bx1, by1;

    /** Evaluates edges e and f of {@code layer} (or of two layers: f of {@code other}). */
    public int evaluate(MergedLayer layer, int e, MergedLayer other, int f, int side) {
        type = NONE;
        if (layer == other) {
            if (e == f || layer.ringOf(e) == layer.ringOf(f) && (layer.next(e) == f || layer.next(f) == e)) {
                return NONE;
            }
        }
        long ax = layer.x0(e), ay = layer.y0(e), bx = layer.x1(e), by = layer.y1(e);
        long cx = other.x0(f), cy = other.y0(f), dx = other.x1(f), dy = other.y1(f);
        long ux = bx - ax, uy = by - ay, vx = dx - cx, vy = dy - cy;
        long cross = ux * vy - uy * vx;
        long dot = ux * vx + uy * vy;
        if (cross == 0 && dot < 0) {
            double l2 = (double) ux * ux + (double) uy * uy;
            double tc = (double) (cx - ax) * ux + (double) (cy - ay) * uy;
            double td = (double) (dx - ax) * ux + (double) (dy - ay) * uy;
            double lo = Math.max(0, Math.min(tc, td)), hi = Math.min(l2, Math.max(tc, td));
            // outward normal of e (material on the left) is (uy, -ux)
            double offset = side * ((double) (cx - ax) * uy - (double) (cy - ay) * ux);
            if (hi > lo) {
                if (offset <= 0) {
                    return NONE;
                }
                double len = Math.sqrt(l2);
                distance = offset / len;
                runLength = (hi - lo) / len;
                px = ax + ux * lo / l2;
                py = ay + uy * lo / l2;
                qx = ax + ux * hi / l2;
                qy = ay + uy * hi / l2;
                double nx = side * uy / len * distance, ny = -side * ux / len * distance;
                bx0 = Math.min(Math.min(px, qx), Math.min(px + nx, qx + nx));
                bx1 = Math.max(Math.max(px, qx), Math.max(px + nx, qx + nx));
                by0 = Math.min(Math.min(py, qy), Math.min(py + ny, qy + ny));
                by1 = Math.max(Math.max(py, qy), Math.max(py + ny, qy + ny));
                type = RUN;
                return RUN;
            }
        }
        // closest points among the four endpoint-to-segment candidates
        double best = Double.POSITIVE_INFINITY;
        double bpX = 0, bpY = 0, bqX = 0, bqY = 0;
        int pKind = 0, qKind = 0; // 0 interior, 1 start, 2 end
        for (int c = 0; c < 4; c++) {
            long sx, sy, tx0, ty0, twx, twy;
            if (c < 2) {
                sx = c == 0 ? ax : bx;
                sy = c == 0 ? ay : by;
                tx0 = cx;
                ty0 = cy;
                twx = vx;
                twy = vy;
            } else {
                sx = c == 2 ? cx : dx;
                sy = c == 2 ? cy : dy;
                tx0 = ax;
                ty0 = ay;
                twx = ux;
                twy = uy;
            }
            double wl2 = (double) twx * twx + (double) twy * twy;
            double t = ((double) (sx - tx0) * twx + (double) (sy - ty0) * twy) / wl2;
            int k;
            double ox, oy;
            if (t <= 0) {
                t = 0;
                k = 1;
                ox = tx0;
                oy = ty0;
            } else if (t >= 1) {
                t = 1;
                k = 2;
                ox = tx0 + twx;
                oy = ty0 + twy;
            } else {
                k = 0;
                ox = tx0 + twx * t;
                oy = ty0 + twy * t;
            }
            double ddx = ox - sx, ddy = oy - sy;
            double d2 = ddx * ddx + ddy * ddy;
            if (d2 < best) {
                best = d2;
                if (c < 2) {
                    bpX = sx;
                    bpY = sy;
                    pKind = c == 0 ? 1 : 2;
                    bqX = ox;
                    bqY = oy;
                    qKind = k;
                } else {
                    bqX = sx;
                    bqY = sy;
                    qKind = c == 2 ? 1 : 2;
                    bpX = ox;
                    bpY = oy;
                    pKind = k;
                }
            }
        }
        if (pKind == 2 || qKind == 2) {
            return NONE;
        }
        double wx = bqX - bpX, wy = bqY - bpY;
        if (!sideOk(layer, e, pKind, wx, wy, side) || !sideOk(other, f, qKind, -wx, -wy, side)) {
            return NONE;
        }
        // a vertex seen straight along its previous edge's normal: the run of that edge reports it
        if (pKind == 1 && alongPrevious(layer, e, wx, wy) && isRun(layer, layer.previous(e), other, f, side)) {
            return NONE;
        }
        if (qKind == 1 && alongPrevious(other, f, -wx, -wy) && isRun(other, other.previous(f), layer, e, side)) {
            return NONE;
        }
        distance = Math.sqrt(best);
        px = bpX;
        py = bpY;
        qx = bqX;
        qy = bqY;
        runLength = 0;
        bx0 = Math.min(px, qx);
        bx1 = Math.max(px, qx);
        by0 = Math.min(py, qy);
        by1 = Math.max(py, qy);
        type = POINT;
        return POINT;
    }

    private static boolean sideOk(MergedLayer l, int e, int kind, double wx, double wy, int side) {
        long ux = l.x1(e) - l.x0(e), uy = l.y1(e) - l.y0(e);
        if (kind == 0) {
            // a vertex of another ring touching the edge's inside (d = 0) counts as facing at distance 0
            return side * (wx * uy - wy * ux) > 0 || wx == 0 && wy == 0;
        }
        int g = l.previous(e);
        long gx = l.x1(g) - l.x0(g), gy = l.y1(g) - l.y0(g);
        long turn = gx * uy - gy * ux;
        if (side * turn <= 0) {
            return false;
        }
        // Voronoi region of the vertex: beyond the end of the previous edge, before the start of e
        return wx * gx + wy * gy >= 0 && wx * ux + wy * uy <= 0;
    }

    private static boolean alongPrevious(MergedLayer l, int e, double wx, double wy) {
        int g = l.previous(e);
        return wx * (l.x1(g) - l.x0(g)) + wy * (l.y1(g) - l.y0(g)) == 0;
    }

    /** True when g and f are antiparallel, overlap by a positive length and face each other on the side. */
    private static boolean isRun(MergedLayer lg, int g, MergedLayer lf, int f, int side) {
        long ax = lg.x0(g), ay = lg.y0(g), ux = lg.x1(g) - ax, uy = lg.y1(g) - ay;
        long cx = lf.x0(f), cy = lf.y0(f), vx = lf.x1(f) - cx, vy = lf.y1(f) - cy;
        if (ux * vy - uy * vx != 0 || ux * vx + uy * vy >= 0) {
            return false;
        }
        double l2 = (double) ux * ux + (double) uy * uy;
        double tc = (double) (cx - ax) * ux + (double) (cy - ay) * uy;
        double td = tc + (double) vx * ux + (double) vy * uy;
        double lo = Math.max(0, Math.min(tc, td)), hi = Math.min(l2, Math.max(tc, td));
        return hi > lo && side * ((double) (cx - ax) * uy - (double) (cy - ay) * ux) > 0;
    }

    /** The marker box, rounded outwards to database units. */
    public Box marker() {
        return Box.around(bx0, by0, bx1, by1);
    }

    /**
     * Separation vector x component for the anisotropic requirement: the normal of e for a run, the
     * vector between the closest points otherwise.
     */
    public double sepX(MergedLayer layer, int e) {
        if (type == RUN) {
            return layer.y1(e) - layer.y0(e);
        }
        return qx - px;
    }

    /** Separation vector y component (see {@link #sepX}). */
    public double sepY(MergedLayer layer, int e) {
        if (type == RUN) {
            return -(layer.x1(e) - layer.x0(e));
        }
        return qy - py;
    }
}
