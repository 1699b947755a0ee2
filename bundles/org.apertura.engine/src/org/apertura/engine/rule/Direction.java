/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.rule;

/** Preferred routing direction of a line layer. */
public enum Direction {
    /** Lines run along x; pitch is measured along y. */
    HORIZONTAL,
    /** Lines run along y; pitch is measured along x. */
    VERTICAL
}
