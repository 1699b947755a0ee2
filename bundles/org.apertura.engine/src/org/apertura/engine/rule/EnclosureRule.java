/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.Objects;
import java.util.OptionalLong;

/**
 * Enclosure of each merged shape of the inner layer ({@link #layer()}) by the outer layer. The inner
 * shape must lie inside one outer shape, and each of its edges must have at least {@code allSides}
 * of outer material in front of it (projection metric). With {@code oppositeSides} present, in
 * addition at least one pair of opposite sides (left and right, or bottom and top) must each have
 * {@code oppositeSides}.
 */
public record EnclosureRule(String id, String layer, String outerLayer, long allSides, OptionalLong oppositeSides)
        implements Rule {

    public EnclosureRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "inner layer");
        Rule.requireText(outerLayer, "outer layer");
        if (allSides < 0) {
            throw new IllegalArgumentException("enclosure must not be negative: " + allSides);
        }
        Objects.requireNonNull(oppositeSides, "oppositeSides");
    }

    @Override
    public long reach() {
        return Math.max(allSides, oppositeSides.orElse(0)) + 1;
    }
}
