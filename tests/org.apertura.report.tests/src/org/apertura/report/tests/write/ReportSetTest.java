/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.stream.Stream;

import org.apertura.report.model.ReportData;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.write.ReportFormat;
import org.apertura.report.write.ReportSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportSetTest {

    @TempDir
    Path dir;

    @Test
    void writesEveryFormatAndReplacesTheFolderWhole() throws Exception {
        Path out = dir.resolve("out").resolve("report");
        ReportData d = ReportFixture.migration(dir);
        List<String> names = ReportSet.write(out, d, EnumSet.allOf(ReportFormat.class));
        assertEquals(List.of("index.html", "report.json", "apertura-report.schema.json", "report.sarif", "findings.csv",
                "matrix.csv", "headroom.csv", "masks.csv", "stale-waivers.csv", "provenance.csv"), names);
        for (String n : names) {
            assertTrue(Files.size(out.resolve(n)) > 0, n);
        }
        // a second run with fewer formats leaves nothing of the first behind
        ReportSet.write(out, ReportFixture.check(dir), EnumSet.of(ReportFormat.JSON));
        try (Stream<Path> s = Files.list(out)) {
            assertEquals(List.of("apertura-report.schema.json", "report.json"),
                    s.map(p -> p.getFileName().toString()).sorted().toList());
        }
        try (Stream<Path> s = Files.list(out.getParent())) {
            assertEquals(List.of("report"), s.map(p -> p.getFileName().toString()).toList(), "no temporary folder left");
        }
        assertTrue(Files.readString(out.resolve("report.json")).contains("\"kind\": \"check\""));
    }

    @Test
    void formatListsParse() {
        assertEquals(EnumSet.of(ReportFormat.HTML, ReportFormat.SARIF), ReportFormat.parseList("html, SARIF"));
        assertEquals(EnumSet.allOf(ReportFormat.class), ReportFormat.parseList("all"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ReportFormat.parseList("pdf"));
        assertTrue(e.getMessage().contains("'pdf'"));
        assertFalse(ReportFormat.parseList("csv").contains(ReportFormat.HTML));
    }
}
