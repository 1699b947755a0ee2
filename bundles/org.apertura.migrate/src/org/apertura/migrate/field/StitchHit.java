/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.field;

import java.util.Objects;

import org.apertura.engine.geom.Box;

/**
 * A shape of a critical layer at a stitching line.
 *
 * @param layer      the deck layer
 * @param shape      the merged shape's bounding box (database units)
 * @param line       the stitching line
 * @param crossing   true when the shape crosses the line, false when it lies within the keep-out band
 * @param distanceNm the distance from the shape to the line (0 when crossing)
 */
public record StitchHit(String layer, Box shape, StitchLine line, boolean crossing, double distanceNm) {

    /** Checks the components are present. */
    public StitchHit {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(line, "line");
    }
}
