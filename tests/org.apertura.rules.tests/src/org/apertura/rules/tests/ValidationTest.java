/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;

import org.apertura.rules.deck.Deck;
import org.apertura.rules.deck.DeckPackage;
import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.validation.DeckIssueCodes;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.eclipse.xtext.testing.validation.ValidationTestHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;

/** Each validation rule fires on a minimal deck, with its issue code at the right place. */
@ExtendWith(InjectionExtension.class)
@InjectWith(DeckInjectorProvider.class)
class ValidationTest extends DeckTestSupport {

	@Inject
	private ParseHelper<Deck> parser;

	@Inject
	private ValidationTestHelper validator;

	private static String euvWith(String layers, String block) {
		return HEADER + layers + "\n" + EUV + block + "\n}\n";
	}

	private static final String M1 = "layer M1 gds 19/0 line horizontal\nlayer V1 gds 21/0 cut\n";

	@Test
	void aCleanDeckHasNoIssues() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 18 nm spacing 18 nm pitch 36 nm }"));
		validator.assertNoIssues(deck);
	}

	@Test
	void unknownLayerAndOptionAreLinkingErrorsWithOurCodes() throws Exception {
		Deck deck = parser.parse(HEADER + M1 + "option a extends nowhere { }\non M3 { width 1 nm }\n");
		validator.assertError(deck, DeckPackage.Literals.OPTION, DeckIssueCodes.UNKNOWN_OPTION);
		validator.assertError(deck, DeckPackage.Literals.LAYER_RULES, DeckIssueCodes.UNKNOWN_LAYER);
	}

	@Test
	void duplicateRuleInOneBlock() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 18 nm width 20 nm }"));
		validator.assertError(deck, DeckPackage.Literals.WIDTH_RULE, DeckIssueCodes.DUPLICATE_RULE);
	}

	@Test
	void duplicateSpacingRowAndEnclosure() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { spacing 30 nm if width > 100 nm spacing 40 nm if width > 100 nm "
				+ "enclosure of V1 2 nm enclosure of V1 3 nm }"));
		assertThat(errorCodes(r)).containsExactlyInAnyOrder(DeckIssueCodes.DUPLICATE_RULE, DeckIssueCodes.DUPLICATE_RULE);
	}

	@Test
	void missingUnitOnALength() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 18 }"));
		validator.assertError(deck, DeckPackage.Literals.QUANTITY, DeckIssueCodes.MISSING_UNIT);
	}

	@Test
	void missingUnitInsideASum() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 18 nm + 2 }"));
		validator.assertError(deck, DeckPackage.Literals.QUANTITY, DeckIssueCodes.MISSING_UNIT);
	}

	@Test
	void areaWrittenAsALength() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { area 500 nm }"));
		validator.assertError(deck, DeckPackage.Literals.QUANTITY, DeckIssueCodes.UNIT_MISMATCH);
	}

	@Test
	void nonPositiveValue() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 0 nm spacing -4 nm }"));
		validator.assertError(deck, DeckPackage.Literals.WIDTH_RULE, DeckIssueCodes.NON_POSITIVE_VALUE);
		validator.assertError(deck, DeckPackage.Literals.SPACING_RULE, DeckIssueCodes.NON_POSITIVE_VALUE);
	}

	@Test
	void valueOffTheManufacturingGrid() {
		DeckLoadResult r = load("technology \"T\" database unit 1 nm grid 5 nm\n" + M1 + EUV
				+ "on M1 { width 142 nm }\n}\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.OFF_GRID);
		assertThat(r.errors().get(0).message()).contains("5 nm manufacturing grid");
	}

	@Test
	void valueNotAWholeNumberOfDatabaseUnits() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { width 18.5 nm }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.OFF_GRID);
	}

	@Test
	void widthPlusSpacingGreaterThanPitch() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { width 20 nm spacing 20 nm pitch 36 nm }"));
		validator.assertError(deck, DeckPackage.Literals.PITCH_RULE, DeckIssueCodes.WIDTH_SPACING_EXCEED_PITCH);
	}

	@Test
	void sameMaskSpacingOnASingleMaskLayer() throws Exception {
		Deck deck = parser.parse(euvWith(M1, "on M1 { spacing 18 nm same-mask spacing 40 nm }"));
		validator.assertError(deck, DeckPackage.Literals.SAME_MASK_SPACING_RULE,
				DeckIssueCodes.SAME_MASK_ON_SINGLE_MASK);
		Deck ok = parser.parse(euvWith(M1, "on M1 { patterning litho-etch 2 spacing 18 nm same-mask spacing 40 nm }"));
		validator.assertNoIssues(ok);
	}

	@Test
	void cyclicInheritance() throws Exception {
		Deck deck = parser.parse(HEADER + M1 + "option a extends b { }\noption b extends a { }\n");
		validator.assertError(deck, DeckPackage.Literals.OPTION, DeckIssueCodes.INHERITANCE_CYCLE);
	}

	@Test
	void cyclicExpressions() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { width pitch / 2 pitch 2 * width }"));
		assertThat(errorCodes(r)).contains(DeckIssueCodes.EXPRESSION_CYCLE);
	}

	@Test
	void referenceToARuleTheLayerLacks() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { width pitch / 2 }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.UNDEFINED_RULE_REFERENCE);
	}

	@Test
	void duplicateNamesAndBlocks() {
		DeckLoadResult r = load(HEADER + M1 + "layer M1 gds 30/0 cut\n" + EUV + "}\n" + EUV
				+ "on M1 { width 18 nm }\non M1 { spacing 18 nm }\n}\n");
		assertThat(errorCodes(r)).contains(DeckIssueCodes.DUPLICATE_LAYER, DeckIssueCodes.DUPLICATE_OPTION,
				DeckIssueCodes.DUPLICATE_LAYER_BLOCK);
	}

	@Test
	void duplicateGdsNumberIsAWarning() {
		DeckLoadResult r = load(HEADER + "layer A gds 1/0 other\nlayer B gds 1/0 other\n");
		assertThat(r.errors()).isEmpty();
		assertThat(codes(r)).containsExactly(DeckIssueCodes.DUPLICATE_GDS_NUMBER);
	}

	@Test
	void pitchOnACutLayer() {
		DeckLoadResult r = load(euvWith(M1, "on V1 { pitch 40 nm }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.PITCH_ON_NON_LINE_LAYER);
	}

	@Test
	void lineLayerWithoutDirection() {
		DeckLoadResult r = load(HEADER + "layer M1 gds 19/0 line\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.MISSING_DIRECTION);
	}

	@Test
	void optionWithoutOptics() {
		DeckLoadResult r = load(HEADER + "option bare { wavelength 193 nm }\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.MISSING_OPTICS);
		assertThat(r.errors().get(0).message()).contains("NA", "k1 floor", "k2", "demagnification", "field");
	}

	@Test
	void nonPhysicalNa() {
		DeckLoadResult r = load(HEADER + EUV.replace("NA 0.33", "NA 2.5") + "}\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.OPTICS_OUT_OF_RANGE);
	}

	@Test
	void invalidPatterning() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { patterning litho-etch 1 }\non V1 { patterning spacer 3 }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.INVALID_PATTERNING, DeckIssueCodes.INVALID_PATTERNING);
	}

	@Test
	void maskSideMinimumCheckedAfterDemagnificationPerAxis() {
		// anamorphic 4x/8x: a 10 nm vertical-line width is 40 nm on the mask along x, 80 nm along y
		String deck = HEADER + "layer M2 gds 20/0 line vertical\n"
				+ EUV.replace("demagnification 4", "demagnification x 4 y 8")
				+ "on M2 { width 10 nm mask width %s }\n}\n";
		assertThat(load(deck.formatted("40 nm")).diagnostics()).isEmpty();
		DeckLoadResult r = load(deck.formatted("48 nm"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.MASK_FEATURE_TOO_SMALL);
		assertThat(r.errors().get(0).message()).contains("along x").contains("40 nm on the mask");
	}

	@Test
	void densityBounds() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { density min 80 % max 20 % window 50 um step 25 um }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.DENSITY_RANGE);
		DeckLoadResult over = load(euvWith(M1, "on M1 { density max 120 % window 50 um step 25 um }"));
		assertThat(errorCodes(over)).containsExactly(DeckIssueCodes.DENSITY_RANGE);
		DeckLoadResult step = load(euvWith(M1, "on M1 { density max 70 % window 20 um step 25 um }"));
		assertThat(codes(step)).containsExactly(DeckIssueCodes.DENSITY_STEP_EXCEEDS_WINDOW);
	}

	@Test
	void enclosureOfItself() {
		DeckLoadResult r = load(euvWith(M1, "on M1 { enclosure of M1 5 nm }"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.ENCLOSURE_OF_SELF);
	}

	@Test
	void gridThatIsNotAMultipleOfTheUnit() {
		DeckLoadResult r = load("technology \"T\" database unit 1 nm grid 2.5 nm\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.GRID_NOT_MULTIPLE_OF_UNIT);
	}

	@Test
	void rootDeckNeedsATechnologyHeader() {
		DeckLoadResult r = load("layer A gds 1/0 other\n");
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.MISSING_TECHNOLOGY);
	}

	@Test
	void diagnosticsCarryFileLineAndColumn() {
		DeckLoadResult r = load(euvWith(M1, "on M1 {\n    width 18\n}"));
		DeckDiagnostic d = r.errors().get(0);
		assertThat(d.file()).endsWith("test.apdeck");
		assertThat(d.line()).isEqualTo(13);
		assertThat(d.column()).isEqualTo(11);
		assertThat(d.code()).isEqualTo(DeckIssueCodes.MISSING_UNIT);
		assertThat(d.severity()).isEqualTo(DeckDiagnostic.Severity.ERROR);
	}

	@Test
	void syntaxErrorsAreDiagnostics() {
		DeckLoadResult r = load(HEADER + "layer M1 gds 19/0 line horizontal\nlayer = 3\n");
		assertThat(errorCodes(r)).contains(DeckIssueCodes.SYNTAX_ERROR);
		assertThat(r.errors().get(0).line()).isEqualTo(3);
	}
}
