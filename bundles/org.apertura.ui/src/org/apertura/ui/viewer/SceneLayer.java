/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.Collection;
import java.util.Objects;

import org.apertura.engine.geom.Polygon;

/**
 * The shapes of one layer of a {@link LayoutScene}, packed for drawing: vertices as 32-bit integers
 * in database units in one array, a bounding box per shape and a {@link GridIndex} over the boxes.
 * About 8 bytes per vertex and 20 per shape, instead of an object per polygon, plus a coarse
 * coverage bitmap for far zooms. Immutable.
 */
public final class SceneLayer {

    private final String name;
    private final int gdsLayer;
    private final int gdsDatatype;
    private final int[] xy;
    private final int[] offset;
    private final int[] box;
    private final GridIndex index;
    private final CoverageRaster coverage;

    /**
     * Packs polygons for drawing.
     *
     * @param name        label shown in the layer list, e.g. {@code "M1"} or {@code "68/20"}
     * @param gdsLayer    GDSII layer number, or -1 for layers not from a stream file
     * @param gdsDatatype GDSII data type, or -1
     * @param polygons    the shapes, in database units
     * @throws IllegalArgumentException if a vertex lies outside the 32-bit range of the stream format
     */
    public SceneLayer(String name, int gdsLayer, int gdsDatatype, Collection<Polygon> polygons) {
        this.name = Objects.requireNonNull(name, "name");
        this.gdsLayer = gdsLayer;
        this.gdsDatatype = gdsDatatype;
        int n = polygons.size();
        long vertices = 0;
        for (Polygon p : polygons) {
            vertices += p.size();
        }
        if (2 * vertices > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("layer " + name + " has too many vertices to draw: " + vertices);
        }
        xy = new int[(int) (2 * vertices)];
        offset = new int[n + 1];
        box = new int[4 * n];
        int at = 0;
        int i = 0;
        for (Polygon p : polygons) {
            offset[i] = at;
            int minX = Integer.MAX_VALUE, minY = Integer.MAX_VALUE, maxX = Integer.MIN_VALUE, maxY = Integer.MIN_VALUE;
            for (int v = 0; v < p.size(); v++) {
                int x = narrow(p.x(v), name);
                int y = narrow(p.y(v), name);
                xy[at++] = x;
                xy[at++] = y;
                minX = Math.min(minX, x);
                minY = Math.min(minY, y);
                maxX = Math.max(maxX, x);
                maxY = Math.max(maxY, y);
            }
            box[4 * i] = minX;
            box[4 * i + 1] = minY;
            box[4 * i + 2] = maxX;
            box[4 * i + 3] = maxY;
            i++;
        }
        offset[n] = at;
        index = new GridIndex(box, n);
        coverage = new CoverageRaster(this);
    }

    /** The coarse bitmap used when zoomed far out. */
    CoverageRaster coverage() {
        return coverage;
    }

    private static int narrow(long v, String layer) {
        if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("layer " + layer + ": coordinate " + v + " outside the 32-bit range");
        }
        return (int) v;
    }

    public String name() {
        return name;
    }

    /** GDSII layer number, or -1. */
    public int gdsLayer() {
        return gdsLayer;
    }

    /** GDSII data type, or -1. */
    public int gdsDatatype() {
        return gdsDatatype;
    }

    /** Number of shapes. */
    public int size() {
        return offset.length - 1;
    }

    /** Number of vertices of shape i. */
    public int vertexCount(int i) {
        return (offset[i + 1] - offset[i]) / 2;
    }

    /** x of vertex v of shape i, in database units. */
    public int x(int i, int v) {
        return xy[offset[i] + 2 * v];
    }

    /** y of vertex v of shape i, in database units. */
    public int y(int i, int v) {
        return xy[offset[i] + 2 * v + 1];
    }

    /** Bounding box of shape i: minX, minY, maxX, maxY in database units. */
    public int[] box(int i) {
        return new int[] {box[4 * i], box[4 * i + 1], box[4 * i + 2], box[4 * i + 3]};
    }

    int minX(int i) {
        return box[4 * i];
    }

    int minY(int i) {
        return box[4 * i + 1];
    }

    int maxX(int i) {
        return box[4 * i + 2];
    }

    int maxY(int i) {
        return box[4 * i + 3];
    }

    /** True when shape i is an axis-parallel rectangle (4 vertices, Manhattan). */
    boolean isRectangle(int i) {
        int o = offset[i];
        if (offset[i + 1] - o != 8) {
            return false;
        }
        int x0 = xy[o], y0 = xy[o + 1], x1 = xy[o + 2], y1 = xy[o + 3], x2 = xy[o + 4], y2 = xy[o + 5], x3 = xy[o + 6],
                y3 = xy[o + 7];
        return (x0 == x1 && y1 == y2 && x2 == x3 && y3 == y0) || (y0 == y1 && x1 == x2 && y2 == y3 && x3 == x0);
    }

    /** Raw vertex array and the start of shape i in it, for the renderer. */
    int[] vertices() {
        return xy;
    }

    int start(int i) {
        return offset[i];
    }

    /** The spatial index over this layer's shapes. */
    public GridIndex index() {
        return index;
    }
}
