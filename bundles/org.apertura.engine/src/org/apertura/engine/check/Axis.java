/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

/** Direction along which a measured distance runs. */
public enum Axis {
    /** along x: between vertical edges */
    X,
    /** along y: between horizontal edges */
    Y,
    /** corner-to-corner or between edges at other angles */
    OTHER,
    /** all of the above together */
    ANY
}
