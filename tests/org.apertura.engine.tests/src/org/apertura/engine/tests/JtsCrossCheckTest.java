/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.geom.Segment;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.AxisValue;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.engine.tests.support.JtsOracle;
import org.apertura.engine.tests.support.RandomLayouts;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;

/**
 * Property tests on seeded random layouts against JTS 1.20.0 as the outside reference: the union,
 * distances between shapes and segments, and covered/empty rectangles between facing edges.
 */
class JtsCrossCheckTest {

    private static final CheckEngine ENGINE = new CheckEngine(CheckOptions.threads(1));

    @Test
    void manhattanMergeEqualsJtsUnion() {
        Random r = new Random(11);
        for (int c = 0; c < 1500; c++) {
            List<Polygon> shapes = RandomLayouts.manhattan(r, 2 + r.nextInt(25));
            MergedLayer m = RegionMerger.merge("L", shapes);
            List<org.locationtech.jts.geom.Polygon> ref = JtsOracle.union(shapes);
            assertThat(m.shapeCount()).as("case %d shape count", c).isEqualTo(ref.size());
            List<Geometry> mine = new ArrayList<>();
            for (int s = 0; s < m.shapeCount(); s++) {
                mine.add(CheckEngine.shapeGeometry(JtsOracle.GF, m, s));
                assertThat(mine.get(s).isValid()).as("case %d shape %d valid", c, s).isTrue();
            }
            Geometry all = JtsOracle.GF.buildGeometry(mine);
            Geometry refAll = JtsOracle.GF.buildGeometry(new ArrayList<Geometry>(ref));
            assertThat(all.symDifference(refAll).getArea()).as("case %d", c).isZero();
            assertThat(m.bounds().width()).isEqualTo((long) refAll.getEnvelopeInternal().getWidth());
        }
    }

    @Test
    void manhattanSpacingAndWidthAgainstJts() {
        Random r = new Random(7);
        for (int c = 0; c < 1500; c++) {
            List<Polygon> shapes = RandomLayouts.manhattan(r, 2 + r.nextInt(14));
            long s = 3 + r.nextInt(18), w = 2 + r.nextInt(12);
            crossCheck(c, shapes, s, w, true);
        }
    }

    @Test
    void octilinearSpacingAndWidthAgainstJts() {
        Random r = new Random(45);
        for (int c = 0; c < 800; c++) {
            List<Polygon> shapes = RandomLayouts.octilinear(r, 2 + r.nextInt(10));
            long s = 3 + r.nextInt(18), w = 2 + r.nextInt(12);
            crossCheck(c, shapes, s, w, false);
        }
    }

    private static void crossCheck(int c, List<Polygon> shapes, long s, long w, boolean manhattan) {
        List<org.locationtech.jts.geom.Polygon> polys = JtsOracle.union(shapes);
        Map<String, List<Polygon>> layers = Map.of("L", shapes);
        List<Violation> euclid = ENGINE.check(layers, List.of(
                new SpacingRule("S", "L", AxisValue.of(s), Metric.EUCLIDEAN, Optional.empty()),
                new WidthRule("W", "L", AxisValue.of(w), Metric.EUCLIDEAN)));
        // soundness: each reported pair is at the measured JTS distance, below the rule, on the right shapes
        double[][] minBetween = new double[polys.size()][polys.size()];
        for (double[] row : minBetween) {
            java.util.Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        for (Violation v : euclid) {
            double d = JtsOracle.line(v.edgeA()).distance(JtsOracle.line(v.edgeB()));
            assertThat(v.measured()).as("case %d %s", c, v).isCloseTo(d, within(1e-6));
            assertThat(v.measured()).isLessThan(v.required());
            int a = JtsOracle.owner(polys, v.edgeA()), b = JtsOracle.owner(polys, v.edgeB());
            assertThat(a).as("case %d owner of %s", c, v.edgeA()).isNotNegative();
            assertThat(b).as("case %d owner of %s", c, v.edgeB()).isNotNegative();
            switch (v.kind()) {
                case SPACING -> {
                    assertThat(a).as("case %d %s", c, v).isNotEqualTo(b);
                    minBetween[a][b] = Math.min(minBetween[a][b], v.measured());
                    minBetween[b][a] = minBetween[a][b];
                }
                case NOTCH, WIDTH -> assertThat(a).as("case %d %s", c, v).isEqualTo(b);
                default -> throw new AssertionError("unexpected kind " + v);
            }
        }
        // completeness: every two shapes closer than s by JTS are reported, at exactly that distance
        for (int i = 0; i < polys.size(); i++) {
            for (int j = i + 1; j < polys.size(); j++) {
                double d = polys.get(i).distance(polys.get(j));
                if (Math.abs(d - s) < 1e-9) {
                    continue; // JTS rounding at exactly the rule value
                }
                if (d < s) {
                    assertThat(minBetween[i][j]).as("case %d shapes %d,%d at JTS distance %s", c, i, j, d)
                            .isCloseTo(d, within(1e-6));
                } else {
                    assertThat(minBetween[i][j]).isInfinite();
                }
            }
        }
        if (!manhattan) {
            return;
        }
        // projection metric: every facing edge pair with a covered (width) or empty (spacing) rectangle
        // between them closer than the rule must be reported with that rectangle as marker
        List<Violation> proj = ENGINE.check(layers, List.of(
                new SpacingRule("S", "L", AxisValue.of(s), Metric.PROJECTION, Optional.empty()),
                new WidthRule("W", "L", AxisValue.of(w), Metric.PROJECTION)));
        org.locationtech.jts.geom.prep.PreparedGeometry union = org.locationtech.jts.geom.prep.PreparedGeometryFactory
                .prepare(JtsOracle.GF.buildGeometry(new ArrayList<Geometry>(polys)));
        List<Segment> edges = new ArrayList<>();
        polys.forEach(p -> edges.addAll(JtsOracle.edges(p)));
        for (int i = 0; i < edges.size(); i++) {
            for (int j = i + 1; j < edges.size(); j++) {
                Segment e = edges.get(i), f = edges.get(j);
                Box gap = facingGap(e, f);
                if (gap == null) {
                    continue;
                }
                long dist = e.isVertical() ? gap.width() : gap.height();
                if (dist >= Math.max(s, w)) {
                    continue;
                }
                Geometry rect = JtsOracle.GF.toGeometry(new org.locationtech.jts.geom.Envelope(gap.minX(), gap.maxX(),
                        gap.minY(), gap.maxY()));
                boolean inside = isInsideSide(e, f);
                if (inside && dist < w && union.covers(rect)) {
                    assertThat(proj).as("case %d width gap %s", c, gap).anyMatch(
                            v -> v.kind() == ViolationKind.WIDTH && v.marker().equals(gap) && v.measured() == dist);
                }
                // the open rectangle is empty iff the rectangle shrunk by 1/4 misses the union (integer grid)
                Geometry shrunk = JtsOracle.GF.toGeometry(new org.locationtech.jts.geom.Envelope(gap.minX() + 0.25,
                        gap.maxX() - 0.25, gap.minY() + 0.25, gap.maxY() - 0.25));
                if (!inside && dist < s && !union.intersects(shrunk)) {
                    assertThat(proj).as("case %d spacing gap %s", c, gap).anyMatch(
                            v -> v.kind() != ViolationKind.WIDTH && v.marker().equals(gap) && v.measured() == dist);
                }
            }
        }
        // and every projection violation is also a Euclidean one
        for (Violation v : proj) {
            assertThat(euclid).contains(v);
        }
    }

    /** The rectangle between two antiparallel axis-parallel edges overlapping by a positive length, or null. */
    private static Box facingGap(Segment e, Segment f) {
        if (e.isVertical() && f.isVertical() && Long.signum(e.y1() - e.y0()) == -Long.signum(f.y1() - f.y0())) {
            long lo = Math.max(Math.min(e.y0(), e.y1()), Math.min(f.y0(), f.y1()));
            long hi = Math.min(Math.max(e.y0(), e.y1()), Math.max(f.y0(), f.y1()));
            if (hi > lo && e.x0() != f.x0()) {
                return new Box(Math.min(e.x0(), f.x0()), lo, Math.max(e.x0(), f.x0()), hi);
            }
        }
        if (e.isHorizontal() && f.isHorizontal() && Long.signum(e.x1() - e.x0()) == -Long.signum(f.x1() - f.x0())) {
            long lo = Math.max(Math.min(e.x0(), e.x1()), Math.min(f.x0(), f.x1()));
            long hi = Math.min(Math.max(e.x0(), e.x1()), Math.max(f.x0(), f.x1()));
            if (hi > lo && e.y0() != f.y0()) {
                return new Box(lo, Math.min(e.y0(), f.y0()), hi, Math.max(e.y0(), f.y0()));
            }
        }
        return null;
    }

    /** True when f lies on the material side of e (left of e's direction). */
    private static boolean isInsideSide(Segment e, Segment f) {
        long ux = e.x1() - e.x0(), uy = e.y1() - e.y0();
        return ux * (f.y0() - e.y0()) - uy * (f.x0() - e.x0()) > 0;
    }
}
