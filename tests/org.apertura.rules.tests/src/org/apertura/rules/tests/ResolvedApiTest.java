/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;

import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.EndOfLine;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;
import org.junit.jupiter.api.Test;

/** The plain-Java resolved view: its small computations and its guards. */
class ResolvedApiTest {

	@Test
	void ruleValuePerAxis() {
		RuleValue v = new RuleValue(18, 24);
		assertThat(v.isIsotropic()).isFalse();
		assertThat(v.along(Axis.X)).isEqualTo(18);
		assertThat(v.along(Axis.Y)).isEqualTo(24);
		assertThat(v.min()).isEqualTo(18);
		assertThat(v.max()).isEqualTo(24);
		assertThatThrownBy(v::value).isInstanceOf(IllegalStateException.class);
		assertThat(RuleValue.of(7).value()).isEqualTo(7);
	}

	@Test
	void patterningLabelsAndMasks() {
		// trade names, common practice
		assertThat(Patterning.SINGLE.label()).isEqualTo("SE");
		assertThat(Patterning.lithoEtch(2).label()).isEqualTo("LE2");
		assertThat(Patterning.lithoEtch(3).masks()).isEqualTo(3);
		assertThat(Patterning.lithoEtch(3).isMultiMask()).isTrue();
		Patterning sadp = Patterning.spacerDivision(2, Optional.of("CUT"));
		assertThat(sadp.label()).isEqualTo("SADP");
		assertThat(sadp.masks()).isEqualTo(2); // core + cut
		assertThat(sadp.isMultiMask()).isFalse();
		assertThat(Patterning.spacerDivision(4, Optional.empty()).label()).isEqualTo("SAQP");
	}

	@Test
	void k1OfAPitch() {
		// references.md §2: 36 nm @ 0.33 -> 0.44; 28 nm -> 0.34; 20 nm @ 0.55 -> 0.41
		LithographyOption euv = new LithographyOption("euv", "", Optional.empty(), 13.5, 0.33, 0.3, 0.5, 4, 4, 26, 33,
				OptionalDouble.empty());
		assertThat(euv.k1(36, 1)).isCloseTo(0.44, within(1e-9));
		assertThat(euv.k1(28, 1)).isCloseTo(0.342, within(0.001));
		assertThat(euv.k1(18, 2)).isCloseTo(0.44, within(1e-9));
		LithographyOption hna = new LithographyOption("hna", "", Optional.of("euv"), 13.5, 0.55, 0.3, 0.5, 4, 8, 26,
				16.5, OptionalDouble.of(185));
		assertThat(hna.k1(20, 1)).isCloseTo(0.407, within(0.001));
		assertThat(hna.isAnamorphic()).isTrue();
		assertThat(hna.demagnification(Axis.Y)).isEqualTo(8);
	}

	@Test
	void conditionalSpacingThresholds() {
		ConditionalSpacing atLeast = new ConditionalSpacing(RuleValue.of(280), SpacingMetric.EUCLIDEAN,
				OptionalLong.of(3000), true, OptionalLong.empty(), false);
		assertThat(atLeast.applies(3000, 0)).isTrue();
		assertThat(atLeast.applies(2999, 1_000_000)).isFalse();
		ConditionalSpacing both = new ConditionalSpacing(RuleValue.of(220), SpacingMetric.EUCLIDEAN,
				OptionalLong.of(300), false, OptionalLong.of(1000), false);
		assertThat(both.applies(301, 1001)).isTrue();
		assertThat(both.applies(301, 1000)).isFalse();
		assertThat(both.applies(300, 1001)).isFalse();
	}

	@Test
	void endOfLineTips() {
		EndOfLine inclusive = new EndOfLine(RuleValue.of(36), true, Optional.of(RuleValue.of(27)), Optional.empty());
		assertThat(inclusive.isTip(36, Axis.X)).isTrue();
		assertThat(inclusive.isTip(37, Axis.X)).isFalse();
		EndOfLine strict = new EndOfLine(RuleValue.of(36), false, Optional.empty(), Optional.empty());
		assertThat(strict.isTip(36, Axis.Y)).isFalse();
	}

	@Test
	void enclosureNeedsItsPairKind() {
		assertThatThrownBy(() -> new Enclosure("V1", RuleValue.of(0), Optional.of(RuleValue.of(4)),
				Enclosure.SidePair.NONE)).isInstanceOf(IllegalArgumentException.class);
		assertThat(new Enclosure("V1", RuleValue.of(0), Optional.empty(), Enclosure.SidePair.NONE).pairValue()).isEmpty();
	}

	@Test
	void pitchAxisOfDirections() {
		assertThat(Direction.HORIZONTAL.pitchAxis()).isEqualTo(Axis.Y);
		assertThat(Direction.VERTICAL.pitchAxis()).isEqualTo(Axis.X);
		assertThatThrownBy(Direction.NONE::pitchAxis).isInstanceOf(IllegalStateException.class);
	}
}
