/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/**
 * Density of a layer in square windows of side {@code window} placed every {@code step} from the
 * lower-left corner of the checked extent: the covered fraction of each window must lie in
 * [{@code minimum}, {@code maximum}]. Windows are clipped to nothing: they start at the extent's
 * lower-left corner and the last row/column is shifted to end at the extent's upper/right border.
 */
public record DensityRule(String id, String layer, long window, long step, double minimum, double maximum)
        implements Rule {

    public DensityRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Rule.requirePositive(window, "window");
        Rule.requirePositive(step, "step");
        if (!(minimum >= 0 && minimum <= maximum && maximum <= 1)) {
            throw new IllegalArgumentException("density bounds must satisfy 0 <= min <= max <= 1: " + minimum + ", " + maximum);
        }
    }

    @Override
    public long reach() {
        return 0;
    }
}
