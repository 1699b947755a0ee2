/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

/** What a violation is about. */
public enum ViolationKind {
    /** two edges of one shape facing across material closer than the width rule */
    WIDTH,
    /** edges of two different shapes facing across space closer than the spacing rule */
    SPACING,
    /** two edges of the same shape facing across space closer than the spacing rule */
    NOTCH,
    /** centre lines of neighbouring parallel lines closer than the pitch rule */
    PITCH,
    /** two line ends facing each other */
    TIP_TO_TIP,
    /** a line end facing the side of a line */
    TIP_TO_SIDE,
    /** a merged shape smaller than the area rule (measured and required in square database units) */
    AREA,
    /** an inner shape with too little outer material in front of one of its sides */
    ENCLOSURE,
    /** an inner shape with neither pair of opposite sides enclosed by the opposite-sides value */
    ENCLOSURE_OPPOSITE,
    /** an inner shape not inside the outer layer at all */
    NOT_ENCLOSED,
    /** a window whose covered fraction is below the minimum (values are fractions) */
    DENSITY_LOW,
    /** a window whose covered fraction is above the maximum (values are fractions) */
    DENSITY_HIGH,
    /**
     * shapes that cannot be put on different masks: an odd cycle for two masks, or a conflict edge
     * left by the three-mask search
     */
    MASK_CONFLICT
}
