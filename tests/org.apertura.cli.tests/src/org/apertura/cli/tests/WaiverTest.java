/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

import org.apertura.cli.AperturaCommand;
import org.apertura.report.json.JsonValue;
import org.apertura.report.model.EdgePair;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.ValueUnit;
import org.apertura.report.waiver.WaiverFile;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Waivers beside the deck or named on the command line: waived and open findings apart, stale waivers reported. */
class WaiverTest {

    @TempDir
    Path tmp;

    /** The finding of a JSON report entry, as far as waiver matching needs it. */
    private static Finding finding(JsonValue f) {
        List<JsonValue> m = ((JsonValue.Arr) Cli.get(f, "marker")).items();
        NmBox box = new NmBox(n(m.get(0)), n(m.get(1)), n(m.get(2)), n(m.get(3)));
        return new Finding(Cli.str(f, "fingerprint"), Cli.str(f, "ruleId"), Cli.str(f, "ruleKind"), Cli.str(f, "layer"),
                Cli.num(f, "measured").doubleValue(), Cli.num(f, "required").doubleValue(), ValueUnit.NM, box,
                Optional.<EdgePair>empty(), FindingStatus.OPEN, Optional.empty());
    }

    private static double n(JsonValue v) {
        return ((JsonValue.Num) v).value().doubleValue();
    }

    @Test
    void aWaivedFindingShowsAsWaivedOnReRunAndAStaleWaiverIsReported() throws Exception {
        Path deck = Cli.copyDecks(tmp);
        String[] check = {"check", deck.toString(), Cli.layout().toString(), "--option", "euv_hna", "--layers", "M1",
            "--out", tmp.resolve("out").toString(), "--format", "json", "-q"};
        Cli.Result first = Cli.run(check);
        assertEquals(AperturaCommand.EXIT_FINDINGS, first.exit(), first::toString);
        List<JsonValue> findings = Cli.items(Cli.json(tmp.resolve("out/report.json")), "findings");
        assertEquals(2, findings.size(), "the sample's two M1 line ends 14 nm apart");

        // waive one finding in the file beside the deck, and one place that does not exist
        Path waivers = WaiverFile.besideDeck(deck);
        WaiverFile.add(waivers, finding(findings.get(0)), "line ends cut by a later step", "a.reviewer",
                LocalDate.of(2026, 12, 1));
        Finding ghost = Finding.of("M1/end-of-line", "tip-to-tip", "M1", 10, 16, ValueUnit.NM,
                new NmBox(-500, -500, -490, -490), Optional.empty(), FindingStatus.OPEN);
        WaiverFile.add(waivers, ghost, "a place removed from the layout", "a.reviewer", LocalDate.of(2026, 11, 1));

        Cli.Result second = Cli.run(check);
        assertEquals(AperturaCommand.EXIT_FINDINGS, second.exit(), "one finding is still open: " + second);
        assertTrue(second.out().contains("1 finding waived, 1 stale"), second.out());
        assertTrue(second.out().contains("stale waiver meridian-mx3.apdeck.waivers.json:"), second.out());
        JsonValue.Obj json = Cli.json(tmp.resolve("out/report.json"));
        assertEquals(1, Cli.num(json, "summary", "waived").intValueExact());
        assertEquals(1, Cli.num(json, "summary", "staleWaivers").intValueExact());
        JsonValue waived = Cli.items(json, "findings").stream()
                .filter(f -> Cli.str(f, "fingerprint").equals(Cli.str(findings.get(0), "fingerprint"))).findFirst()
                .orElseThrow();
        assertEquals("a.reviewer", Cli.str(waived, "waiver", "author"));
        assertTrue(Cli.items(json, "provenance", "inputs").stream().anyMatch(i -> Cli.str(i, "role").equals("waivers")));

        // waive the other one too: nothing open is left, so the check is clean
        WaiverFile.add(waivers, finding(findings.get(1)), "same", "a.reviewer", LocalDate.of(2026, 12, 1));
        Cli.Result third = Cli.run(check);
        assertEquals(AperturaCommand.EXIT_CLEAN, third.exit(), third::toString);

        // --no-waivers ignores the file beside the deck
        String[] ignoring = java.util.Arrays.copyOf(check, check.length + 1);
        ignoring[check.length] = "--no-waivers";
        assertEquals(AperturaCommand.EXIT_FINDINGS, Cli.run(ignoring).exit());
    }

    @Test
    void waivedBreaksDoNotFailAMigration() throws Exception {
        Path deck = Cli.copyDecks(tmp);
        Path out = tmp.resolve("mig");
        String[] migrate = {"migrate", deck.toString(), Cli.layout().toString(), "--from", "euv_le2", "--to", "duv_le2",
            "--layers", "GATE", "--out", out.toString(), "--format", "json", "-q"};
        Cli.Result first = Cli.run(migrate);
        List<JsonValue> news = Cli.items(Cli.json(out.resolve("report.json")), "findings").stream()
                .filter(f -> Cli.str(f, "status").equals("new")).toList();
        assertTrue(!news.isEmpty() && first.exit() == AperturaCommand.EXIT_FINDINGS, first::toString);
        Path file = tmp.resolve("review.waivers.json");
        for (JsonValue f : news) {
            WaiverFile.add(file, finding(f), "accepted for the pilot", "a.reviewer", LocalDate.of(2026, 12, 1));
        }
        String[] withFile = java.util.Arrays.copyOf(migrate, migrate.length + 2);
        withFile[migrate.length] = "--waivers";
        withFile[migrate.length + 1] = file.toString();
        Cli.Result second = Cli.run(withFile);
        assertEquals(AperturaCommand.EXIT_CLEAN, second.exit(), second::toString);
        assertTrue(second.out().contains(news.size() + " finding" + (news.size() == 1 ? "" : "s") + " waived, 0 stale"),
                second.out());
        assertTrue(Files.exists(out.resolve("study.apstudy")));
    }
}
