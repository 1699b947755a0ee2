/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import java.math.BigDecimal;

/**
 * The units a deck may write after a number. Lengths are normalised to nanometres, areas to square
 * nanometres, percentages to fractions.
 */
final class Units {

	private Units() {
	}

	/** Length dimension of a unit: 0 dimensionless, 1 length, 2 area. A missing unit is dimensionless. */
	static int dimension(String unit) {
		if (unit == null) {
			return 0;
		}
		return switch (unit) {
			case "nm", "um", "\u00b5m", "mm" -> 1;
			case "nm2", "nm\u00b2", "um2", "\u00b5m\u00b2" -> 2;
			default -> 0;
		};
	}

	/** The factor to nanometres (or square nanometres, or plain numbers for %). */
	static BigDecimal scale(String unit) {
		if (unit == null) {
			return BigDecimal.ONE;
		}
		return switch (unit) {
			case "nm", "nm2", "nm\u00b2" -> BigDecimal.ONE;
			case "um", "\u00b5m" -> BigDecimal.valueOf(1000);
			case "mm" -> BigDecimal.valueOf(1_000_000);
			case "um2", "\u00b5m\u00b2" -> BigDecimal.valueOf(1_000_000);
			case "%" -> new BigDecimal("0.01");
			default -> throw new IllegalArgumentException("unknown unit " + unit);
		};
	}

	/** A word for a dimension, for messages. */
	static String describe(int dimension) {
		return switch (dimension) {
			case 0 -> "a plain number";
			case 1 -> "a length (nm, um)";
			case 2 -> "an area (nm2, um2)";
			default -> "a quantity of length power " + dimension;
		};
	}
}
