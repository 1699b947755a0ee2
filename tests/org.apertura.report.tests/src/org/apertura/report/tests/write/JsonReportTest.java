/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import org.apertura.report.Caution;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.tests.Schemas;
import org.apertura.report.waiver.Waivers;
import org.apertura.report.write.JsonReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class JsonReportTest {

    @TempDir
    Path dir;

    static String json(ReportData d) {
        StringWriter w = new StringWriter();
        JsonReport.write(d, w, true);
        return w.toString();
    }

    static List<String> validate(String json) throws IOException {
        try (InputStream schema = JsonReport.openSchema()) {
            return Schemas.validateDraft7(schema, json);
        }
    }

    @Test
    void migrationReportIsValidAgainstItsSchema() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding first = d.findings().get(0);
        d = Waivers.apply(d, List.of(Waiver.forFinding(first, "known", "rev", LocalDate.of(2026, 3, 1))));
        String text = json(d);
        assertEquals(List.of(), validate(text));
    }

    @Test
    void plainCheckHasNoMatrixAndIsValid() throws Exception {
        String text = json(ReportFixture.check(dir));
        assertEquals(List.of(), validate(text));
        JsonNode n = Schemas.tree(text);
        assertFalse(n.has("matrix"));
        assertFalse(n.has("masks"));
        assertEquals("check", n.get("kind").asText());
        assertTrue(n.get("provenance").get("targetOption").isNull());
    }

    @Test
    void schemaRejectsAReportWithoutCautionOrWithABadStatus() throws Exception {
        String text = json(ReportFixture.migration(dir));
        // the validator must be able to fail: break the document in two ways
        assertFalse(validate(text.replaceFirst("\"caution\": \"[^\"]*\",", "")).isEmpty());
        assertFalse(validate(text.replaceFirst("\"status\": \"new\"", "\"status\": \"broken\"")).isEmpty());
    }

    @Test
    void numbersAndCountsAreTheModelsValues() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        JsonNode n = Schemas.tree(json(d));
        assertEquals(Caution.TEXT, n.get("caution").asText());
        JsonNode fs = n.get("findings");
        assertEquals(d.findings().size(), fs.size());
        for (int i = 0; i < fs.size(); i++) {
            Finding f = d.findings().get(i);
            assertEquals(f.measured(), fs.get(i).get("measured").doubleValue());
            assertEquals(f.required(), fs.get(i).get("required").doubleValue());
            assertEquals(f.marker().x2(), fs.get(i).get("marker").get(2).doubleValue());
            assertEquals(f.fingerprint(), fs.get(i).get("fingerprint").asText());
        }
        JsonNode s = n.get("summary");
        assertEquals(ReportFixture.M1_NEW, s.get("new").asInt());
        assertEquals(ReportFixture.M2_FIXED, s.get("fixed").asInt());
        assertEquals(ReportFixture.M1_PERSISTING + ReportFixture.M2_PERSISTING, s.get("persisting").asInt());
        assertEquals(d.count(FindingStatus.NEW), s.get("new").asLong());
        // k1 of a 36 nm pitch at NA 0.33, 13.5 nm: 0.44 (references.md section 2, derived)
        JsonNode pitch = n.get("matrix").get(2);
        assertEquals("pitch", pitch.get("rule").asText());
        assertEquals(0.44, pitch.get("k1Old").doubleValue(), 1e-12);
        assertEquals(1, n.get("masks").get("totals").get("masksSaved").asInt());
        assertEquals(d.provenance().input("layout").orElseThrow().sha256(),
                n.get("provenance").get("inputs").get(1).get("sha256").asText());
    }
}
