/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

/**
 * The 8-byte real of the GDSII stream format (Calma, "GDS II Stream Format Manual", Release 6.0,
 * February 1987): one sign bit, a 7-bit exponent of 16 biased by 64 and a 56-bit fraction, so
 * value = (-1)^sign * (mantissa / 2^56) * 16^(exponent - 64).
 * <p>
 * Every finite double in the range of the format is encoded exactly (its 53 significant bits fit in
 * the 56-bit fraction). Decoding rounds the 56-bit fraction to the nearest double, so values written
 * from doubles read back identical. Unnormalised encodings (leading hex digit 0) are decoded too.
 */
public final class Real8 {

    private static final long MANTISSA_MASK = 0x00FF_FFFF_FFFF_FFFFL;

    private Real8() {
    }

    /** Decodes the 64 bits of an 8-byte real, first stream byte in the most significant position. */
    public static double decode(long bits) {
        long mantissa = bits & MANTISSA_MASK;
        int exponent = (int) ((bits >>> 56) & 0x7F);
        double magnitude = mantissa == 0 ? 0.0 : Math.scalb((double) mantissa, 4 * (exponent - 64) - 56);
        return bits < 0 ? -magnitude : magnitude;
    }

    /**
     * Encodes a double as an 8-byte real. Zero (of either sign) encodes as all zero bits; magnitudes
     * below 16^-65 (the smallest normalised value) encode as zero.
     *
     * @throws IllegalArgumentException for NaN, infinities and magnitudes of 16^63 or more
     */
    public static long encode(double value) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("an 8-byte real cannot hold " + value);
        }
        double magnitude = Math.abs(value);
        if (magnitude == 0.0) {
            return 0L;
        }
        int binaryExponent = Math.getExponent(magnitude);
        // smallest k with magnitude < 16^k, i.e. 4k - 4 <= binaryExponent < 4k
        int k = Math.floorDiv(binaryExponent, 4) + 1;
        if (k > 63) {
            throw new IllegalArgumentException("an 8-byte real cannot hold " + value + ": too large");
        }
        if (k < -64) {
            return 0L;
        }
        long mantissa = (long) Math.scalb(magnitude, 56 - 4 * k);
        long bits = ((long) (k + 64) << 56) | mantissa;
        return value < 0 ? bits | Long.MIN_VALUE : bits;
    }
}
