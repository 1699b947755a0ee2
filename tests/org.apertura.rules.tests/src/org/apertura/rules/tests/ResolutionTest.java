/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;

import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.LayerKind;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.validation.DeckIssueCodes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Inheritance, expressions and imports resolve to exact database units. */
class ResolutionTest extends DeckTestSupport {

	private static final String LAYERS = """
			layer M1 gds 19/0 line horizontal "first metal"
			layer V1 gds 21/0 cut
			""";

	@Test
	void pitchWrittenAsTwoK1LambdaOverNa() {
		// 2 x 0.3 x 13.5 / 0.33 = 24.5454... nm: off the 1 nm grid unless rounded
		DeckLoadResult raw = load(HEADER + LAYERS + EUV + "on M1 { pitch 2 * k1 * lambda / NA }\n}\n");
		assertThat(errorCodes(raw)).containsExactly(DeckIssueCodes.OFF_GRID);
		ResolvedDeck d = resolve(HEADER + LAYERS + EUV + "on M1 { pitch ceil(2 * k1 * λ / NA) }\n}\n");
		assertThat(d.value("euv", "M1", RuleKind.PITCH)).contains(RuleValue.of(25));
		ResolvedDeck down = resolve(HEADER + LAYERS + EUV + "on M1 { pitch floor(2 * k1 * lambda / NA) }\n}\n");
		assertThat(down.value("euv", "M1", RuleKind.PITCH)).contains(RuleValue.of(24));
	}

	@Test
	void unitsAndArithmeticAreExact() {
		// 0.14 um = 140 nm exactly; 0.0561 um2 = 56100 nm2; 1 mm = 1e6 nm
		ResolvedDeck d = resolve(HEADER + LAYERS + EUV + """
				on M1 {
					width 0.14 um
					spacing (width + 60 nm) / 2 - 10 nm
					max width 1 mm / 1000
					area 0.0561 µm²
					end-of-line tip < 3 * width: tip-to-tip max(spacing, 95 nm) tip-to-side min(spacing, 95 nm)
				}
				}
				""");
		assertThat(d.value("euv", "M1", RuleKind.WIDTH)).contains(RuleValue.of(140));
		assertThat(d.value("euv", "M1", RuleKind.SPACING)).contains(RuleValue.of(90));
		assertThat(d.value("euv", "M1", RuleKind.MAX_WIDTH)).contains(RuleValue.of(1000));
		assertThat(d.value("euv", "M1", RuleKind.AREA)).contains(RuleValue.of(56_100));
		assertThat(d.value("euv", "M1", RuleKind.END_OF_LINE_TIP_LENGTH)).contains(RuleValue.of(420));
		assertThat(d.rules("euv", "M1").endOfLine().orElseThrow().tipLengthInclusive()).isFalse();
		assertThat(d.value("euv", "M1", RuleKind.END_OF_LINE_TIP_TO_TIP)).contains(RuleValue.of(95));
		assertThat(d.value("euv", "M1", RuleKind.END_OF_LINE_TIP_TO_SIDE)).contains(RuleValue.of(90));
	}

	@Test
	void subNanometreDatabaseUnit() {
		// 0.25 nm database unit (ASAP7's): 18 nm = 72 units, 504 nm2 = 8064 square units
		ResolvedDeck d = resolve("technology \"T\" database unit 0.25 nm grid 0.5 nm\n" + LAYERS + EUV
				+ "on M1 { width 18.5 nm area 504 nm2 }\n}\n");
		assertThat(d.value("euv", "M1", RuleKind.WIDTH)).contains(RuleValue.of(74));
		assertThat(d.value("euv", "M1", RuleKind.AREA)).contains(RuleValue.of(8064));
		assertThat(d.manufacturingGrid()).isEqualTo(2);
		assertThat(d.toNanometres(74)).isEqualTo(18.5);
	}

	@Test
	void childOptionOverridesOnlyWhatChangesAndExpressionsFollow() {
		ResolvedDeck d = resolve(HEADER + LAYERS + """
				on M1 {
					width pitch / 2
					spacing pitch - width
				}
				""" + EUV + """
					on M1 { pitch 36 nm }
					on V1 { width 18 nm spacing 20 nm }
				}
				option hna extends euv {
					NA 0.55
					demagnification x 4 y 8
					field x 26 mm y 16.5 mm
					on M1 { pitch 20 nm }
				}
				""");
		assertThat(d.value("euv", "M1", RuleKind.WIDTH)).contains(RuleValue.of(18));
		assertThat(d.value("euv", "M1", RuleKind.SPACING)).contains(RuleValue.of(18));
		assertThat(d.value("hna", "M1", RuleKind.PITCH)).contains(RuleValue.of(20));
		assertThat(d.value("hna", "M1", RuleKind.WIDTH)).contains(RuleValue.of(10));
		assertThat(d.value("hna", "M1", RuleKind.SPACING)).contains(RuleValue.of(10));
		assertThat(d.value("hna", "V1", RuleKind.WIDTH)).contains(RuleValue.of(18)); // inherited block
		var hna = d.option("hna").orElseThrow();
		assertThat(hna.wavelengthNm()).isEqualTo(13.5); // inherited optics
		assertThat(hna.k1Floor()).isEqualTo(0.3);
		assertThat(hna.demagnification(Axis.Y)).isEqualTo(8);
		assertThat(hna.fieldYMm()).isEqualTo(16.5);
	}

	@Test
	void optionExpressionsSeeTheChildsOptics() {
		// the parent writes its pitch over lambda and NA; the child only changes NA
		ResolvedDeck d = resolve(HEADER + LAYERS + EUV + """
					on M1 { pitch round(2 * 0.44 * lambda / NA) }
				}
				option hna extends euv { NA 0.55 }
				""");
		assertThat(d.value("euv", "M1", RuleKind.PITCH)).contains(RuleValue.of(36)); // 36.0
		assertThat(d.value("hna", "M1", RuleKind.PITCH)).contains(RuleValue.of(22)); // 21.6 -> 22
	}

	@Test
	void perAxisValues() {
		ResolvedDeck d = resolve(HEADER + LAYERS + EUV + "on V1 { width 16 nm spacing x 18 nm y 2 * width }\n}\n");
		RuleValue s = d.value("euv", "V1", RuleKind.SPACING).orElseThrow();
		assertThat(s.isIsotropic()).isFalse();
		assertThat(s.along(Axis.X)).isEqualTo(18);
		assertThat(s.along(Axis.Y)).isEqualTo(32);
	}

	@Test
	void layersResolveWithKindAndDirection() {
		ResolvedDeck d = resolve(HEADER + LAYERS);
		var m1 = d.layer("M1").orElseThrow();
		assertThat(m1.kind()).isEqualTo(LayerKind.LINE);
		assertThat(m1.direction()).isEqualTo(Direction.HORIZONTAL);
		assertThat(m1.direction().pitchAxis()).isEqualTo(Axis.Y);
		assertThat(m1.description()).isEqualTo("first metal");
		assertThat(d.layer("V1").orElseThrow().direction()).isEqualTo(Direction.NONE);
	}

	@Test
	void importsBringLayersAndOptions(@TempDir Path dir) throws Exception {
		Files.writeString(dir.resolve("layers.apdeck"), LAYERS);
		Files.writeString(dir.resolve("base.apdeck"), "import \"layers.apdeck\"\n" + HEADER + EUV
				+ "on M1 { width 18 nm }\n}\n");
		Files.writeString(dir.resolve("top.apdeck"), "import \"base.apdeck\"\n" + HEADER
				+ "option hna extends euv { NA 0.55 on M1 { pitch 20 nm } }\n");
		DeckLoadResult r = LOADER.load(dir.resolve("top.apdeck"));
		assertThat(r.diagnostics()).isEmpty();
		ResolvedDeck d = r.deck().orElseThrow();
		assertThat(d.layers()).hasSize(2);
		assertThat(d.value("hna", "M1", RuleKind.WIDTH)).contains(RuleValue.of(18));
		assertThat(d.value("hna", "M1", RuleKind.PITCH)).contains(RuleValue.of(20));
	}

	@Test
	void aValueInheritedFromAnotherFileIsReportedAtTheOptionThatBreaksIt(@TempDir Path dir) throws Exception {
		// 36 nm is fine at 0.33-NA EUV (k1 0.44) but not with 193 nm optics: (36/2) x 1.35 / 193 = 0.13
		Files.writeString(dir.resolve("base.apdeck"), HEADER + LAYERS + EUV + "on M1 { pitch 36 nm }\n}\n");
		Files.writeString(dir.resolve("top.apdeck"), "import \"base.apdeck\"\n" + HEADER
				+ "option arf extends euv { wavelength 193 nm NA 1.35 }\n");
		DeckLoadResult r = LOADER.load(dir.resolve("top.apdeck"));
		assertThat(r.errors()).singleElement().satisfies(e -> {
			assertThat(e.code()).isEqualTo(DeckIssueCodes.K1_BELOW_LIMIT);
			assertThat(e.file()).endsWith("top.apdeck");
			assertThat(e.line()).isEqualTo(3);
			assertThat(e.message()).contains("'arf'").contains("inherited from base.apdeck").contains("LE2 or SADP"); // (36 x 2 / 2) x 1.35 / 193 = 0.252
		});
	}

	@Test
	void importCycleIsReportedNotLooped(@TempDir Path dir) throws Exception {
		Files.writeString(dir.resolve("a.apdeck"), "import \"b.apdeck\"\n" + HEADER + "layer A gds 1/0 other\n");
		Files.writeString(dir.resolve("b.apdeck"), "import \"a.apdeck\"\nlayer B gds 2/0 other\n");
		DeckLoadResult r = LOADER.load(dir.resolve("a.apdeck"));
		assertThat(errorCodes(r)).contains(DeckIssueCodes.IMPORT_CYCLE);
	}

	@Test
	void missingImport(@TempDir Path dir) throws Exception {
		Files.writeString(dir.resolve("a.apdeck"), "import \"nowhere.apdeck\"\n" + HEADER);
		DeckLoadResult r = LOADER.load(dir.resolve("a.apdeck"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.IMPORT_NOT_FOUND);
		assertThat(r.errors().get(0).line()).isEqualTo(1);
	}

	@Test
	void errorsInAnImportedDeckNameThatFile(@TempDir Path dir) throws Exception {
		Files.writeString(dir.resolve("layers.apdeck"), "layer M1 gds 19/0 line\n");
		Files.writeString(dir.resolve("top.apdeck"), "import \"layers.apdeck\"\n" + HEADER);
		DeckLoadResult r = LOADER.load(dir.resolve("top.apdeck"));
		assertThat(r.errors()).singleElement().satisfies(e -> {
			assertThat(e.file()).endsWith("layers.apdeck");
			assertThat(e.code()).isEqualTo(DeckIssueCodes.MISSING_DIRECTION);
			assertThat(e.line()).isEqualTo(1);
		});
	}

	@Test
	void missingFileIsADiagnostic(@TempDir Path dir) {
		DeckLoadResult r = LOADER.load(dir.resolve("absent.apdeck"));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.LOAD_FAILED);
	}
}
