/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;
import java.util.OptionalDouble;

import org.apertura.migrate.delta.RuleDelta;

/**
 * One cell of the layer &times; rule matrix: a rule of one layer under the source and the target option.
 *
 * @param layer      the deck layer
 * @param rule       the rule's stable name within the layer (e.g. {@code width}, {@code spacing})
 * @param axis       {@code both}, {@code x} or {@code y}
 * @param unit       unit of the values
 * @param oldValue   value under the source option, empty when absent
 * @param newValue   value under the target option, empty when absent
 * @param change     tightened, relaxed, unchanged, added or removed
 * @param cause      why the value changed (optics, patterning, anamorphic axis, override, ...)
 * @param k1Old      the k1 the rule implies under the source option, if it has one
 * @param k1New      the k1 the rule implies under the target option, if it has one
 * @param newCount   new violations of the rule on the layout
 * @param fixedCount fixed violations of the rule on the layout
 */
public record MatrixRow(String layer, String rule, String axis, ValueUnit unit, OptionalDouble oldValue,
        OptionalDouble newValue, RuleChange change, String cause, OptionalDouble k1Old, OptionalDouble k1New,
        int newCount, int fixedCount) {

    /** Checks the components are present and the counts not negative. */
    public MatrixRow {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(axis, "axis");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(oldValue, "oldValue");
        Objects.requireNonNull(newValue, "newValue");
        Objects.requireNonNull(change, "change");
        Objects.requireNonNull(cause, "cause");
        Objects.requireNonNull(k1Old, "k1Old");
        Objects.requireNonNull(k1New, "k1New");
        if (newCount < 0 || fixedCount < 0) {
            throw new IllegalArgumentException("counts must not be negative");
        }
    }

    /** {@code new - old}, empty unless both are present. */
    public OptionalDouble difference() {
        return RuleDelta.difference(oldValue, newValue);
    }

    /** {@code new / old}, empty unless both are present and old is not zero. */
    public OptionalDouble ratio() {
        return RuleDelta.ratio(oldValue, newValue);
    }
}
