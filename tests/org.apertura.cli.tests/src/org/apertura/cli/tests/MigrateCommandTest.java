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
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.apertura.cli.AperturaCommand;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.model.Study;
import org.apertura.migrate.persist.StudyResources;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.report.Caution;
import org.apertura.report.json.JsonValue;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's first command, run in-process on the committed samples, and its output checked against the
 * migration API run on the same input.
 */
class MigrateCommandTest {

    @TempDir
    static Path tmp;

    private static Cli.Result readme;
    private static Path folder;
    private static MigrationResult expected;
    private static double dbuNm;

    @BeforeAll
    static void runTheReadmeCommand() {
        folder = tmp.resolve("readme");
        readme = Cli.run("migrate", Cli.deck().toString(), Cli.layout().toString(), "--from", "euv_le2", "--to",
                "euv_hna", "--out", folder.toString(), "--quiet");
        ResolvedDeck deck = new DeckLoader().load(Cli.deck()).orElseThrow();
        dbuNm = deck.databaseUnitNanometres().doubleValue();
        try {
            expected = MigrationStudy.run(deck, Cli.layout(), "euv_le2", "euv_hna", Set.of(), MigrationOptions.defaults());
        } catch (java.io.IOException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void exitsCleanWithTheSummaryTableAndTheReportFolder() {
        // the sample is drawn for euv_le2: moving to euv_hna breaks nothing, so the exit code is 0
        assertEquals(AperturaCommand.EXIT_CLEAN, readme.exit(), readme::toString);
        String out = readme.out();
        assertTrue(out.contains("Migration of Meridian MX3: euv_le2 -> euv_hna"), out);
        assertTrue(out.contains("masks saved: 2"), out);
        assertTrue(out.contains("open breaks (new violations not waived): 0"), out);
        assertTrue(out.contains("caution: " + Caution.TEXT), out);
        assertTrue(out.contains("reports: " + folder + " ("), out);
        assertEquals("", readme.err(), "quiet mode prints nothing on stderr");
    }

    @Test
    void writesEveryReportTheSummaryAndTheStudy() throws Exception {
        for (String f : List.of("index.html", "report.json", "report.sarif", "findings.csv", "matrix.csv",
                "headroom.csv", "masks.csv", "provenance.csv", "summary.txt", "study.apstudy")) {
            assertTrue(Files.size(folder.resolve(f)) > 0, f);
        }
        assertEquals(readme.out().substring(0, readme.out().indexOf("reports: ")),
                Files.readString(folder.resolve("summary.txt")));
        assertTrue(Files.readString(folder.resolve("index.html")).contains("qualified rule decks"));
        // nothing temporary is left beside the folder
        try (var s = Files.list(tmp)) {
            assertEquals(List.of("readme"), s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith(".")
                    || n.equals("readme")).sorted().toList());
        }
    }

    @Test
    void jsonCountsEqualTheMigrationApi() throws Exception {
        JsonValue.Obj json = Cli.json(folder.resolve("report.json"));
        assertEquals("migration", Cli.str(json, "kind"));
        assertEquals(expected.impact().total().newCount(), Cli.num(json, "summary", "new").intValueExact());
        assertEquals(expected.impact().total().fixed(), Cli.num(json, "summary", "fixed").intValueExact());
        assertEquals(expected.impact().total().persisting(), Cli.num(json, "summary", "persisting").intValueExact());
        assertEquals(expected.impact().changes().size(), Cli.items(json, "findings").size());
        assertEquals(expected.deltas().size(), Cli.items(json, "matrix").size());
    }

    @Test
    void jsonValuesEqualTheMigrationApiInNanometres() throws Exception {
        JsonValue.Obj json = Cli.json(folder.resolve("report.json"));
        // the persisting tip-to-tip findings: engine values in database units times the deck's 0.25 nm unit
        List<ViolationChange> persisting = expected.impact().withStatus(ImpactStatus.PERSISTING);
        List<JsonValue> found = Cli.items(json, "findings").stream()
                .filter(f -> Cli.str(f, "status").equals("persisting")).toList();
        assertEquals(persisting.size(), found.size());
        for (int i = 0; i < found.size(); i++) {
            var v = persisting.get(i).target().orElseThrow();
            assertEquals(v.measured() * dbuNm, Cli.num(found.get(i), "measured").doubleValue(), 1e-9);
            assertEquals(v.required() * dbuNm, Cli.num(found.get(i), "required").doubleValue(), 1e-9);
            assertEquals(v.marker().minX() * dbuNm, Cli.num(((JsonValue.Arr) Cli.get(found.get(i), "marker"))
                    .items().get(0)).doubleValue(), 1e-9);
        }
        // every matrix value is the deck delta's value
        List<JsonValue> matrix = Cli.items(json, "matrix");
        for (int i = 0; i < matrix.size(); i++) {
            RuleDelta d = expected.deltas().get(i);
            assertEquals(d.rule(), Cli.str(matrix.get(i), "rule"));
            if (d.oldValue().isPresent()) {
                assertEquals(d.oldValue().getAsDouble(), Cli.num(matrix.get(i), "oldValue").doubleValue(), 1e-9);
            }
            if (d.newValue().isPresent()) {
                assertEquals(d.newValue().getAsDouble(), Cli.num(matrix.get(i), "newValue").doubleValue(), 1e-9);
            }
        }
        // shrink headroom of V1 as a whole, uniform, and masks saved
        JsonValue v1 = Cli.items(json, "headroom").stream()
                .filter(h -> Cli.str(h, "layer").equals("V1") && Cli.str(h, "rule").equals("*")).findFirst().orElseThrow();
        assertEquals(expected.layerHeadroom("V1", ShrinkScope.UNIFORM).factor(), Cli.num(v1, "factor").doubleValue(), 1e-12);
        int saved = 0;
        for (JsonValue row : Cli.items(json, "masks", "rows")) {
            saved += Cli.num(row, "oldMasks").intValueExact() - Cli.num(row, "newMasks").intValueExact();
        }
        assertEquals(expected.masks().masksSaved(), saved);
    }

    @Test
    void histogramsCarryTheRulesOfBothOptions() throws Exception {
        JsonValue.Obj json = Cli.json(folder.resolve("report.json"));
        JsonValue m2 = Cli.items(json, "histograms").stream()
                .filter(h -> Cli.str(h, "layer").equals("M2") && Cli.str(h, "quantity").equals("pitch")).findFirst()
                .orElseThrow();
        // the deck: M2 pitch 24 nm under euv_le2, 22 nm under euv_hna; the sample draws M2 at the euv_le2 pitch
        assertEquals(24.0, Cli.num(m2, "oldRule").doubleValue(), 0);
        assertEquals(22.0, Cli.num(m2, "newRule").doubleValue(), 0);
        List<JsonValue> values = Cli.items(m2, "values");
        assertTrue(values.size() > 100, "values: " + values.size());
        assertEquals(24.0, values.stream().mapToDouble(v -> ((JsonValue.Num) v).value().doubleValue()).min()
                .orElseThrow(), 0);
    }

    @Test
    void provenanceRecordsHashesOptionsVersionAndCommand() throws Exception {
        JsonValue.Obj json = Cli.json(folder.resolve("report.json"));
        assertEquals(Cli.VERSION, Cli.str(json, "provenance", "toolVersion"));
        assertEquals("euv_le2", Cli.str(json, "provenance", "sourceOption"));
        assertEquals("euv_hna", Cli.str(json, "provenance", "targetOption"));
        Map<String, String> hashes = new HashMap<>();
        for (JsonValue in : Cli.items(json, "provenance", "inputs")) {
            hashes.put(Cli.str(in, "role"), Cli.str(in, "sha256"));
        }
        assertEquals(org.apertura.report.model.InputFile.hash("deck", Cli.deck()).sha256(), hashes.get("deck"));
        assertEquals(org.apertura.report.model.InputFile.hash("layout", Cli.layout()).sha256(), hashes.get("layout"));
        // the sample deck imports its layer table: that file is an input too
        java.nio.file.Path layers = Cli.deck().resolveSibling("meridian-layers.apdeck");
        assertEquals(org.apertura.report.model.InputFile.hash("deck import", layers).sha256(), hashes.get("deck import"));
        assertEquals("migrate", Cli.str(((JsonValue.Arr) Cli.get(json, "provenance", "command")).items().get(0)));
    }

    @Test
    void savedStudyHoldsTheSameResult() throws Exception {
        Study s = StudyResources.load(folder.resolve("study.apstudy"));
        assertEquals(expected.impact().changes().size(), s.getViolations().size());
        assertEquals(expected.masks().masksSaved(), s.getMasksSaved());
        assertEquals(List.copyOf(expected.layers()), List.copyOf(s.getLayers()));
    }

    @Test
    void renderOfTheSavedStudyGivesTheSameFindingsAndFingerprints() throws Exception {
        Path again = tmp.resolve("rendered");
        Cli.Result r = Cli.run("render", Cli.deck().toString(), folder.resolve("study.apstudy").toString(), "--out",
                again.toString(), "--format", "json,csv");
        assertEquals(AperturaCommand.EXIT_CLEAN, r.exit(), r::toString);
        assertTrue(r.out().contains("masks saved: 2"), r.out());
        List<JsonValue> a = Cli.items(Cli.json(folder.resolve("report.json")), "findings");
        List<JsonValue> b = Cli.items(Cli.json(again.resolve("report.json")), "findings");
        assertEquals(a.size(), b.size());
        for (int i = 0; i < a.size(); i++) {
            assertEquals(Cli.str(a.get(i), "fingerprint"), Cli.str(b.get(i), "fingerprint"));
            assertEquals(Cli.num(a.get(i), "measured"), Cli.num(b.get(i), "measured"));
        }
        assertFalse(Files.exists(again.resolve("index.html")), "only the chosen formats are written");
    }

    @Test
    void breaksGiveExitCodeOne() {
        // drawn for 0.33-NA EUV LE2 (20 nm M1 pitch), the block breaks under 193i LE2 (42 nm M1 pitch)
        Path out = tmp.resolve("breaks");
        Cli.Result r = Cli.run("migrate", Cli.deck().toString(), Cli.layout().toString(), "--from", "euv_le2", "--to",
                "duv_le2", "--layers", "M1", "--out", out.toString(), "-q", "--format", "json");
        assertEquals(AperturaCommand.EXIT_FINDINGS, r.exit(), r::toString);
        assertFalse(r.out().contains("open breaks (new violations not waived): 0"), r.out());
        assertTrue(Files.exists(out.resolve("report.json")));
        assertTrue(Optional.of(out.resolve("study.apstudy")).filter(Files::exists).isPresent());
    }
}
