/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/** The formats a report set can hold. */
public enum ReportFormat {
    /** {@code index.html}, self-contained */
    HTML,
    /** {@code report.json} and its schema {@code apertura-report.schema.json} */
    JSON,
    /** one CSV file per table */
    CSV,
    /** {@code report.sarif} */
    SARIF;

    /**
     * Parses a comma-separated list of format names (case-insensitive, {@code all} for every format).
     *
     * @throws IllegalArgumentException naming the unknown format
     */
    public static Set<ReportFormat> parseList(String list) {
        EnumSet<ReportFormat> out = EnumSet.noneOf(ReportFormat.class);
        for (String s : list.split(",")) {
            String t = s.trim().toUpperCase(Locale.ROOT);
            if (t.isEmpty()) {
                continue;
            }
            if (t.equals("ALL")) {
                out.addAll(EnumSet.allOf(ReportFormat.class));
                continue;
            }
            try {
                out.add(valueOf(t));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("unknown report format '" + s.trim()
                        + "' (expected html, json, csv, sarif or all)", e);
            }
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException("no report format given (expected html, json, csv, sarif or all)");
        }
        return out;
    }
}
