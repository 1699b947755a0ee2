/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.apertura.migrate.derive.DraftDeck;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.junit.jupiter.api.Test;

/** The draft deck derived from {@link HandmadeCase}, values worked out by hand (0.25 nm units). */
class DraftDeckTest {

    @Test
    void derivedByK1PreservingScaling() {
        DraftDeck d = DraftDeck.derive(HandmadeCase.deck(), "src", "tgt", List.of(), Path.of("draft.apdeck"));
        assertFalse(d.hasErrors(), () -> d.diagnostics() + "\n" + d.text());
        ResolvedDeck draft = new DeckLoader().load(Path.of("draft.apdeck"), d.text()).orElseThrow();
        String o = d.name();
        // s = (13.5/0.55)/(13.5/0.33) = 0.6
        // M1 width 10 x 0.6 = 6 nm; spacing 12 x 0.6 = 7.2 -> 7.5 nm on the 0.5 nm grid
        assertEquals(6 * 4, draft.value(o, "M1", RuleKind.WIDTH).orElseThrow().value());
        assertEquals(30, draft.value(o, "M1", RuleKind.SPACING).orElseThrow().value());
        // pitch 22 x 0.6 = 13.2 -> 13.5 nm has k1 0.275 in one exposure, below the floor 0.35:
        // raised to 2 x 0.35 x 13.5 / 0.55 = 17.18 -> 17.5 nm
        assertEquals(70, draft.value(o, "M1", RuleKind.PITCH).orElseThrow().value());
        assertTrue(draft.pitchK1(o, "M1").getAsDouble() >= 0.35);
        // M1 leaves LE2: single exposure, same-mask spacing dropped
        assertEquals(Patterning.SINGLE, draft.rules(o, "M1").patterning());
        assertTrue(draft.value(o, "M1", RuleKind.SAME_MASK_SPACING).isEmpty());
        assertTrue(d.text().contains("same-mask spacing 36 nm dropped"));
        // V1 width 12 x 0.6 = 7.2 -> 7.5 nm; spacing 20 x 0.6 = 12 nm
        assertEquals(30, draft.value(o, "V1", RuleKind.WIDTH).orElseThrow().value());
        assertEquals(48, draft.value(o, "V1", RuleKind.SPACING).orElseThrow().value());
    }
}
