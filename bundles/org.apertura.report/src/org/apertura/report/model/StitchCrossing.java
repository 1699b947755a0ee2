/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;

/**
 * A shape of a critical layer at a stitching line.
 *
 * @param layer   the deck layer
 * @param shape   the shape's bounding box in nm
 * @param crosses true when the shape crosses the line, false when it only lies in the keep-out band
 */
public record StitchCrossing(String layer, NmBox shape, boolean crosses) {

    /** Checks the components are present. */
    public StitchCrossing {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(shape, "shape");
    }
}
