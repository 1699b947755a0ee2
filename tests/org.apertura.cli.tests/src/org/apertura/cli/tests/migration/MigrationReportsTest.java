/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests.migration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.List;
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
import org.apertura.migrate.delta.AxisScope;
import org.apertura.migrate.delta.DeltaCause;
import org.apertura.migrate.delta.DeltaStatus;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.OptionOptics;
import org.apertura.migrate.optics.Printability;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.persist.StudyModels;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.migrate.shrink.ShrinkScope;
import org.apertura.report.migration.MigrationReports;
import org.apertura.report.migration.ReportContext;
import org.apertura.report.migration.SavedStudy;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.Fingerprint;
import org.apertura.report.model.HeadroomRow;
import org.apertura.report.model.MatrixRow;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ReportKind;
import org.apertura.report.model.RuleChange;
import org.apertura.report.model.ValueUnit;
import org.junit.jupiter.api.Test;

/**
 * The adapter from a migration result to the report model ({@code org.apertura.report.migration}), on a result
 * made by hand. It lives here rather than in the report tests bundle until that bundle imports the migration
 * packages.
 */
class MigrationReportsTest {

    /** 0.25 nm per database unit, as in the sample deck. */
    private static final double U = 0.25;

    private static final RuleRef M1_EOL = new RuleRef("M1", "end-of-line", Optional.empty());
    private static final RuleRef M1_AREA = new RuleRef("M1", "area", Optional.empty());
    private static final RuleRef V1_SPACING = new RuleRef("V1", "spacing", Optional.empty());
    private static final RuleRef M1_DENSITY = new RuleRef("M1", "density", Optional.empty());

    private static Violation tipToTip() {
        // two line ends 56 database units (14 nm) apart, rule 64 (16 nm)
        return new Violation("M1/end-of-line", "M1", ViolationKind.TIP_TO_TIP, 56, 64, new Segment(3232, 1060, 3232, 1100),
                new Segment(3288, 1100, 3288, 1060), new Box(3232, 1060, 3288, 1100));
    }

    private static MigrationResult result() {
        Violation eol = tipToTip();
        Violation area = new Violation("M1/area", "M1", ViolationKind.AREA, 12800, 18432, null, null,
                new Box(0, 0, 80, 160));
        Violation space = new Violation("V1/spacing", "V1", ViolationKind.SPACING, 80, 96, new Segment(0, 0, 0, 64),
                new Segment(80, 64, 80, 0), new Box(0, 0, 80, 64));
        Violation dense = new Violation("M1/density", "M1", ViolationKind.DENSITY_HIGH, 0.85, 0.8, null, null,
                new Box(0, 0, 200000, 200000));
        List<ViolationChange> changes = List.of(
                new ViolationChange(ImpactStatus.PERSISTING, M1_EOL, eol.kind(), eol.marker(), Optional.of(eol),
                        Optional.of(eol)),
                new ViolationChange(ImpactStatus.NEW, M1_EOL, eol.kind(), new Box(0, 0, 56, 40), Optional.empty(),
                        Optional.of(new Violation("M1/end-of-line", "M1", ViolationKind.TIP_TO_TIP, 56, 64,
                                new Segment(0, 0, 0, 40), new Segment(56, 40, 56, 0), new Box(0, 0, 56, 40)))),
                new ViolationChange(ImpactStatus.FIXED, M1_AREA, area.kind(), area.marker(), Optional.of(area),
                        Optional.empty()),
                new ViolationChange(ImpactStatus.NEW, V1_SPACING, space.kind(), space.marker(), Optional.empty(),
                        Optional.of(space)),
                new ViolationChange(ImpactStatus.NEW, M1_DENSITY, dense.kind(), dense.marker(), Optional.empty(),
                        Optional.of(dense)));
        RuleSet none = new RuleSet("a", List.of(), Map.of(), Set.of(), List.of());
        List<RuleDelta> deltas = List.of(
                new RuleDelta("M1", "pitch", AxisScope.BOTH, "nm", OptionalDouble.of(20), OptionalDouble.of(20),
                        DeltaStatus.UNCHANGED, DeltaCause.NONE),
                new RuleDelta("M1", "end-of-line-tip-to-tip", AxisScope.BOTH, "nm", OptionalDouble.of(16),
                        OptionalDouble.of(16), DeltaStatus.UNCHANGED, DeltaCause.NONE),
                new RuleDelta("M1", "area", AxisScope.BOTH, "nm2", OptionalDouble.of(1152), OptionalDouble.of(800),
                        DeltaStatus.RELAXED, DeltaCause.PATTERNING),
                new RuleDelta("V1", "spacing", AxisScope.X, "nm", OptionalDouble.of(24), OptionalDouble.of(18),
                        DeltaStatus.RELAXED, DeltaCause.ANAMORPHIC_AXIS),
                new RuleDelta("V1", "spacing", AxisScope.Y, "nm", OptionalDouble.of(24), OptionalDouble.of(20),
                        DeltaStatus.RELAXED, DeltaCause.ANAMORPHIC_AXIS));
        List<RuleOptics> optics = List.of(
                new RuleOptics("a", "M1", "pitch", "LE2", 2, 20, 0.4888, Printability.WITH_SPLIT, 2),
                new RuleOptics("b", "M1", "pitch", "SE", 1, 20, 0.4074, Printability.SINGLE_EXPOSURE, 1),
                new RuleOptics("b", "V1", "width+spacing", "SE", 1, 32, 0.6519, Printability.SINGLE_EXPOSURE, 1));
        List<Headroom> headroom = List.of(
                new Headroom("V1", "*", ShrinkScope.UNIFORM, 0.875, false, Optional.of(new Box(0, 0, 64, 64)),
                        OptionalDouble.of(16), OptionalDouble.of(14)),
                new Headroom("V1", "*", ShrinkScope.X, 0.75, false, Optional.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty()),
                new Headroom("V1", "*", ShrinkScope.Y, 0.9, false, Optional.empty(), OptionalDouble.empty(),
                        OptionalDouble.empty()));
        OptionOptics a = new OptionOptics("a", 13.5, 0.33, 0.33, 0.5, 13.5, 10.227, 62, 4, 4, 26, 33,
                OptionalDouble.of(150));
        OptionOptics b = new OptionOptics("b", 13.5, 0.55, 0.35, 0.5, 8.59, 6.136, 22.3, 4, 8, 26, 16.5,
                OptionalDouble.of(185));
        MaskBudget masks = new MaskBudget(List.of(
                new LayerMasks("M1", "LE2", "SE", 2, 1, 2, 1, OptionalDouble.of(48), OptionalDouble.of(19.46)),
                new LayerMasks("V1", "SE", "SE", 1, 1, 1, 1, OptionalDouble.of(24), OptionalDouble.of(19.46))));
        FieldResult field = new FieldResult("b", 26, 16.5, 0.003, 0.002, 1, 1, List.of(), List.of(), 0, 1000);
        return new MigrationResult("Test", "/x/block.gds", "TOP", "a", "b", List.of("M1", "V1"), a, b, optics, deltas,
                new LayoutImpact(none, none, changes), headroom, masks, List.of(), List.of(), List.of(field), List.of());
    }

    private static ReportContext context() {
        Provenance p = new Provenance("1.0", Instant.parse("2026-12-01T00:00:00Z"), List.of("migrate"), List.of(), "a",
                Optional.of("b"));
        return new ReportContext(U, p, List.of(), Map.of("M1", List.of(Polygon.rectangle(0, 0, 80, 160))),
                Optional.of(new Box(400, 800, 12400, 8800)), List.of());
    }

    @Test
    void findingsAreInNanometresWithTheStatusOfTheChange() {
        ReportData d = MigrationReports.migration(result(), context());
        assertEquals(ReportKind.MIGRATION, d.kind());
        assertEquals(5, d.findings().size());
        Finding eol = d.findings().get(0);
        assertEquals(FindingStatus.PERSISTING, eol.status());
        assertEquals("M1/end-of-line", eol.ruleId());
        assertEquals("tip-to-tip", eol.ruleKind());
        assertEquals(14.0, eol.measured(), 0); // 56 x 0.25
        assertEquals(16.0, eol.required(), 0);
        assertEquals(ValueUnit.NM, eol.unit());
        assertEquals(new NmBox(808, 265, 822, 275), eol.marker());
        assertEquals(808.0, eol.edges().orElseThrow().a().x1(), 0);
        Finding area = d.findings().get(2);
        assertEquals(FindingStatus.FIXED, area.status());
        assertEquals(ValueUnit.NM2, area.unit());
        assertEquals(12800 * 0.0625, area.measured(), 1e-9); // square database units x (0.25 nm)^2
        Finding dense = d.findings().get(4);
        assertEquals(ValueUnit.FRACTION, dense.unit());
        assertEquals(0.85, dense.measured(), 0);
    }

    @Test
    void fingerprintsDoNotDependOnEdges() {
        Finding f = MigrationReports.migration(result(), context()).findings().get(0);
        assertEquals(Fingerprint.of("M1/end-of-line", "M1", "tip-to-tip", f.marker(), Optional.empty()), f.fingerprint());
    }

    @Test
    void matrixCarriesK1AndCountsOnTheRightRows() {
        List<MatrixRow> rows = MigrationReports.migration(result(), context()).matrix().orElseThrow().rows();
        MatrixRow pitch = rows.get(0);
        assertEquals(0.4888, pitch.k1Old().getAsDouble(), 0);
        assertEquals(0.4074, pitch.k1New().getAsDouble(), 0);
        // the new end-of-line break counts on the tip-to-tip rule; the persisting one counts nowhere
        MatrixRow eol = rows.get(1);
        assertEquals(1, eol.newCount());
        assertEquals(0, eol.fixedCount());
        MatrixRow area = rows.get(2);
        assertEquals(RuleChange.RELAXED, area.change());
        assertEquals("patterning", area.cause());
        assertEquals(1, area.fixedCount());
        // per-axis rows: the count sits on the first only, the k1 of width+spacing on both
        assertEquals("x", rows.get(3).axis());
        assertEquals(1, rows.get(3).newCount());
        assertEquals(0, rows.get(4).newCount());
        assertEquals(0.6519, rows.get(4).k1New().getAsDouble(), 0);
        assertTrue(rows.get(3).k1Old().isEmpty());
        // the density break has no delta row of its own: it gets one, so that no count is lost
        MatrixRow density = rows.get(5);
        assertEquals("density-max", density.rule());
        assertEquals(1, density.newCount());
        assertEquals(6, rows.size());
    }

    @Test
    void headroomJoinsUniformAndPerAxisRows() {
        List<HeadroomRow> h = MigrationReports.migration(result(), context()).headroom();
        assertEquals(1, h.size());
        assertEquals(0.875, h.get(0).factor(), 0);
        assertEquals(0.75, h.get(0).factorX().getAsDouble(), 0);
        assertEquals(0.9, h.get(0).factorY().getAsDouble(), 0);
        assertEquals(new NmBox(0, 0, 16, 16), h.get(0).limitingPlace().orElseThrow());
    }

    @Test
    void masksFieldAndGeometry() {
        ReportData d = MigrationReports.migration(result(), context());
        assertEquals(1, d.masks().orElseThrow().masksSaved());
        var f = d.field().orElseThrow();
        // the die starts at the cell extent's corner (400, 800) dbu = (100, 200) nm; 0.003 mm = 3000 nm wide
        assertEquals(new NmBox(100, 200, 3100, 2200), f.die());
        assertEquals(26e6, f.fieldWidthNm(), 0);
        assertTrue(f.fits());
        assertEquals(20.0, d.geometry("M1").orElseThrow().polygons().get(0).bounds().x2(), 0); // 80 dbu = 20 nm
    }

    @Test
    void aSavedStudyGivesTheSameReport() {
        MigrationResult r = result();
        MigrationResult back = SavedStudy.toResult(StudyModels.toModel(r));
        ReportData a = MigrationReports.migration(r, context());
        ReportData b = MigrationReports.migration(back, context());
        assertEquals(a.findings().size(), b.findings().size());
        for (int i = 0; i < a.findings().size(); i++) {
            Finding x = a.findings().get(i), y = b.findings().get(i);
            assertEquals(x.fingerprint(), y.fingerprint());
            assertEquals(x.measured(), y.measured(), 0);
            assertEquals(x.status(), y.status());
            assertTrue(y.edges().isEmpty(), "a saved study keeps no edges");
        }
        assertEquals(a.matrix(), b.matrix());
        assertEquals(a.headroom(), b.headroom());
        assertEquals(a.masks(), b.masks());
        assertEquals(a.field(), b.field());
    }
}
