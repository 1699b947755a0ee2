/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.Objects;

/**
 * Minimum pitch of a line layer: the distance between the centre lines of neighbouring parallel lines
 * running in the preferred direction. For two facing edges of different shapes, parallel to the
 * preferred direction, the pitch is {@code spacing + (w1 + w2) / 2} where w1, w2 are the widths of the
 * two lines behind the edges. An edge counts as the side of a line when an inner facing edge lies
 * within {@code minimum}. Only neighbours count: a pair hidden by a third parallel edge between them
 * that covers their whole common run is skipped.
 */
public record PitchRule(String id, String layer, Direction preferred, long minimum) implements Rule {

    public PitchRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Objects.requireNonNull(preferred, "preferred");
        Rule.requirePositive(minimum, "minimum pitch");
    }

    @Override
    public long reach() {
        return minimum;
    }
}
