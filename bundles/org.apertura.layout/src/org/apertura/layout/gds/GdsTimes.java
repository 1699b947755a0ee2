/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Text form of the six 16-bit date fields of BGNLIB and BGNSTR: {@code "year-month-day
 * hour:minute:second"} with the numbers exactly as stored (no calendar check; years may be stored as
 * years since 1900 by old writers).
 */
final class GdsTimes {

    private static final Pattern FORM = Pattern.compile("(-?\\d+)-(-?\\d+)-(-?\\d+) (-?\\d+):(-?\\d+):(-?\\d+)");

    private GdsTimes() {
    }

    static String format(int y, int mo, int d, int h, int mi, int s) {
        return y + "-" + two(mo) + "-" + two(d) + " " + two(h) + ":" + two(mi) + ":" + two(s);
    }

    private static String two(int v) {
        return v >= 0 && v < 10 ? "0" + v : Integer.toString(v);
    }

    /**
     * The six fields of a time string, or six zeros for null.
     *
     * @throws IllegalArgumentException when the text is not in the form or a field exceeds 16 bits
     */
    static int[] parse(String text) {
        if (text == null) {
            return new int[6];
        }
        Matcher m = FORM.matcher(text.strip());
        if (!m.matches()) {
            throw new IllegalArgumentException("time '" + text + "' is not of the form year-month-day hour:minute:second");
        }
        int[] fields = new int[6];
        for (int i = 0; i < 6; i++) {
            long v = Long.parseLong(m.group(i + 1));
            if (v < Short.MIN_VALUE || v > Short.MAX_VALUE) {
                throw new IllegalArgumentException("time '" + text + "': field " + v + " does not fit 16 bits");
            }
            fields[i] = (int) v;
        }
        return fields;
    }
}
