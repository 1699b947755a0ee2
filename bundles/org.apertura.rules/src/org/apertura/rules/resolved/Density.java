/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * A density rule: the fraction of each square window covered by the layer, the window stepped over
 * the layout.
 *
 * @param minimum minimum covered fraction in [0, 1], if any
 * @param maximum maximum covered fraction in [0, 1], if any
 * @param window  side of the square window (database units)
 * @param step    step of the window (database units)
 */
public record Density(OptionalDouble minimum, OptionalDouble maximum, long window, long step) {

	/** Checks the components are present. */
	public Density {
		Objects.requireNonNull(minimum, "minimum");
		Objects.requireNonNull(maximum, "maximum");
	}
}
