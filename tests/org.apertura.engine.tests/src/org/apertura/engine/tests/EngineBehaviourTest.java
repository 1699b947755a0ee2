/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;

import org.apertura.engine.bench.RoutingGenerator;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.rule.AreaRule;
import org.apertura.engine.rule.Direction;
import org.apertura.engine.rule.EndOfLineRule;
import org.apertura.engine.rule.MaskRule;
import org.apertura.engine.rule.PitchRule;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.junit.jupiter.api.Test;

/** Determinism across threads and tile sizes, progress, cancellation and input errors. */
class EngineBehaviourTest {

    private static final List<Rule> RULES = List.of(
            new WidthRule("W1", "m1", 50), new SpacingRule("S1", "m1", 50), new WidthRule("W2", "m2", 50),
            new SpacingRule("S2", "m2", 60), new PitchRule("P1", "m1", Direction.HORIZONTAL, 100),
            new EndOfLineRule("E2", "m2", 60, 120, 80), new AreaRule("A1", "m1", 10_000), new MaskRule("M1", "m1", 60, 2));

    @Test
    void sameViolationsForEveryThreadCountAndTileSize() {
        Map<String, List<Polygon>> layout = RoutingGenerator.generate(9, 12_000);
        List<Violation> one = new CheckEngine(CheckOptions.threads(1).withEdgesPerTile(10_000_000)).check(layout, RULES);
        // tiles of 16 edges put a great many shapes across tile borders
        List<Violation> tiny = new CheckEngine(CheckOptions.threads(2).withEdgesPerTile(16)).check(layout, RULES);
        List<Violation> two = new CheckEngine(CheckOptions.threads(2)).check(layout, RULES);
        List<Violation> three = new CheckEngine(CheckOptions.threads(3).withEdgesPerTile(300)).check(layout, RULES);
        assertThat(one).isNotEmpty();
        assertThat(tiny).isEqualTo(one);
        assertThat(two).isEqualTo(one);
        assertThat(three).isEqualTo(one);
        List<Violation> sorted = new ArrayList<>(one);
        sorted.sort(Violation.ORDER);
        assertThat(one).isEqualTo(sorted);
    }

    @Test
    void progressReachesTheTotalAndCancellationStops() {
        Map<String, List<Polygon>> layout = RoutingGenerator.generate(3, 8_000);
        AtomicLong lastDone = new AtomicLong(), lastTotal = new AtomicLong();
        CheckOptions opts = new CheckOptions(1, (d, t) -> {
            assertThat(d).isGreaterThan(lastDone.get()).isLessThanOrEqualTo(t);
            lastDone.set(d);
            lastTotal.set(t);
        }, () -> false, 64);
        new CheckEngine(opts).check(layout, RULES);
        assertThat(lastDone.get()).isPositive().isEqualTo(lastTotal.get());

        AtomicBoolean stop = new AtomicBoolean();
        AtomicLong calls = new AtomicLong();
        CheckOptions cancelling = new CheckOptions(2, (d, t) -> {
            calls.incrementAndGet();
            stop.set(true);
        }, stop::get, 64);
        assertThatThrownBy(() -> new CheckEngine(cancelling).check(layout, RULES)).isInstanceOf(CancellationException.class);
        assertThat(calls.get()).isLessThan(lastTotal.get());
    }

    @Test
    void unknownLayerIsNamedAndEmptyLayersAreClean() {
        CheckEngine engine = new CheckEngine(CheckOptions.threads(1));
        assertThatThrownBy(() -> engine.check(Map.of("m1", List.of()), List.of(new WidthRule("m2.1", "m2", 10))))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("m2.1").hasMessageContaining("'m2'");
        assertThat(engine.check(Map.of("m1", List.of()), RULES.subList(0, 2))).isEmpty();
        Map<String, MergedLayer> merged = engine.merge(Map.of("m1", List.of()));
        assertThat(merged.get("m1").shapeCount()).isZero();
    }
}
