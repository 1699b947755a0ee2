/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/** How a distance between two edges is measured. */
public enum Metric {
    /**
     * True Euclidean distance between the closest points of the two edges: facing edges whose
     * projections overlap, and also corner-to-corner pairs.
     */
    EUCLIDEAN,
    /**
     * Only parallel facing edges whose projections onto each other overlap by a positive length are
     * measured, perpendicular to the edges; corner-to-corner pairs are not checked.
     */
    PROJECTION
}
