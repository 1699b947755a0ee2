/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.anamorphic.MaskSideCheck;
import org.apertura.migrate.anamorphic.MaskSideResult;
import org.apertura.migrate.delta.DeckDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.optics.OptionOptics;
import org.apertura.migrate.optics.OpticsAnalysis;
import org.apertura.migrate.optics.Printability;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Facts of the trade (common practice) and published values (references.md) through the analysis. */
class TradeFactsTest {

    private static ResolvedDeck sample;

    @BeforeAll
    static void load() {
        Path repo = Path.of(System.getProperty("apertura.repo", "../.."));
        sample = new DeckLoader().load(repo.resolve("samples/decks/meridian-mx3.apdeck")).orElseThrow();
    }

    @Test
    void highNaScalesResolutionDensityAndDepthOfFocus() {
        // common practice (references.md §2): NA 0.33 -> 0.55 scales features by 0.6 (1.7x smaller),
        // density by 1/0.6^2 = 2.78, depth of focus by (0.33/0.55)^2 = 0.36
        var se = sample.option("euv_se").orElseThrow();
        var hna = sample.option("euv_hna").orElseThrow();
        double s = DeckDelta.opticalScale(se, hna);
        assertEquals(0.6, s, 1e-12);
        assertEquals(1.67, 1 / s, 0.005);
        assertEquals(2.78, 1 / (s * s), 0.005);
        OptionOptics a = OpticsAnalysis.of(se), b = OpticsAnalysis.of(hna);
        assertEquals(0.36, b.depthOfFocusNm() / a.depthOfFocusNm(), 1e-12); // both decks' k2 = 0.5
        assertEquals(0.6, b.physicalLimitNm() / a.physicalLimitNm(), 1e-12);
    }

    @Test
    void fieldsFullAndHalf() {
        // common practice: 26 x 33 mm full field; 26 x 16.5 mm for the 4x/8x anamorphic optics
        OptionOptics se = OpticsAnalysis.of(sample.option("euv_se").orElseThrow());
        OptionOptics hna = OpticsAnalysis.of(sample.option("euv_hna").orElseThrow());
        assertEquals(26.0, se.fieldXMm());
        assertEquals(33.0, se.fieldYMm());
        assertEquals(26.0, hna.fieldXMm());
        assertEquals(16.5, hna.fieldYMm());
        assertTrue(hna.anamorphic());
    }

    @Test
    void maskSizesAreFourAndEightTimesPerAxis() {
        // common practice: 4x reduction both ways at 0.33 NA, 4x along x and 8x along y at 0.55 NA.
        // An M1 bar 9 nm wide along x and a line 6 nm wide along y, against the 40 nm mask minimum:
        var layout = Map.of("M1", List.of(HandmadeCase.nm(0, 0, 9, 100), HandmadeCase.nm(100, 0, 300, 6)));
        CheckEngine engine = new CheckEngine(CheckOptions.threads(1));
        var merged = engine.merge(layout);
        MaskSideResult hna = MaskSideCheck.check(sample, "euv_hna", List.of("M1"), merged, engine, 4).get(0);
        assertEquals("mask-width", hna.rule());
        assertEquals(9.0, hna.x().waferMinimum().getAsDouble());
        assertEquals(36.0, hna.x().maskSize().getAsDouble(), 1e-9); // 9 x 4 < 40
        assertEquals(1, hna.x().violations());
        assertEquals(48.0, hna.y().maskSize().getAsDouble(), 1e-9); // 6 x 8 >= 40
        assertEquals(0, hna.y().violations());
        assertEquals(Axis.X, hna.binding().orElseThrow());
        MaskSideResult se = MaskSideCheck.check(sample, "euv_se", List.of("M1"), merged, engine, 4).get(0);
        assertEquals(24.0, se.y().maskSize().getAsDouble(), 1e-9); // 6 x 4 < 40
        assertEquals(1, se.y().violations());
        assertEquals(Axis.Y, se.binding().orElseThrow());
    }

    /** ASAP7 rows transcribed from references.md §1 (Clark et al. 2016, Table 1; ASAP7 DRM). */
    private static final String ASAP7 = """
            technology "ASAP7 excerpt"
            	database unit 0.25 nm
            	grid 0.25 nm
            layer M1 gds 19/0 line horizontal   // ASAP7 M1, GDS 19
            layer M4 gds 40/0 line horizontal   // ASAP7 M4, GDS 40
            option euv033 "0.33-NA EUV single exposure (ASAP7's assumption for M1-M3)" {
            	wavelength 13.5 nm
            	NA 0.33
            	k1 floor 0.3
            	k2 0.5
            	demagnification 4
            	field x 26 mm y 33 mm
            	on M1 {
            		width 18 nm     // M1.W.1
            		spacing 18 nm   // M1.S.1
            		pitch 36 nm     // Table 1: 18 / 36
            	}
            }
            option duv "193 nm immersion (ASAP7's assumption for M4-M7)" {
            	wavelength 193 nm
            	NA 1.35
            	k1 floor 0.28
            	k2 0.5
            	demagnification 4
            	field x 26 mm y 33 mm
            	on M4 {
            		patterning spacer 2
            		width 24 nm     // M4 SADP width
            		spacing 24 nm   // spacing across tracks
            		pitch 48 nm     // Table 1: 24 / 48
            	}
            }
            """;

    @Test
    void asap7PitchesUnderTheirStatedLithography() {
        ResolvedDeck d = new DeckLoader().load(Path.of("asap7.apdeck"), ASAP7).orElseThrow();
        // references.md §2: 36 nm pitch at 0.33 NA single exposure -> k1 0.44
        RuleOptics m1 = OpticsAnalysis.rules(d, "euv033", List.of("M1")).get(0);
        assertEquals("pitch", m1.rule());
        assertEquals(0.44, m1.k1(), 0.005);
        assertEquals(Printability.SINGLE_EXPOSURE, m1.verdict());
        // M4 48 nm under 193i SADP: (48 x 2 / 2) x 1.35 / 193 = 0.336 (derived); one exposure would give 0.168
        RuleOptics m4 = OpticsAnalysis.rules(d, "duv", List.of("M4")).get(0);
        assertEquals("SADP", m4.patterning());
        assertEquals(48 * 1.35 / 193, m4.k1(), 1e-12);
        assertEquals(Printability.WITH_SPLIT, m4.verdict());
        assertEquals(2, m4.minimumSplit());
    }

    @Test
    void dieLargerThanTheHalfFieldIsStitched() {
        // a declared 26 x 30 mm die: one 26 x 33 mm field; two 26 x 16.5 mm fields stitched at y = 15 mm
        double band = 1000; // nm keep-out on each side of the line
        long line = 15_000_000L * 4; // 15 mm in 0.25 nm units
        var layout = Map.of("M1", List.of(HandmadeCase.nm(0, 0, 100, 16),
                HandmadeCase.nm(1000, 14_999_990, 1016, 15_000_010), // crosses the line
                HandmadeCase.nm(2000, 14_999_484, 2100, 14_999_500), // 500 nm below the line: in the band
                HandmadeCase.nm(3000, 14_994_984, 3100, 14_995_000))); // 5 um below: outside
        MigrationResult r = MigrationStudy.run(HandmadeCase.deck(), layout, new Box(0, 0, 3100 * 4, line + 40),
                "die", "TOP", List.of(), "src", "tgt", java.util.Set.of("M1"),
                MigrationOptions.defaults().withDie(26, 30).withStitchKeepOut(band));
        FieldResult src = r.fields().get(0);
        FieldResult tgt = r.fields().get(1);
        assertTrue(src.fits());
        assertEquals(2, tgt.fieldsY());
        assertEquals(1, tgt.fieldsX());
        assertEquals(List.of(new org.apertura.migrate.field.StitchLine(Axis.Y, line)), tgt.lines());
        assertEquals(2, tgt.hitCount());
        assertTrue(tgt.hits().get(0).crossing());
        assertEquals(500.0, tgt.hits().get(1).distanceNm(), 1e-9);
    }
}
