/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import java.util.List;
import java.util.Map;

/**
 * What {@link GdsStreamReader} returns: the library in packed form. Every reference is resolved
 * (its child index points into {@link #cells()}) and the hierarchy is free of cycles.
 *
 * @param name                      LIBNAME, or null when empty or missing
 * @param userUnitsPerDatabaseUnit  first UNITS value
 * @param metresPerDatabaseUnit     second UNITS value
 * @param cells                     structures in file order
 * @param topCells                  cells no reference points to, in file order
 * @param skippedRecords            records not turned into content, by name, as
 *                                  {@link org.apertura.layout.gds.GdsReadResult#skippedRecords()}
 * @param warnings                  the same warnings {@link org.apertura.layout.gds.GdsReader} gives
 */
public record StreamLayout(String name, double userUnitsPerDatabaseUnit, double metresPerDatabaseUnit,
        List<StreamCell> cells, List<StreamCell> topCells, Map<String, Integer> skippedRecords, List<String> warnings) {

    public StreamLayout {
        cells = List.copyOf(cells);
        topCells = List.copyOf(topCells);
        skippedRecords = Map.copyOf(skippedRecords);
        warnings = List.copyOf(warnings);
    }

    /** Total boundaries, boxes and paths over all cells (each definition once). */
    public long shapeCount() {
        long n = 0;
        for (StreamCell c : cells) {
            n += c.shapeCount();
        }
        return n;
    }

    /** Total elements over all cells: shapes, references and texts. */
    public long elementCount() {
        long n = 0;
        for (StreamCell c : cells) {
            n += c.shapeCount() + c.referenceCount() + c.textCount();
        }
        return n;
    }

    /** The cell with this name, or null. */
    public StreamCell cell(String cellName) {
        for (StreamCell c : cells) {
            if (c.name().equals(cellName)) {
                return c;
            }
        }
        return null;
    }
}
