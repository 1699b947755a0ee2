/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamCell;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.tests.gds.GdsBytes;
import org.junit.jupiter.api.Test;

/**
 * A BOUNDARY of five points that closes an axis-parallel rectangle is kept as two corners and a
 * turn ({@link StreamCell#RECTANGLE}); every other boundary keeps all its points. Whichever record a
 * boundary gets, {@link StreamCell#points} must give back the points exactly as the file stores
 * them, on the quick path (a plain element) and on the general path (the same element with an
 * ELFLAGS record, which the quick path does not take). That the flattened polygons equal the EMF
 * reader's, vertex for vertex, is checked on every data file by {@link StreamEquivalence}.
 */
class RectangleRecordTest {

    /** The rectangle x 10..40, y 20..70 from each corner, both ways round: 8 rings of 5 points. */
    private static List<int[]> rectangleRings() {
        int[][] corners = {{10, 20}, {40, 20}, {40, 70}, {10, 70}};
        List<int[]> rings = new ArrayList<>();
        for (int start = 0; start < 4; start++) {
            for (int step : new int[] {1, 3}) {
                int[] ring = new int[10];
                for (int k = 0; k < 5; k++) {
                    int[] c = corners[(start + k * step) % 4];
                    ring[2 * k] = c[0];
                    ring[2 * k + 1] = c[1];
                }
                rings.add(ring);
            }
        }
        return rings;
    }

    /** Reads the rings as boundaries of one structure, plain or each with an ELFLAGS record. */
    private static StreamCell read(List<int[]> rings, boolean withElflags) throws IOException {
        GdsBytes g = new GdsBytes().libraryStart("R").structure("S");
        for (int[] ring : rings) {
            if (withElflags) {
                g.empty(0x08).int16(0x26, 1, 0).int16(0x0D, 2, 1).int16(0x0E, 2, 0).int32(0x10, ring).empty(0x11);
            } else {
                g.boundary(1, 0, ring);
            }
        }
        StreamLayout layout = GdsStreamReader.read(g.endStructure().endLibrary().bytes(), "r.gds");
        return layout.cells().get(0);
    }

    /** The points and kind of each shape record of the cell, in order. */
    private static List<int[]> records(StreamCell c, List<Integer> kinds) {
        List<int[]> points = new ArrayList<>();
        int[] d = c.shapeData();
        for (int i = c.shapeStart(); i < c.shapeEnd(); i += StreamCell.recordSize(d[i])) {
            kinds.add(StreamCell.kind(d[i]));
            points.add(StreamCell.points(d, i));
        }
        return points;
    }

    /** Each ring, plain or with ELFLAGS, gets a record of the given kind that gives back its points. */
    private static void assertKeptAs(int kind, List<int[]> rings) throws IOException {
        for (boolean elflags : new boolean[] {false, true}) {
            List<Integer> kinds = new ArrayList<>();
            List<int[]> points = records(read(rings, elflags), kinds);
            for (int i = 0; i < rings.size(); i++) {
                assertEquals(kind, kinds.get(i), "ring " + Arrays.toString(rings.get(i)));
                assertArrayEquals(rings.get(i), points.get(i), "ring " + i + (elflags ? " with ELFLAGS" : ""));
            }
        }
    }

    /** Independent statement of the rule: closed, and its four edges alternate horizontal and vertical. */
    private static boolean isAxisParallelRectangle(int[] r) {
        if (r[8] != r[0] || r[9] != r[1]) {
            return false;
        }
        boolean horizontalFirst = true;
        boolean verticalFirst = true;
        for (int e = 0; e < 4; e++) {
            boolean horizontal = r[2 * e + 1] == r[2 * e + 3];
            boolean vertical = r[2 * e] == r[2 * e + 2];
            horizontalFirst &= e % 2 == 0 ? horizontal : vertical;
            verticalFirst &= e % 2 == 0 ? vertical : horizontal;
        }
        return horizontalFirst || verticalFirst;
    }

    @Test
    void everyCornerAndTurnIsKeptAsTwoCornersAndGivenBackExactly() throws IOException {
        List<int[]> rings = rectangleRings();
        assertKeptAs(StreamCell.RECTANGLE, rings);
        for (boolean elflags : new boolean[] {false, true}) {
            StreamCell c = read(rings, elflags);
            assertEquals(8, c.shapeCount());
            assertEquals(8 * 6, c.shapeEnd() - c.shapeStart(), "six values per rectangle");
            for (int i = 0; i < rings.size(); i++) {
                assertEquals(5, StreamCell.pointCount(c.shapeData()[c.shapeStart() + 6 * i]));
            }
        }
        // the first record by hand: start (10, 20), first edge along x to (40, 20), opposite corner (40, 70)
        StreamCell c = read(rings.subList(0, 2), false);
        assertArrayEquals(new int[] {StreamCell.RECTANGLE << 28 | 5, 1 << 16, 10, 20, 40, 70,
            StreamCell.RECTANGLE << 28 | StreamCell.VERTICAL_FIRST | 5, 1 << 16, 10, 20, 40, 70},
            Arrays.copyOfRange(c.shapeData(), c.shapeStart(), c.shapeEnd()));
    }

    @Test
    void otherBoundariesKeepAllTheirPoints() throws IOException {
        List<int[]> rings = List.of(
                new int[] {0, 0, 10, 0, 10, 5, 0, 5, 0, 1},            // not closed
                new int[] {0, 0, 10, 0, 10, 5, 1, 5, 0, 0},            // one corner off
                new int[] {0, 0, 10, 10, 0, 20, -10, 10, 0, 0},        // a square at 45 degrees
                new int[] {0, 0, 10, 0, 0, 0, 10, 0, 0, 0},            // back and forth on one line
                new int[] {0, 0, 10, 0, 10, 5, 0, 0},                  // four points
                new int[] {0, 0, 10, 0, 10, 5, 5, 5, 5, 8, 0, 8, 0, 0}); // seven points
        assertKeptAs(StreamCell.BOUNDARY, rings);
    }

    @Test
    void degenerateAndExtremeRectanglesAreGivenBackExactly() throws IOException {
        int max = Integer.MAX_VALUE;
        int min = Integer.MIN_VALUE;
        List<int[]> rings = List.of(
                new int[] {3, 3, 3, 3, 3, 3, 3, 3, 3, 3},              // one point five times
                new int[] {0, 0, 10, 0, 10, 0, 0, 0, 0, 0},            // zero height
                new int[] {0, 0, 0, 7, 0, 7, 0, 0, 0, 0},              // zero width
                new int[] {min, min, max, min, max, max, min, max, min, min},
                new int[] {max, -1, max, min, -1, min, -1, -1, max, -1});
        assertKeptAs(StreamCell.RECTANGLE, rings);
    }

    @Test
    void randomRingsAreKeptAsRectanglesExactlyWhenTheyAreOne() throws IOException {
        // coordinates from a set of three values, so that a good share of the rings are rectangles
        Random random = new Random(31);
        int[] values = {-5, 0, 8};
        List<int[]> rings = new ArrayList<>();
        for (int n = 0; n < 3000; n++) {
            int[] r = new int[10];
            for (int i = 0; i < 8; i++) {
                r[i] = values[random.nextInt(3)];
            }
            boolean closed = random.nextInt(8) > 0;
            r[8] = closed ? r[0] : values[random.nextInt(3)];
            r[9] = closed ? r[1] : values[random.nextInt(3)];
            rings.add(r);
        }
        for (boolean elflags : new boolean[] {false, true}) {
            List<Integer> kinds = new ArrayList<>();
            List<int[]> points = records(read(rings, elflags), kinds);
            int rectangles = 0;
            for (int i = 0; i < rings.size(); i++) {
                boolean rectangle = isAxisParallelRectangle(rings.get(i));
                rectangles += rectangle ? 1 : 0;
                assertEquals(rectangle ? StreamCell.RECTANGLE : StreamCell.BOUNDARY, kinds.get(i),
                        "ring " + Arrays.toString(rings.get(i)));
                assertArrayEquals(rings.get(i), points.get(i), "ring " + i);
            }
            assertEquals(true, rectangles > 30 && rectangles < 2970, rectangles + " rectangles: both kinds must occur");
        }
    }
}
