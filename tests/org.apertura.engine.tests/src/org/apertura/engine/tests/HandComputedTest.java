/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.apertura.engine.tests.support.Shapes.check;
import static org.apertura.engine.tests.support.Shapes.rects;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.AreaRule;
import org.apertura.engine.rule.AxisValue;
import org.apertura.engine.rule.DensityRule;
import org.apertura.engine.rule.Direction;
import org.apertura.engine.rule.EnclosureRule;
import org.apertura.engine.rule.EndOfLineRule;
import org.apertura.engine.rule.MaskRule;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.PitchRule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.SpacingTable;
import org.apertura.engine.rule.WidthRule;
import org.junit.jupiter.api.Test;

/** Small layouts whose violations were worked out by hand (values in the comments). */
class HandComputedTest {

    private static SpacingRule spacing(long s, Metric m) {
        return new SpacingRule("S", "L", AxisValue.of(s), m, Optional.empty());
    }

    @Test
    void diamondWithRepeatedVerticesAloneSurvivesTheMerge() {
        // a 45-degree square with diagonals 24 and 24 (area 24 * 24 / 2 = 288), every vertex given twice,
        // touching nothing else: it is merged on its own and must keep its 4 corners
        Polygon diamond = Polygon.of(288, 384, 288, 384, 300, 396, 300, 396, 288, 408, 288, 408, 276, 396, 276, 396);
        MergedLayer m = RegionMerger.merge("L", List.of(Polygon.rectangle(0, 0, 10, 10), diamond));
        assertThat(m.shapeCount()).isEqualTo(2);
        assertThat(m.area(0) + m.area(1)).isEqualTo(100.0 + 288.0);
        assertThat(m.edgeCount()).isEqualTo(4 + 4);
    }

    @Test
    void parallelSpacingIsThePerpendicularGap() {
        // [0,10]x[0,10] and [13,20]x[5,30]: gap 3 along x, run 5 (y 5..10)
        List<Violation> v = check(rects(0, 0, 10, 10, 13, 5, 20, 30), spacing(4, Metric.EUCLIDEAN));
        assertThat(v).hasSize(1);
        assertThat(v.get(0).kind()).isEqualTo(ViolationKind.SPACING);
        assertThat(v.get(0).measured()).isEqualTo(3.0);
        assertThat(v.get(0).marker()).isEqualTo(new Box(10, 5, 13, 10));
    }

    @Test
    void cornerToCornerOnlyInEuclideanMetric() {
        // diagonal squares: corner (10,10) to (13,14): distance 5
        List<Polygon> l = rects(0, 0, 10, 10, 13, 14, 20, 20);
        List<Violation> e = check(l, spacing(6, Metric.EUCLIDEAN));
        assertThat(e).singleElement().satisfies(x -> {
            assertThat(x.measured()).isEqualTo(5.0);
            assertThat(x.marker()).isEqualTo(new Box(10, 10, 13, 14));
        });
        assertThat(check(l, spacing(5, Metric.EUCLIDEAN))).isEmpty(); // 5 is not below 5
        assertThat(check(l, spacing(6, Metric.PROJECTION))).isEmpty();
    }

    @Test
    void touchingCornersHaveSpacingZeroAndOverlapMerges() {
        // corner-touching squares stay two shapes at distance 0
        List<Violation> v = check(rects(0, 0, 10, 10, 10, 10, 20, 20), spacing(3, Metric.EUCLIDEAN));
        assertThat(v).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.SPACING);
            assertThat(x.measured()).isZero();
        });
        // overlapping and abutting rectangles merge: no spacing, width is that of the union
        assertThat(check(rects(0, 0, 10, 10, 5, 0, 20, 10, 20, 0, 30, 10), spacing(3, Metric.EUCLIDEAN),
                new WidthRule("W", "L", 10))).isEmpty();
        // coincident duplicate shapes are one shape
        assertThat(check(rects(0, 0, 10, 10, 0, 0, 10, 10), new AreaRule("A", "L", 101))).singleElement()
                .satisfies(x -> assertThat(x.measured()).isEqualTo(100.0));
    }

    @Test
    void notchInsideOneShape() {
        // U shape: arms x 0..10 and 14..24, base y 0..10, arms up to 30: notch 4 wide, run 20
        Polygon u = Polygon.of(0, 0, 24, 0, 24, 30, 14, 30, 14, 10, 10, 10, 10, 30, 0, 30);
        List<Violation> v = check(List.of(u), spacing(5, Metric.PROJECTION));
        assertThat(v).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.NOTCH);
            assertThat(x.measured()).isEqualTo(4.0);
            assertThat(x.marker()).isEqualTo(new Box(10, 10, 14, 30));
        });
    }

    @Test
    void widthOfLinesAndSlivers() {
        // 3-wide sliver attached to a 20x20 block: width 3 along y for run 10
        List<Violation> v = check(rects(0, 0, 20, 20, 20, 5, 30, 8), new WidthRule("W", "L", 5));
        assertThat(v).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.WIDTH);
            assertThat(x.measured()).isEqualTo(3.0);
            assertThat(x.marker()).isEqualTo(new Box(20, 5, 30, 8));
        });
    }

    @Test
    void widthAcrossDiagonalNeckIsACornerPairInEuclideanOnly() {
        // squares overlapping in a 1x1 square: concave corners (10,9) and (9,10), distance sqrt 2
        List<Polygon> l = rects(0, 0, 10, 10, 9, 9, 19, 19);
        List<Violation> e = check(l, new WidthRule("W", "L", AxisValue.of(2), Metric.EUCLIDEAN));
        assertThat(e).singleElement().satisfies(x -> assertThat(x.measured()).isCloseTo(Math.sqrt(2), within(1e-12)));
        assertThat(check(l, new WidthRule("W", "L", AxisValue.of(2), Metric.PROJECTION))).isEmpty();
    }

    @Test
    void holesGiveInnerSpacingAndWidth() {
        // ring: outer 0..30, hole 10..20: ring width 10, hole 10 across
        List<Polygon> ring = rects(0, 0, 30, 10, 0, 20, 30, 30, 0, 10, 10, 20, 20, 10, 30, 20);
        assertThat(check(ring, new AreaRule("A", "L", 801))).singleElement()
                .satisfies(x -> assertThat(x.measured()).isEqualTo(800.0)); // 900 - 100
        List<Violation> notch = check(ring, spacing(11, Metric.PROJECTION));
        // the hole's facing sides: left/right and bottom/top, both 10 apart
        assertThat(notch).hasSize(2).allSatisfy(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.NOTCH);
            assertThat(x.measured()).isEqualTo(10.0);
        });
        // a shape inside the hole is a different shape: spacing 4 to the hole's sides
        List<Polygon> withIsland = new java.util.ArrayList<>(ring);
        withIsland.addAll(rects(14, 14, 16, 16));
        assertThat(check(withIsland, spacing(5, Metric.PROJECTION))).hasSize(4)
                .allSatisfy(x -> assertThat(x.kind()).isEqualTo(ViolationKind.SPACING));
    }

    @Test
    void anisotropicSpacingUsesTheAxisOfSeparation() {
        // gap 6 along x and gap 6 along y; rule x 5, y 7: only the y gap violates
        List<Polygon> l = rects(0, 0, 10, 10, 16, 0, 26, 10, 0, 16, 10, 26);
        SpacingRule r = new SpacingRule("S", "L", new AxisValue(5, 7), Metric.PROJECTION, Optional.empty());
        assertThat(check(l, r)).singleElement().satisfies(x -> {
            assertThat(x.required()).isEqualTo(7.0);
            assertThat(x.marker()).isEqualTo(new Box(0, 10, 10, 16));
        });
    }

    @Test
    void spacingTableByWidthAndRunLength() {
        // table: 10 normally, 20 when the wider shape is >= 50 wide and the run >= 30
        SpacingTable t = new SpacingTable(List.of(0L, 50L), List.of(0L, 30L), List.of(List.of(10L, 10L), List.of(10L, 20L)));
        SpacingRule r = new SpacingRule("S", "L", AxisValue.of(10), Metric.PROJECTION, Optional.of(t));
        // wide plate 0..60 x 0..60, thin line at gap 15 with run 40: needs 20 -> violation
        assertThat(check(rects(0, 0, 60, 60, 75, 0, 80, 40), r)).singleElement()
                .satisfies(x -> assertThat(x.required()).isEqualTo(20.0));
        // same line with run 20: needs 10 -> clean
        assertThat(check(rects(0, 0, 60, 60, 75, 0, 80, 20), r)).isEmpty();
        // narrow block (40 wide) with run 40: needs 10 -> clean
        assertThat(check(rects(0, 0, 40, 60, 55, 0, 60, 40), r)).isEmpty();
    }

    @Test
    void pitchOfHorizontalLines() {
        // lines 4 wide at y 0..4, 10..14 (pitch 10) and 18..22 (pitch 8)
        List<Polygon> l = rects(0, 0, 100, 4, 0, 10, 100, 14, 0, 18, 100, 22);
        List<Violation> v = check(l, new PitchRule("P", "L", Direction.HORIZONTAL, 9));
        assertThat(v).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.PITCH);
            assertThat(x.measured()).isEqualTo(8.0);
        });
        assertThat(check(l, new PitchRule("P", "L", Direction.VERTICAL, 9))).isEmpty();
    }

    @Test
    void endOfLineTipToTipAndTipToSide() {
        // two horizontal lines 4 wide ending tip to tip 6 apart; a vertical line 5 right of a tip
        List<Polygon> tt = rects(0, 0, 50, 4, 56, 0, 100, 4);
        EndOfLineRule r = new EndOfLineRule("E", "L", 5, 8, 7);
        assertThat(check(tt, r)).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.TIP_TO_TIP);
            assertThat(x.measured()).isEqualTo(6.0);
        });
        List<Polygon> ts = rects(0, 0, 50, 4, 55, -20, 60, 30);
        assertThat(check(ts, r)).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.TIP_TO_SIDE);
            assertThat(x.measured()).isEqualTo(5.0);
            assertThat(x.edgeA().isVertical()).isTrue();
            assertThat(x.edgeA().x0()).isEqualTo(50);
        });
    }

    @Test
    void areaOfMergedShapes() {
        // L from two rectangles: 10x2 + 2x8 = 36
        assertThat(check(rects(0, 0, 10, 2, 0, 2, 2, 10), new AreaRule("A", "L", 40))).singleElement()
                .satisfies(x -> assertThat(x.measured()).isEqualTo(36.0));
        assertThat(check(rects(0, 0, 10, 2, 0, 2, 2, 10), new AreaRule("A", "L", 36))).isEmpty();
    }

    @Test
    void enclosureAllSidesAndOppositeSides() {
        Map<String, List<Polygon>> layers = Map.of("via", rects(10, 10, 20, 20), "metal", rects(7, 5, 23, 25));
        // enclosure left/right 3, bottom/top 5
        CheckEngine engine = new CheckEngine(CheckOptions.threads(1));
        assertThat(engine.check(layers, List.of(new EnclosureRule("E", "via", "metal", 3, OptionalLong.of(5))))).isEmpty();
        List<Violation> v = engine.check(layers, List.of(new EnclosureRule("E", "via", "metal", 4, OptionalLong.of(6))));
        assertThat(v).extracting(Violation::kind).containsExactly(ViolationKind.ENCLOSURE, ViolationKind.ENCLOSURE_OPPOSITE);
        assertThat(v.get(0).measured()).isEqualTo(3.0);
        assertThat(v.get(1).measured()).isEqualTo(5.0);
        // via sticking out of the metal
        Map<String, List<Polygon>> out = Map.of("via", rects(10, 10, 20, 20), "metal", rects(12, 0, 30, 30));
        assertThat(engine.check(out, List.of(new EnclosureRule("E", "via", "metal", 0, OptionalLong.empty()))))
                .singleElement().satisfies(x -> assertThat(x.kind()).isEqualTo(ViolationKind.NOT_ENCLOSED));
        // enclosure through two abutting metal pieces counts as one merged shape
        Map<String, List<Polygon>> split = Map.of("via", rects(10, 10, 20, 20), "metal", rects(5, 5, 15, 25, 15, 5, 25, 25));
        assertThat(engine.check(split, List.of(new EnclosureRule("E", "via", "metal", 5, OptionalLong.empty())))).isEmpty();
    }

    @Test
    void densityInSteppedWindows() {
        // extent 0..100 x 0..100 (the metal itself), windows 50 stepped 50; one window 100% full
        List<Polygon> l = rects(0, 0, 50, 50, 99, 99, 100, 100);
        List<Violation> v = check(l, new DensityRule("D", "L", 50, 50, 0.0, 0.5));
        assertThat(v).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.DENSITY_HIGH);
            assertThat(x.measured()).isEqualTo(1.0);
            assertThat(x.marker()).isEqualTo(new Box(0, 0, 50, 50));
        });
    }

    @Test
    void maskConflictsFromOddCyclesAndFourCliques() {
        // three 10x10 squares 4 apart in an L pattern plus one diagonal: a triangle of conflicts at distance 5
        List<Polygon> tri = rects(0, 0, 10, 10, 14, 0, 24, 10, 0, 14, 10, 24);
        List<Violation> two = check(tri, new MaskRule("M", "L", 7, 2));
        // square 1-2 at 4, 1-3 at 4, 2-3 corner to corner sqrt(4^2+4^2) = 5.66: an odd cycle of three
        assertThat(two).singleElement().satisfies(x -> {
            assertThat(x.kind()).isEqualTo(ViolationKind.MASK_CONFLICT);
            assertThat(x.measured()).isEqualTo(4.0);
            assertThat(x.marker()).isEqualTo(new Box(0, 0, 24, 24));
        });
        assertThat(check(tri, new MaskRule("M", "L", 7, 3))).isEmpty();
        // four squares around a cross: all pairs closer than 7 (K4) need four masks
        List<Polygon> k4 = rects(0, 0, 10, 10, 14, 0, 24, 10, 0, 14, 10, 24, 14, 14, 24, 24);
        assertThat(check(k4, new MaskRule("M", "L", 7, 3))).isNotEmpty()
                .allSatisfy(x -> assertThat(x.kind()).isEqualTo(ViolationKind.MASK_CONFLICT));
        assertThat(check(k4, new MaskRule("M", "L", 5, 2))).isEmpty(); // only the 4-gaps conflict: a 4-cycle
    }

    @Test
    void fortyFiveDegreeEdges() {
        // a square with a chamfered corner facing a 45 degree parallel edge at distance 3*sqrt(2)
        Polygon a = Polygon.of(0, 0, 20, 0, 20, 10, 10, 20, 0, 20);
        Polygon b = Polygon.of(23, 13, 33, 13, 33, 33, 13, 33, 13, 23);
        List<Violation> v = check(List.of(a, b), spacing(5, Metric.PROJECTION));
        assertThat(v).singleElement().satisfies(x -> assertThat(x.measured()).isCloseTo(3 * Math.sqrt(2), within(1e-9)));
    }
}
