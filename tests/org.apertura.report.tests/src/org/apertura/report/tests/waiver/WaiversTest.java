/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.waiver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;
import org.apertura.report.tests.ReportFixture;
import org.apertura.report.waiver.Waivers;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WaiversTest {

    private static final LocalDate DAY = LocalDate.of(2026, 3, 2);

    @TempDir
    Path dir;

    private static Finding first(ReportData d, FindingStatus s) {
        return d.findings().stream().filter(f -> f.status() == s).findFirst().orElseThrow();
    }

    @Test
    void matchesByBoxOrByFingerprint() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding a = first(d, FindingStatus.NEW);
        Finding b = first(d, FindingStatus.PERSISTING);
        Waiver byBox = new Waiver(a.ruleId(), a.layer(), Optional.of(a.marker()), Optional.empty(), "r", "x", DAY,
                Optional.empty());
        Waiver byFp = new Waiver(b.ruleId(), b.layer(), Optional.empty(), Optional.of(b.fingerprint()), "r", "x", DAY,
                Optional.empty());
        ReportData w = Waivers.apply(d, List.of(byBox, byFp));
        assertEquals(2, w.waivedFindings().size());
        assertEquals(d.findings().stream().filter(f -> f.status().present()).count() - 2, w.openFindings().size());
        assertEquals(List.of(), w.staleWaivers());
    }

    @Test
    void ruleAndLayerMustAgree() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding a = first(d, FindingStatus.NEW);
        Waiver otherRule = new Waiver("M1.W.1", a.layer(), Optional.of(a.marker()), Optional.of(a.fingerprint()), "r",
                "x", DAY, Optional.empty());
        Waiver otherLayer = new Waiver(a.ruleId(), "M2", Optional.of(a.marker()), Optional.empty(), "r", "x", DAY,
                Optional.empty());
        Waiver nearlySameBox = new Waiver(a.ruleId(), a.layer(), Optional.of(new NmBox(a.marker().x1() + 0.01,
                a.marker().y1(), a.marker().x2(), a.marker().y2())), Optional.empty(), "r", "x", DAY, Optional.empty());
        ReportData w = Waivers.apply(d, List.of(otherRule, otherLayer, nearlySameBox));
        assertEquals(0, w.waivedFindings().size());
        assertEquals(3, w.staleWaivers().size());
    }

    @Test
    void matchingDoesNotDependOnOrder() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        List<Waiver> ws = new ArrayList<>();
        for (Finding f : d.findings()) {
            if (f.status() == FindingStatus.NEW) {
                ws.add(Waiver.forFinding(f, "ok", "x", DAY));
            }
        }
        ReportData one = Waivers.apply(d, ws);
        List<Finding> shuffled = new ArrayList<>(d.findings());
        Collections.reverse(shuffled);
        List<Waiver> reversed = new ArrayList<>(ws);
        Collections.reverse(reversed);
        ReportData two = Waivers.apply(d.withFindings(shuffled, List.of()), reversed);
        assertEquals(ReportFixture.M1_NEW, one.waivedFindings().size());
        assertEquals(one.waivedFindings().stream().map(Finding::fingerprint).sorted().toList(),
                two.waivedFindings().stream().map(Finding::fingerprint).sorted().toList());
    }

    @Test
    void aRerunOfTheSameLayoutGivesTheSameFingerprints() throws Exception {
        ReportData a = ReportFixture.migration(dir);
        ReportData b = ReportFixture.migration(dir);
        assertEquals(a.findings().stream().map(Finding::fingerprint).toList(),
                b.findings().stream().map(Finding::fingerprint).toList());
        assertEquals(a.findings().size(), a.findings().stream().map(Finding::fingerprint).distinct().count());
    }

    @Test
    void waiversOfFixedOrVanishedPlacesAreStale() throws Exception {
        ReportData d = ReportFixture.migration(dir);
        Finding fixed = first(d, FindingStatus.FIXED);
        Waiver onFixed = Waiver.forFinding(fixed, "was accepted before", "x", DAY);
        Waiver vanished = new Waiver("M1.S.1", "M1", Optional.of(new NmBox(5000, 5000, 5018, 5400)), Optional.empty(),
                "old place", "x", DAY, Optional.of("deck.waivers.json:12"));
        Waiver live = Waiver.forFinding(first(d, FindingStatus.NEW), "ok", "x", DAY);
        ReportData w = Waivers.apply(d, List.of(onFixed, vanished, live));
        assertEquals(List.of(onFixed, vanished), w.staleWaivers());
        assertFalse(w.findings().stream().filter(f -> f.status() == FindingStatus.FIXED).anyMatch(Finding::waived));
        assertTrue(w.findings().stream().anyMatch(f -> f.waiver().equals(Optional.of(live))));
    }
}
