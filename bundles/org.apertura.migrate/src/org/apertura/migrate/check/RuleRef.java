/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.check;

import java.util.Objects;
import java.util.Optional;

import org.apertura.rules.resolved.RuleKind;

/**
 * Which deck rule an engine rule was made from.
 *
 * @param layer the deck layer owning the rule (for an enclosure: the enclosing, outer layer)
 * @param rule  a stable name of the rule within the layer: the lower-case rule kind for scalar kinds
 *              ({@code width}, {@code spacing}, {@code pitch}, {@code area}, {@code end-of-line},
 *              {@code same-mask-spacing}), {@code enclosure:<inner layer>} for enclosures,
 *              {@code density} for the density rule
 * @param kind  the deck's rule kind when the rule is one scalar kind, empty for enclosure and density
 */
public record RuleRef(String layer, String rule, Optional<RuleKind> kind) implements Comparable<RuleRef> {

    /** Checks the components are present. */
    public RuleRef {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(kind, "kind");
    }

    /** The rule id used in engine rules and violations: {@code layer/rule}. */
    public String id() {
        return layer + "/" + rule;
    }

    /** The stable rule name of a scalar rule kind: lower case with hyphens ({@code END_OF_LINE_TIP_TO_TIP} gives {@code end-of-line-tip-to-tip}). */
    public static String nameOf(RuleKind kind) {
        return kind.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
    }

    /** A reference to a scalar rule kind of a layer. */
    public static RuleRef of(String layer, RuleKind kind) {
        return new RuleRef(layer, nameOf(kind), Optional.of(kind));
    }

    @Override
    public int compareTo(RuleRef o) {
        int c = layer.compareTo(o.layer);
        return c != 0 ? c : rule.compareTo(o.rule);
    }
}
