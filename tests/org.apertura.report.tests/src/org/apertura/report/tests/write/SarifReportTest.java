/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.write;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Files;
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
import org.apertura.report.write.SarifReport;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** SARIF output against the published OASIS SARIF 2.1.0 JSON schema (sarif-schema-2.1.0.json, draft-04). */
class SarifReportTest {

    @TempDir
    Path dir;

    @BeforeEach
    void schemaPresent() {
        Assumptions.assumeTrue(Files.exists(Schemas.sarifSchema()), "shared/data/sarif is missing");
    }

    static String sarif(ReportData d) {
        StringWriter w = new StringWriter();
        SarifReport.write(d, w);
        return w.toString();
    }

    @Test
    void migrationWithAWaiverIsValidSarif210() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding first = d.findings().stream().filter(f -> f.status() == FindingStatus.NEW).findFirst().orElseThrow();
        d = Waivers.apply(d, List.of(Waiver.forFinding(first, "reviewed: dummy fill", "rev", LocalDate.of(2026, 3, 1))));
        String text = sarif(d);
        assertEquals(List.of(), Schemas.validateDraft4(Schemas.sarifSchema(), text));

        JsonNode run = Schemas.tree(text).get("runs").get(0);
        assertEquals("2.1.0", Schemas.tree(text).get("version").asText());
        assertEquals("Apertura", run.get("tool").get("driver").get("name").asText());
        JsonNode results = run.get("results");
        assertEquals(d.findings().size(), results.size());
        int suppressed = 0;
        for (int i = 0; i < results.size(); i++) {
            JsonNode r = results.get(i);
            Finding f = d.findings().get(i);
            assertEquals(f.ruleId(), r.get("ruleId").asText());
            assertEquals(f.ruleId(), run.get("tool").get("driver").get("rules").get(r.get("ruleIndex").asInt())
                    .get("id").asText());
            JsonNode loc = r.get("locations").get(0);
            assertEquals(f.marker().x1(), loc.get("properties").get("markerNm").get(0).doubleValue());
            assertEquals(f.layer(), loc.get("logicalLocations").get(0).get("name").asText());
            assertTrue(loc.get("physicalLocation").get("artifactLocation").get("uri").asText().endsWith(".gds"));
            assertEquals(f.fingerprint(), r.get("partialFingerprints").get(SarifReport.FINGERPRINT_KEY).asText());
            String expectedState = switch (f.status()) {
            case NEW -> "new";
            case PERSISTING -> "unchanged";
            case FIXED -> "absent";
            case OPEN -> null;
            };
            assertEquals(expectedState, r.has("baselineState") ? r.get("baselineState").asText() : null);
            assertEquals(f.status() == FindingStatus.FIXED ? "none" : "error", r.get("level").asText());
            if (r.has("suppressions")) {
                suppressed++;
                assertEquals("reviewed: dummy fill", r.get("suppressions").get(0).get("justification").asText());
            }
        }
        assertEquals(1, suppressed);
        assertEquals(Caution.TEXT, run.get("properties").get("caution").asText());
        assertEquals(d.provenance().input("deck").orElseThrow().sha256(),
                run.get("artifacts").get(0).get("hashes").get("sha-256").asText());
    }

    @Test
    void plainCheckIsValidSarif210() throws Exception {
        assertEquals(List.of(), Schemas.validateDraft4(Schemas.sarifSchema(), sarif(ReportFixture.check(dir))));
    }

    @Test
    void theValidatorRejectsBrokenSarif() throws Exception {
        String text = sarif(ReportFixture.migration(dir));
        // the schema demands version "2.1.0" and a message on every result; make sure violations are caught
        assertFalse(Schemas.validateDraft4(Schemas.sarifSchema(), text.replace("\"version\": \"2.1.0\"",
                "\"version\": \"2.0.0\"")).isEmpty());
        assertFalse(Schemas.validateDraft4(Schemas.sarifSchema(), text.replaceFirst("\"level\": \"error\"",
                "\"level\": \"fatal\"")).isEmpty());
    }
}
