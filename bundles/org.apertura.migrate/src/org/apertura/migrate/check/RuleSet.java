/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.check;

import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;

import org.apertura.engine.rule.Rule;

/**
 * Engine rules made from one option of a deck, with the deck rule behind each.
 *
 * @param option      the option the rules were taken from
 * @param rules       the engine rules, in layer then rule order
 * @param refs        the deck rule of every engine rule, keyed by engine rule id
 * @param layers      every layer the rules need polygons of (rule layers and enclosed layers)
 * @param unsupported deck rules the engine has no check for (e.g. max width, adjacent-sides
 *                    enclosure), as readable text; they are reported, not checked
 */
public record RuleSet(String option, List<Rule> rules, Map<String, RuleRef> refs, Set<String> layers,
        List<String> unsupported) {

    /** Copies the collections. */
    public RuleSet {
        rules = List.copyOf(rules);
        refs = Map.copyOf(refs);
        layers = Set.copyOf(layers);
        unsupported = List.copyOf(unsupported);
    }

    /** The deck rule behind an engine rule id. */
    public RuleRef ref(String ruleId) {
        RuleRef r = refs.get(ruleId);
        if (r == null) {
            throw new NoSuchElementException("no engine rule '" + ruleId + "' in the rules of option " + option);
        }
        return r;
    }
}
