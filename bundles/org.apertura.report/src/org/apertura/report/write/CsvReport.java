/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.IOException;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.report.Caution;
import org.apertura.report.json.JsonWriter;
import org.apertura.report.model.EdgePair;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.HeadroomRow;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.MaskRow;
import org.apertura.report.model.MaskSummary;
import org.apertura.report.model.MatrixRow;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmSegment;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ValueUnit;
import org.apertura.report.model.Waiver;

/**
 * Writes report tables as CSV (RFC 4180, UTF-8, CRLF), one file per table: {@value #FINDINGS},
 * {@value #MATRIX} (when the report has a matrix), {@value #HEADROOM} (when it has headroom rows),
 * {@value #MASKS} (when it has masks), {@value #STALE_WAIVERS} and {@value #PROVENANCE}. Numbers are in nm
 * (nm2 for areas) in their shortest round-trip form; absent values are empty fields. The first record of
 * each file is its header.
 */
public final class CsvReport {

    public static final String FINDINGS = "findings.csv";
    public static final String MATRIX = "matrix.csv";
    public static final String HEADROOM = "headroom.csv";
    public static final String MASKS = "masks.csv";
    public static final String STALE_WAIVERS = "stale-waivers.csv";
    public static final String PROVENANCE = "provenance.csv";

    /** Header of {@value #FINDINGS}. */
    public static final List<String> FINDING_HEADER = List.of("fingerprint", "status", "waived", "layer", "rule_id",
            "rule_kind", "measured", "required", "unit", "x1", "y1", "x2", "y2", "edge_a_x1", "edge_a_y1", "edge_a_x2",
            "edge_a_y2", "edge_b_x1", "edge_b_y1", "edge_b_x2", "edge_b_y2", "waiver_reason", "waiver_author",
            "waiver_date", "waiver_origin");

    private CsvReport() {
    }

    /** The findings table. */
    public static String findings(List<Finding> findings) {
        StringBuilder sb = new StringBuilder(Csv.record(FINDING_HEADER));
        for (Finding f : findings) {
            List<String> r = new ArrayList<>();
            r.add(f.fingerprint());
            r.add(JsonReport.lower(f.status()));
            r.add(Boolean.toString(f.waived()));
            r.add(f.layer());
            r.add(f.ruleId());
            r.add(f.ruleKind());
            r.add(n(f.measured()));
            r.add(n(f.required()));
            r.add(f.unit().symbol());
            box(r, f.marker());
            if (f.edges().isPresent()) {
                seg(r, f.edges().get().a());
                seg(r, f.edges().get().b());
            } else {
                for (int i = 0; i < 8; i++) {
                    r.add("");
                }
            }
            Optional<Waiver> w = f.waiver();
            r.add(w.map(Waiver::reason).orElse(""));
            r.add(w.map(Waiver::author).orElse(""));
            r.add(w.map(v -> v.date().toString()).orElse(""));
            r.add(w.flatMap(Waiver::origin).orElse(""));
            sb.append(Csv.record(r));
        }
        return sb.toString();
    }

    /**
     * Reads a findings table written by {@link #findings(List)} back. Waivers come back with their box and
     * fingerprint taken from the finding.
     *
     * @throws IOException on malformed CSV, a wrong header or a bad value, naming the line
     */
    public static List<Finding> readFindings(String csv) throws IOException {
        List<List<String>> rows = Csv.parse(csv);
        if (rows.isEmpty() || !rows.get(0).equals(FINDING_HEADER)) {
            throw new IOException("line 1: not a findings table (header differs)");
        }
        List<Finding> out = new ArrayList<>();
        for (int i = 1; i < rows.size(); i++) {
            List<String> r = rows.get(i);
            try {
                if (r.size() != FINDING_HEADER.size()) {
                    throw new IllegalArgumentException(r.size() + " fields, expected " + FINDING_HEADER.size());
                }
                NmBox marker = new NmBox(d(r.get(9)), d(r.get(10)), d(r.get(11)), d(r.get(12)));
                Optional<EdgePair> edges = r.get(13).isEmpty() ? Optional.empty()
                        : Optional.of(new EdgePair(new NmSegment(d(r.get(13)), d(r.get(14)), d(r.get(15)), d(r.get(16))),
                                new NmSegment(d(r.get(17)), d(r.get(18)), d(r.get(19)), d(r.get(20)))));
                Optional<Waiver> w = Boolean.parseBoolean(r.get(2))
                        ? Optional.of(new Waiver(r.get(4), r.get(3), Optional.of(marker), Optional.of(r.get(0)), r.get(21),
                                r.get(22), LocalDate.parse(r.get(23)),
                                r.get(24).isEmpty() ? Optional.empty() : Optional.of(r.get(24))))
                        : Optional.empty();
                out.add(new Finding(r.get(0), r.get(4), r.get(5), r.get(3), d(r.get(6)), d(r.get(7)),
                        ValueUnit.ofSymbol(r.get(8)), marker, edges,
                        FindingStatus.valueOf(r.get(1).toUpperCase(Locale.ROOT)), w));
            } catch (RuntimeException e) {
                throw new IOException("record " + (i + 1) + ": " + e.getMessage(), e);
            }
        }
        return out;
    }

    /** The layer &times; rule matrix table. */
    public static String matrix(List<MatrixRow> rows) {
        StringBuilder sb = new StringBuilder(Csv.record(List.of("layer", "rule", "axis", "unit", "old", "new",
                "difference", "ratio", "change", "cause", "k1_old", "k1_new", "new_violations", "fixed_violations")));
        for (MatrixRow m : rows) {
            sb.append(Csv.record(List.of(m.layer(), m.rule(), m.axis(), m.unit().symbol(), n(m.oldValue()),
                    n(m.newValue()), n(m.difference()), n(m.ratio()), JsonReport.lower(m.change()), m.cause(),
                    n(m.k1Old()), n(m.k1New()), Integer.toString(m.newCount()), Integer.toString(m.fixedCount()))));
        }
        return sb.toString();
    }

    /** The shrink headroom table. */
    public static String headroom(List<HeadroomRow> rows) {
        StringBuilder sb = new StringBuilder(Csv.record(List.of("layer", "rule", "factor", "headroom", "bounded",
                "factor_x", "factor_y", "limit_x1", "limit_y1", "limit_x2", "limit_y2", "measured", "required")));
        for (HeadroomRow h : rows) {
            List<String> r = new ArrayList<>(List.of(h.layer(), h.rule(), n(h.factor()), n(h.headroom()),
                    Boolean.toString(h.bounded()), n(h.factorX()), n(h.factorY())));
            if (h.limitingPlace().isPresent()) {
                box(r, h.limitingPlace().get());
            } else {
                r.addAll(List.of("", "", "", ""));
            }
            r.add(n(h.measured()));
            r.add(n(h.required()));
            sb.append(Csv.record(r));
        }
        return sb.toString();
    }

    /** The masks and exposures table, with a final {@code *} row of totals. */
    public static String masks(MaskSummary m) {
        StringBuilder sb = new StringBuilder(Csv.record(List.of("layer", "old_patterning", "new_patterning", "old_masks",
                "new_masks", "masks_saved", "old_exposures", "new_exposures", "exposures_saved", "old_seconds_per_wafer",
                "new_seconds_per_wafer")));
        for (MaskRow r : m.rows()) {
            sb.append(Csv.record(List.of(r.layer(), r.oldPatterning(), r.newPatterning(), i(r.oldMasks()),
                    i(r.newMasks()), i(r.masksSaved()), i(r.oldExposures()), i(r.newExposures()),
                    i(r.exposuresSaved()), n(r.oldSeconds()), n(r.newSeconds()))));
        }
        sb.append(Csv.record(List.of("*", "", "", i(m.oldMasks()), i(m.newMasks()), i(m.masksSaved()),
                i(m.oldExposures()), i(m.newExposures()), i(m.exposuresSaved()), n(m.oldSeconds()), n(m.newSeconds()))));
        return sb.toString();
    }

    /** The stale waivers table. */
    public static String staleWaivers(List<Waiver> stale) {
        StringBuilder sb = new StringBuilder(Csv.record(List.of("rule", "layer", "x1", "y1", "x2", "y2", "fingerprint",
                "reason", "author", "date", "origin")));
        for (Waiver w : stale) {
            List<String> r = new ArrayList<>(List.of(w.rule(), w.layer()));
            if (w.box().isPresent()) {
                box(r, w.box().get());
            } else {
                r.addAll(List.of("", "", "", ""));
            }
            r.addAll(List.of(w.fingerprint().orElse(""), w.reason(), w.author(), w.date().toString(),
                    w.origin().orElse("")));
            sb.append(Csv.record(r));
        }
        return sb.toString();
    }

    /** Provenance as key/value records, with the caution. */
    public static String provenance(ReportData d) {
        Provenance p = d.provenance();
        StringBuilder sb = new StringBuilder(Csv.record(List.of("key", "value")));
        sb.append(Csv.record(List.of("kind", JsonReport.lower(d.kind()))));
        sb.append(Csv.record(List.of("title", d.title())));
        sb.append(Csv.record(List.of("tool_version", p.toolVersion())));
        sb.append(Csv.record(List.of("created", DateTimeFormatter.ISO_INSTANT.format(p.created()))));
        sb.append(Csv.record(List.of("command", String.join(" ", p.command()))));
        sb.append(Csv.record(List.of("source_option", p.sourceOption())));
        sb.append(Csv.record(List.of("target_option", p.targetOption().orElse(""))));
        for (InputFile f : p.inputs()) {
            sb.append(Csv.record(List.of(f.role() + "_path", f.path())));
            sb.append(Csv.record(List.of(f.role() + "_sha256", f.sha256())));
        }
        sb.append(Csv.record(List.of("caution", Caution.TEXT)));
        return sb.toString();
    }

    private static void box(List<String> r, NmBox b) {
        r.add(n(b.x1()));
        r.add(n(b.y1()));
        r.add(n(b.x2()));
        r.add(n(b.y2()));
    }

    private static void seg(List<String> r, NmSegment s) {
        r.add(n(s.x1()));
        r.add(n(s.y1()));
        r.add(n(s.x2()));
        r.add(n(s.y2()));
    }

    private static String n(double v) {
        return JsonWriter.number(v);
    }

    private static String n(OptionalDouble v) {
        return v.isPresent() ? n(v.getAsDouble()) : "";
    }

    private static String i(int v) {
        return Integer.toString(v);
    }

    private static double d(String s) {
        return Double.parseDouble(s);
    }
}
