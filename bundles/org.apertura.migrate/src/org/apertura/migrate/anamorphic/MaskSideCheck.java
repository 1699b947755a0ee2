/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.anamorphic;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.Violation;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.AxisValue;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.apertura.migrate.shrink.ShrinkHeadroom;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;

/**
 * The layout's features at mask scale against the deck's mask-side minimums, per axis.
 * <p>
 * A wafer size s measured along x is {@code s · demagnification x} on the mask (likewise y). The
 * mask-side minimum M along x is met when {@code s ≥ M / demag x} on the wafer. The engine checks the
 * layer with width (for {@link RuleKind#MASK_WIDTH}) or spacing (for {@link RuleKind#MASK_SPACING})
 * rules of {@code probe ·} these wafer-side values; each place found is given to the axis its closest
 * points are separated along (the larger component), its size is taken to the mask, and the smallest
 * size per axis gives the margin. The axis with the smaller margin binds: on a 4/8 anamorphic option
 * the 8x axis has four times the room, so the 4x axis usually binds.
 */
public final class MaskSideCheck {

    private MaskSideCheck() {
    }

    /** The mask-side checks of {@code layers} under {@code option}; layers without such rules are skipped. */
    public static List<MaskSideResult> check(ResolvedDeck deck, String option, Collection<String> layers,
            Map<String, MergedLayer> merged, CheckEngine engine, int probe) {
        LithographyOption o = deck.option(option).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + option + "'"));
        double dbu = deck.databaseUnitNanometres().doubleValue();
        List<MaskSideResult> out = new ArrayList<>();
        for (String layer : layers) {
            LayerRules lr = deck.rules(option, layer);
            MergedLayer m = merged.getOrDefault(layer, RegionMerger.merge(layer, List.of()));
            for (RuleKind kind : List.of(RuleKind.MASK_WIDTH, RuleKind.MASK_SPACING)) {
                Optional<RuleValue> v = lr.value(kind);
                if (v.isEmpty()) {
                    continue;
                }
                long wx = (long) Math.ceil(v.get().x() / o.demagnificationX());
                long wy = (long) Math.ceil(v.get().y() / o.demagnificationY());
                AxisValue limit = new AxisValue(Math.max(1, wx) * probe, Math.max(1, wy) * probe);
                String id = layer + "/" + (kind == RuleKind.MASK_WIDTH ? "mask-width" : "mask-spacing");
                Rule rule = kind == RuleKind.MASK_WIDTH ? new WidthRule(id, layer, limit, Metric.EUCLIDEAN)
                        : new SpacingRule(id, layer, limit, Metric.EUCLIDEAN, Optional.empty());
                List<Violation> found = engine.checkMerged(Map.of(layer, m), List.of(rule));
                double[] min = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY};
                int[] bad = new int[2];
                for (Violation f : found) {
                    double[] d = separationOf(f);
                    int axis = Math.abs(d[0]) >= Math.abs(d[1]) ? 0 : 1;
                    double demag = axis == 0 ? o.demagnificationX() : o.demagnificationY();
                    long maskMin = axis == 0 ? v.get().x() : v.get().y();
                    min[axis] = Math.min(min[axis], f.measured());
                    if (f.measured() * demag < maskMin) {
                        bad[axis]++;
                    }
                }
                MaskSideAxis x = axis(Axis.X, o.demagnificationX(), min[0], v.get().x(), bad[0], dbu);
                MaskSideAxis y = axis(Axis.Y, o.demagnificationY(), min[1], v.get().y(), bad[1], dbu);
                Optional<Axis> binding;
                if (x.margin().isEmpty() && y.margin().isEmpty()) {
                    binding = Optional.empty();
                } else if (y.margin().isEmpty()) {
                    binding = Optional.of(Axis.X);
                } else if (x.margin().isEmpty()) {
                    binding = Optional.of(Axis.Y);
                } else {
                    binding = Optional.of(x.margin().getAsDouble() <= y.margin().getAsDouble() ? Axis.X : Axis.Y);
                }
                out.add(new MaskSideResult(layer, kind == RuleKind.MASK_WIDTH ? "mask-width" : "mask-spacing", option,
                        x, y, binding));
            }
        }
        return out;
    }

    private static double[] separationOf(Violation f) {
        double[] d = ShrinkHeadroom.separation(f);
        if (d != null) {
            return d;
        }
        return new double[] {f.marker().width(), f.marker().height()};
    }

    private static MaskSideAxis axis(Axis axis, double demag, double minDbu, long maskMinDbu, int bad, double dbu) {
        OptionalDouble wafer = Double.isFinite(minDbu) ? OptionalDouble.of(minDbu * dbu) : OptionalDouble.empty();
        OptionalDouble margin = Double.isFinite(minDbu) ? OptionalDouble.of(minDbu * demag / maskMinDbu)
                : OptionalDouble.empty();
        return new MaskSideAxis(axis, demag, wafer, maskMinDbu * dbu, margin, bad);
    }
}
