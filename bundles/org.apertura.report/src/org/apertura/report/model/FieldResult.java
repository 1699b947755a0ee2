/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.List;
import java.util.Objects;

/**
 * The die against the exposure field of the target option (or the checked option).
 *
 * @param option        the lithography option whose field is used
 * @param die           the die (top-cell extent or declared size), nm
 * @param fieldWidthNm  the exposure field's width at wafer scale, nm
 * @param fieldHeightNm the exposure field's height at wafer scale, nm
 * @param keepOutNm     half-width of the band around each stitching line, nm (0 when the deck has none)
 * @param lines         the stitching lines; empty when the die fits one field
 * @param crossings     shapes of critical layers crossing a line or lying in its band
 */
public record FieldResult(String option, NmBox die, double fieldWidthNm, double fieldHeightNm, double keepOutNm,
        List<StitchLine> lines, List<StitchCrossing> crossings) {

    /** Copies the lists. */
    public FieldResult {
        Objects.requireNonNull(option, "option");
        Objects.requireNonNull(die, "die");
        lines = List.copyOf(lines);
        crossings = List.copyOf(crossings);
    }

    /** True when the die fits in one exposure field. */
    public boolean fits() {
        return die.width() <= fieldWidthNm && die.height() <= fieldHeightNm;
    }
}
