/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.check;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalLong;
import java.util.Set;
import java.util.TreeSet;

import org.apertura.engine.rule.AreaRule;
import org.apertura.engine.rule.AxisValue;
import org.apertura.engine.rule.DensityRule;
import org.apertura.engine.rule.EnclosureRule;
import org.apertura.engine.rule.EndOfLineRule;
import org.apertura.engine.rule.MaskRule;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.PitchRule;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.SpacingTable;
import org.apertura.engine.rule.WidthRule;
import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.Density;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.EndOfLine;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;

/**
 * Turns the resolved rules of one deck option into check-engine rules, all in database units.
 * <p>
 * Mapping: width (Euclidean metric), spacing with its metric and its width/run-length table, pitch of
 * line layers with a preferred direction, area, end-of-line, enclosure (all sides, and opposite sides
 * when the deck gives that pair), density, and for litho-etch layers with 2 or 3 masks the same-mask
 * spacing as a colouring rule. Where the engine takes one value and the deck gives two per axis
 * (spacing tables, end-of-line, enclosure, area) the larger is used, which can only add violations.
 * Rules the engine cannot check (max width, the adjacent-sides enclosure pair, colouring with more
 * than three masks) are listed in {@link RuleSet#unsupported()}. Mask-side minimums are not engine
 * rules: the anamorphic mask check handles them.
 */
public final class EngineRules {

    private EngineRules() {
    }

    /** The engine rules of {@code layers} under {@code option}. */
    public static RuleSet of(ResolvedDeck deck, String option, Collection<String> layers) {
        return build(deck, option, layers, 1, false);
    }

    /**
     * Probe rules for measuring: every length multiplied by {@code factor} (areas by its square), so
     * that the violations of the probe are every place that a uniform shrink to {@code 1/factor}
     * would make violate. Density and colouring rules are left out (a uniform shrink does not
     * change the fraction of a window that is covered, and colouring follows the spacing).
     */
    public static RuleSet probe(ResolvedDeck deck, String option, Collection<String> layers, long factor) {
        if (factor < 1) {
            throw new IllegalArgumentException("probe factor must be at least 1, got " + factor);
        }
        return build(deck, option, layers, factor, true);
    }

    private static RuleSet build(ResolvedDeck deck, String option, Collection<String> layers, long k,
            boolean probe) {
        if (deck.option(option).isEmpty()) {
            throw new IllegalArgumentException("deck '" + deck.technology() + "' has no option '" + option + "'");
        }
        List<Rule> rules = new ArrayList<>();
        Map<String, RuleRef> refs = new LinkedHashMap<>();
        Set<String> needed = new TreeSet<>();
        List<String> unsupported = new ArrayList<>();
        for (String name : new LinkedHashSet<>(layers)) {
            Layer layer = deck.layer(name).orElseThrow(() -> new IllegalArgumentException(
                    "deck '" + deck.technology() + "' has no layer '" + name + "'"));
            LayerRules lr = deck.rules(option, name);
            needed.add(name);
            for (RuleKind kind : lr.values().keySet()) {
                RuleValue v = lr.values().get(kind);
                RuleRef ref = RuleRef.of(name, kind);
                Rule rule = switch (kind) {
                    case WIDTH -> new WidthRule(ref.id(), name, axis(v, k), Metric.EUCLIDEAN);
                    case SPACING -> spacing(ref.id(), name, v, lr, k);
                    case PITCH -> layer.direction() == Direction.NONE ? null
                            : new PitchRule(ref.id(), name, direction(layer.direction()),
                                    k * v.along(layer.direction().pitchAxis()));
                    case AREA -> new AreaRule(ref.id(), name, k * k * v.max());
                    case SAME_MASK_SPACING -> probe ? null : maskRule(ref, lr, v, unsupported);
                    case MAX_WIDTH -> {
                        unsupported.add(name + " max width (no engine check)");
                        yield null;
                    }
                    default -> null; // end-of-line parts, mask-side and density sizes: below
                };
                if (rule != null) {
                    rules.add(rule);
                    refs.put(rule.id(), ref);
                }
            }
            if (lr.endOfLine().isPresent()) {
                Rule eol = endOfLine(name, lr.endOfLine().get(), k);
                if (eol != null) {
                    rules.add(eol);
                    refs.put(eol.id(), new RuleRef(name, "end-of-line", Optional.empty()));
                }
            }
            for (Enclosure e : lr.enclosures()) {
                RuleRef ref = new RuleRef(name, "enclosure:" + e.innerLayer(), Optional.empty());
                OptionalLong pair = OptionalLong.empty();
                if (e.pair() == Enclosure.SidePair.OPPOSITE) {
                    pair = OptionalLong.of(k * e.pairValue().orElseThrow().max());
                } else if (e.pair() == Enclosure.SidePair.ADJACENT) {
                    unsupported.add(name + " enclosure of " + e.innerLayer() + " on adjacent sides (no engine check)");
                }
                rules.add(new EnclosureRule(ref.id(), e.innerLayer(), name, k * e.allSides().max(), pair));
                refs.put(ref.id(), ref);
                needed.add(e.innerLayer());
            }
            if (!probe && lr.density().isPresent()) {
                Density d = lr.density().get();
                RuleRef ref = new RuleRef(name, "density", Optional.empty());
                rules.add(new DensityRule(ref.id(), name, d.window(), d.step(), d.minimum().orElse(0),
                        d.maximum().orElse(1)));
                refs.put(ref.id(), ref);
            }
        }
        return new RuleSet(option, rules, refs, needed, unsupported);
    }

    private static AxisValue axis(RuleValue v, long k) {
        return new AxisValue(k * v.x(), k * v.y());
    }

    private static org.apertura.engine.rule.Direction direction(Direction d) {
        return d == Direction.HORIZONTAL ? org.apertura.engine.rule.Direction.HORIZONTAL
                : org.apertura.engine.rule.Direction.VERTICAL;
    }

    private static Rule maskRule(RuleRef ref, LayerRules lr, RuleValue v, List<String> unsupported) {
        if (!lr.patterning().isMultiMask()) {
            return null;
        }
        int masks = lr.patterning().masks();
        if (masks != 2 && masks != 3) {
            unsupported.add(ref.layer() + " colouring with " + masks + " masks (engine colours 2 or 3)");
            return null;
        }
        return new MaskRule(ref.id(), ref.layer(), v.max(), masks);
    }

    private static Rule endOfLine(String layer, EndOfLine eol, long k) {
        if (eol.tipToTip().isEmpty() && eol.tipToSide().isEmpty()) {
            return null;
        }
        long tip = k * eol.tipLength().max() + (eol.tipLengthInclusive() ? 1 : 0);
        // a missing part becomes 1 database unit, which distinct merged shapes never undercut
        long t2t = eol.tipToTip().map(v -> k * v.max()).orElse(1L);
        long t2s = eol.tipToSide().map(v -> k * v.max()).orElse(1L);
        return new EndOfLineRule(layer + "/end-of-line", layer, tip, t2t, t2s);
    }

    private static Rule spacing(String id, String layer, RuleValue base, LayerRules lr, long k) {
        Metric metric = lr.spacingMetric() == SpacingMetric.PROJECTION ? Metric.PROJECTION : Metric.EUCLIDEAN;
        AxisValue minimum = axis(base, k);
        if (lr.spacingTable().isEmpty()) {
            return new SpacingRule(id, layer, minimum, metric, Optional.empty());
        }
        return new SpacingRule(id, layer, minimum, metric, Optional.of(table(base, lr.spacingTable(), k)));
    }

    /**
     * The engine's grid table holding, at every (width, run) threshold pair, the largest spacing of
     * the base value and every deck row that applies there. Exclusive thresholds ({@code >} t) become
     * t + 1 on the integer grid, so the lookup is exact.
     */
    static SpacingTable table(RuleValue base, List<ConditionalSpacing> rows, long k) {
        TreeSet<Long> widths = new TreeSet<>(List.of(0L));
        TreeSet<Long> runs = new TreeSet<>(List.of(0L));
        for (ConditionalSpacing r : rows) {
            if (r.width().isPresent()) {
                widths.add(threshold(r.width().getAsLong(), r.widthInclusive(), k));
            }
            if (r.runLength().isPresent()) {
                runs.add(threshold(r.runLength().getAsLong(), r.runLengthInclusive(), k));
            }
        }
        List<List<Long>> values = new ArrayList<>();
        for (long w : widths) {
            List<Long> row = new ArrayList<>();
            for (long run : runs) {
                long v = k * base.max();
                for (ConditionalSpacing r : rows) {
                    boolean wOk = r.width().isEmpty() || threshold(r.width().getAsLong(), r.widthInclusive(), k) <= w;
                    boolean rOk = r.runLength().isEmpty()
                            || threshold(r.runLength().getAsLong(), r.runLengthInclusive(), k) <= run;
                    if (wOk && rOk) {
                        v = Math.max(v, k * r.spacing().max());
                    }
                }
                row.add(Math.max(1, v));
            }
            values.add(row);
        }
        return new SpacingTable(List.copyOf(widths), List.copyOf(runs), values);
    }

    private static long threshold(long t, boolean inclusive, long k) {
        return Math.max(0, k * t + (inclusive ? 0 : 1));
    }
}
