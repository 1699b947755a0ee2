/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.TreeMap;

import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.report.Caution;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;

/**
 * The short plain-text summaries the commands print on standard output and keep as {@code summary.txt}.
 * Every summary ends with the caution line of {@link Caution}.
 */
final class Summaries {

    private static final String CAUTION_LINE = "caution: " + Caution.TEXT;

    private Summaries() {
    }

    /**
     * The migration summary table of {@code org.apertura.migrate.SummaryTable} with the report caution in place
     * of the study's own caution line, and the waiver lines before it.
     */
    static String migration(String table, ReportData data, Inputs.WaiverInput waivers) {
        StringBuilder sb = new StringBuilder();
        String old = "caution: " + MigrationResult.CAUTION;
        for (String line : table.split("\n", -1)) {
            if (line.equals(old) || line.isEmpty()) {
                continue;
            }
            sb.append(line).append('\n');
        }
        waiverLines(sb, data, waivers);
        long breaks = data.findings().stream().filter(f -> f.status() == FindingStatus.NEW && f.open()).count();
        sb.append("open breaks (new violations not waived): ").append(breaks).append('\n');
        sb.append(CAUTION_LINE).append('\n');
        return sb.toString();
    }

    /** Findings per layer and rule, open and waived, then the waivers and the caution. */
    static String check(ReportData data, Inputs.WaiverInput waivers) {
        StringBuilder sb = new StringBuilder();
        sb.append(data.title()).append('\n');
        Map<String, long[]> counts = new TreeMap<>();
        for (Finding f : data.findings()) {
            long[] c = counts.computeIfAbsent(f.layer() + '\u0000' + f.ruleId() + '\u0000' + f.ruleKind(), k -> new long[2]);
            c[f.waived() ? 1 : 0]++;
        }
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"layer", "rule", "kind", "open", "waived"});
        long open = 0, waived = 0;
        for (Map.Entry<String, long[]> e : counts.entrySet()) {
            String[] k = e.getKey().split("\u0000");
            rows.add(new String[] {k[0], k[1], k[2], Long.toString(e.getValue()[0]), Long.toString(e.getValue()[1])});
            open += e.getValue()[0];
            waived += e.getValue()[1];
        }
        rows.add(new String[] {"total", "", "", Long.toString(open), Long.toString(waived)});
        table(sb, rows, 3);
        waiverLines(sb, data, waivers);
        sb.append(CAUTION_LINE).append('\n');
        return sb.toString();
    }

    /** The deck delta of a comparison with k1 per rule and the masks. */
    static String comparison(String technology, String from, String to, List<RuleDelta> deltas, List<RuleOptics> optics,
            MaskBudget masks) {
        StringBuilder sb = new StringBuilder();
        sb.append("Comparison of ").append(technology).append(": ").append(from).append(" -> ").append(to).append('\n');
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"layer", "rule", "axis", "old", "new", "ratio", "status", "cause"});
        for (RuleDelta d : deltas) {
            if (d.status() == DeltaStatus.UNCHANGED) {
                continue;
            }
            rows.add(new String[] {d.layer(), d.rule(), d.axis().name().toLowerCase(Locale.ROOT),
                value(d.oldValue(), d.unit()), value(d.newValue(), d.unit()),
                d.ratio().isPresent() ? String.format(Locale.ROOT, "%.3f", d.ratio().getAsDouble()) : "-",
                d.status().name().toLowerCase(Locale.ROOT),
                d.cause().name().toLowerCase(Locale.ROOT).replace('_', '-')});
        }
        long unchanged = deltas.stream().filter(d -> d.status() == DeltaStatus.UNCHANGED).count();
        table(sb, rows, 3);
        sb.append(unchanged).append(" rule value").append(unchanged == 1 ? "" : "s").append(" unchanged\n");
        if (!optics.isEmpty()) {
            sb.append('\n');
            List<String[]> k = new ArrayList<>();
            k.add(new String[] {"layer", "rule", "option", "patterning", "pitch", "k1", "verdict"});
            for (RuleOptics o : optics) {
                k.add(new String[] {o.layer(), o.rule(), o.option(), o.patterning(),
                    String.format(Locale.ROOT, "%.2f nm", o.valueNm()), String.format(Locale.ROOT, "%.3f", o.k1()),
                    o.verdict().name().toLowerCase(Locale.ROOT).replace('_', ' ')});
            }
            table(sb, k, 4);
        }
        sb.append('\n');
        List<String[]> m = new ArrayList<>();
        m.add(new String[] {"layer", "patterning", "masks", "exposures"});
        for (LayerMasks l : masks.layers()) {
            m.add(new String[] {l.layer(), l.sourcePatterning() + " -> " + l.targetPatterning(),
                l.sourceMasks() + " -> " + l.targetMasks(), l.sourceExposures() + " -> " + l.targetExposures()});
        }
        table(sb, m, Integer.MAX_VALUE);
        int saved = masks.masksSaved();
        sb.append(saved >= 0 ? "masks saved: " + saved : "masks added: " + (-saved)).append('\n');
        sb.append(CAUTION_LINE).append('\n');
        return sb.toString();
    }

    private static String value(OptionalDouble v, String unit) {
        if (v.isEmpty()) {
            return "-";
        }
        String n = String.format(Locale.ROOT, "%.4f", v.getAsDouble()).replaceAll("0+$", "").replaceAll("\\.$", "");
        return unit.isEmpty() ? n : n + " " + unit;
    }

    private static void waiverLines(StringBuilder sb, ReportData data, Inputs.WaiverInput waivers) {
        if (waivers.file().isEmpty()) {
            sb.append("waivers: none\n");
            return;
        }
        long waived = data.waivedFindings().size();
        sb.append("waivers: ").append(waivers.file().get()).append(": ").append(waived).append(" finding")
                .append(waived == 1 ? "" : "s").append(" waived, ").append(data.staleWaivers().size())
                .append(" stale\n");
        for (Waiver w : data.staleWaivers()) {
            sb.append("  stale waiver ").append(w.origin().orElse("")).append(": ").append(w.rule()).append(" on ")
                    .append(w.layer()).append(" matches no finding\n");
        }
    }

    /** Appends a table, columns padded with spaces; columns from {@code firstNumeric} on are right-aligned. */
    static void table(StringBuilder sb, List<String[]> rows, int firstNumeric) {
        int cols = rows.get(0).length;
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int i = 0; i < cols; i++) {
                width[i] = Math.max(width[i], r[i].length());
            }
        }
        for (String[] r : rows) {
            StringBuilder l = new StringBuilder();
            for (int i = 0; i < cols; i++) {
                String pad = " ".repeat(width[i] - r[i].length());
                l.append(i == 0 ? "" : "  ").append(i >= firstNumeric ? pad + r[i] : r[i] + pad);
            }
            sb.append(l.toString().stripTrailing()).append('\n');
        }
    }
}
