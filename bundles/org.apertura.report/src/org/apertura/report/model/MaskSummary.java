/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.List;
import java.util.OptionalDouble;
import java.util.function.ToIntFunction;

/** Masks and exposures per moved layer, and their totals. */
public record MaskSummary(List<MaskRow> rows) {

    /** Copies the list. */
    public MaskSummary {
        rows = List.copyOf(rows);
    }

    /** Masks of all layers under the source option. */
    public int oldMasks() {
        return sum(MaskRow::oldMasks);
    }

    /** Masks of all layers under the target option. */
    public int newMasks() {
        return sum(MaskRow::newMasks);
    }

    /** Exposures of all layers under the source option. */
    public int oldExposures() {
        return sum(MaskRow::oldExposures);
    }

    /** Exposures of all layers under the target option. */
    public int newExposures() {
        return sum(MaskRow::newExposures);
    }

    /** Masks saved in total (negative when added). */
    public int masksSaved() {
        return oldMasks() - newMasks();
    }

    /** Exposures saved in total (negative when added). */
    public int exposuresSaved() {
        return oldExposures() - newExposures();
    }

    /** Scanner seconds per wafer of all rows under the source option, empty unless every row has one. */
    public OptionalDouble oldSeconds() {
        return seconds(true);
    }

    /** Scanner seconds per wafer of all rows under the target option, empty unless every row has one. */
    public OptionalDouble newSeconds() {
        return seconds(false);
    }

    private int sum(ToIntFunction<MaskRow> f) {
        return rows.stream().mapToInt(f).sum();
    }

    private OptionalDouble seconds(boolean old) {
        double s = 0;
        for (MaskRow r : rows) {
            OptionalDouble v = old ? r.oldSeconds() : r.newSeconds();
            if (v.isEmpty()) {
                return OptionalDouble.empty();
            }
            s += v.getAsDouble();
        }
        return rows.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(s);
    }
}
