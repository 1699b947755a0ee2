/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.migration;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.TreeMap;

import org.apertura.engine.check.Axis;
import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.MeasureKind;
import org.apertura.engine.check.MeasureReport;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.report.model.Histogram;
import org.apertura.report.model.Quantity;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;

/**
 * Measured widths, spacings and pitches of layers, from the engine's measure mode, as report histograms with
 * the rule values of the source and the target option drawn over them.
 *
 * <p>Width and spacing take every measured value along any axis (including notches as spacings); pitch takes
 * the values along the layer's pitch axis (across its preferred direction) and is left out for layers without
 * one. Values are measured below three times the largest width, spacing or pitch rule of the layer under the two
 * options, so that the histogram shows the region around the rules; larger values are not listed. Rule values
 * are the larger of the x and y values where they differ. Everything is converted to nm.
 */
public final class Histograms {

    private Histograms() {
    }

    /**
     * Measures {@code layers} of the layout.
     *
     * @param polygons the layout's polygons by deck layer, in database units
     * @param from     the source option, or the checked option
     * @param to       the target option; empty for a plain check (then only the source rule is drawn)
     */
    public static List<Histogram> measure(CheckEngine engine, ResolvedDeck deck, String from, Optional<String> to,
            Collection<String> layers, Map<String, List<Polygon>> polygons) {
        double u = deck.databaseUnitNanometres().doubleValue();
        List<Histogram> out = new ArrayList<>();
        for (String name : layers) {
            List<Polygon> ps = polygons.getOrDefault(name, List.of());
            Layer layer = deck.layer(name).orElse(null);
            if (ps.isEmpty() || layer == null) {
                continue;
            }
            long range = 0;
            for (RuleKind k : List.of(RuleKind.WIDTH, RuleKind.SPACING, RuleKind.PITCH)) {
                range = Math.max(range, rule(deck, from, name, k).orElse(0));
                if (to.isPresent()) {
                    range = Math.max(range, rule(deck, to.get(), name, k).orElse(0));
                }
            }
            if (range <= 0) {
                continue;
            }
            Map<String, MergedLayer> merged = engine.merge(new TreeMap<>(Map.of(name, ps)));
            MeasureReport m = engine.measure(merged, 3 * range);
            add(out, deck, from, to, name, Quantity.WIDTH, RuleKind.WIDTH, u,
                    m.distribution(name, MeasureKind.WIDTH, Axis.ANY).values());
            add(out, deck, from, to, name, Quantity.SPACING, RuleKind.SPACING, u,
                    concat(m.distribution(name, MeasureKind.SPACING, Axis.ANY).values(),
                            m.distribution(name, MeasureKind.NOTCH, Axis.ANY).values()));
            if (layer.direction() != Direction.NONE) {
                Axis axis = Axis.valueOf(layer.direction().pitchAxis().name());
                add(out, deck, from, to, name, Quantity.PITCH, RuleKind.PITCH, u,
                        m.distribution(name, MeasureKind.PITCH, axis).values());
            }
        }
        return out;
    }

    private static void add(List<Histogram> out, ResolvedDeck deck, String from, Optional<String> to, String layer,
            Quantity q, RuleKind kind, double u, double[] dbu) {
        if (dbu.length == 0) {
            return;
        }
        double[] nm = new double[dbu.length];
        for (int i = 0; i < dbu.length; i++) {
            nm[i] = dbu[i] * u;
        }
        OptionalDouble old = nm(rule(deck, from, layer, kind), u);
        OptionalDouble now = to.isPresent() ? nm(rule(deck, to.get(), layer, kind), u) : OptionalDouble.empty();
        out.add(new Histogram(layer, q, nm, old, now));
    }

    private static java.util.OptionalLong rule(ResolvedDeck deck, String option, String layer, RuleKind k) {
        Optional<RuleValue> v = deck.value(option, layer, k);
        return v.isPresent() ? java.util.OptionalLong.of(v.get().max()) : java.util.OptionalLong.empty();
    }

    private static OptionalDouble nm(java.util.OptionalLong v, double u) {
        return v.isPresent() ? OptionalDouble.of(v.getAsLong() * u) : OptionalDouble.empty();
    }

    private static double[] concat(double[] a, double[] b) {
        double[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
