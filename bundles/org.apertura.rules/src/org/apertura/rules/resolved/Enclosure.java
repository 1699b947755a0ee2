/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.Optional;

/**
 * How far the layer owning this rule must extend beyond every shape of an inner layer.
 *
 * @param innerLayer the enclosed layer's name
 * @param allSides   the enclosure required on every side (database units, per axis)
 * @param pairValue  a larger enclosure required on a pair of sides, if the rule has one
 * @param pair       which pair: {@link SidePair#NONE} when {@code pairValue} is empty
 */
public record Enclosure(String innerLayer, RuleValue allSides, Optional<RuleValue> pairValue, SidePair pair) {

	/** Which pair of sides carries the larger enclosure. */
	public enum SidePair {
		/** No pair rule. */
		NONE,
		/** Two opposite sides (either pair: left and right, or top and bottom). */
		OPPOSITE,
		/** Two adjacent sides (a corner). */
		ADJACENT
	}

	/** Checks the components are consistent. */
	public Enclosure {
		Objects.requireNonNull(innerLayer, "innerLayer");
		Objects.requireNonNull(allSides, "allSides");
		Objects.requireNonNull(pairValue, "pairValue");
		Objects.requireNonNull(pair, "pair");
		if (pairValue.isPresent() == (pair == SidePair.NONE)) {
			throw new IllegalArgumentException("a pair value needs a side pair and the reverse");
		}
	}
}
