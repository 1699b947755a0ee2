/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.impact.ImpactCount;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;

/**
 * The short plain-text summary of a study for a terminal: one row per moved layer (patterning, pitch
 * k1, rules tightened and relaxed, new/fixed/persisting violations, shrink headroom, masks) and a
 * total row, then masks and scanner time saved, and the caution line. Columns are padded with
 * spaces; no colours, no tabs.
 */
public final class SummaryTable {

    private static final String[] HEAD = {"layer", "patterning", "pitch k1", "tightened", "relaxed", "new", "fixed",
        "persisting", "shrink headroom", "masks"};

    private SummaryTable() {
    }

    /** Renders the summary; lines end with {@code \n}. */
    public static String render(MigrationResult r) {
        List<String[]> rows = new ArrayList<>();
        rows.add(HEAD);
        long tightened = 0, relaxed = 0;
        for (String layer : r.layers()) {
            LayerMasks m = r.masks().layers().stream().filter(x -> x.layer().equals(layer)).findFirst().orElseThrow();
            long t = r.count(layer, DeltaStatus.TIGHTENED);
            long x = r.count(layer, DeltaStatus.RELAXED);
            tightened += t;
            relaxed += x;
            ImpactCount c = r.impact().counts().stream().filter(k -> k.layer().equals(layer) && k.rule().equals("*"))
                    .findFirst().orElse(new ImpactCount(layer, "*", 0, 0, 0));
            rows.add(new String[] {layer, m.sourcePatterning() + " -> " + m.targetPatterning(), k1(r, layer),
                String.valueOf(t), String.valueOf(x), String.valueOf(c.newCount()), String.valueOf(c.fixed()),
                String.valueOf(c.persisting()), headroom(r, layer), m.sourceMasks() + " -> " + m.targetMasks()});
        }
        ImpactCount total = r.impact().total();
        rows.add(new String[] {"total", "", "", String.valueOf(tightened), String.valueOf(relaxed),
            String.valueOf(total.newCount()), String.valueOf(total.fixed()), String.valueOf(total.persisting()), "",
            r.masks().sourceMasks() + " -> " + r.masks().targetMasks()});

        StringBuilder sb = new StringBuilder();
        sb.append("Migration of ").append(r.technology()).append(": ").append(r.from()).append(" -> ").append(r.to())
                .append(", layout ").append(r.layout()).append(" (cell ").append(r.topCell()).append(")\n");
        sb.append(String.format(Locale.ROOT, "optics: half-pitch at k1 floor %.1f nm -> %.1f nm, depth of focus %.0f nm -> %.0f nm%n",
                r.sourceOptics().resolutionNm(), r.targetOptics().resolutionNm(), r.sourceOptics().depthOfFocusNm(),
                r.targetOptics().depthOfFocusNm()));
        int[] width = new int[HEAD.length];
        for (String[] row : rows) {
            for (int i = 0; i < row.length; i++) {
                width[i] = Math.max(width[i], row[i].length());
            }
        }
        for (int k = 0; k < rows.size(); k++) {
            if (k == 1 || k == rows.size() - 1) {
                line(sb, width);
            }
            String[] row = rows.get(k);
            StringBuilder l = new StringBuilder();
            for (int i = 0; i < row.length; i++) {
                boolean numeric = i >= 3 && i <= 7;
                String cell = numeric ? " ".repeat(width[i] - row[i].length()) + row[i]
                        : row[i] + " ".repeat(width[i] - row[i].length());
                l.append(i == 0 ? "" : "  ").append(cell);
            }
            sb.append(l.toString().stripTrailing()).append('\n');
        }
        int saved = r.masks().masksSaved();
        sb.append(saved >= 0 ? "masks saved: " + saved : "masks added: " + (-saved));
        int exp = r.masks().exposuresSaved();
        sb.append(exp >= 0 ? ", exposures saved: " + exp : ", exposures added: " + (-exp));
        if (r.masks().sourceSeconds().isPresent() && r.masks().targetSeconds().isPresent()) {
            sb.append(String.format(Locale.ROOT, ", scanner time per wafer for these layers: %.1f s -> %.1f s",
                    r.masks().sourceSeconds().getAsDouble(), r.masks().targetSeconds().getAsDouble()));
        }
        sb.append('\n');
        long conflictsGone = r.colouring().stream().mapToLong(c -> c.vanishing()).sum();
        long conflictsNew = r.colouring().stream().mapToLong(c -> c.appearing()).sum();
        if (!r.colouring().isEmpty()) {
            sb.append("colouring conflicts vanishing: ").append(conflictsGone).append(", appearing: ")
                    .append(conflictsNew).append('\n');
        }
        r.fields().stream().filter(f -> f.option().equals(r.to())).findFirst().ifPresent(f -> sb.append(String.format(
                Locale.ROOT, "field under %s: die %.3f x %.3f mm in %.1f x %.1f mm field, %s%n", f.option(), f.dieXMm(),
                f.dieYMm(), f.fieldXMm(), f.fieldYMm(),
                f.fits() ? "fits one exposure" : f.lines().size() + " stitch line(s), " + f.hitCount() + " critical shape(s) at them")));
        sb.append("caution: ").append(MigrationResult.CAUTION).append('\n');
        return sb.toString();
    }

    private static void line(StringBuilder sb, int[] width) {
        int n = 0;
        for (int w : width) {
            n += w + 2;
        }
        sb.append("-".repeat(n - 2)).append('\n');
    }

    private static String k1(MigrationResult r, String layer) {
        Optional<RuleOptics> a = pitch(r, r.from(), layer);
        Optional<RuleOptics> b = pitch(r, r.to(), layer);
        if (a.isEmpty() && b.isEmpty()) {
            return "-";
        }
        return fmt(a) + " -> " + fmt(b);
    }

    private static Optional<RuleOptics> pitch(MigrationResult r, String option, String layer) {
        return r.ruleOptics().stream()
                .filter(o -> o.option().equals(option) && o.layer().equals(layer) && o.rule().equals("pitch")).findFirst();
    }

    private static String fmt(Optional<RuleOptics> o) {
        return o.map(x -> String.format(Locale.ROOT, "%.2f", x.k1())).orElse("-");
    }

    private static String headroom(MigrationResult r, String layer) {
        Headroom h = r.layerHeadroom(layer, ShrinkScope.UNIFORM);
        if (h.bounded()) {
            return String.format(Locale.ROOT, ">= %.0f %%", 100 * h.headroom());
        }
        // Several rules may bind at the same factor: name them all, in a fixed order.
        String limit = r.headroom().stream()
                .filter(x -> x.layer().equals(layer) && !x.rule().equals("*") && x.scope() == ShrinkScope.UNIFORM
                        && !x.bounded() && x.factor() == h.factor())
                .map(Headroom::rule).distinct().sorted().collect(Collectors.joining(", "));
        if (limit.isEmpty()) {
            limit = "?";
        }
        return String.format(Locale.ROOT, "%.1f %% (%s)", 100 * h.headroom(), limit);
    }
}
