/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.apertura.engine.bench.RoutingGenerator;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.internal.EdgeIndex;
import org.apertura.engine.internal.Exec;
import org.apertura.engine.internal.FacingPair;
import org.apertura.engine.internal.PairSearch;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.engine.tests.support.RandomLayouts;
import org.junit.jupiter.api.Test;

/**
 * The engine's fast paths give exactly what their plain forms give: the merge that groups touching
 * polygons first equals one sweep over the whole layer, ring for ring; the pair search over sorted rows
 * and columns reports exactly the pairs a box search over a grid of all edges reports. (Both plain forms
 * are themselves checked against JTS in {@link JtsCrossCheckTest}.)
 */
class FastPathTest {

    @Test
    void groupedMergeEqualsSingleSweepOnRandomLayouts() {
        Random r = new Random(2026);
        for (int c = 0; c < 2000; c++) {
            List<Polygon> polygons = mixedManhattan(r, 1 + r.nextInt(40), c % 3 == 0 ? 2000 : 200);
            assertSameLayer(c, RegionMerger.mergeBySingleSweep("L", polygons), RegionMerger.merge("L", polygons));
        }
    }

    @Test
    void groupedMergeEqualsSingleSweepOnRoutingAndOnHeavyOverlap() {
        List<Polygon> m1 = RoutingGenerator.generate(5, 30_000).get("m1");
        assertSameLayer(0, RegionMerger.mergeBySingleSweep("m1", m1), RegionMerger.merge("m1", m1));
        // thousands of large boxes over one another: grouping would test millions of box pairs, so
        // the merge falls back to the single sweep; the result must not change either way
        Random r = new Random(3);
        List<Polygon> heavy = new ArrayList<>();
        for (int i = 0; i < 3000; i++) {
            long x = r.nextInt(1000), y = r.nextInt(1000);
            heavy.add(Polygon.rectangle(x, y, x + 2000 + r.nextInt(500), y + 2000 + r.nextInt(500)));
        }
        heavy.add(Polygon.rectangle(100_000, 0, 100_010, 10));
        assertSameLayer(1, RegionMerger.mergeBySingleSweep("h", heavy), RegionMerger.merge("h", heavy));
    }

    @Test
    void sortedPairSearchEqualsBoxSearch() {
        Random r = new Random(77);
        for (int c = 0; c < 600; c++) {
            List<Polygon> polygons = c % 2 == 0 ? mixedManhattan(r, 2 + r.nextInt(30), 200)
                    : RandomLayouts.octilinear(r, 2 + r.nextInt(12));
            MergedLayer layer = RegionMerger.merge("L", polygons);
            EdgeIndex sorted = new EdgeIndex(layer), plain = EdgeIndex.gridOnly(layer);
            long reach = 1 + r.nextInt(60);
            for (int side : new int[] {1, -1}) {
                List<String> expected = pairs(layer, plain, reach, side, 1);
                assertThat(pairs(layer, sorted, reach, side, 1)).as("case %d reach %d side %d", c, reach, side)
                        .isEqualTo(expected);
                assertThat(pairs(layer, sorted, reach, side, 3)).as("case %d, three threads", c).isEqualTo(expected);
            }
        }
    }

    @Test
    void coordinatesBeyondThirtyTwoBitsStillChecked() {
        // rows hold 32-bit offsets; a layer spanning more than 2^31 units falls back to the grid
        long far = 3_000_000_000L;
        List<Polygon> polygons = List.of(Polygon.rectangle(0, 0, 100, 100), Polygon.rectangle(130, 0, 200, 100),
                Polygon.rectangle(far, 0, far + 100, 5));
        List<Violation> v = new CheckEngine(CheckOptions.threads(1)).check(Map.of("L", polygons),
                List.of(new SpacingRule("S", "L", 40), new WidthRule("W", "L", 10)));
        assertThat(v).extracting(Violation::ruleId, Violation::measured).containsExactlyInAnyOrder(
                org.assertj.core.groups.Tuple.tuple("S", 30.0), org.assertj.core.groups.Tuple.tuple("W", 5.0));
    }

    /** Every pair as text (edges, kind, distance, closest points), sorted: the search order may differ. */
    private static List<String> pairs(MergedLayer layer, EdgeIndex index, long reach, int side, int threads) {
        Exec exec = new Exec(threads, (d, t) -> {
        }, () -> false, 7);
        List<String> out = PairSearch.run(layer, index, reach, side, exec, (e, f, p, list) -> list.add(
                String.format("%d %d %d %.6f %.3f %.3f %.3f %.3f", e, f, p.type, p.distance, p.px, p.py, p.qx, p.qy)));
        assertThat(out).allSatisfy(s -> assertThat(Integer.parseInt(s.split(" ")[2])).isNotEqualTo(FacingPair.NONE));
        List<String> sorted = new ArrayList<>(out);
        sorted.sort(null);
        return sorted;
    }

    /**
     * Rectangles (both orientations), L-shapes, zero-area slivers and four-bar frames enclosing holes in
     * a square field of the given side: dense fields overlap and touch at corners, sparse ones leave
     * most polygons alone.
     */
    private static List<Polygon> mixedManhattan(Random r, int n, int field) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            long x = r.nextInt(field), y = r.nextInt(field), w = 1 + r.nextInt(40), h = 1 + r.nextInt(40);
            switch (r.nextInt(6)) {
                case 0 -> out.add(Polygon.of(x, y, x, y + h, x + w, y + h, x + w, y));
                case 1 -> out.add(Polygon.of(x, y, x + w + 5, y, x + w + 5, y + 3, x + 3, y + 3, x + 3, y + h + 5, x, y + h + 5));
                case 2 -> out.add(Polygon.of(x, y, x + w, y, x + w, y));
                case 3 -> {
                    long t = 1 + r.nextInt(4);
                    out.add(Polygon.rectangle(x, y, x + w + 2 * t, y + t));
                    out.add(Polygon.rectangle(x, y + h + t, x + w + 2 * t, y + h + 2 * t));
                    out.add(Polygon.rectangle(x, y, x + t, y + h + 2 * t));
                    out.add(Polygon.rectangle(x + w + t, y, x + w + 2 * t, y + h + 2 * t));
                }
                default -> out.add(Polygon.rectangle(x, y, x + w, y + h));
            }
        }
        return out;
    }

    private static void assertSameLayer(int c, MergedLayer expected, MergedLayer actual) {
        assertThat(actual.edgeCount()).as("case %d edges", c).isEqualTo(expected.edgeCount());
        assertThat(actual.ringCount()).as("case %d rings", c).isEqualTo(expected.ringCount());
        assertThat(actual.shapeCount()).as("case %d shapes", c).isEqualTo(expected.shapeCount());
        for (int e = 0; e < expected.edgeCount(); e++) {
            if (!actual.edge(e).equals(expected.edge(e)) || actual.ringOf(e) != expected.ringOf(e)
                    || actual.shapeOf(e) != expected.shapeOf(e)) {
                throw new AssertionError("case " + c + ": edge " + e + " is " + actual.edge(e) + " in ring "
                        + actual.ringOf(e) + " shape " + actual.shapeOf(e) + ", expected " + expected.edge(e) + " in ring "
                        + expected.ringOf(e) + " shape " + expected.shapeOf(e));
            }
        }
    }
}
