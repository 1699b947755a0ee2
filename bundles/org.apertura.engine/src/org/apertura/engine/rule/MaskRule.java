/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/**
 * Multiple patterning: shapes closer than {@code sameMaskSpacing} (Euclidean, strictly) must go on
 * different masks; {@code masks} is 2 (LELE) or 3 (LELELE).
 */
public record MaskRule(String id, String layer, long sameMaskSpacing, int masks) implements Rule {

    public MaskRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Rule.requirePositive(sameMaskSpacing, "same-mask spacing");
        if (masks != 2 && masks != 3) {
            throw new IllegalArgumentException("mask count must be 2 or 3, got " + masks);
        }
    }

    @Override
    public long reach() {
        return sameMaskSpacing;
    }
}
