/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.OptionalLong;

import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.PatterningScheme;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;
import org.junit.jupiter.api.Test;

/**
 * The reference decks under resources/decks transcribe published rule tables (references.md §1);
 * each check names the rule ID it comes from. SKY130 and GF180MCU use a 1 nm database unit, ASAP7
 * 0.25 nm.
 */
class ReferenceDecksTest extends DeckTestSupport {

	private static ResolvedDeck loadReference(String name) {
		DeckLoadResult r = LOADER.load(testDeck(name));
		assertThat(r.diagnostics()).as(name).isEmpty();
		return r.deck().orElseThrow();
	}

	private static long v(ResolvedDeck d, String option, String layer, RuleKind kind) {
		return d.value(option, layer, kind).orElseThrow(() -> new AssertionError(layer + " " + kind)).value();
	}

	@Test
	void sky130() {
		// google/skywater-pdk periphery rules; sky130_fd_sc_hd tech LEF
		ResolvedDeck d = loadReference("sky130.apdeck");
		assertThat(d.manufacturingGrid()).isEqualTo(5); // x.1b, 0.005 um
		assertThat(d.layer("met1").orElseThrow().gdsLayer()).isEqualTo(68); // gds_layers.csv 68/20
		assertThat(d.layer("met1").orElseThrow().gdsDatatype()).isEqualTo(20);
		assertThat(v(d, "krf", "li1", RuleKind.WIDTH)).isEqualTo(170); // li.1
		assertThat(v(d, "krf", "li1", RuleKind.SPACING)).isEqualTo(170); // li.3
		assertThat(v(d, "krf", "li1", RuleKind.AREA)).isEqualTo(56_100); // li.6, 0.0561 um2
		assertThat(d.value("krf", "li1", RuleKind.PITCH)).contains(new RuleValue(460, 340)); // LEF
		assertThat(v(d, "krf", "met1", RuleKind.WIDTH)).isEqualTo(140); // m1.1
		assertThat(v(d, "krf", "met1", RuleKind.SPACING)).isEqualTo(140); // m1.2
		assertThat(v(d, "krf", "met1", RuleKind.AREA)).isEqualTo(83_000); // m1.6
		assertThat(v(d, "krf", "met1", RuleKind.PITCH)).isEqualTo(340); // LEF
		LayerRules met1 = d.rules("krf", "met1");
		// m1.3a/b: 0.28 next to metal >= 3 um wide
		assertThat(met1.spacingTable()).containsExactly(new ConditionalSpacing(RuleValue.of(280),
				SpacingMetric.EUCLIDEAN, OptionalLong.of(3000), true, OptionalLong.empty(), false));
		// m1.4 / m1.5
		Enclosure mcon = met1.enclosureOf("mcon").orElseThrow();
		assertThat(mcon.allSides()).isEqualTo(RuleValue.of(30));
		assertThat(mcon.pairValue()).contains(RuleValue.of(60));
		assertThat(mcon.pair()).isEqualTo(Enclosure.SidePair.ADJACENT);
		// m1.13 / m1.14
		assertThat(met1.density().orElseThrow().maximum()).hasValueCloseTo(0.77, within(1e-12));
		assertThat(met1.density().orElseThrow().minimum()).isEmpty();
		assertThat(met1.density().orElseThrow().window()).isEqualTo(50_000);
		assertThat(met1.density().orElseThrow().step()).isEqualTo(25_000);
		assertThat(v(d, "krf", "met2", RuleKind.WIDTH)).isEqualTo(140); // m2.1
		assertThat(v(d, "krf", "met2", RuleKind.SPACING)).isEqualTo(140); // m2.2
		assertThat(v(d, "krf", "met2", RuleKind.AREA)).isEqualTo(67_600); // m2.6
		assertThat(v(d, "krf", "met2", RuleKind.PITCH)).isEqualTo(460); // LEF
		Enclosure via = d.rules("krf", "met2").enclosureOf("via").orElseThrow();
		assertThat(via.allSides()).isEqualTo(RuleValue.of(55)); // m2.4
		assertThat(via.pairValue()).contains(RuleValue.of(85)); // m2.5
		assertThat(v(d, "krf", "mcon", RuleKind.WIDTH)).isEqualTo(170); // ct.1
		assertThat(v(d, "krf", "mcon", RuleKind.SPACING)).isEqualTo(190); // ct.2
		assertThat(v(d, "krf", "via", RuleKind.WIDTH)).isEqualTo(150); // via.1a
		assertThat(v(d, "krf", "via", RuleKind.SPACING)).isEqualTo(170); // via.2
	}

	@Test
	void gf180mcu() {
		// google/gf180mcu-pdk design manual section 7.13 (22_Metaln_58.csv); 7-track tech LEF
		ResolvedDeck d = loadReference("gf180mcu.apdeck");
		assertThat(v(d, "krf", "Metal1", RuleKind.WIDTH)).isEqualTo(230); // Mn.1
		assertThat(v(d, "krf", "Metal1", RuleKind.SPACING)).isEqualTo(230); // Mn.2a
		assertThat(d.rules("krf", "Metal1").spacingTable()).singleElement().satisfies(row -> {
			assertThat(row.spacing()).isEqualTo(RuleValue.of(300)); // Mn.2b
			assertThat(row.width()).hasValue(10_000);
			assertThat(row.widthInclusive()).isFalse();
			assertThat(row.applies(10_001, 0)).isTrue();
			assertThat(row.applies(10_000, 0)).isFalse();
		});
		assertThat(v(d, "krf", "Metal1", RuleKind.AREA)).isEqualTo(144_400); // Mn.3
		assertThat(v(d, "krf", "Metal1", RuleKind.PITCH)).isEqualTo(560); // LEF
		assertThat(v(d, "krf", "Metal2", RuleKind.WIDTH)).isEqualTo(280);
		assertThat(v(d, "krf", "Metal2", RuleKind.SPACING)).isEqualTo(280);
		assertThat(v(d, "krf", "Metal2", RuleKind.AREA)).isEqualTo(144_400);
		assertThat(v(d, "krf", "Metal2", RuleKind.PITCH)).isEqualTo(560);
		assertThat(v(d, "krf", "Via1", RuleKind.WIDTH)).isEqualTo(260);
		assertThat(v(d, "krf", "Via1", RuleKind.SPACING)).isEqualTo(260);
		assertThat(d.layer("Via1").orElseThrow().gdsLayer()).isEqualTo(35);
	}

	@Test
	void asap7() {
		// ASAP7 DRM Table 3.12.1 and Clark et al. 2016 Table 1; database unit 0.25 nm
		ResolvedDeck d = loadReference("asap7.apdeck");
		assertThat(d.databaseUnitMetres()).isCloseTo(2.5e-10, within(1e-22));
		for (String m : new String[] { "M1", "M2", "M3" }) {
			assertThat(v(d, "euv", m, RuleKind.WIDTH)).isEqualTo(72); // M1.W.1, 18 nm
			assertThat(v(d, "euv", m, RuleKind.SPACING)).isEqualTo(72); // M1.S.1, 18 nm
			assertThat(d.rules("euv", m).spacingMetric()).isEqualTo(SpacingMetric.PROJECTION);
			assertThat(v(d, "euv", m, RuleKind.END_OF_LINE_TIP_TO_SIDE)).isEqualTo(100); // M1.S.2, 25 nm
			assertThat(v(d, "euv", m, RuleKind.END_OF_LINE_TIP_TO_TIP)).isEqualTo(108); // M1.S.3, 27 nm
			assertThat(v(d, "euv", m, RuleKind.END_OF_LINE_TIP_LENGTH)).isEqualTo(144); // 36 nm = 2x width
			assertThat(d.rules("euv", m).endOfLine().orElseThrow().tipLengthInclusive()).isTrue();
			assertThat(v(d, "euv", m, RuleKind.AREA)).isEqualTo(504 * 16); // M1.A.1, 504 nm2
			assertThat(v(d, "euv", m, RuleKind.PITCH)).isEqualTo(144); // Table 1, 36 nm
			// references.md §2: 36 nm at NA 0.33 -> k1 0.44
			assertThat(d.pitchK1("euv", m)).hasValueCloseTo(0.44, within(0.001));
		}
		for (String m : new String[] { "M4", "M5" }) {
			LayerRules r = d.rules("arf_sadp", m);
			assertThat(r.patterning().scheme()).isEqualTo(PatterningScheme.SPACER_DIVISION); // Table 1: SADP
			assertThat(r.patterning().pitchSplit()).isEqualTo(2);
			assertThat(v(d, "arf_sadp", m, RuleKind.WIDTH)).isEqualTo(96); // 24 nm
			assertThat(v(d, "arf_sadp", m, RuleKind.MAX_WIDTH)).isEqualTo(1920); // 480 nm
			assertThat(v(d, "arf_sadp", m, RuleKind.SPACING)).isEqualTo(96); // 24 nm
			assertThat(v(d, "arf_sadp", m, RuleKind.END_OF_LINE_TIP_TO_TIP)).isEqualTo(160); // 40 nm
			assertThat(v(d, "arf_sadp", m, RuleKind.PITCH)).isEqualTo(192); // 48 nm
			// (48 x 2 / 2) x 1.35 / 193 = 0.336
			assertThat(d.pitchK1("arf_sadp", m)).hasValueCloseTo(0.336, within(0.001));
			// under the EUV option these layers carry no rules: ASAP7 prints them with 193i
			assertThat(d.rules("euv", m).values()).isEmpty();
		}
	}
}
