/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Masks and exposures of one layer under the source and the target option.
 *
 * @param layer            the deck layer
 * @param oldPatterning    label of the source patterning (SE, LE2, SADP, ...)
 * @param newPatterning    label of the target patterning
 * @param oldMasks         masks under the source option
 * @param newMasks         masks under the target option
 * @param oldExposures     exposures under the source option
 * @param newExposures     exposures under the target option
 * @param oldSeconds       scanner seconds per wafer under the source option, when known
 * @param newSeconds       scanner seconds per wafer under the target option, when known
 */
public record MaskRow(String layer, String oldPatterning, String newPatterning, int oldMasks, int newMasks,
        int oldExposures, int newExposures, OptionalDouble oldSeconds, OptionalDouble newSeconds) {

    /** Checks the components are present. */
    public MaskRow {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(oldPatterning, "oldPatterning");
        Objects.requireNonNull(newPatterning, "newPatterning");
        Objects.requireNonNull(oldSeconds, "oldSeconds");
        Objects.requireNonNull(newSeconds, "newSeconds");
    }

    /** Masks saved (negative when added). */
    public int masksSaved() {
        return oldMasks - newMasks;
    }

    /** Exposures saved (negative when added). */
    public int exposuresSaved() {
        return oldExposures - newExposures;
    }
}
