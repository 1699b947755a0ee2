/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/**
 * End-of-line spacing. A tip is a boundary edge shorter than {@code tipLength} whose two end vertices
 * are both convex (a line end). Two facing tips closer than {@code tipToTip}, or a tip facing a
 * non-tip edge closer than {@code tipToSide}, are violations (projection metric: the edges must
 * overlap in projection).
 */
public record EndOfLineRule(String id, String layer, long tipLength, long tipToTip, long tipToSide) implements Rule {

    public EndOfLineRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Rule.requirePositive(tipLength, "tip length");
        Rule.requirePositive(tipToTip, "tip-to-tip spacing");
        Rule.requirePositive(tipToSide, "tip-to-side spacing");
    }

    @Override
    public long reach() {
        return Math.max(tipToTip, tipToSide);
    }
}
