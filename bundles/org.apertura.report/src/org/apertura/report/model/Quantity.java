/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** The measured quantity of a histogram. */
public enum Quantity {
    /** widths across material */
    WIDTH,
    /** gaps between shapes */
    SPACING,
    /** centre-line distances of neighbouring parallel lines */
    PITCH
}
