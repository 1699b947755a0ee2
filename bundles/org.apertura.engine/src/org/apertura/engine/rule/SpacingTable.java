/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

import java.util.List;
import java.util.Objects;

/**
 * Width- and parallel-run-length-dependent spacing. Row {@code i} applies when the wider of the two
 * edges' shapes is at least {@code widths.get(i)} wide at that edge; column {@code j} when the two
 * edges run parallel for at least {@code runLengths.get(j)}. Both lists ascend and start at 0; the
 * last matching row and column give the required spacing. Corner-to-corner pairs use run length 0.
 * <p>
 * The width of an edge is the smallest distance to an inner facing edge that overlaps it in
 * projection (the width of the material right behind it), capped at the largest row threshold.
 */
public record SpacingTable(List<Long> widths, List<Long> runLengths, List<List<Long>> values) {

    public SpacingTable {
        widths = List.copyOf(widths);
        runLengths = List.copyOf(runLengths);
        values = values.stream().map(List::copyOf).toList();
        check(widths, "widths");
        check(runLengths, "runLengths");
        if (values.size() != widths.size()) {
            throw new IllegalArgumentException("spacing table needs " + widths.size() + " rows, got " + values.size());
        }
        for (List<Long> row : values) {
            if (row.size() != runLengths.size()) {
                throw new IllegalArgumentException("spacing table row needs " + runLengths.size() + " values, got " + row.size());
            }
            row.forEach(v -> Rule.requirePositive(Objects.requireNonNull(v), "spacing table value"));
        }
    }

    private static void check(List<Long> list, String what) {
        if (list.isEmpty() || list.get(0) != 0) {
            throw new IllegalArgumentException(what + " must start with 0");
        }
        for (int i = 1; i < list.size(); i++) {
            if (list.get(i) <= list.get(i - 1)) {
                throw new IllegalArgumentException(what + " must ascend strictly");
            }
        }
    }

    /** Required spacing for the given width and parallel run length (database units). */
    public long lookup(long width, long runLength) {
        int r = 0;
        while (r + 1 < widths.size() && widths.get(r + 1) <= width) {
            r++;
        }
        int c = 0;
        while (c + 1 < runLengths.size() && runLengths.get(c + 1) <= runLength) {
            c++;
        }
        return values.get(r).get(c);
    }

    /** The largest required spacing in the table. */
    public long maximum() {
        return values.stream().flatMap(List::stream).mapToLong(Long::longValue).max().orElseThrow();
    }

    /** The largest width threshold (widths at or above it all fall in the last row). */
    public long widestThreshold() {
        return widths.get(widths.size() - 1);
    }
}
