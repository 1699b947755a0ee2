/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.util.List;
import java.util.Map;

/**
 * Checks and warning texts shared by the two GDSII readers, {@link GdsReader} (into the EMF model)
 * and {@code org.apertura.layout.stream.GdsStreamReader} (into packed arrays), so that both reject
 * the same elements with the same message and report the same warnings. Offsets are byte offsets of
 * a record from the start of the file; coordinates are database units.
 */
public final class GdsReadChecks {

    private GdsReadChecks() {
    }

    /**
     * The warning for records that were skipped, or null when none were: the total and the counts
     * by record name (and place) in the map's iteration order, e.g.
     * {@code "4 records skipped: {ELFLAGS=1, NODE element=1, ...}"}.
     */
    public static String skippedRecordsWarning(Map<String, Integer> skipped) {
        if (skipped.isEmpty()) {
            return null;
        }
        int total = 0;
        for (int n : skipped.values()) {
            total += n;
        }
        return total + " records skipped: " + skipped;
    }

    /** The warning for array references whose pitch was rounded (see {@link #pitch}), or null for none. */
    public static String roundedPitchesWarning(int count) {
        return count > 0 ? count + " array references whose span is not a multiple of the count: pitch rounded"
                : null;
    }

    /**
     * Adds the end-of-read warnings to a reader's list: skipped records first, rounded array pitches
     * last, so both readers list warnings in the same order.
     */
    public static void addEndWarnings(List<String> warnings, Map<String, Integer> skipped, int roundedPitches) {
        String skippedWarning = skippedRecordsWarning(skipped);
        if (skippedWarning != null) {
            warnings.add(0, skippedWarning);
        }
        String pitchWarning = roundedPitchesWarning(roundedPitches);
        if (pitchWarning != null) {
            warnings.add(pitchWarning);
        }
    }

    /** The warning for non-zero bytes after ENDLIB (zero padding is normal), or null for none. */
    public static String trailingBytesWarning(long nonZeroBytes) {
        return nonZeroBytes > 0 ? nonZeroBytes + " non-zero bytes after ENDLIB ignored" : null;
    }

    /**
     * The pitch of an array reference along one direction: the span from the origin to the corner
     * point divided by the count, rounded half up to a whole database unit. The caller counts the
     * rounded cases ({@link #isPitchRounded}) for {@link #roundedPitchesWarning}.
     *
     * @param span  corner minus origin, database units (64-bit so that it cannot overflow)
     * @param count columns or rows, at least 1
     */
    public static int pitch(long span, int count) {
        return (int) Math.round((double) span / count);
    }

    /** Whether {@link #pitch} rounds: the span is not a whole multiple of the count. */
    public static boolean isPitchRounded(long span, int count) {
        return span % count != 0;
    }

    /**
     * Fails unless an element has a LAYER record.
     *
     * @param layer the layer read, or {@link Integer#MIN_VALUE} when there was no LAYER record
     * @param start byte offset of the element's first record
     * @param kind  record name of the element (BOUNDARY, PATH, ...)
     */
    public static void requireLayer(String file, int layer, long start, String kind) throws GdsFormatException {
        if (layer == Integer.MIN_VALUE) {
            throw new GdsFormatException(file, start, kind + " element without LAYER");
        }
    }

    /**
     * Fails unless a reference element has an SNAME record.
     *
     * @param hasName whether an SNAME record was read
     * @param start   byte offset of the element's first record
     */
    public static void requireName(String file, boolean hasName, long start, String kind) throws GdsFormatException {
        if (!hasName) {
            throw new GdsFormatException(file, start, kind + " element without SNAME");
        }
    }

    /**
     * Fails when an element's XY record has a point count the element kind does not allow.
     *
     * @param ok       whether the count is allowed
     * @param points   number of points in the XY record
     * @param expected the allowed count in words ("5", "at least 1")
     */
    public static void requirePoints(String file, boolean ok, long start, String kind, int points, String expected)
            throws GdsFormatException {
        if (!ok) {
            throw new GdsFormatException(file, start, kind + " element has " + points + " points in XY, expected "
                    + expected);
        }
    }
}
