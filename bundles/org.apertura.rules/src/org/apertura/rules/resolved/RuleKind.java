/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/**
 * The kinds of scalar rule a layer has under an option. Every kind is a length in database units
 * except {@link #AREA} (square database units); mask-side kinds are lengths on the mask (before
 * demagnification), also in database units.
 */
public enum RuleKind {
	/** Minimum width. */
	WIDTH,
	/** Maximum width. */
	MAX_WIDTH,
	/** Minimum spacing between shapes (for multi-mask layers: between shapes on different masks). */
	SPACING,
	/** Minimum pitch of a line layer in its preferred direction. */
	PITCH,
	/** Minimum area, in square database units. */
	AREA,
	/** An edge shorter than this (or not longer, see {@link EndOfLine#tipLengthInclusive()}) is a tip. */
	END_OF_LINE_TIP_LENGTH,
	/** Minimum spacing between two facing tips. */
	END_OF_LINE_TIP_TO_TIP,
	/** Minimum spacing between a tip and the side of another shape. */
	END_OF_LINE_TIP_TO_SIDE,
	/** Minimum spacing between shapes on the same mask of a multi-mask layer. */
	SAME_MASK_SPACING,
	/** Minimum feature on the mask, after multiplying wafer sizes by the demagnification per axis. */
	MASK_WIDTH,
	/** Minimum space on the mask, after multiplying wafer sizes by the demagnification per axis. */
	MASK_SPACING,
	/** Side of the square density window. */
	DENSITY_WINDOW,
	/** Step by which the density window moves. */
	DENSITY_STEP;

	/** Whether values of this kind are areas (square database units) rather than lengths. */
	public boolean isArea() {
		return this == AREA;
	}
}
