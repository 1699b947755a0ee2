/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.apertura.cli.AperturaCommand;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.report.Caution;
import org.apertura.report.json.JsonValue;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code apertura check} on the samples, against the engine run through its API on the same input. */
class CheckCommandTest {

    @TempDir
    Path tmp;

    @Test
    void violationsUnderTheTargetOptionEqualTheEngineApi() throws Exception {
        Path out = tmp.resolve("check");
        Cli.Result r = Cli.run("check", Cli.deck().toString(), Cli.layout().toString(), "--option", "euv_hna", "--out",
                out.toString(), "--threads", "2", "-q");
        // the sample keeps two M1 line ends 14 nm apart, below every option's tip-to-tip rule
        assertEquals(AperturaCommand.EXIT_FINDINGS, r.exit(), r::toString);
        assertTrue(r.out().contains("caution: " + Caution.TEXT), r.out());

        ResolvedDeck deck = new DeckLoader().load(Cli.deck()).orElseThrow();
        LayoutLayers l = LayoutLayers.read(Cli.layout(), deck, Optional.empty());
        RuleSet rules = EngineRules.of(deck, "euv_hna", deck.layers().stream().map(Layer::name).toList());
        List<Violation> vs = new ArrayList<>(new CheckEngine(CheckOptions.threads(1))
                .check(LayoutImpact.select(l.polygons(), rules.layers()), rules.rules()));
        vs.sort(Violation.ORDER);
        double u = deck.databaseUnitNanometres().doubleValue();

        JsonValue.Obj json = Cli.json(out.resolve("report.json"));
        assertEquals("check", Cli.str(json, "kind"));
        List<JsonValue> findings = Cli.items(json, "findings");
        assertEquals(vs.size(), findings.size());
        assertEquals(vs.size(), Cli.num(json, "summary", "open").intValueExact());
        for (int i = 0; i < vs.size(); i++) {
            assertEquals(vs.get(i).ruleId(), Cli.str(findings.get(i), "ruleId"));
            assertEquals(vs.get(i).measured() * u, Cli.num(findings.get(i), "measured").doubleValue(), 1e-9);
            assertEquals(vs.get(i).required() * u, Cli.num(findings.get(i), "required").doubleValue(), 1e-9);
            assertEquals("open", Cli.str(findings.get(i), "status"));
        }
    }

    @Test
    void aCleanLayerExitsZero() throws Exception {
        Cli.Result r = Cli.run("check", Cli.deck().toString(), Cli.layout().toString(), "--option", "euv_le2",
                "--layers", "GATE", "--out", tmp.resolve("gate").toString(), "--format", "json", "-q");
        assertEquals(AperturaCommand.EXIT_CLEAN, r.exit(), r::toString);
        assertTrue(Cli.items(Cli.json(tmp.resolve("gate/report.json")), "findings").isEmpty());
    }

    @Test
    void progressGoesToStandardErrorUnlessQuiet() {
        Cli.Result r = Cli.run("check", Cli.deck().toString(), Cli.layout().toString(), "--option", "euv_le2",
                "--layers", "M1", "--out", tmp.resolve("progress").toString(), "--format", "csv");
        assertTrue(r.err().contains("checking") && r.err().contains("100%"), r.err());
        assertTrue(!r.out().contains("%  about"), "no progress on stdout");
    }
}
