/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.field;

import java.util.List;
import java.util.Objects;

/**
 * The die against one option's exposure field.
 *
 * @param option      the option
 * @param fieldXMm    the field width (wafer side)
 * @param fieldYMm    the field height (wafer side)
 * @param dieXMm      the die width
 * @param dieYMm      the die height
 * @param fieldsX     exposure fields needed across x, {@code ceil(die x / field x)}
 * @param fieldsY     exposure fields needed across y
 * @param lines       the stitching lines (the die split into equal parts), empty when it fits
 * @param hits        shapes of critical layers crossing a line or within the keep-out band, at most
 *                    {@link FieldCheck#MAX_HITS} listed
 * @param hitCount    the number of such shapes, listed or not
 * @param keepOutNm   the keep-out band on each side of a line
 */
public record FieldResult(String option, double fieldXMm, double fieldYMm, double dieXMm, double dieYMm, int fieldsX,
        int fieldsY, List<StitchLine> lines, List<StitchHit> hits, int hitCount, double keepOutNm) {

    /** Copies the lists. */
    public FieldResult {
        Objects.requireNonNull(option, "option");
        lines = List.copyOf(lines);
        hits = List.copyOf(hits);
    }

    /** Whether the die fits one exposure field. */
    public boolean fits() {
        return fieldsX == 1 && fieldsY == 1;
    }
}
