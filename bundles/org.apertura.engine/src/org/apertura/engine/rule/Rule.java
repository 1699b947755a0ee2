/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.Objects;

/** A design rule checked by the engine. */
public sealed interface Rule permits WidthRule, SpacingRule, PitchRule, EndOfLineRule, AreaRule, EnclosureRule,
        DensityRule, MaskRule {

    /** Identifier copied into each violation (for example the rule's name in a rule deck). */
    String id();

    /** The layer whose shapes are measured (for enclosure the inner layer). */
    String layer();

    /** The largest distance this rule needs to look at around an edge, in database units. */
    long reach();

    static void requireText(String value, String what) {
        Objects.requireNonNull(value, what);
        if (value.isBlank()) {
            throw new IllegalArgumentException(what + " must not be blank");
        }
    }

    static void requirePositive(long value, String what) {
        if (value <= 0) {
            throw new IllegalArgumentException(what + " must be positive, got " + value);
        }
    }
}
