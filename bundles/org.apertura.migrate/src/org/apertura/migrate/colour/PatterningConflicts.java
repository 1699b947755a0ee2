/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.colour;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.colour.ConflictGraph;
import org.apertura.engine.colour.Decomposition;
import org.apertura.engine.geom.Box;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.MaskRule;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;

/**
 * Colouring of the layers whose multiple patterning changes: for a layer leaving it, the conflicts of
 * its source decomposition (they vanish); for a layer entering it, the decomposition under the target
 * with its odd cycles (two masks) or unresolved conflicts (three masks), by the engine's
 * {@link Decomposition}. Layers single-mask under both options are not listed.
 */
public final class PatterningConflicts {

    private PatterningConflicts() {
    }

    /** The colouring changes of {@code layers} from {@code from} to {@code to}. */
    public static List<ColouringChange> analyse(ResolvedDeck deck, String from, String to, Collection<String> layers,
            Map<String, MergedLayer> merged, CheckEngine engine) {
        List<ColouringChange> out = new ArrayList<>();
        for (String layer : layers) {
            LayerRules a = deck.rules(from, layer);
            LayerRules b = deck.rules(to, layer);
            boolean ma = a.patterning().isMultiMask(), mb = b.patterning().isMultiMask();
            if (!ma && !mb) {
                continue;
            }
            Transition t = ma && mb ? Transition.STAYING : ma ? Transition.LEAVING : Transition.ENTERING;
            MergedLayer m = merged.getOrDefault(layer, RegionMerger.merge(layer, List.of()));
            List<String> notes = new ArrayList<>();
            Optional<Colouring> src = ma ? colour(deck, a, m, engine, notes) : Optional.empty();
            Optional<Colouring> tgt = mb ? colour(deck, b, m, engine, notes) : Optional.empty();
            out.add(new ColouringChange(layer, t, src, tgt, String.join("; ", notes)));
        }
        return out;
    }

    private static Optional<Colouring> colour(ResolvedDeck deck, LayerRules r, MergedLayer m, CheckEngine engine,
            List<String> notes) {
        int masks = r.patterning().masks();
        if (r.value(RuleKind.SAME_MASK_SPACING).isEmpty()) {
            notes.add("no same-mask spacing for " + r.layer() + " under " + r.option() + ": not decomposed");
            return Optional.empty();
        }
        if (masks != 2 && masks != 3) {
            notes.add(r.layer() + " under " + r.option() + " uses " + masks + " masks: the engine colours 2 or 3");
            return Optional.empty();
        }
        long distance = r.value(RuleKind.SAME_MASK_SPACING).orElseThrow().max();
        ConflictGraph g = engine.conflictGraph(m, distance);
        Decomposition d = engine.decompose(m, new MaskRule(r.layer() + "/same-mask-spacing", r.layer(), distance, masks));
        List<Box> conflicts = new ArrayList<>();
        for (List<Integer> cycle : d.oddCycles()) {
            Box box = null;
            for (int s : cycle) {
                box = box == null ? m.bounds(s) : box.union(m.bounds(s));
            }
            conflicts.add(box);
        }
        for (ConflictGraph.Edge e : d.unresolved()) {
            conflicts.add(m.bounds(e.a()).union(m.bounds(e.b())));
        }
        Integer[] perMask = new Integer[masks];
        java.util.Arrays.fill(perMask, 0);
        for (int s = 0; s < m.shapeCount(); s++) {
            perMask[d.mask(s)]++;
        }
        return Optional.of(new Colouring(r.option(), masks, deck.toNanometres(distance), m.shapeCount(),
                g.edges().size(), d.colourable(), conflicts, List.of(perMask)));
    }
}
