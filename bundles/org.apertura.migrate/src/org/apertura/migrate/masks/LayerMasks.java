/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.masks;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Masks and exposures of one layer under the source and the target option.
 *
 * @param layer             the deck layer
 * @param sourcePatterning  label of the source patterning (SE, LE2, SADP, ...)
 * @param targetPatterning  label of the target patterning
 * @param sourceMasks       masks under the source option
 * @param targetMasks       masks under the target option
 * @param sourceExposures   exposures under the source option (one per mask: litho-etch exposes each
 *                          mask once, spacer division exposes its core and its cut mask)
 * @param targetExposures   exposures under the target option
 * @param sourceSeconds     scanner seconds per wafer for the layer under the source option,
 *                          {@code exposures · 3600 / throughput}, when the option states a throughput
 * @param targetSeconds     the same under the target option
 */
public record LayerMasks(String layer, String sourcePatterning, String targetPatterning, int sourceMasks,
        int targetMasks, int sourceExposures, int targetExposures, OptionalDouble sourceSeconds,
        OptionalDouble targetSeconds) {

    /** Checks the components are present. */
    public LayerMasks {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(sourcePatterning, "sourcePatterning");
        Objects.requireNonNull(targetPatterning, "targetPatterning");
        Objects.requireNonNull(sourceSeconds, "sourceSeconds");
        Objects.requireNonNull(targetSeconds, "targetSeconds");
    }

    /** Masks saved by the migration (negative when masks are added). */
    public int masksSaved() {
        return sourceMasks - targetMasks;
    }

    /** Exposures saved by the migration (negative when exposures are added). */
    public int exposuresSaved() {
        return sourceExposures - targetExposures;
    }
}
