/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

/**
 * Bounds and settings for {@link Flattener}. The bounds protect against small files that describe
 * enormous layouts (nested arrays) or absurd nesting.
 *
 * @param maxDepth      largest accepted number of hierarchy levels (a cell without references is
 *                      one level)
 * @param maxVertices   largest accepted number of output vertices plus expanded placements, which
 *                      bounds memory (about 16 bytes per vertex) and time, also for arrays of empty
 *                      cells; checked before any expansion
 * @param roundSegments segments per half circle for ROUND path ends (at least 2)
 */
public record FlattenOptions(int maxDepth, long maxVertices, int roundSegments) {

    /**
     * 64 levels, 100 million vertices and placements (some 2 GB of polygons),
     * {@link PathOutline#DEFAULT_ROUND_SEGMENTS} segments.
     */
    public static final FlattenOptions DEFAULTS = new FlattenOptions(64, 100_000_000L, PathOutline.DEFAULT_ROUND_SEGMENTS);

    public FlattenOptions {
        if (maxDepth < 1 || maxVertices < 0 || roundSegments < 2) {
            throw new IllegalArgumentException("invalid flatten options: depth " + maxDepth + ", vertices " + maxVertices
                    + ", round segments " + roundSegments);
        }
    }

    /** These options with another depth bound. */
    public FlattenOptions withMaxDepth(int depth) {
        return new FlattenOptions(depth, maxVertices, roundSegments);
    }

    /** These options with another bound on vertices plus placements. */
    public FlattenOptions withMaxVertices(long vertices) {
        return new FlattenOptions(maxDepth, vertices, roundSegments);
    }

    /** These options with another number of segments per half circle of round path ends. */
    public FlattenOptions withRoundSegments(int segments) {
        return new FlattenOptions(maxDepth, maxVertices, segments);
    }
}
