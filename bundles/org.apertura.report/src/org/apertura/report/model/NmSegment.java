/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** A directed edge from ({@code x1},{@code y1}) to ({@code x2},{@code y2}), in nanometres. */
public record NmSegment(double x1, double y1, double x2, double y2) {

    /** The box spanned by the edge. */
    public NmBox bounds() {
        return new NmBox(x1, y1, x2, y2);
    }
}
