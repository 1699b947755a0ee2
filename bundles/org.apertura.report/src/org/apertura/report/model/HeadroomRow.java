/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * How far one layer can shrink under one rule under the target option.
 *
 * @param layer         the deck layer
 * @param rule          the rule name, {@code *} for the layer as a whole
 * @param factor        the smallest uniform linear scale factor (at most 1) the layout takes without a new
 *                      violation; 0.8 means the layer can be drawn 20 % smaller
 * @param bounded       true when nothing limited the shrink down to the search's floor, so the true
 *                      factor is at most {@code factor}
 * @param factorX       the same for a shrink along x only, for anamorphic options
 * @param factorY       the same along y only
 * @param limitingPlace where the uniform limit is, in nm; empty when bounded
 * @param measured      the limiting measured value at scale 1 (nm, nm2 for areas)
 * @param required      the rule value the limiting place must keep
 */
public record HeadroomRow(String layer, String rule, double factor, boolean bounded, OptionalDouble factorX,
        OptionalDouble factorY, Optional<NmBox> limitingPlace, OptionalDouble measured, OptionalDouble required) {

    /** Checks the components are present. */
    public HeadroomRow {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(factorX, "factorX");
        Objects.requireNonNull(factorY, "factorY");
        Objects.requireNonNull(limitingPlace, "limitingPlace");
        Objects.requireNonNull(measured, "measured");
        Objects.requireNonNull(required, "required");
    }

    /** The linear shrink available, {@code 1 - factor}. */
    public double headroom() {
        return 1 - factor;
    }
}
