/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests.field;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.field.FieldCheck;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.field.StitchHit;
import org.apertura.migrate.tests.HandmadeCase;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.Test;

/**
 * The field check: the keep-out band comes from the deck's {@code stitch keep-out}, an explicit
 * option overrides it, and shapes are tested by their real polygons. Figures are worked out by hand:
 * a declared 26 x 30 mm die under the 26 x 16.5 mm half field (common practice for 0.55-NA
 * anamorphic EUV) needs two fields stitched at y = 15 mm. Database unit 0.25 nm: 4 units per nm.
 */
class FieldCheckTest {

    /** The hand-made deck with a 1 µm keep-out band on the half-field target option. */
    static ResolvedDeck deck() {
        String text = HandmadeCase.DECK.replace("throughput 185 wph", "throughput 185 wph\n\tstitch keep-out 1 um");
        return new DeckLoader().load(Path.of("handmade-stitch.apdeck"), text).orElseThrow();
    }

    private static final long LINE_NM = 15_000_000;
    private static final long DIE_X_NM = 26_000_000;
    private static final Box DIE = new Box(0, 0, DIE_X_NM * 4, 30_000_000L * 4);

    private static Polygon poly(long... nm) {
        long[] dbu = new long[nm.length];
        for (int i = 0; i < nm.length; i++) {
            dbu[i] = nm[i] * 4;
        }
        return Polygon.of(dbu);
    }

    private static Map<String, MergedLayer> merged(List<Polygon> m1) {
        return new CheckEngine(CheckOptions.defaults()).merge(Map.of("M1", m1));
    }

    private static FieldResult check(List<Polygon> m1, double keepOutNm) {
        return FieldCheck.check(deck(), "tgt", DIE, List.of("M1"), merged(m1), OptionalDouble.of(keepOutNm));
    }

    @Test
    void theBandComesFromTheDeck() {
        var layout = Map.of("M1", List.of(
                HandmadeCase.nm(2000, LINE_NM - 516, 2100, LINE_NM - 500), // 500 nm below: in the 1 um band
                HandmadeCase.nm(3000, LINE_NM - 1516, 3100, LINE_NM - 1500))); // 1.5 um below: outside
        MigrationResult r = MigrationStudy.run(deck(), layout, DIE, "die", "TOP", List.of(), "src", "tgt", Set.of("M1"),
                MigrationOptions.defaults().withDie(26, 30));
        FieldResult src = r.fields().get(0);
        FieldResult tgt = r.fields().get(1);
        assertTrue(src.fits());
        assertEquals(0, src.keepOutNm(), "the full-field option has no band in the deck");
        assertEquals(1000, tgt.keepOutNm(), "stitch keep-out 1 um from the deck");
        assertEquals(1, tgt.hitCount());
        assertEquals(500, tgt.hits().get(0).distanceNm(), 1e-9);

        // an explicit override replaces the deck's band for both options
        MigrationResult wide = MigrationStudy.run(deck(), layout, DIE, "die", "TOP", List.of(), "src", "tgt",
                Set.of("M1"), MigrationOptions.defaults().withDie(26, 30).withStitchKeepOut(2000));
        assertEquals(2000, wide.fields().get(1).keepOutNm());
        assertEquals(2, wide.fields().get(1).hitCount());
        assertEquals(2000, wide.fields().get(0).keepOutNm());

        // the override can be withdrawn again
        MigrationOptions back = MigrationOptions.defaults().withStitchKeepOut(2000).withDeckStitchKeepOut();
        assertTrue(back.stitchKeepOutNm().isEmpty());
    }

    @Test
    void deckWithoutBandChecksCrossingsOnly() {
        ResolvedDeck plain = HandmadeCase.deck();
        var m = merged(List.of(HandmadeCase.nm(1000, LINE_NM - 10, 1016, LINE_NM + 10),
                HandmadeCase.nm(2000, LINE_NM - 16, 2100, LINE_NM))); // touches the line from below
        FieldResult f = FieldCheck.check(plain, "tgt", DIE, List.of("M1"), m);
        assertEquals(0, f.keepOutNm());
        assertEquals(1, f.hitCount());
        assertTrue(f.hits().get(0).crossing());
    }

    @Test
    void anLShapeIsJudgedByItsMaterialNotItsBoundingBox() {
        // The stitch line y = 15 mm runs across the die, x = 0 .. 26 mm. The L's foot lies inside the
        // die 5 um below the line; its upright stands past the die's right edge (x > 26 mm) and rises
        // through y = 15 mm there. Its bounding box crosses the line inside the die, but no material
        // within the die comes closer than 5 um: no hit. (For a connected shape wholly inside the die
        // the bounding box would give the same answer: its extent across the line is an interval.)
        long y0 = LINE_NM - 5000;
        Polygon l = poly(DIE_X_NM - 10_000, y0, DIE_X_NM + 100, y0, DIE_X_NM + 100, LINE_NM + 500,
                DIE_X_NM + 50, LINE_NM + 500, DIE_X_NM + 50, y0 + 16, DIE_X_NM - 10_000, y0 + 16);
        Box bounds = merged(List.of(l)).get("M1").bounds(0);
        assertTrue(bounds.minY() < LINE_NM * 4 && bounds.maxY() > LINE_NM * 4 && bounds.minX() < DIE.maxX(),
                "the bounding box crosses the line inside the die");
        FieldResult f = check(List.of(l), 1000);
        assertEquals(0, f.hitCount());

        // the same L with its upright 100 nm inside the die edge crosses the line
        Polygon inside = poly(DIE_X_NM - 10_000, y0, DIE_X_NM - 100, y0, DIE_X_NM - 100, LINE_NM + 500,
                DIE_X_NM - 150, LINE_NM + 500, DIE_X_NM - 150, y0 + 16, DIE_X_NM - 10_000, y0 + 16);
        FieldResult g = check(List.of(inside), 1000);
        assertEquals(1, g.hitCount());
        assertTrue(g.hits().get(0).crossing());

        // an upright that stops 600 nm below the line, inside the die: in the band at exactly 600 nm
        Polygon near = poly(DIE_X_NM - 10_000, y0, DIE_X_NM - 100, y0, DIE_X_NM - 100, LINE_NM - 600,
                DIE_X_NM - 150, LINE_NM - 600, DIE_X_NM - 150, y0 + 16, DIE_X_NM - 10_000, y0 + 16);
        StitchHit h = check(List.of(near), 1000).hits().get(0);
        assertFalse(h.crossing());
        assertEquals(600, h.distanceNm(), 1e-9);
    }

    /** The exact distance from shapes to the line y = 15 mm across the die, in nm (-1: crossing). */
    private static double toLine(Polygon p) {
        double d = FieldCheck.distanceToLine(List.of(p), Axis.Y, LINE_NM * 4, DIE.minX(), DIE.maxX());
        return d < 0 ? d : d / 4;
    }

    @Test
    void anyAngleShapesAreMeasuredToTheirNearestVertex() {
        // Called on the rings directly: merging any-angle polygons inside OSGi needs the engine bundle
        // to import org.locationtech.jts.index (reported to the lead); the geometry is the same.
        // a triangle whose apex points at the line from 600 nm below: distance 600 nm exactly
        Polygon apex = poly(1000, LINE_NM - 5000, 3000, LINE_NM - 5000, 2000, LINE_NM - 600);
        assertEquals(600, toLine(apex), 1e-9);
        // a slanted parallelogram (45 degrees) through the line crosses it
        Polygon slant = poly(5000, LINE_NM - 100, 5020, LINE_NM - 100, 5220, LINE_NM + 100, 5200, LINE_NM + 100);
        assertEquals(-1, toLine(slant));
        // a triangle whose apex touches the line from below: distance 0, not crossing
        Polygon touch = poly(8000, LINE_NM - 400, 8400, LINE_NM - 400, 8200, LINE_NM);
        assertEquals(0, toLine(touch), 1e-9);
        // a slanted bar 45 degrees whose lower end reaches 250 nm below the line, upper end far below
        Polygon bar = poly(9000, LINE_NM - 3000, 9020, LINE_NM - 3000, 9270, LINE_NM - 250, 9250, LINE_NM - 250);
        assertEquals(250, toLine(bar), 1e-9);
        // a triangle reaching through the line only beyond the die's right edge (x > 26 mm): the part
        // inside the die ends where its slanted side meets x = 26 mm, 500 nm below the line
        Polygon past = poly(DIE_X_NM - 1000, LINE_NM - 1500, DIE_X_NM + 1000, LINE_NM - 1500, DIE_X_NM + 1000,
                LINE_NM + 500);
        assertEquals(500, toLine(past), 1e-9);
    }

    @Test
    void aVerticalStitchLineIsTheTransposedCase() {
        // a 40 x 20 mm die: two 26 mm wide fields across x, stitched at x = 20 mm
        Box die = new Box(0, 0, 40_000_000L * 4, 20_000_000L * 4);
        var m = merged(List.of(HandmadeCase.nm(20_000_700, 1000, 20_005_000, 1016), // 700 nm right of the line
                HandmadeCase.nm(19_999_990, 3000, 20_000_010, 3100))); // across it
        FieldResult f = FieldCheck.check(deck(), "src", die, List.of("M1"), m, OptionalDouble.of(1000));
        assertEquals(2, f.fieldsX());
        assertEquals(List.of(new org.apertura.migrate.field.StitchLine(Axis.X, 20_000_000L * 4)), f.lines());
        assertEquals(2, f.hitCount());
        assertEquals(1, f.hits().stream().filter(StitchHit::crossing).count());
        assertEquals(700, f.hits().stream().filter(h -> !h.crossing()).findFirst().orElseThrow().distanceNm(), 1e-9);
        // any angle, transposed: a triangle whose apex lies 700 nm right of the line
        Polygon apex = poly(20_000_700, 1000, 20_005_000, 0, 20_005_000, 2000);
        assertEquals(2800, FieldCheck.distanceToLine(List.of(apex), Axis.X, 20_000_000L * 4, die.minY(), die.maxY()),
                1e-9);
    }
}
