/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests.samples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.apertura.engine.check.ViolationKind;
import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.SummaryTable;
import org.apertura.migrate.derive.DraftDeck;
import org.apertura.migrate.impact.ImpactStatus;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.layout.gds.GdsWriter;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The committed sample block and its migration from the 0.33-NA LE2 option to the 0.55-NA option. */
class SampleLayoutTest {

    private static Path repo;
    private static ResolvedDeck deck;

    @BeforeAll
    static void load() {
        repo = Path.of(System.getProperty("apertura.repo", "../.."));
        deck = new DeckLoader().load(repo.resolve("samples/decks/meridian-mx3.apdeck")).orElseThrow();
    }

    private static Path gds() {
        return repo.resolve("samples/layouts/meridian-block.gds");
    }

    @Test
    void committedFileIsWhatTheSeededGeneratorMakes() throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GdsWriter.write(SampleLayoutGenerator.generate(SampleLayoutGenerator.SEED), out);
        assertArrayEquals(Files.readAllBytes(gds()), out.toByteArray(),
                "regenerate with SampleLayoutGenerator.main after changing the generator");
    }

    @Test
    void aFewThousandShapesOnTheDeckLayers() throws Exception {
        LayoutLayers l = LayoutLayers.read(gds(), deck, java.util.Optional.empty());
        assertEquals("MERIDIAN_BLOCK", l.topCell());
        long shapes = l.polygons().values().stream().mapToLong(List::size).sum();
        assertTrue(shapes >= 1000 && shapes <= 5000, "shapes: " + shapes);
        for (String layer : List.of("NW", "ACT", "GATE", "CT", "M1", "V1", "M2")) {
            assertFalse(l.polygons().getOrDefault(layer, List.of()).isEmpty(), layer);
        }
    }

    @Test
    void migrationOfTheCriticalLayers() throws Exception {
        MigrationResult r = MigrationStudy.run(deck, gds(), "euv_le2", "euv_hna", Set.of("M1", "V1", "M2"),
                MigrationOptions.defaults());
        assertEquals(List.of("M1", "V1", "M2"), r.layers());
        // M1 and M2 leave LE2: 2 + 1 + 2 masks become 1 + 1 + 1
        assertEquals(2, r.masks().masksSaved());
        // drawn for LE2: every odd cycle of the LE2 decomposition is fixed, nothing breaks
        assertEquals(0, r.impact().total().newCount());
        assertTrue(r.impact().total().fixed() > 0);
        assertTrue(r.impact().withStatus(ImpactStatus.FIXED).stream().allMatch(c -> c.kind() == ViolationKind.MASK_CONFLICT));
        // the generator's two line ends 14 nm apart stay below the 16 nm tip-to-tip rule
        var kept = r.impact().withStatus(ImpactStatus.PERSISTING);
        assertEquals(2, kept.size());
        assertTrue(kept.stream().allMatch(c -> c.kind() == ViolationKind.TIP_TO_TIP
                && c.target().orElseThrow().measured() == 14 * 4));
        // M1 is drawn at its 10 nm minimum width under euv_hna: no headroom; V1 vias 16 nm vs 14 nm
        assertEquals(0.0, r.layerHeadroom("M1", org.apertura.migrate.shrink.ShrinkScope.UNIFORM).headroom(), 1e-12);
        assertEquals(1 - 14.0 / 16, r.layerHeadroom("V1", org.apertura.migrate.shrink.ShrinkScope.UNIFORM).headroom(),
                1e-12);
        assertTrue(SummaryTable.render(r).contains("masks saved: 2"));
        assertTrue(r.fields().stream().allMatch(f -> f.fits()));
    }

    @Test
    void draftDeckOfTheSampleParsesAndValidates() {
        DraftDeck d = DraftDeck.derive(deck, "euv_le2", "euv_hna", List.of(), repo.resolve("samples/decks/draft.apdeck"));
        assertFalse(d.hasErrors(), () -> d.diagnostics() + "\n" + d.text());
        // every rule line carries its derivation
        assertTrue(d.text().lines().filter(l -> l.matches("\\t\\t(width|spacing|pitch|area).*")).allMatch(l -> l.contains("//")));
        ResolvedDeck draft = new DeckLoader().load(repo.resolve("samples/decks/draft.apdeck"), d.text()).orElseThrow();
        // GATE pitch 48 nm x 0.6 = 28.8 -> 29 nm, raised to width 10 + spacing 19.5 = 29.5 nm (0.25 nm units)
        assertEquals(118, draft.value(d.name(), "GATE", org.apertura.rules.resolved.RuleKind.PITCH).orElseThrow().value());
        // the target option's stitch keep-out (2 um in the sample deck) is carried into the draft
        assertEquals(2000, draft.option(d.name()).orElseThrow().stitchKeepOutNm().getAsDouble(), 1e-9);
    }
}
