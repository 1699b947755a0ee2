/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Arrays;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * Measured values of one quantity on one layer, with the rule values drawn over them.
 *
 * <p>The record keeps its own copy of the values (a record with an array component would otherwise
 * compare by identity); {@link #values()} returns a copy.
 *
 * @param layer    the deck layer
 * @param quantity width, spacing or pitch
 * @param values   measured values in nm
 * @param oldRule  the rule value under the source option, nm
 * @param newRule  the rule value under the target option, nm
 */
public record Histogram(String layer, Quantity quantity, double[] values, OptionalDouble oldRule,
        OptionalDouble newRule) {

    /** Copies the values and checks they are finite. */
    public Histogram {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(quantity, "quantity");
        values = values.clone();
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("histogram values must be finite");
            }
        }
        Objects.requireNonNull(oldRule, "oldRule");
        Objects.requireNonNull(newRule, "newRule");
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /** Number of values. */
    public int count() {
        return values.length;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Histogram h && layer.equals(h.layer) && quantity == h.quantity
                && Arrays.equals(values, h.values) && oldRule.equals(h.oldRule) && newRule.equals(h.newRule);
    }

    @Override
    public int hashCode() {
        return Objects.hash(layer, quantity, Arrays.hashCode(values), oldRule, newRule);
    }

    @Override
    public String toString() {
        return "Histogram[" + layer + " " + quantity + " n=" + values.length + " old=" + oldRule + " new=" + newRule + "]";
    }
}
