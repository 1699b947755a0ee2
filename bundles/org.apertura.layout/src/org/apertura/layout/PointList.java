/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout;

import java.util.Arrays;

/**
 * An immutable list of integer points in database units, stored as one interleaved array
 * {@code x0, y0, x1, y1, ...}. It is the value type of the point attributes of the layout model
 * (boundary, path and box points). Points are kept exactly as given: a closed ring keeps its
 * repeated last point, as a GDSII BOUNDARY stores it.
 * <p>
 * The text form, used by XMI, is the coordinates separated by single spaces
 * ({@code "0 0 10 0 10 5"}); {@link #parse(String)} reads it back.
 */
public final class PointList {

    private static final int[] NO_VALUES = new int[0];

    /** The list with no points. */
    public static final PointList EMPTY = new PointList(NO_VALUES);

    private final int[] xy;

    private PointList(int[] xy) {
        this.xy = xy;
    }

    /**
     * A point list from interleaved coordinates (copied).
     *
     * @throws IllegalArgumentException if the number of values is odd
     */
    public static PointList of(int... xy) {
        if (xy.length % 2 != 0) {
            throw new IllegalArgumentException("odd number of coordinates: " + xy.length);
        }
        return xy.length == 0 ? EMPTY : new PointList(xy.clone());
    }

    /**
     * A point list that takes ownership of the given array without copying; for readers that
     * build a fresh array per list. The caller must not change the array afterwards.
     */
    public static PointList wrap(int[] xy) {
        if (xy.length % 2 != 0) {
            throw new IllegalArgumentException("odd number of coordinates: " + xy.length);
        }
        return new PointList(xy);
    }

    /**
     * Parses the text form produced by {@link #toString()}: integers separated by white space.
     * Returns null for null.
     *
     * @throws IllegalArgumentException on a non-integer token or an odd number of values
     */
    public static PointList parse(String text) {
        if (text == null) {
            return null;
        }
        String trimmed = text.strip();
        if (trimmed.isEmpty()) {
            return EMPTY;
        }
        String[] tokens = trimmed.split("\\s+");
        int[] values = new int[tokens.length];
        for (int i = 0; i < tokens.length; i++) {
            try {
                values[i] = Integer.parseInt(tokens[i]);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("point list value " + (i + 1) + " is not an integer: '"
                        + tokens[i] + "'", e);
            }
        }
        return wrap(values);
    }

    /** Number of points. */
    public int size() {
        return xy.length / 2;
    }

    /** x of point {@code i} (0-based). */
    public int x(int i) {
        return xy[2 * i];
    }

    /** y of point {@code i} (0-based). */
    public int y(int i) {
        return xy[2 * i + 1];
    }

    /** A copy of the interleaved coordinates. */
    public int[] toArray() {
        return xy.clone();
    }

    /** True when there are at least two points and the last equals the first. */
    public boolean isClosed() {
        int n = xy.length;
        return n >= 4 && xy[0] == xy[n - 2] && xy[1] == xy[n - 1];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PointList p && Arrays.equals(xy, p.xy);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(xy);
    }

    /** The coordinates separated by single spaces, e.g. {@code "0 0 10 0 10 5"}. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(xy.length * 6);
        for (int i = 0; i < xy.length; i++) {
            if (i > 0) {
                sb.append(' ');
            }
            sb.append(xy[i]);
        }
        return sb.toString();
    }
}
