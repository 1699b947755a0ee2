/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.shrink;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Segment;
import org.apertura.engine.region.MergedLayer;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleRef;
import org.apertura.migrate.check.RuleSet;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * Shrink headroom: how far the layout could be scaled down under an option before a rule that holds
 * now starts to fail.
 * <p>
 * Uniform shrink of width, spacing, pitch and area rules comes from the engine's measure mode, exact
 * and without a floor: see {@link MeasuredShrink}. Everything else — end-of-line, enclosure, spacing
 * with a width/run table, and every per-axis figure — is measured with probe rules whose lengths are
 * {@code k} times the option's (areas k²), see {@link EngineRules#probe}. Every place a rule would fail
 * at scale {@code 1/k} or above is then a probe violation carrying its measured value m; the place
 * fails at scale f when {@code f·m < R}, so it allows {@code f ≥ R/m} ({@code √(R/A)} for areas), and
 * the factor is the largest such bound — the limiting place. Places already failing at scale 1
 * (R/m &gt; 1) are not new violations and are left out. When nothing limits down to 1/k, the factor is
 * reported as 1/k and marked {@link Headroom#bounded()}. A layer's uniform figure ({@code rule = *})
 * is its most limiting rule.
 * <p>
 * Per axis (x scaled by f, y kept): for a place whose closest points are (dx, dy) apart the distance
 * becomes {@code √(f²dx² + dy²)}, which keeps R when {@code f ≥ √(R² − dy²)/|dx|}; pitches and areas
 * scale with f on their axis. For per-axis rule values the requirement of the original direction is
 * kept (exact on the axes). Spacing-table rows are probed with their thresholds multiplied by k as
 * well, which is exact for the row choice under a uniform shrink only.
 */
public final class ShrinkHeadroom {

    /** The default probe factor: places are measured down to a quarter of their size. */
    public static final int DEFAULT_PROBE = 4;

    private ShrinkHeadroom() {
    }

    /**
     * Headroom of {@code layers} under {@code option}, per rule and per layer ({@code rule = *}),
     * uniform and, when {@code perAxis}, along x and along y.
     *
     * @param merged the layout's merged layers by deck layer name (every layer the rules need)
     */
    public static List<Headroom> measure(ResolvedDeck deck, String option, Collection<String> layers,
            Map<String, MergedLayer> merged, CheckEngine engine, int probe, boolean perAxis) {
        if (probe < 2) {
            throw new IllegalArgumentException("probe factor must be at least 2, got " + probe);
        }
        RuleSet rules = EngineRules.probe(deck, option, layers, probe);
        Map<String, MergedLayer> input = new java.util.TreeMap<>();
        for (String l : rules.layers()) {
            MergedLayer m = merged.get(l);
            input.put(l, m != null ? m : org.apertura.engine.region.RegionMerger.merge(l, List.of()));
        }
        List<Violation> found = engine.checkMerged(input, rules.rules());
        double dbu = deck.databaseUnitNanometres().doubleValue();
        List<ShrinkScope> scopes = perAxis ? List.of(ShrinkScope.UNIFORM, ShrinkScope.X, ShrinkScope.Y)
                : List.of(ShrinkScope.UNIFORM);
        // best (largest) factor per (layer, rule, scope) and per (layer, *, scope)
        Map<String, Best> best = new LinkedHashMap<>();
        for (String layer : layers) {
            for (ShrinkScope s : scopes) {
                best.put(key(layer, "*", s), new Best(layer, "*", s));
            }
        }
        for (var r : rules.rules()) {
            RuleRef ref = rules.ref(r.id());
            for (ShrinkScope s : scopes) {
                best.putIfAbsent(key(ref.layer(), ref.rule(), s), new Best(ref.layer(), ref.rule(), s));
            }
        }
        for (Violation v : found) {
            RuleRef ref = rules.ref(v.ruleId());
            boolean area = v.kind() == org.apertura.engine.check.ViolationKind.AREA;
            if (!(v.measured() > 0) || v.kind() == org.apertura.engine.check.ViolationKind.NOT_ENCLOSED) {
                continue; // touching or not enclosed at all: no shrink changes that
            }
            double required = area ? v.required() / ((double) probe * probe) : v.required() / probe;
            double uniform = area ? Math.sqrt(required / v.measured()) : required / v.measured();
            if (uniform > 1 + 1e-12) {
                continue; // fails already at scale 1: not a new violation
            }
            for (ShrinkScope s : scopes) {
                double f = s == ShrinkScope.UNIFORM ? uniform : axisFactor(v, s, required, area);
                Best place = new Best(ref.layer(), ref.rule(), s);
                place.offer(f, v, required, dbu, area);
                best.get(key(ref.layer(), ref.rule(), s)).offer(place);
                best.get(key(ref.layer(), "*", s)).offer(place);
            }
        }
        double floor = 1.0 / probe;
        List<Headroom> out = new ArrayList<>();
        for (Best b : best.values()) {
            out.add(b.toHeadroom(floor));
        }
        // uniform width, spacing, pitch and area: exact from measure mode, without the probe's floor
        Map<String, Headroom> exact = new LinkedHashMap<>();
        for (Headroom h : MeasuredShrink.uniform(deck, option, layers, merged, engine)) {
            exact.put(key(h.layer(), h.rule(), h.scope()), h);
        }
        out.replaceAll(h -> exact.getOrDefault(key(h.layer(), h.rule(), h.scope()), h));
        out.replaceAll(h -> h.rule().equals("*") && h.scope() == ShrinkScope.UNIFORM ? layerOf(h, out) : h);
        return out;
    }

    /** The layer's uniform headroom: its most limiting rule (largest factor; exact before bounded). */
    private static Headroom layerOf(Headroom star, List<Headroom> all) {
        Headroom worst = null;
        for (Headroom h : all) {
            if (!h.layer().equals(star.layer()) || h.rule().equals("*") || h.scope() != ShrinkScope.UNIFORM) {
                continue;
            }
            if (worst == null || h.factor() > worst.factor()
                    || h.factor() == worst.factor() && worst.bounded() && !h.bounded()) {
                worst = h;
            }
        }
        if (worst == null) {
            return star;
        }
        return new Headroom(star.layer(), "*", ShrinkScope.UNIFORM, worst.factor(), worst.bounded(),
                worst.limitingPlace(), worst.measured(), worst.required());
    }

    private static String key(String layer, String rule, ShrinkScope s) {
        return layer + "\u0000" + rule + "\u0000" + s;
    }

    /** The factor of one place when only one axis is scaled. */
    static double axisFactor(Violation v, ShrinkScope s, double required, boolean area) {
        if (area) {
            return required / v.measured();
        }
        double[] d = separation(v);
        if (d == null) {
            return required / v.measured(); // no edge pair: as uniform (conservative)
        }
        double along = s == ShrinkScope.X ? Math.abs(d[0]) : Math.abs(d[1]);
        double across = s == ShrinkScope.X ? Math.abs(d[1]) : Math.abs(d[0]);
        if (v.kind() == org.apertura.engine.check.ViolationKind.PITCH) {
            // a pitch lies along one axis: it scales with that axis only
            return along >= across ? required / v.measured() : 0;
        }
        if (along == 0 || across >= required) {
            return 0;
        }
        return Math.sqrt(required * required - across * across) / along;
    }

    /** The vector (database units) between the closest points of a violation's two edges, from edge A to edge B, or null for region violations without edges. */
    public static double[] separation(Violation v) {
        Segment a = v.edgeA(), b = v.edgeB();
        if (a == null || b == null) {
            return null;
        }
        double[] best = null;
        for (double[] c : new double[][] {closest(a.x0(), a.y0(), b), closest(a.x1(), a.y1(), b),
                negate(closest(b.x0(), b.y0(), a)), negate(closest(b.x1(), b.y1(), a))}) {
            if (best == null || c[0] * c[0] + c[1] * c[1] < best[0] * best[0] + best[1] * best[1]) {
                best = c;
            }
        }
        return best;
    }

    private static double[] negate(double[] v) {
        return new double[] {-v[0], -v[1]};
    }

    /** Vector from point p to the closest point of segment s. */
    private static double[] closest(double px, double py, Segment s) {
        double ux = s.x1() - s.x0(), uy = s.y1() - s.y0();
        double l2 = ux * ux + uy * uy;
        double t = l2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - s.x0()) * ux + (py - s.y0()) * uy) / l2));
        return new double[] {s.x0() + t * ux - px, s.y0() + t * uy - py};
    }

    /** The running maximum factor of one (layer, rule, scope). */
    private static final class Best {
        final String layer;
        final String rule;
        final ShrinkScope scope;
        double factor = -1;
        Violation at;
        double required;
        double dbu;
        boolean area;

        Best(String layer, String rule, ShrinkScope scope) {
            this.layer = layer;
            this.rule = rule;
            this.scope = scope;
        }

        void offer(double f, Violation v, double req, double dbuNm, boolean isArea) {
            if (f > factor || f == factor && at != null && v.compareTo(at) < 0) {
                factor = f;
                at = v;
                required = req;
                dbu = dbuNm;
                area = isArea;
            }
        }

        void offer(Best o) {
            if (o.at != null) {
                offer(o.factor, o.at, o.required, o.dbu, o.area);
            }
        }

        Headroom toHeadroom(double floor) {
            if (at == null || factor <= floor) {
                return new Headroom(layer, rule, scope, floor, true, Optional.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty());
            }
            double unit = area ? dbu * dbu : dbu;
            return new Headroom(layer, rule, scope, Math.min(1, factor), false, Optional.of(at.marker()),
                    OptionalDouble.of(at.measured() * unit), OptionalDouble.of(required * unit));
        }
    }
}
