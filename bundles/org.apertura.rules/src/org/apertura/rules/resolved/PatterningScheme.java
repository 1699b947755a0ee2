/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/** How a layer is printed under one option. */
public enum PatterningScheme {
	/** One exposure, one mask. */
	SINGLE_EXPOSURE,
	/** Litho-etch repeated n times: n masks, pitch split n. */
	LITHO_ETCH,
	/** Spacer-based pitch division by 2 (SADP) or 4 (SAQP): a core mask plus its block/cut mask. */
	SPACER_DIVISION
}
