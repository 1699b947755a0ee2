/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/**
 * A resolved rule value per axis, in database units (square database units for areas). Most rules
 * are isotropic ({@code x == y}).
 *
 * @param x the value where the quantity is measured along x
 * @param y the value where the quantity is measured along y
 */
public record RuleValue(long x, long y) {

	/** The same value on both axes. */
	public static RuleValue of(long value) {
		return new RuleValue(value, value);
	}

	/** Whether both axes carry the same value. */
	public boolean isIsotropic() {
		return x == y;
	}

	/** The value along one axis. */
	public long along(Axis axis) {
		return axis == Axis.X ? x : y;
	}

	/** The smaller of the two axis values. */
	public long min() {
		return Math.min(x, y);
	}

	/** The larger of the two axis values. */
	public long max() {
		return Math.max(x, y);
	}

	/**
	 * The value of an isotropic rule.
	 *
	 * @throws IllegalStateException if the axes differ; use {@link #along(Axis)} then
	 */
	public long value() {
		if (x != y) {
			throw new IllegalStateException("per-axis value x " + x + " y " + y + ": ask along an axis");
		}
		return x;
	}
}
