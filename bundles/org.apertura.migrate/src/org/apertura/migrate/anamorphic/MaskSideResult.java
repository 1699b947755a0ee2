/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.anamorphic;

import java.util.Objects;
import java.util.Optional;

import org.apertura.rules.resolved.Axis;

/**
 * A mask-side minimum of one layer checked along both axes.
 *
 * @param layer   the deck layer
 * @param rule    {@code mask-width} or {@code mask-spacing}
 * @param option  the option whose demagnification applies
 * @param x       the check along x
 * @param y       the check along y
 * @param binding the axis with the smaller margin (the limit that binds), empty when neither axis
 *                has a measured size within the probe
 */
public record MaskSideResult(String layer, String rule, String option, MaskSideAxis x, MaskSideAxis y,
        Optional<Axis> binding) {

    /** Checks the components are present. */
    public MaskSideResult {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(option, "option");
        Objects.requireNonNull(x, "x");
        Objects.requireNonNull(y, "y");
        Objects.requireNonNull(binding, "binding");
    }
}
