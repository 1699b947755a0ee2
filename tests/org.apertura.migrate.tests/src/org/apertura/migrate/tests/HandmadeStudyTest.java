/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.SummaryTable;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.colour.Transition;
import org.apertura.migrate.delta.AxisScope;
import org.apertura.migrate.delta.DeltaCause;
import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The migration of {@link HandmadeCase}, every figure worked out by hand in the comments. */
class HandmadeStudyTest {

    private static ResolvedDeck deck;
    private static MigrationResult result;

    @BeforeAll
    static void run() {
        deck = HandmadeCase.deck();
        result = MigrationStudy.run(deck, HandmadeCase.layout(), new Box(0, 0, 4400, 1000), "handmade", "TOP",
                List.of(), "src", "tgt", Set.of(), MigrationOptions.defaults().withEngine(CheckOptions.threads(2)));
    }

    private static RuleDelta delta(String layer, String rule, AxisScope axis) {
        return result.deltas().stream().filter(d -> d.layer().equals(layer) && d.rule().equals(rule) && d.axis() == axis)
                .findFirst().orElseThrow();
    }

    @Test
    void movedLayersAreThoseThatDiffer() {
        assertEquals(List.of("M1", "V1"), result.layers());
    }

    @Test
    void deckDelta() {
        RuleDelta w = delta("M1", "width", AxisScope.BOTH);
        assertEquals(10.0, w.oldValue().getAsDouble());
        assertEquals(12.0, w.newValue().getAsDouble());
        assertEquals(2.0, w.difference().getAsDouble(), 1e-12);
        assertEquals(1.2, w.ratio().getAsDouble(), 1e-12);
        assertEquals(DeltaStatus.TIGHTENED, w.status());
        assertEquals(DeltaCause.PATTERNING, w.cause()); // LE2 -> SE
        assertEquals(DeltaStatus.TIGHTENED, delta("M1", "pitch", AxisScope.BOTH).status());
        assertEquals(DeltaStatus.REMOVED, delta("M1", "same-mask-spacing", AxisScope.BOTH).status());
        assertEquals(DeltaStatus.UNCHANGED, delta("V1", "width", AxisScope.BOTH).status());
        assertEquals(DeltaCause.NONE, delta("V1", "width", AxisScope.BOTH).cause());
        // V1 spacing 20 -> x 18 / y 22 on the 4x/8x option: one row per axis
        RuleDelta sx = delta("V1", "spacing", AxisScope.X);
        RuleDelta sy = delta("V1", "spacing", AxisScope.Y);
        assertEquals(DeltaStatus.RELAXED, sx.status());
        assertEquals(DeltaStatus.TIGHTENED, sy.status());
        assertEquals(DeltaCause.ANAMORPHIC_AXIS, sx.cause());
        assertEquals(DeltaCause.ANAMORPHIC_AXIS, sy.cause());
        assertEquals(3, result.count("M1", DeltaStatus.TIGHTENED));
        assertEquals(1, result.count("V1", DeltaStatus.RELAXED));
    }

    @Test
    void layoutImpact() {
        // new: A-B space 14 < 16 (M1 spacing); vias a-c 20 apart along y < 22 (V1 spacing)
        // fixed: the odd cycles A-B-D (all < 36 apart) and a-b-c (all < 40 apart) under LE2
        // persisting: line C, 8 wide, below 10 and 12
        List<ViolationChange> brk = result.impact().withStatus(ImpactStatus.NEW);
        List<ViolationChange> fix = result.impact().withStatus(ImpactStatus.FIXED);
        List<ViolationChange> keep = result.impact().withStatus(ImpactStatus.PERSISTING);
        assertEquals(2, brk.size());
        assertEquals(2, fix.size());
        assertEquals(1, keep.size());
        ViolationChange ab = brk.stream().filter(c -> c.rule().layer().equals("M1")).findFirst().orElseThrow();
        assertEquals("spacing", ab.rule().rule());
        assertEquals(14 * 4, ab.target().orElseThrow().measured(), 1e-9); // 14 nm in 0.25 nm units
        assertEquals(new Box(0, 64, 4000, 120), ab.marker()); // the gap between A and B
        ViolationChange ac = brk.stream().filter(c -> c.rule().layer().equals("V1")).findFirst().orElseThrow();
        assertEquals(new Box(800, 848, 848, 928), ac.marker()); // between a (y ..212) and c (y 232..)
        assertTrue(fix.stream().allMatch(c -> c.kind() == ViolationKind.MASK_CONFLICT));
        assertEquals(new Box(0, 0, 4400, 184), fix.get(0).marker()); // around A, B and D
        assertEquals("width", keep.get(0).rule().rule());
        assertEquals(new Box(0, 400, 4000, 432), keep.get(0).marker()); // line C
        assertEquals(2, result.impact().total().newCount());
    }

    private static Headroom headroom(String layer, String rule, ShrinkScope scope) {
        return result.headroom().stream()
                .filter(h -> h.layer().equals(layer) && h.rule().equals(rule) && h.scope() == scope).findFirst()
                .orElseThrow();
    }

    @Test
    void shrinkHeadroom() {
        // places already failing at scale 1 (A-B space, C width, a-c space) are not counted
        // width: A and B are 16 wide, 12 required -> 12/16 = 0.75
        assertEquals(0.75, headroom("M1", "width", ShrinkScope.UNIFORM).factor(), 1e-12);
        // spacing: D is 20 from A and B, 16 required -> 0.8 (B-C 54 apart only needs 16/54)
        assertEquals(0.8, headroom("M1", "spacing", ShrinkScope.UNIFORM).factor(), 1e-12);
        // pitch: A-B centre lines 30 apart, 28 required -> 28/30
        Headroom pitch = headroom("M1", "pitch", ShrinkScope.UNIFORM);
        assertEquals(28.0 / 30, pitch.factor(), 1e-12);
        assertEquals(30.0, pitch.measured().getAsDouble(), 1e-9);
        // the layer: the pitch binds, 1 - 28/30 = 6.7 %
        Headroom m1 = result.layerHeadroom("M1", ShrinkScope.UNIFORM);
        assertEquals(1 - 28.0 / 30, m1.headroom(), 1e-12);
        assertEquals(new Box(0, 64, 4000, 120), m1.limitingPlace().orElseThrow());
        // along x only the D-A and D-B spaces shrink (20 -> 16): 0.8; along y the pitch: 28/30
        assertEquals(0.8, result.layerHeadroom("M1", ShrinkScope.X).factor(), 1e-12);
        assertEquals(28.0 / 30, result.layerHeadroom("M1", ShrinkScope.Y).factor(), 1e-12);
        // nothing of M1 limits a shrink along x below 1/4 for the pitch (horizontal lines)
        assertTrue(headroom("M1", "pitch", ShrinkScope.X).bounded());
        // V1: vias drawn at the 12 nm minimum: no headroom; the a-b space (20 along x, 18 needed): 0.9
        assertEquals(1.0, result.layerHeadroom("V1", ShrinkScope.UNIFORM).factor(), 1e-12);
        assertEquals(0.9, headroom("V1", "spacing", ShrinkScope.UNIFORM).factor(), 1e-12);
        assertTrue(headroom("V1", "spacing", ShrinkScope.Y).bounded());
    }

    @Test
    void shrinkHeadroomAgreesWithTheEngineOnAScaledLayout() {
        // the engine on the layout scaled by 0.95 (above 28/30) finds only the 2 violations of scale 1,
        // scaled by 0.92 (below 28/30) a pitch violation more
        assertEquals(2, targetViolations("M1", 1.0));
        assertEquals(2, targetViolations("M1", 0.95));
        assertEquals(3, targetViolations("M1", 0.92));
    }

    private static int targetViolations(String layer, double f) {
        List<Polygon> scaled = new ArrayList<>();
        for (Polygon p : HandmadeCase.layout().get(layer)) {
            long[] c = p.coordinates();
            for (int i = 0; i < c.length; i++) {
                c[i] = Math.round(c[i] * f);
            }
            scaled.add(Polygon.of(c));
        }
        RuleSet rules = EngineRules.of(deck, "tgt", List.of(layer));
        return new CheckEngine(CheckOptions.threads(1)).check(Map.of(layer, scaled), rules.rules()).size();
    }

    @Test
    void masksAndScannerTime() {
        // M1 and V1 leave LE2: 2 + 2 masks become 1 + 1
        assertEquals(4, result.masks().sourceMasks());
        assertEquals(2, result.masks().targetMasks());
        assertEquals(2, result.masks().masksSaved());
        // 4 exposures at 150 wph = 4 x 24 s; 2 exposures at 185 wph = 2 x 3600/185 s
        assertEquals(96.0, result.masks().sourceSeconds().getAsDouble(), 1e-9);
        assertEquals(7200.0 / 185, result.masks().targetSeconds().getAsDouble(), 1e-9);
    }

    @Test
    void colouringConflictsVanish() {
        assertEquals(2, result.colouring().size());
        var m1 = result.colouring().get(0);
        assertEquals(Transition.LEAVING, m1.transition());
        assertEquals(3, m1.source().orElseThrow().conflictEdges()); // A-B, A-D, B-D
        assertFalse(m1.source().orElseThrow().colourable());
        assertEquals(1, m1.vanishing());
    }

    @Test
    void opticsPerRule() {
        // M1 pitch 22 nm LE2 at 0.33 NA: (22 x 2 / 2) x 0.33 / 13.5 = 0.538; 28 nm SE at 0.55: 0.570
        var src = result.ruleOptics().stream()
                .filter(o -> o.option().equals("src") && o.layer().equals("M1") && o.rule().equals("pitch")).findFirst()
                .orElseThrow();
        assertEquals(22 * 0.33 / 13.5, src.k1(), 1e-12);
        assertEquals(org.apertura.migrate.optics.Printability.WITH_SPLIT, src.verdict());
        assertEquals(2, src.minimumSplit()); // 11 x 0.33 / 13.5 = 0.27 < 0.3 in one exposure
        var tgt = result.ruleOptics().stream()
                .filter(o -> o.option().equals("tgt") && o.layer().equals("M1") && o.rule().equals("pitch")).findFirst()
                .orElseThrow();
        assertEquals(14 * 0.55 / 13.5, tgt.k1(), 1e-12);
        assertEquals(org.apertura.migrate.optics.Printability.SINGLE_EXPOSURE, tgt.verdict());
    }

    @Test
    void summaryTable() {
        String t = SummaryTable.render(result);
        assertTrue(t.contains("M1     LE2 -> SE   0.54 -> 0.57"), t);
        assertTrue(t.contains("6.7 % (pitch)"), t);
        assertTrue(t.contains("masks saved: 2"), t);
        assertTrue(t.contains("engineering aid"), t);
        assertTrue(t.lines().anyMatch(l -> l.startsWith("total") && l.contains("4 -> 2")), t);
    }
}
