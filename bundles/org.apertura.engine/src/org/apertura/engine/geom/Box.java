/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.geom;

/**
 * An axis-parallel box in database units with inclusive bounds; a point is a box with
 * {@code minX == maxX} and {@code minY == maxY}. Used for markers and bounding boxes.
 */
public record Box(long minX, long minY, long maxX, long maxY) implements Comparable<Box> {

    public Box {
        if (minX > maxX || minY > maxY) {
            throw new IllegalArgumentException("empty box: " + minX + "," + minY + " .. " + maxX + "," + maxY);
        }
    }

    /** The smallest box holding both points, rounding fractional coordinates outwards. */
    public static Box around(double x0, double y0, double x1, double y1) {
        return new Box((long) Math.floor(Math.min(x0, x1)), (long) Math.floor(Math.min(y0, y1)),
                (long) Math.ceil(Math.max(x0, x1)), (long) Math.ceil(Math.max(y0, y1)));
    }

    public long width() {
        return maxX - minX;
    }

    public long height() {
        return maxY - minY;
    }

    /** The smallest box holding this box and {@code o}. */
    public Box union(Box o) {
        return new Box(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX), Math.max(maxY, o.maxY));
    }

    /** Orders by minX, minY, maxX, maxY. */
    @Override
    public int compareTo(Box o) {
        int c = Long.compare(minX, o.minX);
        if (c == 0) {
            c = Long.compare(minY, o.minY);
        }
        if (c == 0) {
            c = Long.compare(maxX, o.maxX);
        }
        return c != 0 ? c : Long.compare(maxY, o.maxY);
    }
}
