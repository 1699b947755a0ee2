/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests.shrink;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.MeasuredShrink;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.migrate.tests.HandmadeCase;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.Test;

/**
 * Uniform shrink headroom from measure mode, worked out by hand on the hand-made deck's target option
 * (M1: width 12, spacing 16, pitch 28 nm; horizontal lines).
 */
class MeasuredShrinkTest {

    private static final ResolvedDeck DECK = HandmadeCase.deck();

    /** Three horizontal M1 lines 1 um long, {@code w} nm wide and {@code s} nm apart. */
    private static List<Polygon> lines(int w, int s) {
        List<Polygon> out = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            out.add(HandmadeCase.nm(0, i * (w + s), 1000, i * (w + s) + w));
        }
        return out;
    }

    private static MigrationResult study(List<Polygon> m1) {
        return MigrationStudy.run(DECK, Map.of("M1", m1), new Box(0, 0, 4000, 4000), "lines", "TOP", List.of(), "src",
                "tgt", Set.of("M1"), MigrationOptions.defaults());
    }

    private static Headroom rule(MigrationResult r, String rule) {
        return r.headroom().stream()
                .filter(h -> h.layer().equals("M1") && h.rule().equals(rule) && h.scope() == ShrinkScope.UNIFORM)
                .findFirst().orElseThrow();
    }

    @Test
    void linesDrawnAtThreeTimesTheRulesShrinkByTwoThirds() {
        // width 36 = 3 x 12, spacing 48 = 3 x 16, pitch 84 = 3 x 28: every rule allows s = 1/3,
        // a uniform headroom of 1 - 1/3 = 66.7 %
        MigrationResult r = study(lines(36, 48));
        assertEquals(12.0 / 36, rule(r, "width").factor(), 1e-12);
        assertEquals(16.0 / 48, rule(r, "spacing").factor(), 1e-12);
        assertEquals(28.0 / 84, rule(r, "pitch").factor(), 1e-12);
        Headroom layer = r.layerHeadroom("M1", ShrinkScope.UNIFORM);
        assertEquals(2.0 / 3, layer.headroom(), 1e-12);
        assertFalse(layer.bounded());
        assertEquals(84.0, rule(r, "pitch").measured().getAsDouble(), 1e-9);
        assertEquals(28.0, rule(r, "pitch").required().getAsDouble(), 1e-9);
    }

    @Test
    void headroomBeyondTheOldProbeFloorIsExact() {
        // width 60 = 5 x 12, spacing 80 = 5 x 16, pitch 140 = 5 x 28: s = 0.2, headroom 80 %; a probe
        // with rules x 4 could only say "at least 75 %"
        MigrationResult r = study(lines(60, 80));
        Headroom layer = r.layerHeadroom("M1", ShrinkScope.UNIFORM);
        assertEquals(0.2, layer.factor(), 1e-12);
        assertEquals(0.8, layer.headroom(), 1e-12);
        assertFalse(layer.bounded());
        assertTrue(layer.limitingPlace().isPresent());
    }

    @Test
    void theLimitIsTheSmallestValueThatStillHoldsAndItsPlaceIsNamed() {
        // hand-made layout: line C (8 nm) already fails the 12 nm width; lines A and B (16 nm) limit:
        // 12/16 = 0.75, at A (the first in the engine's order), 0..1000 x 0..16 nm
        Headroom width = MeasuredShrink.uniform(DECK, "tgt", List.of("M1"),
                new CheckEngine(CheckOptions.threads(1)).merge(HandmadeCase.layout()),
                new CheckEngine(CheckOptions.threads(1))).stream().filter(h -> h.rule().equals("width")).findFirst()
                .orElseThrow();
        assertEquals(0.75, width.factor(), 1e-12);
        assertEquals(16.0, width.measured().getAsDouble(), 1e-9);
        assertEquals(new Box(0, 0, 4000, 64), width.limitingPlace().orElseThrow());
    }

    @Test
    void aLayerWithoutNeighboursIsBounded() {
        // one isolated line: no spacing or pitch is measured within 64 x the largest rule or the
        // layer's extent, so nothing limits those rules
        MigrationResult r = study(List.of(HandmadeCase.nm(0, 0, 1000, 24)));
        assertTrue(rule(r, "spacing").bounded());
        assertTrue(rule(r, "pitch").bounded());
        assertEquals(0.5, rule(r, "width").factor(), 1e-12); // 12 / 24
        assertEquals(0.5, r.layerHeadroom("M1", ShrinkScope.UNIFORM).factor(), 1e-12);
        assertFalse(r.layerHeadroom("M1", ShrinkScope.UNIFORM).bounded());
    }

    @Test
    void theMeasuredFactorAgreesWithTheEngineOnTheScaledLayout() {
        // the 3x layout scaled by 0.34 (above 1/3) is clean under the target rules, by 0.32 (below) not
        assertEquals(0, violations(lines(36, 48), 0.34));
        assertTrue(violations(lines(36, 48), 0.32) > 0);
    }

    private static int violations(List<Polygon> m1, double f) {
        List<Polygon> scaled = new ArrayList<>();
        for (Polygon p : m1) {
            long[] c = p.coordinates();
            for (int i = 0; i < c.length; i++) {
                c[i] = Math.round(c[i] * f);
            }
            scaled.add(Polygon.of(c));
        }
        return new CheckEngine(CheckOptions.threads(1))
                .check(Map.of("M1", scaled), EngineRules.of(DECK, "tgt", List.of("M1")).rules()).size();
    }
}
