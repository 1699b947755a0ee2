/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.util.List;
import java.util.Map;

import org.apertura.layout.model.Cell;
import org.apertura.layout.model.Library;

/**
 * What {@link GdsReader} returns.
 *
 * @param library        the library read, with every cell reference resolved
 * @param topCells       cells that no reference points to, in file order
 * @param skippedRecords records the reader did not turn into model content, by record name (or
 *                       {@code 0xNN} for undefined type bytes), with their counts; sorted by name
 * @param warnings       human-readable warnings (skipped records, rounded array pitches, data after
 *                       ENDLIB); empty when the file was read without loss
 */
public record GdsReadResult(Library library, List<Cell> topCells, Map<String, Integer> skippedRecords,
        List<String> warnings) {

    public GdsReadResult {
        topCells = List.copyOf(topCells);
        skippedRecords = Map.copyOf(skippedRecords);
        warnings = List.copyOf(warnings);
    }
}
