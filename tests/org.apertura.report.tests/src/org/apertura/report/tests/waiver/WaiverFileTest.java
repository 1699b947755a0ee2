/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.waiver;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.waiver.WaiverFile;
import org.apertura.report.waiver.WaiverFileException;
import org.apertura.report.waiver.Waivers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WaiverFileTest {

    private static final LocalDate DAY = LocalDate.of(2026, 3, 2);

    @TempDir
    Path dir;

    private static final String HAND_WRITTEN = """
            {
              "format": "apertura-waivers",
              "version": 1,
              "waivers": [
                { "rule": "M1.S.1", "layer": "M1", "box": [5000, 5000, 5018, 5400],
                  "reason": "old place, kept on purpose", "author": "j.doe", "date": "2025-12-24",
                  "note": "hand-written, odd spacing \u00e9"   }
              ]
            }
            """;

    @Test
    void fileSitsBesideTheDeck() {
        assertEquals(dir.resolve("metal.deck.waivers.json"), WaiverFile.besideDeck(dir.resolve("metal.deck")));
    }

    @Test
    void addCreatesAFileThatReadsBackAndMatches() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding f = d.findings().stream().filter(x -> x.status() == FindingStatus.NEW).findFirst().orElseThrow();
        Path file = WaiverFile.besideDeck(dir.resolve("fixture.deck"));
        Waiver added = WaiverFile.add(file, f, "dummy fill \"A\"", "rev", DAY);
        List<Waiver> read = WaiverFile.read(file);
        assertEquals(1, read.size());
        assertEquals(added, read.get(0));
        ReportData w = Waivers.apply(d, read);
        assertEquals(1, w.waivedFindings().size());
        assertEquals(f.fingerprint(), w.waivedFindings().get(0).fingerprint());
        // adding the same finding again changes nothing
        byte[] before = Files.readAllBytes(file);
        assertEquals(added, WaiverFile.add(file, f, "again", "rev", DAY));
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void addKeepsEverythingTheUserWrote() throws Exception {
        Path file = dir.resolve("d.waivers.json");
        Files.writeString(file, HAND_WRITTEN);
        ReportData d = ReportFixture.migration(dir);
        List<Finding> news = d.findings().stream().filter(x -> x.status() == FindingStatus.NEW).toList();
        WaiverFile.add(file, news.get(0), "first", "rev", DAY);
        WaiverFile.add(file, news.get(1), "second", "rev", DAY);
        String text = Files.readString(file);
        int cut = HAND_WRITTEN.indexOf("\"   }") + 5;
        // every character of the user's text up to the end of their last entry, and after the array, is kept
        assertTrue(text.startsWith(HAND_WRITTEN.substring(0, cut)), text);
        assertTrue(text.endsWith(HAND_WRITTEN.substring(HAND_WRITTEN.indexOf("\n  ]"))), text);
        List<Waiver> read = WaiverFile.read(file);
        assertEquals(List.of("old place, kept on purpose", "first", "second"), read.stream().map(Waiver::reason).toList());
        assertEquals(Optional.of(new NmBox(5000, 5000, 5018, 5400)), read.get(0).box());
        assertEquals(Optional.of("d.waivers.json:5"), read.get(0).origin());
        ReportData w = Waivers.apply(d, read);
        assertEquals(2, w.waivedFindings().size());
        assertEquals(List.of(read.get(0)), w.staleWaivers());
    }

    @Test
    void addToAnEmptyListAndWithCrlf() throws Exception {
        Path file = dir.resolve("e.waivers.json");
        Files.writeString(file, "{\"format\":\"apertura-waivers\",\"version\":1,\"waivers\":[]}\r\n");
        Finding f = ReportFixture.migration(dir).findings().get(0);
        WaiverFile.add(file, f, "r", "a", DAY);
        assertEquals(1, WaiverFile.read(file).size());
        String crlf = HAND_WRITTEN.replace("\n", "\r\n");
        Files.writeString(file, crlf);
        WaiverFile.add(file, f, "r", "a", DAY);
        String text = Files.readString(file);
        assertTrue(text.startsWith(crlf.substring(0, crlf.indexOf("\"   }") + 5) + ",\r\n    {\r\n"), text);
        assertEquals(2, WaiverFile.read(file).size());
    }

    @Test
    void badFilesNameFileLineAndProblem() throws Exception {
        assertBad("{\n  \"format\": \"apertura-waivers\",\n  \"version\": 1\n  \"waivers\": []\n}", 4, "expected ','");
        assertBad("{\"format\": \"other\", \"version\": 1, \"waivers\": []}", 1, "\"format\"");
        assertBad("{\"format\": \"apertura-waivers\", \"version\": 2, \"waivers\": []}", 1, "version");
        assertBad(HAND_WRITTEN.replace("\"reason\"", "\"reson\""), 6, "unknown member \"reson\"");
        assertBad(HAND_WRITTEN.replace("2025-12-24", "24.12.2025"), 6, "YYYY-MM-DD");
        assertBad(HAND_WRITTEN.replace("2025-12-24", "2025-02-30"), 6, "YYYY-MM-DD");
        assertBad(HAND_WRITTEN.replace("\"box\": [5000, 5000, 5018, 5400],", ""), 5, "needs \"box\" or \"fingerprint\"");
        assertBad(HAND_WRITTEN.replace("[5000, 5000, 5018, 5400]", "[5000, 5000, 5018]"), 5, "4 numbers");
        assertBad(HAND_WRITTEN.replace("\"j.doe\"", "\"  \""), 6, "must not be blank");
        assertBad(HAND_WRITTEN.replace("\"M1\"", "7"), 5, "\"layer\" must be a string");
        assertBad("[]", 1, "must be a JSON object");
        assertBad("", 1, "unexpected end");
    }

    @Test
    void invalidUtf8IsRefusedWithItsOffset() throws Exception {
        Path file = dir.resolve("u.waivers.json");
        byte[] good = HAND_WRITTEN.getBytes(StandardCharsets.UTF_8);
        byte[] bad = good.clone();
        int at = HAND_WRITTEN.indexOf("j.doe");
        bad[at] = (byte) 0xC3;
        bad[at + 1] = (byte) 0x28; // not a continuation byte
        Files.write(file, bad);
        WaiverFileException e = assertThrows(WaiverFileException.class, () -> WaiverFile.read(file));
        assertEquals(6, e.line());
        assertTrue(e.getMessage().contains("byte offset " + at), e.getMessage());
    }

    @Test
    void aBadFileIsNeverRewritten() throws Exception {
        Path file = dir.resolve("b.waivers.json");
        String broken = HAND_WRITTEN.replace("\"layer\": \"M1\",", "\"layer\": \"M1\"");
        Files.writeString(file, broken);
        Finding f = ReportFixture.migration(dir).findings().get(0);
        assertThrows(WaiverFileException.class, () -> WaiverFile.add(file, f, "r", "a", DAY));
        assertEquals(broken, Files.readString(file));
        try (Stream<Path> s = Files.list(dir)) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary file left");
        }
        assertThrows(IllegalArgumentException.class,
                () -> WaiverFile.add(dir.resolve("n.waivers.json"), f, " ", "a", DAY));
        assertThrows(NoSuchFileException.class, () -> WaiverFile.read(dir.resolve("none.json")));
        assertEquals(List.of(), WaiverFile.readIfPresent(dir.resolve("none.json")));
    }

    private void assertBad(String text, int line, String problem) throws Exception {
        Path file = dir.resolve("bad.waivers.json");
        Files.writeString(file, text);
        WaiverFileException e = assertThrows(WaiverFileException.class, () -> WaiverFile.read(file));
        assertEquals(file, e.file());
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.problem().contains(problem), e.getMessage());
        assertTrue(e.getMessage().startsWith(file + ":" + line + ":"), e.getMessage());
    }
}
