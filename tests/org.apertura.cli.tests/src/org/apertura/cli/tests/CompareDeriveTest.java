/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apertura.cli.AperturaCommand;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.delta.DeckDelta;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.optics.OpticsAnalysis;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.report.json.JsonValue;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code apertura compare} and {@code apertura derive} on the sample deck. */
class CompareDeriveTest {

    @TempDir
    Path tmp;

    @Test
    void compareMatrixAndK1EqualTheMigrationApi() throws Exception {
        Path out = tmp.resolve("cmp");
        Cli.Result r = Cli.run("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--out",
                out.toString());
        assertEquals(AperturaCommand.EXIT_CLEAN, r.exit(), r::toString);
        assertTrue(r.out().contains("masks saved: 2"), r.out());

        ResolvedDeck deck = new DeckLoader().load(Cli.deck()).orElseThrow();
        List<String> layers = MigrationStudy.changedLayers(deck, "euv_le2", "euv_hna");
        List<RuleDelta> deltas = DeckDelta.compare(deck, "euv_le2", "euv_hna", layers);
        List<RuleOptics> optics = new ArrayList<>(OpticsAnalysis.rules(deck, "euv_hna", layers));
        JsonValue.Obj json = Cli.json(out.resolve("report.json"));
        assertEquals("compare", Cli.str(json, "kind"));
        List<JsonValue> matrix = Cli.items(json, "matrix");
        assertEquals(deltas.size(), matrix.size());
        // M1 pitch 20 nm under 0.55 NA: k1 = (20/2) x 0.55 / 13.5 = 0.407 (deck comment; references.md formula)
        JsonValue m1 = matrix.stream().filter(m -> Cli.str(m, "layer").equals("M1") && Cli.str(m, "rule").equals("pitch"))
                .findFirst().orElseThrow();
        double k1 = optics.stream().filter(o -> o.layer().equals("M1") && o.rule().equals("pitch")).findFirst()
                .orElseThrow().k1();
        assertEquals(k1, Cli.num(m1, "k1New").doubleValue(), 1e-12);
        assertEquals(10 * 0.55 / 13.5, k1, 1e-12);
        assertTrue(Cli.items(json, "findings").isEmpty());
    }

    @Test
    void deriveWritesAValidDraftAndNeverOverwritesWithoutForce() throws Exception {
        Path draft = tmp.resolve("drafts/mx3-hna.apdeck");
        Cli.Result r = Cli.run("derive", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--output",
                draft.toString(), "-q");
        assertEquals(AperturaCommand.EXIT_CLEAN, r.exit(), r::toString);
        DeckLoadResult loaded = new DeckLoader().load(draft);
        assertFalse(loaded.hasErrors(), () -> loaded.diagnostics().toString());
        assertTrue(loaded.deck().orElseThrow().option("euv_hna_draft").isPresent());

        Files.writeString(draft, "// kept\n");
        Cli.Result again = Cli.run("derive", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--output",
                draft.toString());
        assertEquals(AperturaCommand.EXIT_USAGE, again.exit(), again::toString);
        assertEquals(draft + ": exists; give --force to replace it", again.err().strip().replace("apertura: ", ""));
        assertEquals("// kept\n", Files.readString(draft));

        Cli.Result forced = Cli.run("derive", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--output",
                draft.toString(), "--force", "-q");
        assertEquals(AperturaCommand.EXIT_CLEAN, forced.exit(), forced::toString);
        assertTrue(Files.readString(draft).contains("option euv_hna_draft"));
        try (var s = Files.list(draft.getParent())) {
            assertEquals(1, s.count(), "no temporary file left beside the draft");
        }
    }
}
