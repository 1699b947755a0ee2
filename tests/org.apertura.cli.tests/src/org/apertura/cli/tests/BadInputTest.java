/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.apertura.cli.AperturaCommand;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReader;
import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Bad input ends with one line naming the file and the position, exit code 2, and nothing written. */
class BadInputTest {

    @TempDir
    Path tmp;

    private Path out() {
        return tmp.resolve("out");
    }

    /** Runs, expects exit code 2 with one line on stderr and no output folder, and returns that line. */
    private String fails(String... args) {
        String[] all = Arrays.copyOf(args, args.length + 3);
        all[args.length] = "--out";
        all[args.length + 1] = out().toString();
        all[args.length + 2] = "--quiet";
        Cli.Result r = Cli.run(all);
        assertEquals(AperturaCommand.EXIT_USAGE, r.exit(), r::toString);
        String err = r.err().strip();
        assertFalse(err.contains("\n"), () -> "one line expected: " + err);
        assertTrue(err.startsWith("apertura: "), err);
        assertFalse(Files.exists(out()), "nothing written on bad input");
        assertEquals("", r.out());
        return err.substring("apertura: ".length());
    }

    @Test
    void missingDeckFile() {
        Path missing = tmp.resolve("no-such.apdeck");
        assertEquals(missing + ": no such deck file",
                fails("migrate", missing.toString(), Cli.layout().toString(), "--from", "euv_le2", "--to", "euv_hna"));
    }

    @Test
    void missingLayoutFile() {
        Path missing = tmp.resolve("no-such.gds");
        assertEquals(missing + ": no such layout file",
                fails("check", Cli.deck().toString(), missing.toString(), "--option", "euv_le2"));
    }

    @Test
    void malformedDeckNamesLineAndColumn() throws Exception {
        Path deck = Cli.copyDecks(tmp);
        // break line 23 ("	width 20 nm" of ACT): a unit the language does not know
        var lines = Files.readAllLines(deck);
        int at = lines.indexOf("on ACT {") + 1;
        lines.set(at, "\twidth 20 furlongs");
        Files.write(deck, lines);
        DeckDiagnostic expected = new DeckLoader().load(deck).errors().get(0);
        String msg = fails("migrate", deck.toString(), Cli.layout().toString(), "--from", "euv_le2", "--to", "euv_hna");
        assertTrue(msg.startsWith(deck + ":" + expected.line() + ":" + expected.column() + ": "), msg);
        assertEquals(at + 1, expected.line(), "the loader places the error on the broken line");
    }

    @Test
    void corruptLayoutNamesTheByteOffset() throws Exception {
        byte[] good = Files.readAllBytes(Cli.layout());
        Path bad = tmp.resolve("cut.gds");
        Files.write(bad, Arrays.copyOf(good, good.length / 2 + 3)); // cut inside a record
        GdsFormatException expected = assertThrows(GdsFormatException.class, () -> GdsReader.read(bad));
        String msg = fails("migrate", Cli.deck().toString(), bad.toString(), "--from", "euv_le2", "--to", "euv_hna");
        assertTrue(expected.offset() >= 0, expected::getMessage);
        assertTrue(msg.contains("byte " + expected.offset()), msg);
        assertTrue(msg.startsWith(bad.toString()), msg);
    }

    @Test
    void unknownOptionListsTheValidOnes() {
        String msg = fails("migrate", Cli.deck().toString(), Cli.layout().toString(), "--from", "euv_le2", "--to",
                "euv_hyper");
        assertEquals(Cli.deck() + ": no option 'euv_hyper' in deck 'Meridian MX3' (options: duv_le2, euv_se, euv_le2, "
                + "euv_hna)", msg);
    }

    @Test
    void withProgressTheErrorIsTheLastLineOfItsOwn() throws Exception {
        Path bad = tmp.resolve("cut.gds");
        Files.write(bad, Arrays.copyOf(Files.readAllBytes(Cli.layout()), 100));
        Cli.Result r = Cli.run("check", Cli.deck().toString(), bad.toString(), "--option", "euv_le2", "--out",
                out().toString());
        assertEquals(AperturaCommand.EXIT_USAGE, r.exit(), r::toString);
        String[] lines = r.err().strip().split("\n");
        assertTrue(lines[lines.length - 1].startsWith("apertura: " + bad + ": byte "), r.err());
        assertTrue(lines.length >= 2 && lines[0].startsWith("reading the deck"), r.err());
    }

    @Test
    void unknownLayerListsTheValidOnes() {
        String msg = fails("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--layers", "M9");
        assertTrue(msg.contains("no layer 'M9'") && msg.contains("(layers: NW, ACT, GATE, CT, M1, V1, M2)"), msg);
    }

    @Test
    void unknownFormatAndMissingOptionAreUsageErrors() {
        assertTrue(fails("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--format", "pdf")
                .contains("unknown report format 'pdf'"));
        Cli.Result r = Cli.run("migrate", Cli.deck().toString(), Cli.layout().toString(), "--to", "euv_hna");
        assertEquals(AperturaCommand.EXIT_USAGE, r.exit());
        assertTrue(r.err().contains("--from"), r.err());
    }

    @Test
    void aFolderThatIsNotAReportIsNeverReplaced() throws Exception {
        Files.createDirectories(out());
        Files.writeString(out().resolve("notes.txt"), "mine");
        Cli.Result r = Cli.run("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--out",
                out().toString());
        assertEquals(AperturaCommand.EXIT_USAGE, r.exit(), r::toString);
        assertEquals("mine", Files.readString(out().resolve("notes.txt")));
        assertEquals(1, Files.list(out()).count());
    }

    @Test
    void aFailedRunLeavesThePreviousReportWhole() throws Exception {
        Cli.Result ok = Cli.run("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "euv_hna", "--out",
                out().toString(), "--format", "json");
        assertEquals(AperturaCommand.EXIT_CLEAN, ok.exit(), ok::toString);
        String before = Files.readString(out().resolve("report.json"));
        Cli.Result bad = Cli.run("compare", Cli.deck().toString(), "--from", "euv_le2", "--to", "nope", "--out",
                out().toString(), "--format", "json");
        assertEquals(AperturaCommand.EXIT_USAGE, bad.exit());
        assertEquals(before, Files.readString(out().resolve("report.json")));
    }

    @Test
    void malformedWaiverFileNamesLineAndColumn() throws Exception {
        Path w = tmp.resolve("w.json");
        Files.writeString(w, "{\n  \"format\": \"apertura-waivers\",\n  \"version\": 1,\n  \"waivers\": [ 12 ]\n}\n");
        String msg = fails("check", Cli.deck().toString(), Cli.layout().toString(), "--option", "euv_le2", "--waivers",
                w.toString());
        assertTrue(msg.startsWith(w + ":4:"), msg);
    }
}
