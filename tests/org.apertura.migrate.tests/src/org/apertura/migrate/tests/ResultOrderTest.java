/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Set;

import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.SummaryTable;
import org.apertura.migrate.impact.LayoutImpact;
import org.junit.jupiter.api.Test;

/** Every list of a study's result has a fixed order, so reports of two runs are byte-identical. */
class ResultOrderTest {

    private static MigrationResult run(int threads) {
        return MigrationStudy.run(HandmadeCase.deck(), HandmadeCase.layout(), new Box(0, 0, 4400, 976), "handmade",
                "TOP", List.of(), "src", "tgt", Set.of("M1", "V1"),
                MigrationOptions.defaults().withEngine(CheckOptions.threads(threads)).withPerAxisShrink(true));
    }

    private static <T> List<T> reversed(List<T> list) {
        List<T> r = new ArrayList<>(list);
        Collections.reverse(r);
        return r;
    }

    @Test
    void listsAreSortedWhateverOrderTheyAreGivenIn() {
        MigrationResult a = run(1);
        MigrationResult b = new MigrationResult(a.technology(), a.layout(), a.topCell(), a.from(), a.to(), a.layers(),
                a.sourceOptics(), a.targetOptics(), reversed(a.ruleOptics()), reversed(a.deltas()),
                new LayoutImpact(a.impact().source(), a.impact().target(), reversed(a.impact().changes())),
                reversed(a.headroom()), a.masks(), reversed(a.colouring()), reversed(a.maskSide()), a.fields(),
                a.warnings()).sorted();
        assertNotEquals(a.headroom(), reversed(a.headroom()), "the test needs lists with more than one row");
        assertEquals(a.ruleOptics(), b.ruleOptics());
        assertEquals(a.deltas(), b.deltas());
        assertEquals(a.impact().changes(), b.impact().changes());
        assertEquals(a.headroom(), b.headroom());
        assertEquals(a.colouring(), b.colouring());
        assertEquals(a.maskSide(), b.maskSide());
        assertEquals(SummaryTable.render(a), SummaryTable.render(b));
    }

    @Test
    void theConstructorKeepsTheGivenOrder() {
        MigrationResult a = run(1);
        List<org.apertura.migrate.shrink.Headroom> back = reversed(a.headroom());
        MigrationResult b = new MigrationResult(a.technology(), a.layout(), a.topCell(), a.from(), a.to(), a.layers(),
                a.sourceOptics(), a.targetOptics(), a.ruleOptics(), a.deltas(), a.impact(), back, a.masks(),
                a.colouring(), a.maskSide(), a.fields(), a.warnings());
        assertEquals(back, b.headroom());
        assertEquals(a.headroom(), b.sorted().headroom());
    }

    @Test
    void headroomIsOrderedByLayerThenRuleThenScope() {
        MigrationResult a = run(1);
        List<String> keys = a.headroom().stream().map(h -> h.layer() + " " + h.rule() + " " + h.scope().ordinal())
                .toList();
        List<String> sorted = new ArrayList<>(keys);
        Collections.sort(sorted);
        assertEquals(sorted, keys);
        // source rule optics come first
        assertEquals("src", a.ruleOptics().get(0).option());
        assertEquals("tgt", a.ruleOptics().get(a.ruleOptics().size() - 1).option());
    }

    @Test
    void twoRunsWithDifferentThreadCountsGiveTheSameSummary() {
        MigrationResult one = run(1);
        MigrationResult four = run(4);
        assertEquals(SummaryTable.render(one), SummaryTable.render(four));
        assertEquals(one.headroom(), four.headroom());
        assertEquals(one.deltas(), four.deltas());
        assertEquals(one.impact().changes(), four.impact().changes());
    }
}
