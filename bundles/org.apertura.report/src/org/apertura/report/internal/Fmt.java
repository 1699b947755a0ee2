/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.internal;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.OptionalDouble;

import org.apertura.report.model.Finding;
import org.apertura.report.model.ValueUnit;

/** Number and text formatting for people (not for machine formats, which use shortest round-trip form). */
public final class Fmt {

    private Fmt() {
    }

    /** {@code v} with at most {@code decimals} decimals, trailing zeros dropped, no exponent. */
    public static String num(double v, int decimals) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        String s = BigDecimal.valueOf(v).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros()
                .toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    /** {@code v} with at most 3 decimals. */
    public static String num(double v) {
        return num(v, 3);
    }

    /** {@code v} with at most 3 decimals, or {@code empty} when absent. */
    public static String num(OptionalDouble v, String empty) {
        return v.isPresent() ? num(v.getAsDouble()) : empty;
    }

    /** A value with its unit: {@code 18 nm}, {@code 504 nm2}, {@code 0.35}. */
    public static String value(double v, ValueUnit u) {
        return u == ValueUnit.FRACTION ? num(v, 4) : num(v) + " " + u.symbol();
    }

    /** A one-line description of a finding, for messages. */
    public static String message(Finding f) {
        String verb = switch (f.status()) {
        case NEW -> "breaks under the target option";
        case FIXED -> "is fixed under the target option";
        case PERSISTING -> "persists under both options";
        case OPEN -> "violates the rule";
        };
        return f.layer() + " " + f.ruleKind() + " (" + f.ruleId() + ") " + verb + ": measured "
                + value(f.measured(), f.unit()) + ", rule " + value(f.required(), f.unit());
    }
}
