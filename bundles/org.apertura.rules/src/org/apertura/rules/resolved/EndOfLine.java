/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.Optional;

/**
 * End-of-line spacing: edges shorter than the tip length are tips and need more room.
 *
 * @param tipLength          the tip length threshold (database units, per axis)
 * @param tipLengthInclusive whether an edge exactly as long as {@code tipLength} is a tip
 * @param tipToTip           minimum spacing between two facing tips, if given
 * @param tipToSide          minimum spacing between a tip and a side, if given
 */
public record EndOfLine(RuleValue tipLength, boolean tipLengthInclusive, Optional<RuleValue> tipToTip,
		Optional<RuleValue> tipToSide) {

	/** Checks the components are present. */
	public EndOfLine {
		Objects.requireNonNull(tipLength, "tipLength");
		Objects.requireNonNull(tipToTip, "tipToTip");
		Objects.requireNonNull(tipToSide, "tipToSide");
	}

	/** Whether an edge of this length (database units) counts as a tip. */
	public boolean isTip(long edgeLength, Axis axis) {
		long limit = tipLength.along(axis);
		return tipLengthInclusive ? edgeLength <= limit : edgeLength < limit;
	}
}
