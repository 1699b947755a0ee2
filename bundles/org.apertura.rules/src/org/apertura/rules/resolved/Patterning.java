/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.Optional;

/**
 * The patterning of one layer under one option.
 *
 * @param scheme     single exposure, litho-etch or spacer division
 * @param masks      masks used for the layer: 1 single exposure, n litho-etch, 2 spacer division (core
 *                   plus block/cut mask)
 * @param pitchSplit by how much each exposure's pitch exceeds the drawn pitch: 1 single exposure, n
 *                   litho-etch, 2 or 4 spacer division
 * @param cutLayer   the layer that draws the block/cut mask of a spacer scheme, if the deck names one
 */
public record Patterning(PatterningScheme scheme, int masks, int pitchSplit, Optional<String> cutLayer) {

	/** Single exposure: one mask, no pitch split. */
	public static final Patterning SINGLE = new Patterning(PatterningScheme.SINGLE_EXPOSURE, 1, 1, Optional.empty());

	/** Checks the components. */
	public Patterning {
		Objects.requireNonNull(scheme, "scheme");
		Objects.requireNonNull(cutLayer, "cutLayer");
		if (masks < 1 || pitchSplit < 1) {
			throw new IllegalArgumentException("masks and pitch split must be at least 1");
		}
	}

	/** Litho-etch with n exposures (n masks, pitch split n). */
	public static Patterning lithoEtch(int n) {
		return new Patterning(PatterningScheme.LITHO_ETCH, n, n, Optional.empty());
	}

	/** Spacer division by 2 or 4, with the layer that draws its cut mask if known. */
	public static Patterning spacerDivision(int division, Optional<String> cutLayer) {
		return new Patterning(PatterningScheme.SPACER_DIVISION, 2, division, cutLayer);
	}

	/** Whether shapes of the layer are split over more than one mask (colours). */
	public boolean isMultiMask() {
		return scheme == PatterningScheme.LITHO_ETCH;
	}

	/** The trade's short name: SE, LE2, LE3, ..., SADP, SAQP (SxP for other divisions). */
	public String label() {
		return switch (scheme) {
			case SINGLE_EXPOSURE -> "SE";
			case LITHO_ETCH -> "LE" + masks;
			case SPACER_DIVISION -> pitchSplit == 2 ? "SADP" : pitchSplit == 4 ? "SAQP" : "S" + pitchSplit + "P";
		};
	}
}
