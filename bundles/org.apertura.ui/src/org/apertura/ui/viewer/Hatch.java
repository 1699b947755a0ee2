/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

/**
 * Fill patterns for layers. Each pattern says, per screen pixel, whether the pixel carries the
 * strong ink of the layer colour or only its light wash; patterns are fixed to the screen so that
 * overlapping layers stay readable while panning.
 */
public enum Hatch {
    /** an even wash, no lines */
    WASH,
    /** lines rising to the right every 6 pixels */
    RISING,
    /** lines falling to the right every 6 pixels */
    FALLING,
    /** both diagonals every 8 pixels */
    LATTICE,
    /** a dot every 4 pixels in both directions */
    DOTS,
    /** horizontal lines every 5 pixels */
    ROWS,
    /** vertical lines every 5 pixels */
    COLUMNS,
    /** a wide checker of 4-pixel squares */
    CHECKER;

    /** True when pixel (x, y) carries the strong ink of this pattern. */
    public boolean ink(int x, int y) {
        return switch (this) {
            case WASH -> false;
            case RISING -> Math.floorMod(x + y, 6) == 0;
            case FALLING -> Math.floorMod(x - y, 6) == 0;
            case LATTICE -> Math.floorMod(x + y, 8) == 0 || Math.floorMod(x - y, 8) == 0;
            case DOTS -> (x & 3) == 0 && (y & 3) == 0;
            case ROWS -> Math.floorMod(y, 5) == 0;
            case COLUMNS -> Math.floorMod(x, 5) == 0;
            case CHECKER -> (((x >> 2) ^ (y >> 2)) & 1) == 0;
        };
    }
}
