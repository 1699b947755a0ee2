/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.findings;

import java.util.Locale;

import org.apertura.engine.geom.Box;
import org.apertura.report.model.Finding;
import org.apertura.report.model.NmBox;

/** Helpers for showing report findings (nanometres) in the workbench (database units). */
public final class Findings {

    private Findings() {
    }

    /** A marker box in database units around an nm box, rounded outwards. */
    public static Box dbu(NmBox b, double nmPerDbu) {
        return Box.around(b.x1() / nmPerDbu, b.y1() / nmPerDbu, b.x2() / nmPerDbu, b.y2() / nmPerDbu);
    }

    /** A short text for lists and markers: {@code "M1 spacing 28 nm < 32 nm"}. */
    public static String label(Finding f) {
        String unit = f.unit().symbol();
        String op = f.ruleKind().equals("density-high") ? ">" : "<";
        return String.format(Locale.ROOT, "%s %s %s%s %s %s%s", f.layer(), f.ruleKind(), number(f.measured()),
                unit.isEmpty() ? "" : " " + unit, op, number(f.required()), unit.isEmpty() ? "" : " " + unit);
    }

    /** A value without trailing zeros, at most three decimals. */
    public static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        String s = String.format(Locale.ROOT, "%.3f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
