/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

import java.util.Comparator;
import java.util.Objects;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Segment;

/**
 * One rule violation. Distances are in database units, areas in square database units, densities as
 * fractions. {@code edgeA}/{@code edgeB} are the offending edge pair (directed with material on their
 * left) for edge-pair kinds, and null for region kinds (area, density, mask conflict, not enclosed),
 * where {@code marker} is the region. The marker box holds the measured gap or region.
 */
public record Violation(String ruleId, String layer, ViolationKind kind, double measured, double required,
        Segment edgeA, Segment edgeB, Box marker) implements Comparable<Violation> {

    private static final Comparator<Segment> SEGMENTS = Comparator.nullsFirst(Comparator.naturalOrder());

    /** Total order: layer, rule id, kind, marker, measured value, edges. */
    public static final Comparator<Violation> ORDER = Comparator.comparing(Violation::layer)
            .thenComparing(Violation::ruleId)
            .thenComparing(Violation::kind)
            .thenComparing(Violation::marker)
            .thenComparingDouble(Violation::measured)
            .thenComparingDouble(Violation::required)
            .thenComparing(Violation::edgeA, SEGMENTS)
            .thenComparing(Violation::edgeB, SEGMENTS);

    public Violation {
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(marker, "marker");
    }

    @Override
    public int compareTo(Violation o) {
        return ORDER.compare(this, o);
    }
}
