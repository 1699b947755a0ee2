/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/** Minimum area of each merged shape (holes subtracted), in square database units. */
public record AreaRule(String id, String layer, long minimumArea) implements Rule {

    public AreaRule {
        Rule.requireText(id, "id");
        Rule.requireText(layer, "layer");
        Rule.requirePositive(minimumArea, "minimum area");
    }

    @Override
    public long reach() {
        return 0;
    }
}
