/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;

import org.apertura.rules.deck.Deck;
import org.apertura.rules.deck.DeckPackage;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.validation.DeckIssueCodes;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

/** The option-level {@code stitch keep-out} setting: resolved, inherited and validated. */
@ExtendWith(InjectionExtension.class)
@InjectWith(DeckInjectorProvider.class)
class StitchKeepOutTest extends DeckTestSupport {

	@Inject
	private ParseHelper<Deck> parser;

	@Inject
	private ValidationTestHelper validator;

	/** A half-pitch grid of 0.5 nm on a 0.25 nm database unit, so that grid and unit checks differ. */
	private static final String FINE = "technology \"Test\" database unit 0.25 nm grid 0.5 nm\n"
			+ "layer M1 gds 19/0 line horizontal\n";

	private static String deck(String setting) {
		return FINE + EUV + "\t" + setting + "\n}\n";
	}

	@Test
	void resolvesToNanometresAndIsInherited() {
		ResolvedDeck d = resolve(FINE + EUV + "\tstitch keep-out 2 um\n}\n"
				+ "option hna extends euv { NA 0.55 demagnification x 4 y 8 field x 26 mm y 16.5 mm }\n"
				+ "option wide extends euv { stitch keep-out 750 nm }\n");
		assertThat(d.option("euv").orElseThrow().stitchKeepOutNm()).hasValue(2000);
		assertThat(d.option("hna").orElseThrow().stitchKeepOutNm()).hasValue(2000);
		assertThat(d.option("wide").orElseThrow().stitchKeepOutNm()).hasValue(750);
	}

	@Test
	void absentMeansNone() {
		ResolvedDeck d = resolve(FINE + EUV + "}\n");
		assertThat(d.option("euv").orElseThrow().stitchKeepOutNm()).isEmpty();
	}

	@Test
	void anExpressionOverTheOpticsIsAllowed() {
		// 100 x 13.5 nm = 1350 nm, on the 0.5 nm grid
		ResolvedDeck d = resolve(deck("stitch keep-out 100 * lambda"));
		assertThat(d.option("euv").orElseThrow().stitchKeepOutNm()).hasValue(1350);
	}

	@Test
	void needsAUnit() {
		DeckLoadResult r = load(deck("stitch keep-out 2000"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.MISSING_UNIT);
	}

	@Test
	void mustBePositive() {
		assertThat(errorCodes(load(deck("stitch keep-out 0 nm")))).containsExactly(DeckIssueCodes.NON_POSITIVE_VALUE);
		assertThat(errorCodes(load(deck("stitch keep-out -1 um")))).containsExactly(DeckIssueCodes.NON_POSITIVE_VALUE);
	}

	@Test
	void mustLieOnTheManufacturingGrid() {
		// 1000.25 nm is a whole number of 0.25 nm units but off the 0.5 nm grid
		DeckLoadResult r = load(deck("stitch keep-out 1000.25 nm"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.OFF_GRID);
		assertThat(r.errors().get(0).message()).contains("stitch keep-out", "grid");
		assertThat(errorCodes(load(deck("stitch keep-out 1000.5 nm")))).isEmpty();
	}

	@Test
	void takesOneValueAndIsSetOnce() {
		assertThat(errorCodes(load(deck("stitch keep-out x 1 um y 2 um"))))
				.containsExactly(DeckIssueCodes.UNIT_MISMATCH);
		assertThat(errorCodes(load(deck("stitch keep-out 1 um\n\tstitch keep-out 2 um"))))
				.contains(DeckIssueCodes.DUPLICATE_SETTING);
	}

	@Test
	void validatorReportsAtTheSetting() throws Exception {
		Deck d = parser.parse(deck("stitch keep-out 0 nm"));
		validator.assertError(d, DeckPackage.Literals.STITCH_KEEP_OUT, DeckIssueCodes.NON_POSITIVE_VALUE);
		validator.assertNoErrors(parser.parse(deck("stitch keep-out 2 um")));
	}
}
