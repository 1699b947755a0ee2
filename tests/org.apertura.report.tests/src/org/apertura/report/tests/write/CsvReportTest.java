/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ValueUnit;
import org.apertura.report.model.Waiver;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.waiver.Waivers;
import org.apertura.report.write.Csv;
import org.apertura.report.write.CsvReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CsvReportTest {

    @TempDir
    Path dir;

    @Test
    void fieldsAreQuotedAsRfc4180Says() throws IOException {
        // RFC 4180 section 2: fields with commas, quotes or line breaks are enclosed in double quotes, inner
        // quotes doubled; records end in CRLF
        assertEquals("plain,\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\",\r\n",
                Csv.record(List.of("plain", "a,b", "say \"hi\"", "two\nlines", "")));
        assertEquals(List.of(List.of("plain", "a,b", "say \"hi\"", "two\nlines", "")),
                Csv.parse("plain,\"a,b\",\"say \"\"hi\"\"\",\"two\nlines\",\r\n"));
        assertThrows(IOException.class, () -> Csv.parse("\"open"));
        assertThrows(IOException.class, () -> Csv.parse("a\"b"));
    }

    @Test
    void findingsRoundTrip() throws IOException {
        ReportData d = ReportFixture.migration(dir);
        Finding tricky = Finding.of("M1.\"odd\",rule", "area", "M1", 503.25, 504, ValueUnit.NM2,
                new NmBox(-0.1, 1e-9, 12345.678901234, 7), Optional.empty(), FindingStatus.NEW);
        List<Finding> all = new java.util.ArrayList<>(d.findings());
        all.add(tricky);
        d = Waivers.apply(d.withFindings(all, List.of()), List.of(
                new Waiver(tricky.ruleId(), "M1", Optional.of(tricky.marker()), Optional.of(tricky.fingerprint()),
                        "reason with, comma and \"quotes\"\nand a line break", "rev", LocalDate.of(2026, 3, 2),
                        Optional.empty())));
        String csv = CsvReport.findings(d.findings());
        assertTrue(csv.startsWith(String.join(",", CsvReport.FINDING_HEADER) + "\r\n"));
        assertEquals(d.findings(), CsvReport.readFindings(csv));
    }

    @Test
    void otherTablesHaveOneRowPerModelRow() throws IOException {
        ReportData d = ReportFixture.migration(dir);
        assertEquals(d.matrix().orElseThrow().rows().size() + 1, Csv.parse(CsvReport.matrix(d.matrix().get().rows())).size());
        List<List<String>> masks = Csv.parse(CsvReport.masks(d.masks().orElseThrow()));
        assertEquals(List.of("*", "", "", "3", "2", "1", "3", "2", "1"), masks.get(masks.size() - 1).subList(0, 9));
        assertEquals(d.headroom().size() + 1, Csv.parse(CsvReport.headroom(d.headroom())).size());
    }

    @Test
    void badFindingsTableIsRefusedWithItsRecord() {
        IOException e = assertThrows(IOException.class,
                () -> CsvReport.readFindings(String.join(",", CsvReport.FINDING_HEADER) + "\r\nx,new\r\n"));
        assertTrue(e.getMessage().startsWith("record 2:"), e.getMessage());
    }
}
