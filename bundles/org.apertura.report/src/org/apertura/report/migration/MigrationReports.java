/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.migration;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.geom.Segment;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.check.RuleRef;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.delta.DeltaCause;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.StitchHit;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.report.model.EdgePair;
import org.apertura.report.model.FieldResult;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.Fingerprint;
import org.apertura.report.model.HeadroomRow;
import org.apertura.report.model.LayerGeometry;
import org.apertura.report.model.MaskRow;
import org.apertura.report.model.MaskSummary;
import org.apertura.report.model.MatrixRow;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmPolygon;
import org.apertura.report.model.NmSegment;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ReportKind;
import org.apertura.report.model.RuleChange;
import org.apertura.report.model.RuleMatrix;
import org.apertura.report.model.StitchCrossing;
import org.apertura.report.model.StitchLine;
import org.apertura.report.model.ValueUnit;

/**
 * Builds the report model of a migration study, a deck comparison or a plain check. Units and the
 * fingerprint rule are described in the {@linkplain org.apertura.report.migration package} javadoc.
 */
public final class MigrationReports {

    private MigrationReports() {
    }

    /**
     * The report of a migration study.
     * <ul>
     * <li>Findings: one per {@link ViolationChange}, status new, fixed or persisting; the measured and required
     * values are the target violation's (the source violation's for a fixed one).</li>
     * <li>Matrix: one row per {@link RuleDelta}; k1 under each option from the {@link RuleOptics} of the layer
     * ({@code pitch} for the pitch rule, {@code width+spacing} for width and spacing, {@code same-mask-pitch}
     * for the same-mask spacing); new and fixed counts from the violation changes, on the first row of the
     * layer and rule (an end-of-line violation counts on its tip-to-tip or tip-to-side rule, a density
     * violation on its minimum or maximum, an opposite-sides enclosure violation on the pair value). A rule
     * with violations but no delta row gets a row of its own with no values.</li>
     * <li>Headroom: one row per layer and rule, uniform factor with the per-axis factors when measured.</li>
     * <li>Masks: one row per moved layer. Field: the die against the target option's field.</li>
     * </ul>
     */
    public static ReportData migration(MigrationResult r, ReportContext c) {
        double u = c.databaseUnitNm();
        ReportData.Builder b = ReportData.builder(ReportKind.MIGRATION, "Migration of " + r.technology() + " from "
                + r.from() + " to " + r.to() + ": " + fileName(r.layout()) + " (cell " + r.topCell() + ")",
                c.provenance());
        c.layers().forEach(b::layer);
        for (ViolationChange v : r.impact().changes()) {
            b.finding(finding(v, u));
        }
        b.matrix(matrix(r.deltas(), r.ruleOptics(), r.from(), r.to(), r.impact().changes()));
        headroom(r.headroom(), u).forEach(b::headroom);
        b.masks(masks(r.masks()));
        r.fields().stream().filter(f -> f.option().equals(r.to())).findFirst()
                .ifPresent(f -> b.field(field(f, c.extent(), u)));
        c.histograms().forEach(b::histogram);
        geometry(c.geometry(), u).forEach(b::geometry);
        return b.build();
    }

    /**
     * The report of a comparison of two options of a deck without a layout: the matrix of the deck delta with
     * k1 per rule, and the masks. It has no findings.
     */
    public static ReportData comparison(String technology, String from, String to, List<RuleDelta> deltas,
            List<RuleOptics> ruleOptics, MaskBudget masks, ReportContext c) {
        ReportData.Builder b = ReportData.builder(ReportKind.COMPARE,
                "Comparison of " + technology + ": " + from + " to " + to, c.provenance());
        c.layers().forEach(b::layer);
        b.matrix(matrix(deltas, ruleOptics, from, to, List.of()));
        b.masks(masks(masks));
        return b.build();
    }

    /**
     * The report of a plain check: every violation is an open finding, sorted in the engine's
     * {@linkplain Violation#ORDER order}.
     *
     * @param rules      the rules the violations were found with (for the deck rule behind each)
     * @param violations the engine's violations, in database units
     */
    public static ReportData check(String technology, String layoutName, String topCell, RuleSet rules,
            List<Violation> violations, ReportContext c) {
        ReportData.Builder b = ReportData.builder(ReportKind.CHECK, "Check of " + fileName(layoutName) + " (cell "
                + topCell + ") against " + technology + " under " + rules.option(), c.provenance());
        c.layers().forEach(b::layer);
        List<Violation> sorted = new ArrayList<>(violations);
        sorted.sort(Violation.ORDER);
        for (Violation v : sorted) {
            RuleRef ref = rules.ref(v.ruleId());
            b.finding(finding(v, ref, FindingStatus.OPEN, c.databaseUnitNm()));
        }
        c.histograms().forEach(b::histogram);
        geometry(c.geometry(), c.databaseUnitNm()).forEach(b::geometry);
        return b.build();
    }

    /** The finding of one violation change (values of the target violation, or of the source one when fixed). */
    public static Finding finding(ViolationChange c, double databaseUnitNm) {
        Violation shown = c.target().or(c::source).orElseThrow();
        FindingStatus status = switch (c.status()) {
            case NEW -> FindingStatus.NEW;
            case FIXED -> FindingStatus.FIXED;
            case PERSISTING -> FindingStatus.PERSISTING;
        };
        return finding(shown, c.rule(), c.marker(), status, databaseUnitNm);
    }

    /** The finding of one engine violation under the deck rule {@code ref}. */
    public static Finding finding(Violation v, RuleRef ref, FindingStatus status, double databaseUnitNm) {
        return finding(v, ref, v.marker(), status, databaseUnitNm);
    }

    private static Finding finding(Violation v, RuleRef ref, Box marker, FindingStatus status, double u) {
        String kind = ruleKind(v.kind());
        ValueUnit unit = unit(v.kind());
        double scale = switch (unit) {
            case NM -> u;
            case NM2 -> u * u;
            case FRACTION -> 1;
        };
        NmBox box = box(marker, u);
        Optional<EdgePair> edges = v.edgeA() != null && v.edgeB() != null
                ? Optional.of(new EdgePair(segment(v.edgeA(), u), segment(v.edgeB(), u))) : Optional.empty();
        String ruleId = ref.id();
        return new Finding(Fingerprint.of(ruleId, ref.layer(), kind, box, Optional.empty()), ruleId, kind, ref.layer(),
                v.measured() * scale, v.required() * scale, unit, box, edges, status, Optional.empty());
    }

    /** The rule kind written in reports: the violation kind in lower case with hyphens ({@code tip-to-tip}). */
    public static String ruleKind(ViolationKind k) {
        return k.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The unit of a violation's values: nm² for areas, a fraction for densities, nm for everything else. */
    public static ValueUnit unit(ViolationKind k) {
        return switch (k) {
            case AREA -> ValueUnit.NM2;
            case DENSITY_LOW, DENSITY_HIGH -> ValueUnit.FRACTION;
            default -> ValueUnit.NM;
        };
    }

    /** The name of the deck-delta row a violation of {@code rule} and {@code kind} counts on. */
    static String deltaRule(String rule, ViolationKind kind) {
        return switch (kind) {
            case TIP_TO_TIP -> rule.equals("end-of-line") ? "end-of-line-tip-to-tip" : rule;
            case TIP_TO_SIDE -> rule.equals("end-of-line") ? "end-of-line-tip-to-side" : rule;
            case DENSITY_LOW -> rule.equals("density") ? "density-min" : rule;
            case DENSITY_HIGH -> rule.equals("density") ? "density-max" : rule;
            case ENCLOSURE_OPPOSITE -> rule.startsWith("enclosure:") ? rule + ":pair" : rule;
            default -> rule;
        };
    }

    /** The {@link RuleOptics} rule whose k1 a delta rule implies, or null. */
    private static String opticsRule(String deltaRule) {
        return switch (deltaRule) {
            case "pitch" -> "pitch";
            case "width", "spacing" -> "width+spacing";
            case "same-mask-spacing" -> "same-mask-pitch";
            default -> null;
        };
    }

    private static RuleMatrix matrix(List<RuleDelta> deltas, List<RuleOptics> optics, String from, String to,
            List<ViolationChange> changes) {
        Map<String, int[]> counts = new LinkedHashMap<>();
        for (ViolationChange c : changes) {
            if (c.status() == ImpactStatus.PERSISTING) {
                continue;
            }
            String key = c.rule().layer() + '\u0000' + deltaRule(c.rule().rule(), c.kind());
            counts.computeIfAbsent(key, k -> new int[2])[c.status() == ImpactStatus.NEW ? 0 : 1]++;
        }
        List<MatrixRow> rows = new ArrayList<>();
        Set<String> counted = new HashSet<>();
        for (RuleDelta d : deltas) {
            String key = d.layer() + '\u0000' + d.rule();
            int[] n = counted.add(key) ? counts.getOrDefault(key, new int[2]) : new int[2];
            String o = opticsRule(d.rule());
            rows.add(new MatrixRow(d.layer(), d.rule(), d.axis().name().toLowerCase(Locale.ROOT),
                    ValueUnit.ofSymbol(d.unit()), d.oldValue(), d.newValue(), RuleChange.valueOf(d.status().name()),
                    cause(d.cause()), k1(optics, from, d.layer(), o), k1(optics, to, d.layer(), o), n[0], n[1]));
        }
        counts.forEach((key, n) -> {
            if (!counted.contains(key)) {
                String[] p = key.split("\u0000", 2);
                rows.add(new MatrixRow(p[0], p[1], "both", ValueUnit.NM, OptionalDouble.empty(), OptionalDouble.empty(),
                        RuleChange.UNCHANGED, "not in the deck delta", OptionalDouble.empty(), OptionalDouble.empty(),
                        n[0], n[1]));
            }
        });
        return new RuleMatrix(rows);
    }

    /** The cause as written in reports: lower case with hyphens ({@code explicit-override}), {@code none}. */
    static String cause(DeltaCause c) {
        return c.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static OptionalDouble k1(List<RuleOptics> optics, String option, String layer, String rule) {
        if (rule == null) {
            return OptionalDouble.empty();
        }
        return optics.stream().filter(o -> o.option().equals(option) && o.layer().equals(layer) && o.rule().equals(rule))
                .mapToDouble(RuleOptics::k1).findFirst();
    }

    private static List<HeadroomRow> headroom(List<Headroom> rows, double u) {
        Map<String, Headroom[]> byRule = new LinkedHashMap<>();
        for (Headroom h : rows) {
            byRule.computeIfAbsent(h.layer() + '\u0000' + h.rule(), k -> new Headroom[3])[h.scope().ordinal()] = h;
        }
        List<HeadroomRow> out = new ArrayList<>();
        for (Headroom[] h : byRule.values()) {
            Headroom uni = h[ShrinkScope.UNIFORM.ordinal()];
            if (uni == null) {
                continue; // per-axis rows without a uniform one: nothing to show as the layer's factor
            }
            out.add(new HeadroomRow(uni.layer(), uni.rule(), uni.factor(), uni.bounded(), factor(h[ShrinkScope.X.ordinal()]),
                    factor(h[ShrinkScope.Y.ordinal()]), uni.limitingPlace().map(b -> box(b, u)), uni.measured(),
                    uni.required()));
        }
        return out;
    }

    private static OptionalDouble factor(Headroom h) {
        return h == null ? OptionalDouble.empty() : OptionalDouble.of(h.factor());
    }

    private static MaskSummary masks(MaskBudget m) {
        List<MaskRow> rows = new ArrayList<>();
        for (LayerMasks l : m.layers()) {
            rows.add(new MaskRow(l.layer(), l.sourcePatterning(), l.targetPatterning(), l.sourceMasks(), l.targetMasks(),
                    l.sourceExposures(), l.targetExposures(), l.sourceSeconds(), l.targetSeconds()));
        }
        return new MaskSummary(rows);
    }

    private static FieldResult field(org.apertura.migrate.field.FieldResult f, Optional<Box> extent, double u) {
        double x0 = extent.map(e -> e.minX() * u).orElse(0.0);
        double y0 = extent.map(e -> e.minY() * u).orElse(0.0);
        NmBox die = new NmBox(x0, y0, x0 + f.dieXMm() * 1e6, y0 + f.dieYMm() * 1e6);
        List<StitchLine> lines = new ArrayList<>();
        for (org.apertura.migrate.field.StitchLine l : f.lines()) {
            lines.add(new StitchLine(l.across() == org.apertura.rules.resolved.Axis.X, l.position() * u));
        }
        List<StitchCrossing> crossings = new ArrayList<>();
        for (StitchHit h : f.hits()) {
            crossings.add(new StitchCrossing(h.layer(), box(h.shape(), u), h.crossing()));
        }
        return new FieldResult(f.option(), die, f.fieldXMm() * 1e6, f.fieldYMm() * 1e6, f.keepOutNm(), lines, crossings);
    }

    private static List<LayerGeometry> geometry(Map<String, List<Polygon>> polygons, double u) {
        List<LayerGeometry> out = new ArrayList<>();
        for (Map.Entry<String, List<Polygon>> e : new java.util.TreeMap<>(polygons).entrySet()) {
            List<NmPolygon> ps = new ArrayList<>(e.getValue().size());
            for (Polygon p : e.getValue()) {
                long[] c = p.coordinates();
                double[] xy = new double[c.length];
                for (int i = 0; i < c.length; i++) {
                    xy[i] = c[i] * u;
                }
                ps.add(new NmPolygon(xy));
            }
            out.add(new LayerGeometry(e.getKey(), ps));
        }
        return out;
    }

    /** A box in database units as nm. */
    public static NmBox box(Box b, double databaseUnitNm) {
        return new NmBox(b.minX() * databaseUnitNm, b.minY() * databaseUnitNm, b.maxX() * databaseUnitNm,
                b.maxY() * databaseUnitNm);
    }

    private static NmSegment segment(Segment s, double u) {
        return new NmSegment(s.x0() * u, s.y0() * u, s.x1() * u, s.y1() * u);
    }

    private static String fileName(String path) {
        try {
            Path p = Path.of(path).getFileName();
            return p == null ? path : p.toString();
        } catch (RuntimeException e) {
            return path;
        }
    }
}
