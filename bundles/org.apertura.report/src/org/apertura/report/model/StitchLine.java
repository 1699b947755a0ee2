/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/**
 * A stitching line across the die.
 *
 * @param vertical   true for a line at constant x, false for one at constant y
 * @param positionNm the line's x (vertical) or y (horizontal) in nm
 */
public record StitchLine(boolean vertical, double positionNm) {
}
