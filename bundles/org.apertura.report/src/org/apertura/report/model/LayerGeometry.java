/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.List;
import java.util.Objects;

/**
 * The shapes of one layer, for pictures only (flattened, in nm). Writers bound what they draw: see
 * {@link org.apertura.report.write.HtmlReport} for the limits.
 *
 * @param layer    the deck layer
 * @param polygons the shapes
 */
public record LayerGeometry(String layer, List<NmPolygon> polygons) {

    /** Copies the list. */
    public LayerGeometry {
        Objects.requireNonNull(layer, "layer");
        polygons = List.copyOf(polygons);
    }
}
