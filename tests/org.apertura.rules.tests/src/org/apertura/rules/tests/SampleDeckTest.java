/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.PatterningScheme;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The invented Meridian MX3 sample deck in samples/decks: it loads clean and resolves as written. */
class SampleDeckTest extends DeckTestSupport {

	private static DeckLoadResult result;
	private static ResolvedDeck deck;

	@BeforeAll
	static void load() {
		result = LOADER.load(repository().resolve("samples/decks/meridian-mx3.apdeck"));
		deck = result.deck().orElse(null);
	}

	@Test
	void validatesWithoutErrorsOrWarnings() {
		assertThat(result.diagnostics()).isEmpty();
		assertThat(deck).isNotNull();
	}

	@Test
	void declaresSevenLayersAndFourOptions() {
		assertThat(deck.layers()).hasSize(7);
		assertThat(deck.options()).extracting(LithographyOption::name)
				.containsExactly("duv_le2", "euv_se", "euv_le2", "euv_hna");
		assertThat(deck.databaseUnitMetres()).isEqualTo(0.25e-9, within(1e-20));
		assertThat(deck.manufacturingGrid()).isEqualTo(2);
	}

	@Test
	void highNaOptionInheritsAndOverrides() {
		LithographyOption hna = deck.option("euv_hna").orElseThrow();
		assertThat(hna.parent()).contains("euv_se");
		assertThat(hna.wavelengthNm()).isEqualTo(13.5);
		assertThat(hna.numericalAperture()).isEqualTo(0.55);
		assertThat(hna.demagnificationX()).isEqualTo(4);
		assertThat(hna.demagnificationY()).isEqualTo(8);
		assertThat(hna.fieldYMm()).isEqualTo(16.5);
		assertThat(hna.isAnamorphic()).isTrue();
		assertThat(hna.throughput()).hasValue(185);
		// the half-field option states its stitch keep-out band (invented value, 2 µm); full-field options have none
		assertThat(hna.stitchKeepOutNm()).hasValue(2000);
		assertThat(deck.option("euv_se").orElseThrow().stitchKeepOutNm()).isEmpty();
	}

	@Test
	void widthAndSpacingFollowEachOptionsPitch() {
		// M1 width is written once as pitch / 2 and resolved per option (0.25 nm database units)
		assertThat(deck.value("duv_le2", "M1", RuleKind.WIDTH)).contains(RuleValue.of(84)); // 21 nm
		assertThat(deck.value("euv_se", "M1", RuleKind.PITCH)).contains(RuleValue.of(108)); // 27 nm
		assertThat(deck.value("euv_se", "M1", RuleKind.WIDTH)).contains(RuleValue.of(54)); // 13.5 nm
		assertThat(deck.value("euv_le2", "M1", RuleKind.WIDTH)).contains(RuleValue.of(40)); // 10 nm
		assertThat(deck.value("euv_le2", "M1", RuleKind.SAME_MASK_SPACING)).contains(RuleValue.of(120)); // 30 nm
		assertThat(deck.value("euv_hna", "V1", RuleKind.SPACING)).contains(new RuleValue(72, 80));
		assertThat(deck.rules("euv_le2", "M1").patterning().scheme()).isEqualTo(PatterningScheme.LITHO_ETCH);
		assertThat(deck.rules("euv_hna", "M1").patterning().masks()).isEqualTo(1);
		assertThat(deck.rules("duv_le2", "GATE").patterning().label()).isEqualTo("SADP");
	}

	@Test
	void pitchK1MatchesTheCommentsInTheDeck() {
		assertThat(deck.pitchK1("duv_le2", "M1")).hasValueCloseTo(0.29, within(0.005));
		assertThat(deck.pitchK1("duv_le2", "M2")).hasValueCloseTo(0.34, within(0.005));
		assertThat(deck.pitchK1("duv_le2", "GATE")).hasValueCloseTo(0.38, within(0.005));
		assertThat(deck.pitchK1("euv_se", "M1")).hasValueCloseTo(0.33, within(0.005));
		assertThat(deck.pitchK1("euv_se", "M2")).hasValueCloseTo(0.39, within(0.005));
		assertThat(deck.pitchK1("euv_le2", "M1")).hasValueCloseTo(0.49, within(0.005));
		assertThat(deck.pitchK1("euv_le2", "M2")).hasValueCloseTo(0.59, within(0.005));
		assertThat(deck.pitchK1("euv_hna", "M1")).hasValueCloseTo(0.41, within(0.005));
		assertThat(deck.pitchK1("euv_hna", "M2")).hasValueCloseTo(0.45, within(0.005));
		assertThat(deck.pitchK1("euv_hna", "GATE")).hasValueCloseTo(0.86, within(0.005));
	}
}
