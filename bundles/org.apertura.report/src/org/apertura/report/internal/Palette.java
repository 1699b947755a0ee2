/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.internal;

import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.RuleChange;

/** Apertura's report colours: warm paper, deep teal ink, earthy status colours. */
public final class Palette {

    public static final String PAPER = "#f6f3ec";
    public static final String PANEL = "#fffdf8";
    public static final String INK = "#1f3038";
    public static final String MUTED = "#6b6f68";
    public static final String RULE_LINE = "#d8d1c2";
    public static final String BAND = "#0f4c5c";
    public static final String BAND_TEXT = "#f6f3ec";
    public static final String CAUTION_BG = "#fbe9c8";
    public static final String CAUTION_EDGE = "#c98a1b";

    public static final String NEW = "#c8553d";
    public static final String FIXED = "#4f9d69";
    public static final String PERSISTING = "#d9962b";
    public static final String OPEN = "#7b5ea7";
    public static final String WAIVED = "#8d8a82";

    public static final String OLD_RULE = "#d9962b";
    public static final String NEW_RULE = "#c8553d";
    public static final String BARS = "#3f7f8f";

    private static final String[] LAYERS = { "#4f86a0", "#a8844a", "#6f9550", "#9c5b78", "#6467a8", "#3f958c",
        "#ad6c48", "#80804f" };

    private Palette() {
    }

    /** The fill colour of the {@code i}-th layer. */
    public static String layer(int i) {
        return LAYERS[Math.floorMod(i, LAYERS.length)];
    }

    /** The colour of a finding: grey when waived, else its status colour. */
    public static String finding(FindingStatus s, boolean waived) {
        if (waived) {
            return WAIVED;
        }
        return switch (s) {
        case NEW -> NEW;
        case FIXED -> FIXED;
        case PERSISTING -> PERSISTING;
        case OPEN -> OPEN;
        };
    }

    /** The background of a matrix cell. */
    public static String change(RuleChange c) {
        return switch (c) {
        case TIGHTENED -> "#f2c4b6";
        case RELAXED -> "#cfe5d3";
        case UNCHANGED -> "#ece8dd";
        case ADDED -> "#dcd2ec";
        case REMOVED -> "#dedbd4";
        };
    }
}
