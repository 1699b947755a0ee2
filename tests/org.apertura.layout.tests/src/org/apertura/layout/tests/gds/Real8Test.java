/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.HexFormat;
import java.util.Random;

import org.apertura.layout.gds.Real8;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The 8-byte real of Calma, "GDS II Stream Format Manual", Release 6.0, February 1987: sign, 7-bit
 * excess-64 exponent of 16, 56-bit fraction. Worked values from docs/references.md section 4 (the
 * UNITS records of sky130_fd_sc_hd__inv_1.gds and the ASAP7 library, and the small constants).
 */
class Real8Test {

    private static long bits(String hex) {
        return HexFormat.fromHexDigitsToLong(hex.replace(" ", ""));
    }

    @ParameterizedTest(name = "{0} = {1}")
    @CsvSource({
            // references.md section 4, UNITS of sky130_fd_sc_hd__inv_1.gds
            "3E 41 89 37 4B C6 A7 F0, 0.001",
            "39 44 B8 2F A0 9B 5A 54, 1.0e-9",
            // references.md section 4, small constants
            "41 10 00 00 00 00 00 00, 1.0",
            "C1 10 00 00 00 00 00 00, -1.0",
            "41 A0 00 00 00 00 00 00, 10.0",
            "42 5A 00 00 00 00 00 00, 90.0",
            // references.md section 4, UNITS of asap7sc7p5t_28_R_220121a.gds
            "3E 10 62 4D D2 F1 A9 FC, 0.00025",
            "39 11 2E 0B E8 26 D6 95, 2.5e-10",
            // derived by hand from the manual's definition: 0.5 = 8/16 * 16^0, 2 = 2/16 * 16^1
            "40 80 00 00 00 00 00 00, 0.5",
            "41 20 00 00 00 00 00 00, 2.0",
            "42 B4 00 00 00 00 00 00, 180.0",
            "00 00 00 00 00 00 00 00, 0.0" })
    void decodesAndEncodesWorkedValues(String hex, double value) {
        assertEquals(value, Real8.decode(bits(hex)));
        assertEquals(bits(hex), Real8.encode(value));
    }

    @Test
    void decodesUnnormalisedMantissa() {
        // 0x41 08 ...: fraction 0x08/256 = 1/32 times 16 = 0.5 (leading hex digit 0, allowed when reading)
        assertEquals(0.5, Real8.decode(bits("41 08 00 00 00 00 00 00")));
    }

    @Test
    void everyDoubleSurvivesEncodeDecode() {
        Random random = new Random(42);
        for (int i = 0; i < 100_000; i++) {
            double v = Double.longBitsToDouble(random.nextLong());
            if (Double.isNaN(v) || Double.isInfinite(v) || Math.abs(v) >= 0x1p250 || Math.abs(v) < 0x1p-256) {
                continue;
            }
            assertEquals(v, Real8.decode(Real8.encode(v)), () -> "value " + v);
        }
    }

    @Test
    void rejectsWhatTheFormatCannotHold() {
        assertThrows(IllegalArgumentException.class, () -> Real8.encode(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Real8.encode(Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> Real8.encode(1e300));
    }
}
