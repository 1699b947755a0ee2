/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/** The preferred direction in which the lines of a layer run. */
public enum Direction {
	/** Lines run along x; their width and pitch are measured along {@link Axis#Y}. */
	HORIZONTAL,
	/** Lines run along y; their width and pitch are measured along {@link Axis#X}. */
	VERTICAL,
	/** No preferred direction (cut and other layers). */
	NONE;

	/**
	 * The axis along which widths and pitches of lines in this direction are measured.
	 *
	 * @throws IllegalStateException for {@link #NONE}
	 */
	public Axis pitchAxis() {
		return switch (this) {
			case HORIZONTAL -> Axis.Y;
			case VERTICAL -> Axis.X;
			case NONE -> throw new IllegalStateException("no preferred direction");
		};
	}
}
