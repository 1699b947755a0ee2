/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.Objects;
import java.util.Optional;

/**
 * Minimum spacing between boundary edges facing each other across empty space: between different
 * merged shapes (kind spacing) and within one shape (kind notch). With a {@link SpacingTable} the
 * required value depends on width and parallel run length and {@code minimum} is not used except
 * for its metric; the table is isotropic.
 */
public record SpacingRule(String id, String layer, AxisValue minimum, Metric metric, Optional<SpacingTable> table)
        implements Rule {

    public SpacingRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Objects.requireNonNull(minimum, "minimum");
        Objects.requireNonNull(metric, "metric");
        Objects.requireNonNull(table, "table");
    }

    public SpacingRule(String id, String layer, long minimum) {
        this(id, layer, AxisValue.of(minimum), Metric.EUCLIDEAN, Optional.empty());
    }

    @Override
    public long reach() {
        long r = minimum.max();
        if (table.isPresent()) {
            r = Math.max(r, Math.max(table.get().maximum(), table.get().widestThreshold()));
        }
        return r;
    }
}
