/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.apertura.engine.tests.support.Shapes.rects;
import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Random;

import org.apertura.engine.check.Axis;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.MeasureKind;
import org.apertura.engine.check.MeasureReport;
import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.engine.tests.support.RandomLayouts;
import org.junit.jupiter.api.Test;

/** Measure mode: hand-computed distributions and agreement with the checks. */
class MeasureTest {

    private static final CheckEngine ENGINE = new CheckEngine(CheckOptions.threads(2));

    @Test
    void linesGiveWidthsSpacingsAndPitches() {
        // lines 4 wide at y 0..4, 10..14, 18..22 (100 long): spacings 6 and 4, pitches 10 and 8; the
        // first and last line are not neighbours (the middle line lies between them)
        List<Polygon> l = rects(0, 0, 100, 4, 0, 10, 100, 14, 0, 18, 100, 22);
        MeasureReport m = ENGINE.measure(ENGINE.merge(Map.of("L", l)), 20);
        assertThat(m.distribution("L", MeasureKind.WIDTH, Axis.Y).values()).containsExactly(4, 4, 4);
        assertThat(m.distribution("L", MeasureKind.WIDTH, Axis.X).count()).isZero(); // 100 is beyond the range
        assertThat(m.distribution("L", MeasureKind.SPACING, Axis.Y).values()).containsExactly(4, 6);
        assertThat(m.distribution("L", MeasureKind.PITCH, Axis.Y).values()).containsExactly(8, 10);
        assertThat(m.minimum("L", MeasureKind.SPACING, Axis.ANY)).hasValueSatisfying(x -> {
            assertThat(x.value()).isEqualTo(4.0);
            assertThat(x.place()).isEqualTo(new Box(0, 14, 100, 18));
        });
        assertThat(m.distribution("L", MeasureKind.SPACING, Axis.Y).histogram(5)).containsExactly(1, 1);
    }

    @Test
    void minimumsAgreeWithViolationsOnRandomLayouts() {
        Random r = new Random(21);
        for (int c = 0; c < 300; c++) {
            List<Polygon> shapes = RandomLayouts.manhattan(r, 3 + r.nextInt(15));
            long w = 2 + r.nextInt(10), s = 2 + r.nextInt(10);
            Map<String, List<Polygon>> layers = Map.of("L", shapes);
            MeasureReport m = ENGINE.measure(ENGINE.merge(layers), 40);
            List<Violation> v = ENGINE.check(layers, List.of(new WidthRule("W", "L", w), new SpacingRule("S", "L", s)));
            double minWidthViolation = v.stream().filter(x -> x.kind() == ViolationKind.WIDTH)
                    .mapToDouble(Violation::measured).min().orElse(Double.NaN);
            double minSpaceViolation = v.stream().filter(x -> x.kind() != ViolationKind.WIDTH)
                    .mapToDouble(Violation::measured).min().orElse(Double.NaN);
            double minWidth = m.minimum("L", MeasureKind.WIDTH, Axis.ANY).map(x -> x.value()).orElse(Double.NaN);
            double minSpace = Math.min(
                    m.minimum("L", MeasureKind.SPACING, Axis.ANY).map(x -> x.value()).orElse(Double.POSITIVE_INFINITY),
                    m.minimum("L", MeasureKind.NOTCH, Axis.ANY).map(x -> x.value()).orElse(Double.POSITIVE_INFINITY));
            if (minWidth < w) {
                assertThat(minWidthViolation).as("case %d", c).isEqualTo(minWidth);
            } else {
                assertThat(minWidthViolation).as("case %d", c).isNaN();
            }
            if (minSpace < s) {
                assertThat(minSpaceViolation).as("case %d", c).isEqualTo(minSpace);
            } else {
                assertThat(minSpaceViolation).as("case %d", c).isNaN();
            }
            // per-axis minimums are never below the overall one
            for (Axis a : Axis.values()) {
                m.minimum("L", MeasureKind.WIDTH, a).ifPresent(x -> assertThat(x.value()).isGreaterThanOrEqualTo(minWidth));
            }
        }
    }
}
