/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.apertura.report.model.EdgePair;
import org.apertura.report.model.FieldResult;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.HeadroomRow;
import org.apertura.report.model.Histogram;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.LayerGeometry;
import org.apertura.report.model.LayerInfo;
import org.apertura.report.model.MaskRow;
import org.apertura.report.model.MaskSummary;
import org.apertura.report.model.MatrixRow;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmPolygon;
import org.apertura.report.model.NmSegment;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.Quantity;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ReportKind;
import org.apertura.report.model.RuleChange;
import org.apertura.report.model.RuleMatrix;
import org.apertura.report.model.StitchCrossing;
import org.apertura.report.model.StitchLine;
import org.apertura.report.model.ValueUnit;

/**
 * A hand-made migration result: rows of parallel lines whose gaps are chosen so that the classification of
 * every gap can be worked out by hand against the old and new spacing rules. Geometry and findings agree.
 */
public final class ReportFixture {

    /** M1: vertical lines 18 nm wide, 400 nm long; gaps between neighbours. */
    public static final double[] M1_GAPS = { 18, 18, 14, 18, 19, 12, 18, 22, 18, 17 };
    public static final double M1_WIDTH = 18;
    public static final double M1_OLD_SPACING = 14;
    public static final double M1_NEW_SPACING = 18;

    /** M2: horizontal lines 24 nm wide, 300 nm long; gaps between neighbours. */
    public static final double[] M2_GAPS = { 24, 22, 21, 19, 24, 30 };
    public static final double M2_WIDTH = 24;
    public static final double M2_OLD_SPACING = 24;
    public static final double M2_NEW_SPACING = 20;

    public static final String SOURCE = "euv-0.33-se";
    public static final String TARGET = "euv-0.55-se";

    private ReportFixture() {
    }

    /**
     * By hand: M1 gaps below the new rule 18 are 14, 12, 17; of these 12 is also below the old rule 14
     * (persisting), 14 and 17 are new. M2 gaps below the old rule 24 are 22, 21, 19; under the new rule 20 only
     * 19 stays (persisting), 22 and 21 are fixed.
     */
    public static final int M1_NEW = 2;
    public static final int M1_PERSISTING = 1;
    public static final int M2_FIXED = 2;
    public static final int M2_PERSISTING = 1;

    /** The migration report; input files are written into {@code dir} and hashed. */
    public static ReportData migration(Path dir) throws IOException {
        ReportData.Builder b = ReportData.builder(ReportKind.MIGRATION, "Fixture block: M1, M2 to 0.55 NA",
                provenance(dir, Optional.of(TARGET)));
        b.layer(new LayerInfo("M1", OptionalInt.of(19), OptionalInt.of(0), true));
        b.layer(new LayerInfo("M2", OptionalInt.of(20), OptionalInt.of(0), true));
        List<NmPolygon> m1 = new ArrayList<>();
        List<Finding> f = new ArrayList<>();
        double x = 0;
        for (int i = 0; i <= M1_GAPS.length; i++) {
            m1.add(NmPolygon.rectangle(new NmBox(x, 0, x + M1_WIDTH, 400)));
            if (i < M1_GAPS.length) {
                double gap = M1_GAPS[i];
                double xr = x + M1_WIDTH;
                double xl = xr + gap;
                FindingStatus s = status(gap, M1_OLD_SPACING, M1_NEW_SPACING);
                if (s != null) {
                    f.add(Finding.of("M1.S.1", "spacing", "M1", gap, s == FindingStatus.FIXED ? M1_OLD_SPACING
                            : M1_NEW_SPACING, ValueUnit.NM, new NmBox(xr, 0, xl, 400),
                            Optional.of(new EdgePair(new NmSegment(xr, 0, xr, 400), new NmSegment(xl, 400, xl, 0))), s));
                }
                x = xl;
            }
        }
        List<NmPolygon> m2 = new ArrayList<>();
        double y = 0;
        for (int i = 0; i <= M2_GAPS.length; i++) {
            m2.add(NmPolygon.rectangle(new NmBox(0, y, 300, y + M2_WIDTH)));
            if (i < M2_GAPS.length) {
                double gap = M2_GAPS[i];
                double yt = y + M2_WIDTH;
                double yb = yt + gap;
                FindingStatus s = status(gap, M2_OLD_SPACING, M2_NEW_SPACING);
                if (s != null) {
                    f.add(Finding.of("M2.S.1", "spacing", "M2", gap, s == FindingStatus.FIXED ? M2_OLD_SPACING
                            : M2_NEW_SPACING, ValueUnit.NM, new NmBox(0, yt, 300, yb),
                            Optional.of(new EdgePair(new NmSegment(300, yt, 0, yt), new NmSegment(0, yb, 300, yb))), s));
                }
                y = yb;
            }
        }
        b.findings(f);
        b.geometry(new LayerGeometry("M1", m1));
        b.geometry(new LayerGeometry("M2", m2));
        // k1 = (pitch/2) * NA / lambda, lambda 13.5 nm: 36 nm pitch at NA 0.33 gives 0.44
        // (references.md section 2, "k1 of a pitch p", derived)
        double m1Pitch = M1_WIDTH + 18;
        b.matrix(new RuleMatrix(List.of(
                new MatrixRow("M1", "width", "both", ValueUnit.NM, od(18), od(18), RuleChange.UNCHANGED, "unchanged",
                        OptionalDouble.empty(), OptionalDouble.empty(), 0, 0),
                new MatrixRow("M1", "spacing", "both", ValueUnit.NM, od(M1_OLD_SPACING), od(M1_NEW_SPACING),
                        RuleChange.TIGHTENED, "explicit override", OptionalDouble.empty(), OptionalDouble.empty(), M1_NEW, 0),
                new MatrixRow("M1", "pitch", "both", ValueUnit.NM, od(m1Pitch), od(m1Pitch), RuleChange.UNCHANGED,
                        "unchanged", od(m1Pitch / 2 * 0.33 / 13.5), od(m1Pitch / 2 * 0.55 / 13.5), 0, 0),
                new MatrixRow("M2", "width", "both", ValueUnit.NM, od(M2_WIDTH), od(20), RuleChange.RELAXED, "optics",
                        OptionalDouble.empty(), OptionalDouble.empty(), 0, 0),
                new MatrixRow("M2", "spacing", "both", ValueUnit.NM, od(M2_OLD_SPACING), od(M2_NEW_SPACING),
                        RuleChange.RELAXED, "patterning change", OptionalDouble.empty(), OptionalDouble.empty(), 0, M2_FIXED),
                new MatrixRow("M2", "same-mask-spacing", "both", ValueUnit.NM, od(48), OptionalDouble.empty(),
                        RuleChange.REMOVED, "patterning change", OptionalDouble.empty(), OptionalDouble.empty(), 0, 0))));
        b.histogram(new Histogram("M1", Quantity.SPACING, M1_GAPS, od(M1_OLD_SPACING), od(M1_NEW_SPACING)));
        b.histogram(new Histogram("M1", Quantity.WIDTH, new double[] { 18, 18, 18, 18, 18, 18, 18, 18, 18, 18, 18 },
                od(18), od(18)));
        b.histogram(new Histogram("M2", Quantity.SPACING, M2_GAPS, od(M2_OLD_SPACING), od(M2_NEW_SPACING)));
        b.headroom(new HeadroomRow("M2", "width", 20.0 / 24, false, od(20.0 / 24), od(1), Optional.of(
                new NmBox(0, 0, 300, 24)), od(24), od(20)));
        b.headroom(new HeadroomRow("M2", "*", 1, false, od(1), od(1), Optional.of(new NmBox(0, 112, 300, 131)), od(19),
                od(20)));
        b.headroom(new HeadroomRow("M1", "*", 0.5, true, OptionalDouble.empty(), OptionalDouble.empty(),
                Optional.empty(), OptionalDouble.empty(), OptionalDouble.empty()));
        b.masks(new MaskSummary(List.of(
                new MaskRow("M1", "SE", "SE", 1, 1, 1, 1, od(3600.0 / 160), od(3600.0 / 185)),
                new MaskRow("M2", "LE2", "SE", 2, 1, 2, 1, od(2 * 3600.0 / 160), od(3600.0 / 185)))));
        // 0.55-NA anamorphic field 26 mm x 16.5 mm (references.md section 2, common practice)
        b.field(new FieldResult(TARGET, new NmBox(0, 0, 20e6, 30e6), 26e6, 16.5e6, 2000,
                List.of(new StitchLine(false, 16.5e6)),
                List.of(new StitchCrossing("M1", new NmBox(1e6, 16.4995e6, 1.00002e6, 16.5005e6), true),
                        new StitchCrossing("M2", new NmBox(2e6, 16.4990e6, 2.0003e6, 16.49905e6), false))));
        return b.build();
    }

    /** A plain check of M1 under the source option: no matrix, no headroom, no masks. */
    public static ReportData check(Path dir) throws IOException {
        ReportData mig = migration(dir);
        ReportData.Builder b = ReportData.builder(ReportKind.CHECK, "Fixture block: check under " + SOURCE,
                provenance(dir, Optional.empty()));
        b.layer(mig.layers().get(0));
        for (Finding f : mig.findings()) {
            if (f.layer().equals("M1") && f.measured() < M1_OLD_SPACING) {
                b.finding(Finding.of(f.ruleId(), f.ruleKind(), f.layer(), f.measured(), M1_OLD_SPACING, f.unit(),
                        f.marker(), f.edges(), FindingStatus.OPEN));
            }
        }
        b.geometry(mig.geometry().get(0));
        return b.build();
    }

    /** A large report: {@code n} M1 lines with a new violation between every pair. */
    public static ReportData large(Path dir, int n) throws IOException {
        ReportData.Builder b = ReportData.builder(ReportKind.MIGRATION, "large", provenance(dir, Optional.of(TARGET)));
        List<NmPolygon> shapes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double x = (i % 100) * 34.0;
            double y = (i / 100) * 500.0;
            shapes.add(NmPolygon.rectangle(new NmBox(x, y, x + 18, y + 400)));
            if (i % 100 != 99) {
                b.finding(Finding.of("M1.S.1", "spacing", "M1", 16, 18, ValueUnit.NM, new NmBox(x + 18, y, x + 34, y + 400),
                        Optional.empty(), FindingStatus.NEW));
            }
        }
        b.layer(new LayerInfo("M1", OptionalInt.of(19), OptionalInt.of(0), true));
        b.geometry(new LayerGeometry("M1", shapes));
        return b.build();
    }

    static Provenance provenance(Path dir, Optional<String> target) throws IOException {
        Path deck = dir.resolve("fixture.deck");
        if (!Files.exists(deck)) {
            Files.writeString(deck, "technology fixture\n");
        }
        Path root = Path.of(System.getProperty("apertura.root", "/work/main"));
        Path gds = root.resolve("../shared/data/sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds").normalize();
        Path layout = Files.exists(gds) ? gds : Files.writeString(dir.resolve("fixture.gds"), "not a real layout");
        return new Provenance("0.1.0-test", Instant.parse("2026-03-02T10:15:30Z"),
                List.of("apertura", "migrate", "--deck", deck.toString(), "--layout", layout.toString()),
                List.of(InputFile.hash("deck", deck), InputFile.hash("layout", layout)), SOURCE, target);
    }

    private static FindingStatus status(double gap, double oldRule, double newRule) {
        boolean old = gap < oldRule;
        boolean now = gap < newRule;
        if (old && now) {
            return FindingStatus.PERSISTING;
        }
        if (now) {
            return FindingStatus.NEW;
        }
        return old ? FindingStatus.FIXED : null;
    }

    private static OptionalDouble od(double v) {
        return OptionalDouble.of(v);
    }
}
