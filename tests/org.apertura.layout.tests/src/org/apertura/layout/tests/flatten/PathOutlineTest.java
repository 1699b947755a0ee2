/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.flatten;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.PointList;
import org.apertura.layout.flatten.PathOutline;
import org.apertura.layout.model.PathType;
import org.junit.jupiter.api.Test;

/**
 * Path ends as the GDS II Stream Format Manual 6.0 defines PATHTYPE: 0 flush, 1 round (half circle),
 * 2 extended by half the width, 4 custom extensions (BGNEXTN/ENDEXTN). Outlines computed by hand.
 */
class PathOutlineTest {

    private static final PointList STRAIGHT = PointList.of(0, 0, 10, 0);

    @Test
    void flushEndsAtTheEndPoints() {
        assertArrayEquals(new long[] {0, -2, 10, -2, 10, 2, 0, 2},
                PathOutline.outline(STRAIGHT, 2, PathType.FLUSH, 0, 0, 16));
    }

    @Test
    void halfWidthExtendsBothEnds() {
        assertArrayEquals(new long[] {-2, -2, 12, -2, 12, 2, -2, 2},
                PathOutline.outline(STRAIGHT, 2, PathType.HALF_WIDTH, 0, 0, 16));
    }

    @Test
    void customUsesItsOwnExtensionsNegativeShortens() {
        assertArrayEquals(new long[] {-3, -2, 9, -2, 9, 2, -3, 2},
                PathOutline.outline(STRAIGHT, 2, PathType.CUSTOM, 3, -1, 16));
    }

    @Test
    void roundEndsAreHalfCirclesWithTheStatedSegmentCount() {
        // 4 segments per half circle of radius 2: inner vertices at 45-degree steps, 2*cos 45 = 1.41 -> 1
        assertArrayEquals(new long[] {0, -2, 10, -2, 11, -1, 12, 0, 11, 1, 10, 2, 0, 2, -1, 1, -2, 0, -1, -1},
                PathOutline.outline(STRAIGHT, 2, PathType.ROUND, 0, 0, 4));
        // with 16 segments each half circle adds 15 vertices
        assertEquals(4 + 2 * 15, PathOutline.outline(STRAIGHT, 100, PathType.ROUND, 0, 0, 16).length / 2);
    }

    @Test
    void diagonalThreeFourFiveIsExact() {
        // direction (0.6, 0.8), half width 5: offset (-4, 3); length 50 x width 10 = area 500
        long[] v = PathOutline.outline(PointList.of(0, 0, 30, 40), 5, PathType.FLUSH, 0, 0, 16);
        assertArrayEquals(new long[] {4, -3, 34, 37, 26, 43, -4, 3}, v);
        assertEquals(1000, Polygon.of(v).signedArea2());
    }

    @Test
    void manhattanWireWithEvenWidthIsExactAndCounterClockwise() {
        long[] v = PathOutline.outline(PointList.of(0, 0, 100, 0, 100, 100, 200, 100), 10, PathType.FLUSH, 0, 0, 16);
        Polygon p = Polygon.of(v);
        assertTrue(p.isManhattan());
        // three segments of 100 along the centre line x width 20: 100*20 + 100*20 + 100*20 = 6000,
        // the mitred corners add and remove equal squares
        assertEquals(2 * 6000, p.signedArea2());
    }

    @Test
    void noAreaGivesNull() {
        assertNull(PathOutline.outline(PointList.of(5, 5), 2, PathType.FLUSH, 0, 0, 16));
        assertNull(PathOutline.outline(PointList.of(5, 5, 5, 5), 2, PathType.FLUSH, 0, 0, 16));
        assertNull(PathOutline.outline(STRAIGHT, 0, PathType.FLUSH, 0, 0, 16));
    }

    @Test
    void reversalAndSharpTurnsStillGiveAnOutline() {
        assertNotNull(PathOutline.outline(PointList.of(0, 0, 100, 0, 0, 0), 5, PathType.FLUSH, 0, 0, 16));
        assertNotNull(PathOutline.outline(PointList.of(0, 0, 100, 0, 0, 10), 5, PathType.ROUND, 0, 0, 16));
    }
}
