/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.apertura.engine.geom.Polygon;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * A hand-made deck and layout whose migration results are worked out by hand in the tests.
 * <p>
 * Deck (database unit 0.25 nm): M1 horizontal lines, LE2 under {@code src} (width 10, spacing 12,
 * pitch 22, same-mask spacing 36 nm) and single exposure under {@code tgt} (width 12, spacing 16,
 * pitch 28 nm); V1 vias, LE2 under {@code src} (width 12, spacing 20, same-mask spacing 40 nm) and
 * single exposure under {@code tgt} (width 12, spacing 18 nm along x, 22 nm along y).
 * <p>
 * Layout, in nm (x range, y range):
 * <pre>
 * M1 A  0..1000 x   0..16    16 wide
 * M1 B  0..1000 x  30..46    16 wide, 14 above A (pitch A-B 30)
 * M1 C  0..1000 x 100..108    8 wide, 54 above B
 * M1 D  1020..1100 x 0..46   20 right of A and of B: A, B, D pairwise closer than 36 (odd cycle)
 * V1 a  200..212 x 200..212
 * V1 b  232..244 x 200..212  20 right of a
 * V1 c  200..212 x 232..244  20 above a, (20, 20) from b: a, b, c pairwise closer than 40
 * </pre>
 */
public final class HandmadeCase {

    /** The deck text. */
    public static final String DECK = """
            technology "Handmade test process"
            	database unit 0.25 nm
            	grid 0.5 nm

            layer M1 gds 19/0 line horizontal "metal lines"
            layer V1 gds 21/0 cut "vias"

            option src "0.33-NA EUV, LE2" {
            	wavelength 13.5 nm
            	NA 0.33
            	k1 floor 0.3
            	k2 0.5
            	demagnification 4
            	field x 26 mm y 33 mm
            	throughput 150 wph
            	on M1 {
            		patterning litho-etch 2
            		width 10 nm
            		spacing 12 nm
            		pitch 22 nm
            		same-mask spacing 36 nm
            	}
            	on V1 {
            		patterning litho-etch 2
            		width 12 nm
            		spacing 20 nm
            		same-mask spacing 40 nm
            	}
            }

            option tgt "0.55-NA anamorphic EUV, single exposure" {
            	wavelength 13.5 nm
            	NA 0.55
            	k1 floor 0.35
            	k2 0.5
            	demagnification x 4 y 8
            	field x 26 mm y 16.5 mm
            	throughput 185 wph
            	on M1 {
            		width 12 nm
            		spacing 16 nm
            		pitch 28 nm
            	}
            	on V1 {
            		width 12 nm
            		spacing x 18 nm y 22 nm
            	}
            }
            """;

    private HandmadeCase() {
    }

    /** The deck, resolved; fails with the diagnostics when it does not load. */
    public static ResolvedDeck deck() {
        DeckLoadResult r = new DeckLoader().load(Path.of("handmade.apdeck"), DECK);
        return r.orElseThrow();
    }

    /** A rectangle given in nm, in database units of 0.25 nm. */
    public static Polygon nm(double x0, double y0, double x1, double y1) {
        return Polygon.rectangle(Math.round(4 * x0), Math.round(4 * y0), Math.round(4 * x1), Math.round(4 * y1));
    }

    /** The layout's polygons by deck layer. */
    public static Map<String, List<Polygon>> layout() {
        return Map.of(
                "M1", List.of(nm(0, 0, 1000, 16), nm(0, 30, 1000, 46), nm(0, 100, 1000, 108), nm(1020, 0, 1100, 46)),
                "V1", List.of(nm(200, 200, 212, 212), nm(232, 200, 244, 212), nm(200, 232, 212, 244)));
    }
}
