/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests.support;

import java.util.ArrayList;
import java.util.List;

import org.apertura.engine.geom.Polygon;
import org.apertura.engine.geom.Segment;
import org.locationtech.jts.algorithm.Orientation;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LineSegment;
import org.locationtech.jts.geom.LineString;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.operation.union.UnaryUnionOp;

/**
 * Independent reference computations with JTS (org.locationtech.jts 1.20.0): union of a layer,
 * its polygons' boundary edges directed with material on the left, distances between segments.
 */
public final class JtsOracle {

    public static final GeometryFactory GF = new GeometryFactory(new PrecisionModel());

    private JtsOracle() {
    }

    public static Geometry polygon(Polygon p) {
        Coordinate[] cs = new Coordinate[p.size() + 1];
        for (int i = 0; i < p.size(); i++) {
            cs[i] = new Coordinate(p.x(i), p.y(i));
        }
        cs[p.size()] = cs[0];
        return GF.createPolygon(cs);
    }

    /** The union's polygons (JTS UnaryUnionOp, floating precision). */
    public static List<org.locationtech.jts.geom.Polygon> union(List<Polygon> shapes) {
        List<Geometry> gs = new ArrayList<>();
        for (Polygon p : shapes) {
            gs.add(polygon(p));
        }
        Geometry u = UnaryUnionOp.union(gs);
        List<org.locationtech.jts.geom.Polygon> out = new ArrayList<>();
        for (int i = 0; u != null && i < u.getNumGeometries(); i++) {
            if (u.getGeometryN(i) instanceof org.locationtech.jts.geom.Polygon p && !p.isEmpty()) {
                out.add(p);
            }
        }
        return out;
    }

    /** Boundary edges of a JTS polygon, collinear vertices removed, material on the left. */
    public static List<Segment> edges(org.locationtech.jts.geom.Polygon p) {
        List<Segment> out = new ArrayList<>();
        addRing(p.getExteriorRing(), true, out);
        for (int i = 0; i < p.getNumInteriorRing(); i++) {
            addRing(p.getInteriorRingN(i), false, out);
        }
        return out;
    }

    private static void addRing(LineString ring, boolean shell, List<Segment> out) {
        Coordinate[] cs = ring.getCoordinates();
        boolean ccw = Orientation.isCCW(cs);
        List<Coordinate> pts = new ArrayList<>();
        for (int i = 0; i < cs.length - 1; i++) {
            pts.add(cs[i]);
        }
        if (ccw != shell) {
            java.util.Collections.reverse(pts);
        }
        // drop collinear vertices
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int i = 0; i < pts.size() && pts.size() > 3; i++) {
                Coordinate a = pts.get((i + pts.size() - 1) % pts.size()), b = pts.get(i), c = pts.get((i + 1) % pts.size());
                if (Orientation.index(a, b, c) == Orientation.COLLINEAR) {
                    pts.remove(i);
                    changed = true;
                    break;
                }
            }
        }
        for (int i = 0; i < pts.size(); i++) {
            Coordinate a = pts.get(i), b = pts.get((i + 1) % pts.size());
            out.add(new Segment(Math.round(a.x), Math.round(a.y), Math.round(b.x), Math.round(b.y)));
        }
    }

    public static LineSegment line(Segment s) {
        return new LineSegment(s.x0(), s.y0(), s.x1(), s.y1());
    }

    /** Index of the polygon whose boundary holds the whole segment, or -1. */
    public static int owner(List<org.locationtech.jts.geom.Polygon> polys, Segment s) {
        Coordinate a = new Coordinate(s.x0(), s.y0()), b = new Coordinate(s.x1(), s.y1());
        Coordinate m = new Coordinate((a.x + b.x) / 2, (a.y + b.y) / 2);
        for (int i = 0; i < polys.size(); i++) {
            Geometry boundary = polys.get(i).getBoundary();
            if (onBoundary(boundary, a) && onBoundary(boundary, b) && onBoundary(boundary, m)) {
                return i;
            }
        }
        return -1;
    }

    private static boolean onBoundary(Geometry boundary, Coordinate c) {
        return boundary.distance(GF.createPoint(c)) < 1e-9;
    }
}
