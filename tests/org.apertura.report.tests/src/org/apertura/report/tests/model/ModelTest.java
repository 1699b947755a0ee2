/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.report.model.Fingerprint;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.MaskRow;
import org.apertura.report.model.MaskSummary;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.Waiver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ModelTest {

    @TempDir
    Path dir;

    @Test
    void inputHashIsSha256() throws Exception {
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        Path f = Files.writeString(dir.resolve("abc.txt"), "abc");
        InputFile in = InputFile.hash("deck", f);
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", in.sha256());
        assertEquals(3, in.sizeBytes());
    }

    @Test
    void fingerprintDependsOnPlaceNotOnValues() {
        NmBox b = new NmBox(10, 0, 24, 400);
        String a = Fingerprint.of("M1.S.1", "M1", "spacing", b, Optional.empty());
        assertEquals(a, Fingerprint.of("M1.S.1", "M1", "spacing", new NmBox(24, 400, 10, 0), Optional.empty()));
        assertEquals(a, Fingerprint.of("M1.S.1", "M1", "spacing", new NmBox(10, -0.0, 24, 400), Optional.empty()));
        assertNotEquals(a, Fingerprint.of("M1.S.1", "M1", "spacing", new NmBox(10, 0, 24.01, 400), Optional.empty()));
        assertNotEquals(a, Fingerprint.of("M1.S.1", "M2", "spacing", b, Optional.empty()));
        assertEquals(16, a.length());
    }

    @Test
    void maskTotalsAndMissingSeconds() {
        MaskSummary m = new MaskSummary(List.of(
                new MaskRow("M1", "LE2", "SE", 2, 1, 2, 1, OptionalDouble.of(40), OptionalDouble.of(20)),
                new MaskRow("M2", "SADP", "SE", 2, 1, 2, 1, OptionalDouble.empty(), OptionalDouble.of(20))));
        assertEquals(2, m.masksSaved());
        assertEquals(OptionalDouble.empty(), m.oldSeconds());
        assertEquals(OptionalDouble.of(40), m.newSeconds());
    }

    @Test
    void waiverNeedsAPlaceAndText() {
        LocalDate d = LocalDate.of(2026, 1, 1);
        assertThrows(IllegalArgumentException.class,
                () -> new Waiver("r", "l", Optional.empty(), Optional.empty(), "why", "who", d, Optional.empty()));
        assertThrows(IllegalArgumentException.class, () -> new Waiver("r", "l", Optional.of(new NmBox(0, 0, 1, 1)),
                Optional.empty(), "", "who", d, Optional.empty()));
    }
}
