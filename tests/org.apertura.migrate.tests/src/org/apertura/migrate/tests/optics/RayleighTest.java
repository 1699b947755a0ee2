/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests.optics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.apertura.migrate.optics.Printability;
import org.apertura.migrate.optics.Rayleigh;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RayleighTest {

    private static final double EUV = 13.5; // nm, common practice

    @Test
    @DisplayName("k1 of published pitches (references.md §2, derived from k1 = (p/2)·NA/λ)")
    void k1OfPublishedPitches() {
        // ASAP7 M1-M3: 36 nm pitch at 0.33-NA EUV single exposure (Clark et al. 2016, Table 1)
        assertEquals(0.44, Rayleigh.k1OfPitch(36, 1, EUV, 0.33), 0.005);
        assertEquals(0.34, Rayleigh.k1OfPitch(28, 1, EUV, 0.33), 0.005);
        assertEquals(0.22, Rayleigh.k1OfPitch(18, 1, EUV, 0.33), 0.005);
        assertEquals(0.41, Rayleigh.k1OfPitch(20, 1, EUV, 0.55), 0.005);
    }

    @Test
    @DisplayName("NA 0.33 -> 0.55: resolution x0.6 (features ~1.7x smaller), density ~2.78x, DOF x0.36 (common practice)")
    void highNaScaling() {
        double cd033 = Rayleigh.resolution(0.3, EUV, 0.33);
        double cd055 = Rayleigh.resolution(0.3, EUV, 0.55);
        assertEquals(0.6, cd055 / cd033, 1e-12);
        assertEquals(1.67, cd033 / cd055, 0.005);
        assertEquals(2.78, (cd033 / cd055) * (cd033 / cd055), 0.005);
        assertEquals(0.36, Rayleigh.depthOfFocus(1, EUV, 0.55) / Rayleigh.depthOfFocus(1, EUV, 0.33), 1e-12);
    }

    @Test
    @DisplayName("0.33-NA EUV resolves about 13 nm CD at k1 0.32 (ASML 2024, references.md §2)")
    void euvResolution() {
        assertEquals(13.0, Rayleigh.resolution(0.32, EUV, 0.33), 0.1);
    }

    @Test
    void splittingLiftsK1() {
        // 18 nm pitch at 0.33 NA: 0.22 in one exposure, 0.44 when split over two masks
        assertEquals(Printability.BELOW_PHYSICAL_LIMIT, Rayleigh.printability(18, 1, 0.3, EUV, 0.33));
        assertEquals(Printability.WITH_SPLIT, Rayleigh.printability(18, 2, 0.3, EUV, 0.33));
        assertEquals(2, Rayleigh.minimumPitchSplit(18, Rayleigh.PHYSICAL_K1_LIMIT, EUV, 0.33));
        assertEquals(1, Rayleigh.minimumPitchSplit(36, Rayleigh.PHYSICAL_K1_LIMIT, EUV, 0.33));
        assertEquals(Printability.BELOW_PRACTICAL_FLOOR, Rayleigh.printability(16, 1, 0.35, EUV, 0.55));
        assertEquals(Printability.SINGLE_EXPOSURE, Rayleigh.printability(20, 1, 0.35, EUV, 0.55));
    }

    @Test
    void rejectsNonsense() {
        assertThrows(IllegalArgumentException.class, () -> Rayleigh.k1OfPitch(36, 0, EUV, 0.33));
        assertThrows(IllegalArgumentException.class, () -> Rayleigh.resolution(0.3, EUV, 0));
        assertThrows(IllegalArgumentException.class, () -> Rayleigh.k1OfPitch(-1, 1, EUV, 0.33));
    }
}
