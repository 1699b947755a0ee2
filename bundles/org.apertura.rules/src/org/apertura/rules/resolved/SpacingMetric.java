/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/** How a spacing is measured. */
public enum SpacingMetric {
	/** True distance between shapes, corners included. */
	EUCLIDEAN,
	/** Distance between facing edges that overlap in projection; corner-to-corner pairs are exempt. */
	PROJECTION
}
