/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.geom.Segment;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.engine.tests.support.JtsOracle;
import org.apertura.engine.tests.support.MiniGds;
import org.apertura.engine.tests.support.TestData;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;

/**
 * Real standard cells checked with the published rules of their kits (references.md §1), all in
 * nanometres (1 database unit = 1 nm in both libraries):
 * SKY130 li1 67/20 width 170 (li.1), spacing 170 (li.3); met1 68/20 width 140 (m1.1), spacing 140
 * (m1.2) — google/skywater-pdk docs/rules/periphery; GF180MCU Metal1 34/0 width 230 (Mn.1), spacing
 * 230 (Mn.2a) — google/gf180mcu-pdk design manual table 22_Metaln_58.
 * Each cell must be clean; then a rectangle is placed 5 nm closer than the spacing beside an edge,
 * or a shape is narrowed 5 nm below the width, and exactly that violation must come back.
 */
class RealCellTest {

    private static final Path DATA = TestData.root();

    record Case(String cell, int layer, int datatype, long width, long spacing, String widthRule, String spacingRule) {
        @Override
        public String toString() {
            return cell + " " + layer + "/" + datatype;
        }
    }

    static Stream<Arguments> cases() throws IOException {
        List<Arguments> out = new ArrayList<>();
        for (Path p : list("sky130_fd_sc_hd")) {
            out.add(Arguments.of(new Case(p.toString(), 67, 20, 170, 170, "li.1", "li.3")));
            out.add(Arguments.of(new Case(p.toString(), 68, 20, 140, 140, "m1.1", "m1.2")));
        }
        for (Path p : list("gf180mcu_fd_sc_mcu7t5v0")) {
            out.add(Arguments.of(new Case(p.toString(), 34, 0, 230, 230, "Mn.1", "Mn.2a")));
        }
        return out.stream();
    }

    private static List<Path> list(String dir) throws IOException {
        try (Stream<Path> s = Files.list(DATA.resolve(dir))) {
            return s.filter(p -> p.toString().endsWith(".gds")).sorted().toList();
        }
    }

    private static List<Violation> check(List<Polygon> shapes, Case c) {
        List<Rule> rules = List.of(new WidthRule(c.widthRule(), "L", c.width()), new SpacingRule(c.spacingRule(), "L", c.spacing()));
        return new CheckEngine(CheckOptions.threads(2)).check(Map.of("L", shapes), rules);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void cleanThenSeededSpacingViolation(Case c) throws IOException {
        List<Polygon> shapes = MiniGds.read(Path.of(c.cell())).layer(c.layer(), c.datatype());
        assertThat(shapes).isNotEmpty();
        assertThat(check(shapes, c)).as("published rules on the unmodified cell").isEmpty();

        List<org.locationtech.jts.geom.Polygon> polys = JtsOracle.union(shapes);
        Geometry union = JtsOracle.GF.buildGeometry(new ArrayList<Geometry>(polys));
        long gap = c.spacing() - 5, w = c.width();
        int seeded = 0;
        for (org.locationtech.jts.geom.Polygon p : polys) {
            for (Segment e : JtsOracle.edges(p)) {
                Box rect = inFront(e, gap, w);
                if (rect == null) {
                    continue;
                }
                // independent clearance check: near the new rectangle there is only the solid strip behind e
                Envelope grown = new Envelope(rect.minX() - c.spacing(), rect.maxX() + c.spacing(),
                        rect.minY() - c.spacing(), rect.maxY() + c.spacing());
                Box behind = behind(e, c.spacing() - gap);
                Geometry near = union.intersection(JtsOracle.GF.toGeometry(grown));
                if (!near.equalsTopo(JtsOracle.GF.toGeometry(new Envelope(behind.minX(), behind.maxX(), behind.minY(), behind.maxY())))) {
                    continue;
                }
                List<Polygon> mutated = new ArrayList<>(shapes);
                mutated.add(Polygon.rectangle(rect.minX(), rect.minY(), rect.maxX(), rect.maxY()));
                long nearSide = e.isVertical() ? (rect.minX() > e.x0() ? rect.minX() : rect.maxX())
                        : (rect.minY() > e.y0() ? rect.minY() : rect.maxY());
                Box expectedMarker = e.isVertical()
                        ? new Box(Math.min(e.x0(), nearSide), rect.minY(), Math.max(e.x0(), nearSide), rect.maxY())
                        : new Box(rect.minX(), Math.min(e.y0(), nearSide), rect.maxX(), Math.max(e.y0(), nearSide));
                List<Violation> v = check(mutated, c);
                assertThat(v).as("seeded beside %s", e).singleElement().satisfies(x -> {
                    assertThat(x.kind()).isEqualTo(ViolationKind.SPACING);
                    assertThat(x.ruleId()).isEqualTo(c.spacingRule());
                    assertThat(x.measured()).isEqualTo((double) gap);
                    assertThat(x.marker()).isEqualTo(expectedMarker);
                });
                seeded++;
                if (seeded == 3) {
                    break;
                }
            }
            if (seeded == 3) {
                break;
            }
        }
        assertThat(seeded).as("places found to seed a spacing violation").isPositive();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void seededWidthViolation(Case c) throws IOException {
        List<Polygon> shapes = MiniGds.read(Path.of(c.cell())).layer(c.layer(), c.datatype());
        List<org.locationtech.jts.geom.Polygon> polys = JtsOracle.union(shapes);
        long w = c.width(), notchLength = c.spacing() + 10;
        int seeded = 0;
        for (org.locationtech.jts.geom.Polygon p : polys) {
            if (p.getNumInteriorRing() > 0) {
                continue;
            }
            for (Segment e : JtsOracle.edges(p)) {
                long len = (long) e.length();
                long lo = e.isVertical() ? Math.min(e.y0(), e.y1()) : Math.min(e.x0(), e.x1());
                long a, b, depth;
                if (len >= notchLength + 2 * c.spacing()) {
                    // a notch in the middle of e; the material beside it (spacing-wide walls) must reach
                    // the same straight far edge, so the walls stay wide enough
                    long mid = lo + len / 2;
                    a = mid - notchLength / 2;
                    b = mid + notchLength / 2;
                    depth = solidDepth(p, e, a, b);
                    if (depth != solidDepth(p, e, a - c.spacing(), b + c.spacing())) {
                        continue;
                    }
                } else {
                    // an isolated rectangle narrowed over its whole length
                    a = lo;
                    b = lo + len;
                    depth = solidDepth(p, e, a, b);
                    if (len < w || Math.abs(p.getArea() - (double) len * depth) > 1e-9) {
                        continue;
                    }
                }
                if (depth < w || depth > 20 * w) {
                    continue;
                }
                Box cut = notch(e, a, b, depth - (w - 5));
                Geometry cutGeom = JtsOracle.GF.toGeometry(new Envelope(cut.minX(), cut.maxX(), cut.minY(), cut.maxY()));
                Geometry narrowed = p.difference(cutGeom);
                if (!(narrowed instanceof org.locationtech.jts.geom.Polygon np) || np.getNumInteriorRing() > 0) {
                    continue;
                }
                List<Polygon> mutated = new ArrayList<>();
                for (Polygon s : shapes) {
                    if (!JtsOracle.polygon(s).intersects(p)) {
                        mutated.add(s);
                    }
                }
                mutated.add(toPolygon(np));
                Box remaining = remaining(e, a, b, depth, w - 5);
                List<Violation> v = check(mutated, c);
                assertThat(v).as("narrowed behind %s", e).singleElement().satisfies(x -> {
                    assertThat(x.kind()).isEqualTo(ViolationKind.WIDTH);
                    assertThat(x.ruleId()).isEqualTo(c.widthRule());
                    assertThat(x.measured()).isEqualTo((double) (w - 5));
                    assertThat(x.marker()).isEqualTo(remaining);
                });
                seeded++;
                break;
            }
            if (seeded == 2) {
                break;
            }
        }
        assertThat(seeded).as("places found to narrow a shape").isPositive();
    }

    /** Rectangle of thickness t at distance gap in front of edge e (outward = right of its direction). */
    private static Box inFront(Segment e, long gap, long t) {
        if (e.isVertical()) {
            long lo = Math.min(e.y0(), e.y1()), hi = Math.max(e.y0(), e.y1());
            if (hi - lo < t) {
                return null;
            }
            return e.y1() > e.y0() ? new Box(e.x0() + gap, lo, e.x0() + gap + t, hi) : new Box(e.x0() - gap - t, lo, e.x0() - gap, hi);
        }
        long lo = Math.min(e.x0(), e.x1()), hi = Math.max(e.x0(), e.x1());
        if (hi - lo < t) {
            return null;
        }
        return e.x1() > e.x0() ? new Box(lo, e.y0() - gap - t, hi, e.y0() - gap) : new Box(lo, e.y0() + gap, hi, e.y0() + gap + t);
    }

    /** The strip of depth d directly behind edge e. */
    private static Box behind(Segment e, long d) {
        if (e.isVertical()) {
            long lo = Math.min(e.y0(), e.y1()), hi = Math.max(e.y0(), e.y1());
            return e.y1() > e.y0() ? new Box(e.x0() - d, lo, e.x0(), hi) : new Box(e.x0(), lo, e.x0() + d, hi);
        }
        long lo = Math.min(e.x0(), e.x1()), hi = Math.max(e.x0(), e.x1());
        return e.x1() > e.x0() ? new Box(lo, e.y0(), hi, e.y0() + d) : new Box(lo, e.y0() - d, hi, e.y0());
    }

    /** Box over span [a, b] of e reaching depth d into the material. */
    private static Box notch(Segment e, long a, long b, long d) {
        if (e.isVertical()) {
            return e.y1() > e.y0() ? new Box(e.x0() - d, a, e.x0(), b) : new Box(e.x0(), a, e.x0() + d, b);
        }
        return e.x1() > e.x0() ? new Box(a, e.y0(), b, e.y0() + d) : new Box(a, e.y0() - d, b, e.y0());
    }

    /** The material left beside the notch: thickness t at the far side of depth total. */
    private static Box remaining(Segment e, long a, long b, long total, long t) {
        Box full = notch(e, a, b, total);
        if (e.isVertical()) {
            return e.y1() > e.y0() ? new Box(full.minX(), a, full.minX() + t, b) : new Box(full.maxX() - t, a, full.maxX(), b);
        }
        return e.x1() > e.x0() ? new Box(a, full.maxY() - t, b, full.maxY()) : new Box(a, full.minY(), b, full.minY() + t);
    }

    /** Depth of solid material behind span [a, b] of e, when it is one rectangle ending on a straight edge; else -1. */
    private static long solidDepth(org.locationtech.jts.geom.Polygon p, Segment e, long a, long b) {
        long depth = 1;
        Geometry strip = null;
        while (depth < 100_000) {
            Box box = notch(e, a, b, depth);
            Geometry g = JtsOracle.GF.toGeometry(new Envelope(box.minX(), box.maxX(), box.minY(), box.maxY()));
            if (!p.covers(g)) {
                break;
            }
            strip = g;
            depth++;
        }
        if (strip == null) {
            return -1;
        }
        depth--;
        // the next slice must be fully empty, so the far side is one straight edge across the span
        Box next = notch(e, a, b, depth + 1);
        Box slice = next.minX() == notch(e, a, b, depth).minX() && next.maxX() == notch(e, a, b, depth).maxX()
                ? next : next;
        Geometry g = JtsOracle.GF.toGeometry(new Envelope(slice.minX(), slice.maxX(), slice.minY(), slice.maxY()));
        double area = p.intersection(g).getArea();
        return Math.abs(area - (double) (b - a) * depth) < 1e-9 ? depth : -1;
    }

    private static Polygon toPolygon(org.locationtech.jts.geom.Polygon p) {
        Coordinate[] cs = p.getExteriorRing().getCoordinates();
        long[] xy = new long[2 * (cs.length - 1)];
        for (int i = 0; i < cs.length - 1; i++) {
            xy[2 * i] = Math.round(cs[i].x);
            xy[2 * i + 1] = Math.round(cs[i].y);
        }
        return Polygon.of(xy);
    }
}
