/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/** A layout axis, along which a per-axis value is measured. */
public enum Axis {
	/** The horizontal axis of the layout. */
	X,
	/** The vertical axis of the layout. */
	Y
}
