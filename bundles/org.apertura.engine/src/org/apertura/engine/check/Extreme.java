/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Segment;

/** One measured value (database units) with the edge pair and the place (marker box) where it occurs. */
public record Extreme(double value, Segment edgeA, Segment edgeB, Box place) {
}
