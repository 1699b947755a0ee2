/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;

/** The two offending edges of an edge-pair violation (width, spacing, pitch, end-of-line, enclosure). */
public record EdgePair(NmSegment a, NmSegment b) {

    /** Checks both edges are present. */
    public EdgePair {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
    }
}
