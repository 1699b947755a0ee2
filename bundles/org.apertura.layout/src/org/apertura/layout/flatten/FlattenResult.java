/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;

/**
 * The polygons of a flattened cell, per layer, in database units of the top cell.
 *
 * @param polygons        per (layer, datatype) the polygons in expansion order (elements of a cell
 *                        in order, references expanded where they stand); sorted by layer key
 * @param rotatedShapes   shapes placed at an angle that is not a multiple of 90 degrees, whose
 *                        vertices were rounded to the database grid
 * @param roundedShapes   shapes placed at a multiple of 90 degrees whose vertices still needed
 *                        rounding (non-integer magnification)
 * @param skippedShapes   element occurrences that cover no area (zero-width or single-point paths,
 *                        boundaries with fewer than 3 vertices) and were left out
 */
public record FlattenResult(Map<LayerKey, List<Polygon>> polygons, long rotatedShapes, long roundedShapes,
        long skippedShapes) {

    public FlattenResult {
        Map<LayerKey, List<Polygon>> copy = new TreeMap<>();
        polygons.forEach((k, v) -> copy.put(k, Collections.unmodifiableList(v)));
        polygons = Collections.unmodifiableMap(copy);
    }

    /** Polygons of one layer; empty when there are none. */
    public List<Polygon> polygons(LayerKey layer) {
        return polygons.getOrDefault(layer, List.of());
    }

    /** Total number of polygons. */
    public long polygonCount() {
        return polygons.values().stream().mapToLong(List::size).sum();
    }

    /** Readable warnings for the non-zero counters; empty when the result is exact. */
    public List<String> warnings() {
        List<String> w = new ArrayList<>();
        if (rotatedShapes > 0) {
            w.add(rotatedShapes + " shapes placed at angles that are not multiples of 90 degrees were rounded to the grid");
        }
        if (roundedShapes > 0) {
            w.add(roundedShapes + " shapes placed with a non-integer magnification were rounded to the grid");
        }
        if (skippedShapes > 0) {
            w.add(skippedShapes + " shapes without area were left out");
        }
        return w;
    }
}
