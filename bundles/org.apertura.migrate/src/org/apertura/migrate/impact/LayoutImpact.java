/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.impact;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleRef;
import org.apertura.migrate.check.RuleSet;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * The layout checked under two options and the violations classified as new, fixed and persisting.
 * <p>
 * Matching: a source and a target violation are the same place when they belong to the same layer,
 * rule name and violation kind, and their markers touch once each is grown by the larger of the two
 * required values (distance kinds; area, density and colouring markers must touch as they are).
 * Markers that are equal are paired first, then the rest greedily by the distance between centres,
 * so each violation is paired at most once.
 *
 * @param source  the rules checked under the source option
 * @param target  the rules checked under the target option
 * @param changes every violation place, sorted by layer, rule, kind and marker
 */
public record LayoutImpact(RuleSet source, RuleSet target, List<ViolationChange> changes) {

    /** Copies the list. */
    public LayoutImpact {
        changes = List.copyOf(changes);
    }

    /**
     * Checks {@code layers} of the layout under both options and classifies the violations.
     *
     * @param polygons the layout's polygons by deck layer name, in database units; layers the rules
     *                 need but the layout lacks count as empty
     */
    public static LayoutImpact run(ResolvedDeck deck, String from, String to, Collection<String> layers,
            Map<String, List<Polygon>> polygons, CheckEngine engine) {
        java.util.Set<String> needed = new java.util.TreeSet<>(EngineRules.of(deck, from, layers).layers());
        needed.addAll(EngineRules.of(deck, to, layers).layers());
        return runMerged(deck, from, to, layers, engine.merge(select(polygons, needed)), engine);
    }

    /**
     * As {@link #run}, on layers merged already.
     *
     * @param merged merged layers by deck layer name; layers the rules need but the map lacks count as empty
     */
    public static LayoutImpact runMerged(ResolvedDeck deck, String from, String to, Collection<String> layers,
            Map<String, MergedLayer> merged, CheckEngine engine) {
        RuleSet src = EngineRules.of(deck, from, layers);
        RuleSet tgt = EngineRules.of(deck, to, layers);
        return classify(src, engine.checkMerged(complete(merged, src.layers()), src.rules()), tgt,
                engine.checkMerged(complete(merged, tgt.layers()), tgt.rules()));
    }

    private static Map<String, MergedLayer> complete(Map<String, MergedLayer> merged, Collection<String> names) {
        Map<String, MergedLayer> m = new TreeMap<>();
        for (String n : names) {
            MergedLayer l = merged.get(n);
            m.put(n, l != null ? l : org.apertura.engine.region.RegionMerger.merge(n, List.of()));
        }
        return m;
    }

    /** The polygons of the named layers, an empty list for each layer the layout lacks. */
    public static Map<String, List<Polygon>> select(Map<String, List<Polygon>> polygons, Collection<String> names) {
        Map<String, List<Polygon>> m = new TreeMap<>();
        for (String n : names) {
            m.put(n, polygons.getOrDefault(n, List.of()));
        }
        return m;
    }

    /** Classifies two violation lists made with the given rule sets. */
    public static LayoutImpact classify(RuleSet src, List<Violation> before, RuleSet tgt, List<Violation> after) {
        Map<String, List<Violation>> a = group(src, before);
        Map<String, List<Violation>> b = group(tgt, after);
        java.util.Set<String> keys = new java.util.TreeSet<>(a.keySet());
        keys.addAll(b.keySet());
        List<ViolationChange> out = new ArrayList<>();
        for (String key : keys) {
            List<Violation> va = new ArrayList<>(a.getOrDefault(key, List.of()));
            List<Violation> vb = new ArrayList<>(b.getOrDefault(key, List.of()));
            RuleRef ref = !va.isEmpty() ? src.ref(va.get(0).ruleId()) : tgt.ref(vb.get(0).ruleId());
            pair(ref, va, vb, out);
        }
        out.sort(Comparator.comparing((ViolationChange c) -> c.rule()).thenComparing(ViolationChange::kind)
                .thenComparing(ViolationChange::marker).thenComparing(ViolationChange::status));
        return new LayoutImpact(src, tgt, out);
    }

    private static Map<String, List<Violation>> group(RuleSet rules, List<Violation> vs) {
        Map<String, List<Violation>> m = new TreeMap<>();
        for (Violation v : vs) {
            RuleRef r = rules.ref(v.ruleId());
            m.computeIfAbsent(r.layer() + "\u0000" + r.rule() + "\u0000" + v.kind(), k -> new ArrayList<>()).add(v);
        }
        return m;
    }

    private static void pair(RuleRef ref, List<Violation> va, List<Violation> vb, List<ViolationChange> out) {
        boolean[] usedA = new boolean[va.size()];
        boolean[] usedB = new boolean[vb.size()];
        // equal markers first
        Map<Box, List<Integer>> byMarker = new TreeMap<>();
        for (int j = 0; j < vb.size(); j++) {
            byMarker.computeIfAbsent(vb.get(j).marker(), k -> new ArrayList<>()).add(j);
        }
        for (int i = 0; i < va.size(); i++) {
            List<Integer> js = byMarker.get(va.get(i).marker());
            if (js != null && !js.isEmpty()) {
                int j = js.remove(0);
                usedA[i] = true;
                usedB[j] = true;
                out.add(change(ImpactStatus.PERSISTING, ref, va.get(i), vb.get(j)));
            }
        }
        // then the nearest touching markers
        List<long[]> candidates = new ArrayList<>();
        for (int i = 0; i < va.size(); i++) {
            if (usedA[i]) {
                continue;
            }
            for (int j = 0; j < vb.size(); j++) {
                if (!usedB[j] && touch(va.get(i), vb.get(j))) {
                    candidates.add(new long[] {centreDistance2(va.get(i).marker(), vb.get(j).marker()), i, j});
                }
            }
        }
        candidates.sort(Comparator.comparingLong((long[] c) -> c[0]).thenComparingLong(c -> c[1]).thenComparingLong(c -> c[2]));
        for (long[] c : candidates) {
            int i = (int) c[1], j = (int) c[2];
            if (!usedA[i] && !usedB[j]) {
                usedA[i] = true;
                usedB[j] = true;
                out.add(change(ImpactStatus.PERSISTING, ref, va.get(i), vb.get(j)));
            }
        }
        for (int i = 0; i < va.size(); i++) {
            if (!usedA[i]) {
                out.add(change(ImpactStatus.FIXED, ref, va.get(i), null));
            }
        }
        for (int j = 0; j < vb.size(); j++) {
            if (!usedB[j]) {
                out.add(change(ImpactStatus.NEW, ref, null, vb.get(j)));
            }
        }
    }

    private static ViolationChange change(ImpactStatus s, RuleRef ref, Violation a, Violation b) {
        Violation shown = b != null ? b : a;
        return new ViolationChange(s, ref, shown.kind(), shown.marker(), Optional.ofNullable(a), Optional.ofNullable(b));
    }

    private static boolean isDistance(ViolationKind k) {
        return switch (k) {
            case AREA, DENSITY_LOW, DENSITY_HIGH, MASK_CONFLICT, NOT_ENCLOSED -> false;
            default -> true;
        };
    }

    private static boolean touch(Violation a, Violation b) {
        long grow = isDistance(a.kind()) ? (long) Math.ceil(Math.max(a.required(), b.required())) : 0;
        Box p = a.marker(), q = b.marker();
        return p.minX() - grow <= q.maxX() && q.minX() - grow <= p.maxX()
                && p.minY() - grow <= q.maxY() && q.minY() - grow <= p.maxY();
    }

    private static long centreDistance2(Box p, Box q) {
        long dx = (p.minX() + p.maxX()) - (q.minX() + q.maxX());
        long dy = (p.minY() + p.maxY()) - (q.minY() + q.maxY());
        return dx * dx + dy * dy;
    }

    /** Changes with the given status. */
    public List<ViolationChange> withStatus(ImpactStatus status) {
        return changes.stream().filter(c -> c.status() == status).toList();
    }

    /** Counts per layer and rule, sorted by layer then rule, with one total row per layer ({@code rule = *}, sorted first). */
    public List<ImpactCount> counts() {
        Map<String, int[]> m = new TreeMap<>();
        for (ViolationChange c : changes) {
            for (String key : List.of(c.rule().layer() + "\u0000" + c.rule().rule(), c.rule().layer() + "\u0000*")) {
                m.computeIfAbsent(key, k -> new int[3])[c.status().ordinal()]++;
            }
        }
        List<ImpactCount> out = new ArrayList<>();
        m.forEach((k, v) -> {
            String[] p = k.split("\u0000");
            out.add(new ImpactCount(p[0], p[1], v[0], v[1], v[2]));
        });
        return out;
    }

    /** Counts over every layer and rule. */
    public ImpactCount total() {
        int[] t = new int[3];
        changes.forEach(c -> t[c.status().ordinal()]++);
        return new ImpactCount("*", "*", t[0], t[1], t[2]);
    }
}
