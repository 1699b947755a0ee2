/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.delta;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.apertura.migrate.check.RuleRef;
import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;

/**
 * Compares the rules of layers between two options of one deck.
 * <p>
 * Every scalar rule kind, each enclosure (all sides and the pair value), each spacing-table row (by
 * position) and the density bounds are compared, lengths in nm and areas in nm². A rule whose value
 * differs per axis under either option gives one row per axis. The status says whether the target
 * asks more (tightened) or less (relaxed) of the layout: a larger value tightens minimum rules and the
 * end-of-line tip length; it relaxes max width, the density maximum, and the density window and step.
 * <p>
 * The cause of a change is decided in this order: {@link DeltaCause#ANAMORPHIC_AXIS} for per-axis
 * rows of an anamorphic target; {@link DeltaCause#PATTERNING} when the layer's patterning differs;
 * {@link DeltaCause#OPTICS} when the new length equals the old times
 * {@code (λt/NAt)/(λs/NAs)} within one manufacturing grid step or 1 % (areas: their square roots);
 * otherwise {@link DeltaCause#EXPLICIT_OVERRIDE}.
 */
public final class DeckDelta {

    private DeckDelta() {
    }

    /** The optical length scale from source to target: {@code (λt/NAt) / (λs/NAs)}. */
    public static double opticalScale(LithographyOption source, LithographyOption target) {
        return (target.wavelengthNm() / target.numericalAperture()) / (source.wavelengthNm() / source.numericalAperture());
    }

    /**
     * Compares {@code layers} between option {@code from} and option {@code to}.
     *
     * @throws IllegalArgumentException if an option or layer is not in the deck
     */
    public static List<RuleDelta> compare(ResolvedDeck deck, String from, String to, Collection<String> layers) {
        LithographyOption src = option(deck, from);
        LithographyOption tgt = option(deck, to);
        double scale = opticalScale(src, tgt);
        double grid = deck.toNanometres(deck.manufacturingGrid());
        List<RuleDelta> out = new ArrayList<>();
        for (String layer : layers) {
            if (deck.layer(layer).isEmpty()) {
                throw new IllegalArgumentException("deck '" + deck.technology() + "' has no layer '" + layer + "'");
            }
            LayerRules a = deck.rules(from, layer);
            LayerRules b = deck.rules(to, layer);
            boolean patterningChanged = !a.patterning().equals(b.patterning());
            Context c = new Context(layer, scale, grid, patterningChanged, tgt.isAnamorphic(), out);
            for (Map.Entry<String, Pair> e : collect(deck, a, b).entrySet()) {
                c.add(e.getKey(), e.getValue());
            }
        }
        return out;
    }

    private static LithographyOption option(ResolvedDeck deck, String name) {
        return deck.option(name).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + name + "'"));
    }

    /** Old and new values of one rule: per-axis lengths (nm), areas (nm²) or fractions. */
    private record Pair(double[] oldXY, double[] newXY, String unit, boolean largerIsTighter, boolean scales,
            boolean isArea) {
    }

    private static Map<String, Pair> collect(ResolvedDeck deck, LayerRules a, LayerRules b) {
        Map<String, Pair> m = new LinkedHashMap<>();
        for (RuleKind k : RuleKind.values()) {
            if (a.has(k) || b.has(k)) {
                boolean area = k.isArea();
                boolean tighter = !(k == RuleKind.MAX_WIDTH || k == RuleKind.DENSITY_WINDOW || k == RuleKind.DENSITY_STEP);
                boolean scales = !(k == RuleKind.DENSITY_WINDOW || k == RuleKind.DENSITY_STEP
                        || k == RuleKind.MASK_WIDTH || k == RuleKind.MASK_SPACING);
                m.put(RuleRef.nameOf(k), new Pair(nm(deck, a.value(k).orElse(null), area),
                        nm(deck, b.value(k).orElse(null), area), area ? "nm2" : "nm", tighter, scales, area));
            }
        }
        for (Enclosure e : a.enclosures()) {
            enclosure(deck, m, e, b.enclosureOf(e.innerLayer()).orElse(null), false);
        }
        for (Enclosure e : b.enclosures()) {
            if (a.enclosureOf(e.innerLayer()).isEmpty()) {
                enclosure(deck, m, e, null, true);
            }
        }
        int rows = Math.max(a.spacingTable().size(), b.spacingTable().size());
        for (int i = 0; i < rows; i++) {
            ConditionalSpacing ra = i < a.spacingTable().size() ? a.spacingTable().get(i) : null;
            ConditionalSpacing rb = i < b.spacingTable().size() ? b.spacingTable().get(i) : null;
            m.put("spacing-table:" + (i + 1), new Pair(nm(deck, ra == null ? null : ra.spacing(), false),
                    nm(deck, rb == null ? null : rb.spacing(), false), "nm", true, true, false));
        }
        if (a.density().isPresent() || b.density().isPresent()) {
            m.put("density-min", new Pair(fraction(a.density().map(d -> d.minimum()).orElse(OptionalDouble.empty())),
                    fraction(b.density().map(d -> d.minimum()).orElse(OptionalDouble.empty())), "", true, false, false));
            m.put("density-max", new Pair(fraction(a.density().map(d -> d.maximum()).orElse(OptionalDouble.empty())),
                    fraction(b.density().map(d -> d.maximum()).orElse(OptionalDouble.empty())), "", false, false, false));
        }
        return m;
    }

    private static void enclosure(ResolvedDeck deck, Map<String, Pair> m, Enclosure e, Enclosure other,
            boolean onlyTarget) {
        Enclosure src = onlyTarget ? null : e;
        Enclosure tgt = onlyTarget ? e : other;
        String key = "enclosure:" + e.innerLayer();
        m.put(key, new Pair(nm(deck, src == null ? null : src.allSides(), false),
                nm(deck, tgt == null ? null : tgt.allSides(), false), "nm", true, true, false));
        RuleValue sp = src == null ? null : src.pairValue().orElse(null);
        RuleValue tp = tgt == null ? null : tgt.pairValue().orElse(null);
        if (sp != null || tp != null) {
            m.put(key + ":pair", new Pair(nm(deck, sp, false), nm(deck, tp, false), "nm", true, true, false));
        }
    }

    private static double[] nm(ResolvedDeck deck, RuleValue v, boolean area) {
        if (v == null) {
            return null;
        }
        double u = deck.databaseUnitNanometres().doubleValue();
        double f = area ? u * u : u;
        return new double[] {v.x() * f, v.y() * f};
    }

    private static double[] fraction(OptionalDouble v) {
        return v.isPresent() ? new double[] {v.getAsDouble(), v.getAsDouble()} : null;
    }

    private record Context(String layer, double scale, double grid, boolean patterningChanged, boolean anamorphic,
            List<RuleDelta> out) {

        void add(String rule, Pair p) {
            boolean perAxis = (p.oldXY != null && p.oldXY[0] != p.oldXY[1]) || (p.newXY != null && p.newXY[0] != p.newXY[1]);
            if (!perAxis) {
                out.add(row(rule, AxisScope.BOTH, p, 0));
            } else {
                out.add(row(rule, AxisScope.X, p, 0));
                out.add(row(rule, AxisScope.Y, p, 1));
            }
        }

        private RuleDelta row(String rule, AxisScope axis, Pair p, int i) {
            OptionalDouble o = p.oldXY == null ? OptionalDouble.empty() : OptionalDouble.of(p.oldXY[i]);
            OptionalDouble n = p.newXY == null ? OptionalDouble.empty() : OptionalDouble.of(p.newXY[i]);
            DeltaStatus status;
            if (o.isEmpty()) {
                status = DeltaStatus.ADDED;
            } else if (n.isEmpty()) {
                status = DeltaStatus.REMOVED;
            } else if (o.getAsDouble() == n.getAsDouble()) {
                status = DeltaStatus.UNCHANGED;
            } else {
                boolean larger = n.getAsDouble() > o.getAsDouble();
                status = larger == p.largerIsTighter ? DeltaStatus.TIGHTENED : DeltaStatus.RELAXED;
            }
            return new RuleDelta(layer, rule, axis, p.unit, o, n, status, cause(status, axis, p, o, n));
        }

        private DeltaCause cause(DeltaStatus status, AxisScope axis, Pair p, OptionalDouble o, OptionalDouble n) {
            if (status == DeltaStatus.UNCHANGED) {
                return DeltaCause.NONE;
            }
            if (axis != AxisScope.BOTH && anamorphic) {
                return DeltaCause.ANAMORPHIC_AXIS;
            }
            if (patterningChanged) {
                return DeltaCause.PATTERNING;
            }
            if (o.isPresent() && n.isPresent() && p.scales) {
                double before = p.isArea ? Math.sqrt(o.getAsDouble()) : o.getAsDouble();
                double after = p.isArea ? Math.sqrt(n.getAsDouble()) : n.getAsDouble();
                double expected = before * scale;
                if (Math.abs(after - expected) <= Math.max(grid, 0.01 * expected)) {
                    return DeltaCause.OPTICS;
                }
            }
            return DeltaCause.EXPLICIT_OVERRIDE;
        }
    }
}
