/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.optics;

/**
 * Rayleigh scaling laws of projection lithography. All lengths are in nanometres.
 * <p>
 * Resolution (half-pitch) {@code CD = k1·λ/NA}; depth of focus {@code DOF = k2·λ/NA²}. A pitch
 * {@code p} printed with its pattern split over {@code n} exposures has, per exposure, the pitch
 * {@code p·n}, hence {@code k1 = (p·n/2)·NA/λ}.
 */
public final class Rayleigh {

    /** Below this k1 no single exposure can resolve a dense line/space pattern (half-pitch limit). */
    public static final double PHYSICAL_K1_LIMIT = 0.25;

    private Rayleigh() {
    }

    /** Smallest printable half-pitch in nm for the given process factor, wavelength (nm) and NA. */
    public static double resolution(double k1, double wavelengthNm, double numericalAperture) {
        requirePositive(wavelengthNm, "wavelength");
        requirePositive(numericalAperture, "NA");
        return k1 * wavelengthNm / numericalAperture;
    }

    /** Depth of focus in nm: {@code k2·λ/NA²}. */
    public static double depthOfFocus(double k2, double wavelengthNm, double numericalAperture) {
        requirePositive(wavelengthNm, "wavelength");
        requirePositive(numericalAperture, "NA");
        return k2 * wavelengthNm / (numericalAperture * numericalAperture);
    }

    /**
     * The k1 that a pitch implies for each exposure when the pattern is split over
     * {@code pitchSplit} exposures (1 for single exposure, 2 for litho-etch twice or spacer pitch
     * division by two, and so on).
     */
    public static double k1OfPitch(double pitchNm, int pitchSplit, double wavelengthNm, double numericalAperture) {
        requirePositive(pitchNm, "pitch");
        requirePositive(wavelengthNm, "wavelength");
        if (pitchSplit < 1) {
            throw new IllegalArgumentException("pitch split must be at least 1, got " + pitchSplit);
        }
        return pitchNm * pitchSplit / 2.0 * numericalAperture / wavelengthNm;
    }

    /**
     * The least pitch split that lifts the per-exposure k1 of a pitch to at least {@code k1Floor}
     * (use {@link #PHYSICAL_K1_LIMIT} for the physical limit).
     */
    public static int minimumPitchSplit(double pitchNm, double k1Floor, double wavelengthNm, double numericalAperture) {
        double k1 = k1OfPitch(pitchNm, 1, wavelengthNm, numericalAperture);
        return (int) Math.max(1, Math.ceil(k1Floor / k1 - 1e-12));
    }

    /** Whether a pitch prints, needs its pattern split, or cannot be made at all with the given split. */
    public static Printability printability(double pitchNm, int pitchSplit, double practicalK1Floor,
            double wavelengthNm, double numericalAperture) {
        double k1 = k1OfPitch(pitchNm, pitchSplit, wavelengthNm, numericalAperture);
        if (k1 < PHYSICAL_K1_LIMIT) {
            return Printability.BELOW_PHYSICAL_LIMIT;
        }
        if (k1 < practicalK1Floor) {
            return Printability.BELOW_PRACTICAL_FLOOR;
        }
        return pitchSplit == 1 ? Printability.SINGLE_EXPOSURE : Printability.WITH_SPLIT;
    }

    private static void requirePositive(double v, String what) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v);
        }
    }
}
