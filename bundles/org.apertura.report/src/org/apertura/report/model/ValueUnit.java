/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** The unit of a measured or required value. */
public enum ValueUnit {
    /** nanometres, for widths, spacings, pitches, enclosures */
    NM("nm"),
    /** square nanometres, for areas */
    NM2("nm2"),
    /** a fraction between 0 and 1, for densities */
    FRACTION("");

    private final String symbol;

    ValueUnit(String symbol) {
        this.symbol = symbol;
    }

    /** The symbol written in reports: {@code nm}, {@code nm2} or empty. */
    public String symbol() {
        return symbol;
    }

    /** The unit for a symbol as written by {@link #symbol()}. */
    public static ValueUnit ofSymbol(String s) {
        for (ValueUnit u : values()) {
            if (u.symbol.equals(s)) {
                return u;
            }
        }
        throw new IllegalArgumentException("unknown unit '" + s + "' (expected nm, nm2 or empty)");
    }
}
