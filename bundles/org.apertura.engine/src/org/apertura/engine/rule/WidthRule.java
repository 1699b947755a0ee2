/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.Objects;

/**
 * Minimum width: two boundary edges of the same merged shape facing each other across material must
 * be at least {@code minimum} apart (see {@link Metric} for corners).
 */
public record WidthRule(String id, String layer, AxisValue minimum, Metric metric) implements Rule {

    public WidthRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Objects.requireNonNull(minimum, "minimum");
        Objects.requireNonNull(metric, "metric");
    }

    public WidthRule(String id, String layer, long minimum) {
        this(id, layer, AxisValue.of(minimum), Metric.EUCLIDEAN);
    }

    @Override
    public long reach() {
        return minimum.max();
    }
}
