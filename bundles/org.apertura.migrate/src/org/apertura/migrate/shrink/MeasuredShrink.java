/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.shrink;

import java.util.ArrayList;
import java.util.Collection;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.engine.check.Axis;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.Extreme;
import org.apertura.engine.check.MeasureKind;
import org.apertura.engine.check.MeasureReport;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Box;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.AxisValue;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.PitchRule;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.migrate.check.RuleRef;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;

/**
 * Uniform shrink headroom from the engine's measure mode ({@link CheckEngine#measure}): the smallest
 * uniform linear scale factor s such that every measured width, spacing (notches included) and pitch
 * times s still meets its rule under the option, and every shape's area times s² its area rule.
 * <p>
 * Each measured value m with m ≥ R (R the rule value along the measured axis) allows s ≥ R/m, so the
 * factor is R over the smallest such m: that place limits the shrink. Values already below their rule
 * fail at scale 1, are not new violations and are left out. Values between vertical edges are held to
 * the rule's x value, between horizontal edges to its y value, other pairs (corners, any-angle edges)
 * to the larger of the two (with a projection metric, spacing ignores corner pairs as the check does).
 * Pitch is compared along the layer's pitch axis only. Areas come from the merged shapes: s ≥ √(R/A)
 * for the smallest area A ≥ R.
 * <p>
 * The measuring range starts at 4 times the layer's largest rule value and doubles, up to
 * {@value #MAX_SPAN} times it or the layer's extent, until each rule has a value at or above it; a
 * rule with none is reported {@link Headroom#bounded() bounded} at R over the final range (nothing
 * limits the shrink down to that factor). Measure mode records the place of each distribution's
 * smallest value only; when that value already fails the rule, the limiting place is found by one
 * check of the layer with the limiting value as the rule (and left empty if the check does not meet
 * it). Spacing-table rows are not applied here: layers with a spacing table keep the probe's spacing
 * headroom ({@link ShrinkHeadroom}).
 */
public final class MeasuredShrink {

    /** The measuring range grows to at most this multiple of the layer's largest rule value. */
    public static final int MAX_SPAN = 64;

    private static final double TOLERANCE = 1e-9;

    private MeasuredShrink() {
    }

    /** One rule to hold: measured kinds and the required value (database units) per measured axis. */
    private record Requirement(String rule, List<MeasureKind> kinds, Map<Axis, Double> required) {
    }

    /**
     * The uniform headroom of every width, spacing (without a table), pitch and area rule of
     * {@code layers} under {@code option}.
     *
     * @param merged the merged layers by deck layer name; a missing layer counts as empty
     * @return one {@link ShrinkScope#UNIFORM} entry per rule the layer has, layers in the given order
     */
    public static List<Headroom> uniform(ResolvedDeck deck, String option, Collection<String> layers,
            Map<String, MergedLayer> merged, CheckEngine engine) {
        double dbu = deck.databaseUnitNanometres().doubleValue();
        List<Headroom> out = new ArrayList<>();
        for (String name : layers) {
            Layer layer = deck.layer(name).orElseThrow(() -> new IllegalArgumentException(
                    "deck '" + deck.technology() + "' has no layer '" + name + "'"));
            LayerRules lr = deck.rules(option, name);
            MergedLayer m = merged.get(name);
            if (m == null) {
                m = RegionMerger.merge(name, List.of());
            }
            List<Requirement> reqs = requirements(layer, lr);
            if (!reqs.isEmpty()) {
                out.addAll(lengths(name, m, reqs, engine, dbu));
            }
            Optional<RuleValue> area = lr.value(RuleKind.AREA);
            if (area.isPresent()) {
                out.add(area(name, m, area.get().max(), dbu));
            }
        }
        return out;
    }

    private static List<Requirement> requirements(Layer layer, LayerRules lr) {
        List<Requirement> reqs = new ArrayList<>();
        lr.value(RuleKind.WIDTH).ifPresent(v -> reqs.add(new Requirement(RuleRef.nameOf(RuleKind.WIDTH),
                List.of(MeasureKind.WIDTH), perAxis(v, true))));
        if (lr.spacingTable().isEmpty()) {
            boolean corners = lr.spacingMetric() != SpacingMetric.PROJECTION;
            lr.value(RuleKind.SPACING).ifPresent(v -> reqs.add(new Requirement(RuleRef.nameOf(RuleKind.SPACING),
                    List.of(MeasureKind.SPACING, MeasureKind.NOTCH), perAxis(v, corners))));
        }
        if (layer.direction() != Direction.NONE) {
            lr.value(RuleKind.PITCH).ifPresent(v -> {
                org.apertura.rules.resolved.Axis a = layer.direction().pitchAxis();
                Map<Axis, Double> r = new EnumMap<>(Axis.class);
                r.put(a == org.apertura.rules.resolved.Axis.X ? Axis.X : Axis.Y, (double) v.along(a));
                reqs.add(new Requirement(RuleRef.nameOf(RuleKind.PITCH), List.of(MeasureKind.PITCH), r));
            });
        }
        return reqs;
    }

    private static Map<Axis, Double> perAxis(RuleValue v, boolean corners) {
        Map<Axis, Double> r = new EnumMap<>(Axis.class);
        r.put(Axis.X, (double) v.x());
        r.put(Axis.Y, (double) v.y());
        if (corners) {
            r.put(Axis.OTHER, (double) v.max());
        }
        return r;
    }

    /** The limiting place found so far for one requirement. */
    private static final class Limit {
        double factor = -1;
        double measured;
        double required;
        Optional<Box> place = Optional.empty();
        MeasureKind kind;
        Axis axis;
        boolean located;

        void offer(double f, double m, double r, MeasureKind k, Axis a, Optional<Extreme> min) {
            boolean atMinimum = min.isPresent() && min.get().value() == m;
            Optional<Box> p = atMinimum ? Optional.of(min.get().place()) : Optional.empty();
            boolean better = f > factor + TOLERANCE
                    || Math.abs(f - factor) <= TOLERANCE && p.isPresent() && (place.isEmpty()
                            || p.get().compareTo(place.get()) < 0);
            if (better) {
                factor = f;
                measured = m;
                required = r;
                kind = k;
                axis = a;
                place = p;
                located = atMinimum;
            }
        }
    }

    private static List<Headroom> lengths(String name, MergedLayer m, List<Requirement> reqs, CheckEngine engine,
            double dbu) {
        double largest = reqs.stream().flatMap(r -> r.required().values().stream()).mapToDouble(d -> d).max()
                .orElse(1);
        long base = Math.max(2, (long) Math.ceil(largest));
        Box bounds = m.bounds();
        long cap = Math.max(4 * base + 1, Math.min((long) MAX_SPAN * base + 1,
                bounds == null ? 0 : Math.max(bounds.width(), bounds.height()) + 1));
        long range = 4 * base + 1;
        List<Limit> limits;
        while (true) {
            MeasureReport report = engine.measure(Map.of(name, m), range);
            limits = new ArrayList<>();
            boolean allFound = true;
            for (Requirement req : reqs) {
                Limit limit = new Limit();
                for (MeasureKind kind : req.kinds()) {
                    for (Map.Entry<Axis, Double> e : req.required().entrySet()) {
                        MeasureReport.Distribution d = report.distribution(name, kind, e.getKey());
                        double r = e.getValue();
                        double[] values = d.sortedValues();
                        for (double v : values) {
                            if (v >= r - TOLERANCE && v > 0) {
                                limit.offer(r / v, v, r, kind, e.getKey(), d.minimum());
                                break;
                            }
                        }
                    }
                }
                allFound &= limit.factor >= 0;
                limits.add(limit);
            }
            if (allFound || range >= cap) {
                break;
            }
            range = Math.min(cap, 2 * range - 1);
        }
        List<Headroom> out = new ArrayList<>();
        for (int i = 0; i < reqs.size(); i++) {
            Requirement req = reqs.get(i);
            Limit limit = limits.get(i);
            if (limit.factor < 0) {
                double floor = req.required().values().stream().mapToDouble(d -> d).max().orElse(0) / range;
                out.add(new Headroom(name, req.rule(), ShrinkScope.UNIFORM, Math.min(1, floor), true,
                        Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty()));
                continue;
            }
            Optional<Box> place = limit.located ? limit.place : locate(name, m, req.rule(), limit, engine);
            out.add(new Headroom(name, req.rule(), ShrinkScope.UNIFORM, Math.min(1, limit.factor), false, place,
                    OptionalDouble.of(limit.measured * dbu), OptionalDouble.of(limit.required * dbu)));
        }
        return out;
    }

    /**
     * The place of a limiting value that is not its distribution's smallest: the first violation (in
     * the engine's order) of a rule set just above the value whose measured value equals it.
     */
    private static Optional<Box> locate(String name, MergedLayer m, String rule, Limit limit, CheckEngine engine) {
        long t = (long) Math.floor(limit.measured) + 1;
        String id = name + "/locate-" + rule;
        Rule probe = switch (limit.kind) {
            case WIDTH -> new WidthRule(id, name, AxisValue.of(t), Metric.EUCLIDEAN);
            case SPACING, NOTCH -> new SpacingRule(id, name, AxisValue.of(t), Metric.EUCLIDEAN, Optional.empty());
            // a pitch along y is the pitch of horizontal lines
            case PITCH -> new PitchRule(id, name, limit.axis == Axis.Y ? org.apertura.engine.rule.Direction.HORIZONTAL
                    : org.apertura.engine.rule.Direction.VERTICAL, t);
        };
        for (Violation v : engine.checkMerged(Map.of(name, m), List.of(probe))) {
            if (Math.abs(v.measured() - limit.measured) <= 1e-6) {
                return Optional.of(v.marker());
            }
        }
        return Optional.empty();
    }

    private static Headroom area(String name, MergedLayer m, long required, double dbu) {
        double best = Double.POSITIVE_INFINITY;
        int at = -1;
        for (int s = 0; s < m.shapeCount(); s++) {
            double a = m.area(s);
            if (a >= required && (a < best || a == best && m.bounds(s).compareTo(m.bounds(at)) < 0)) {
                best = a;
                at = s;
            }
        }
        String rule = RuleRef.nameOf(RuleKind.AREA);
        if (at < 0) {
            // no shape can newly fail: nothing limits the shrink
            return new Headroom(name, rule, ShrinkScope.UNIFORM, 0, true, Optional.empty(), OptionalDouble.empty(),
                    OptionalDouble.empty());
        }
        return new Headroom(name, rule, ShrinkScope.UNIFORM, Math.min(1, Math.sqrt(required / best)), false,
                Optional.of(m.bounds(at)), OptionalDouble.of(best * dbu * dbu), OptionalDouble.of(required * dbu * dbu));
    }
}
