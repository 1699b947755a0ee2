/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.validation.DeckIssueCodes;
import org.junit.jupiter.api.Test;

/**
 * The k1 checks on published values. k1 = (pitch x split / 2) x NA / lambda (references.md §2, derived
 * from the Rayleigh criterion, C. A. Mack, Fundamental Principles of Optical Lithography, 2007); the
 * single-exposure limit 0.25 (imec, "High NA EUV lithography"; common practice).
 */
class OpticsPhysicsTest extends DeckTestSupport {

	private static String deck(String na, String pitch, String patterning, String floor) {
		return HEADER + """
				layer M1 gds 19/0 line horizontal
				option o {
					wavelength 13.5 nm
					NA %s
					k1 floor %s
					k2 0.5
					demagnification 4
					field x 26 mm y 33 mm
					on M1 {
						patterning %s
						pitch %s
					}
				}
				""".formatted(na, floor, patterning, pitch);
	}

	@Test
	void asap7MetalPitchAt033NaPasses() {
		// ASAP7: M1 36 nm pitch, 0.33-NA EUV single exposure (Clark et al. 2016, Table 1) -> k1 0.44
		ResolvedDeck d = resolve(deck("0.33", "36 nm", "single", "0.3"));
		assertThat(d.pitchK1("o", "M1")).hasValueCloseTo(0.44, within(0.001));
	}

	@Test
	void halfTheAsap7PitchAt033NaFailsAndNamesThePatterningThatPrintsIt() {
		// 18 nm at 0.33 NA -> k1 0.22 < 0.25 (references.md §2)
		DeckLoadResult r = load(deck("0.33", "18 nm", "single", "0.3"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.K1_BELOW_LIMIT);
		DeckDiagnostic e = r.errors().get(0);
		assertThat(e.message()).contains("k1 0.22").contains("LE2 or SADP").contains("k1 0.44");
		assertThat(e.line()).isEqualTo(12); // the pitch line
		assertThat(r.deck()).isEmpty();
	}

	@Test
	void twentyNanometresAt055NaPasses() {
		// 20 nm pitch printed with 0.55-NA EUV (references.md §2, secondary imec/ASML reports) -> k1 0.41
		ResolvedDeck d = resolve(deck("0.55", "20 nm", "single", "0.3"));
		assertThat(d.pitchK1("o", "M1")).hasValueCloseTo(0.407, within(0.001));
	}

	@Test
	void twentyEightNanometresAt033NaIsK1Of034() {
		// references.md §2: 28 nm -> 0.34
		ResolvedDeck d = resolve(deck("0.33", "28 nm", "single", "0.3"));
		assertThat(d.pitchK1("o", "M1")).hasValueCloseTo(0.342, within(0.001));
	}

	@Test
	void belowThePracticalFloorIsOnlyAWarning() {
		// 28 nm at 0.33 NA (k1 0.34) against a floor of 0.4: printable, but warned
		DeckLoadResult r = load(deck("0.33", "28 nm", "single", "0.4"));
		assertThat(r.errors()).isEmpty();
		assertThat(codes(r)).containsExactly(DeckIssueCodes.K1_BELOW_FLOOR);
		assertThat(r.deck()).isPresent();
	}

	@Test
	void litheEtchTwiceMakesTheHalfPitchPrintable() {
		// 18 nm with LE2: each exposure prints 36 nm -> k1 0.44
		ResolvedDeck d = resolve(deck("0.33", "18 nm", "litho-etch 2", "0.3"));
		assertThat(d.pitchK1("o", "M1")).hasValueCloseTo(0.44, within(0.001));
	}

	@Test
	void aPitchOnlyQuadruplePatterningSavesIsSaidSo() {
		// 10 nm at 0.33: SE 0.12, x2 0.24, x3 0.37 -> LE3 is the first that reaches 0.25
		DeckLoadResult r = load(deck("0.33", "10 nm", "single", "0.3"));
		assertThat(r.errors()).singleElement().satisfies(e -> assertThat(e.message()).contains("LE3"));
		// 7 nm: x3 0.257 -> LE3; 6 nm: x3 0.22, x4 0.29 -> SAQP
		DeckLoadResult six = load(deck("0.33", "6 nm", "single", "0.3"));
		assertThat(six.errors()).singleElement().satisfies(e -> assertThat(e.message()).contains("SAQP"));
		DeckLoadResult four = load(deck("0.33", "4 nm", "single", "0.3"));
		assertThat(four.errors()).singleElement().satisfies(e -> assertThat(e.message()).contains("not even SAQP"));
	}

	@Test
	void depthOfFocusShrinksWithNaSquared() {
		// DOF = k2 lambda / NA^2 (Mack 2007); ratio 0.55 vs 0.33 = (0.33/0.55)^2 = 0.36 (references.md §2)
		double low = resolve(deck("0.33", "36 nm", "single", "0.3")).option("o").orElseThrow().depthOfFocusNm();
		double high = resolve(deck("0.55", "36 nm", "single", "0.3")).option("o").orElseThrow().depthOfFocusNm();
		assertThat(low).isCloseTo(0.5 * 13.5 / (0.33 * 0.33), within(1e-9));
		assertThat(high / low).isCloseTo(0.36, within(0.001));
	}

	@Test
	void rayleighResolutionAtTheFloor() {
		// half-pitch CD = k1 lambda / NA: 0.33 x 13.5 / 0.33 = 13.5 nm, near ASML's 13 nm for 0.33 NA
		double r = resolve(deck("0.33", "36 nm", "single", "0.33")).option("o").orElseThrow().resolutionNm();
		assertThat(r).isCloseTo(13.5, within(1e-9));
	}
}
