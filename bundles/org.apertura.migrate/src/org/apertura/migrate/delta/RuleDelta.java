/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.delta;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One rule compared between two options.
 *
 * @param layer    the deck layer
 * @param rule     the rule's stable name (see {@link org.apertura.migrate.check.RuleRef#rule()}, plus
 *                 {@code density-min}, {@code density-max}, {@code enclosure:<inner>:pair} and
 *                 {@code spacing-table:<row>} for the parts that are not scalar kinds)
 * @param axis     the axis the values apply to
 * @param unit     {@code nm}, {@code nm2} or empty for fractions
 * @param oldValue the value under the source option, in {@code unit}; empty when absent
 * @param newValue the value under the target option; empty when absent
 * @param status   tightened, relaxed, unchanged, added or removed
 * @param cause    why the value changed
 */
public record RuleDelta(String layer, String rule, AxisScope axis, String unit, OptionalDouble oldValue,
        OptionalDouble newValue, DeltaStatus status, DeltaCause cause) {

    /** Checks the components are present. */
    public RuleDelta {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(axis, "axis");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(oldValue, "oldValue");
        Objects.requireNonNull(newValue, "newValue");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(cause, "cause");
    }

    /** {@code new - old}, empty unless both are present. */
    public OptionalDouble difference() {
        return difference(oldValue, newValue);
    }

    /** {@code new / old}, empty unless both are present and old is not zero. */
    public OptionalDouble ratio() {
        return ratio(oldValue, newValue);
    }

    /** {@code newValue - oldValue}, empty unless both are present. */
    public static OptionalDouble difference(OptionalDouble oldValue, OptionalDouble newValue) {
        return oldValue.isPresent() && newValue.isPresent()
                ? OptionalDouble.of(newValue.getAsDouble() - oldValue.getAsDouble()) : OptionalDouble.empty();
    }

    /** {@code newValue / oldValue}, empty unless both are present and the old value is not zero. */
    public static OptionalDouble ratio(OptionalDouble oldValue, OptionalDouble newValue) {
        return oldValue.isPresent() && newValue.isPresent() && oldValue.getAsDouble() != 0
                ? OptionalDouble.of(newValue.getAsDouble() / oldValue.getAsDouble()) : OptionalDouble.empty();
    }
}
