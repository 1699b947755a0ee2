/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

/** What measure mode measures. */
public enum MeasureKind {
    /** distance between edges of one shape facing across material */
    WIDTH,
    /** distance between edges of different shapes facing across space */
    SPACING,
    /** distance between edges of one shape facing across space */
    NOTCH,
    /** centre-line distance of neighbouring parallel lines (spacing plus half of both widths) */
    PITCH
}
