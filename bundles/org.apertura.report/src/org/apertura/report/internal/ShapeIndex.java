/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.internal;

import java.util.ArrayList;
import java.util.List;

import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmPolygon;

/** A uniform-grid bucket index over polygon bounding boxes, for finding the shapes near a place. */
public final class ShapeIndex {

    private static final int CELLS = 128;

    private final List<NmPolygon> polygons;
    private final NmBox[] bounds;
    private final NmBox extent;
    private final double cellW;
    private final double cellH;
    private final List<List<Integer>> cells = new ArrayList<>();

    /** Indexes {@code polygons}. */
    public ShapeIndex(List<NmPolygon> polygons) {
        this.polygons = polygons;
        this.bounds = new NmBox[polygons.size()];
        NmBox e = null;
        for (int i = 0; i < polygons.size(); i++) {
            bounds[i] = polygons.get(i).bounds();
            e = e == null ? bounds[i] : e.union(bounds[i]);
        }
        extent = e == null ? new NmBox(0, 0, 1, 1) : e;
        cellW = Math.max(extent.width() / CELLS, 1e-9);
        cellH = Math.max(extent.height() / CELLS, 1e-9);
        for (int i = 0; i < CELLS * CELLS; i++) {
            cells.add(null);
        }
        for (int i = 0; i < bounds.length; i++) {
            NmBox b = bounds[i];
            for (int cy = cy(b.y1()); cy <= cy(b.y2()); cy++) {
                for (int cx = cx(b.x1()); cx <= cx(b.x2()); cx++) {
                    int k = cy * CELLS + cx;
                    if (cells.get(k) == null) {
                        cells.set(k, new ArrayList<>());
                    }
                    cells.get(k).add(i);
                }
            }
        }
    }

    /** The extent of all shapes. */
    public NmBox extent() {
        return extent;
    }

    /** Shapes whose bounding box meets {@code window}, at most {@code limit}, in input order. */
    public List<NmPolygon> query(NmBox window, int limit) {
        if (bounds.length == 0 || !window.intersects(extent)) {
            return List.of();
        }
        boolean[] seen = new boolean[bounds.length];
        List<Integer> hits = new ArrayList<>();
        for (int cy = cy(window.y1()); cy <= cy(window.y2()); cy++) {
            for (int cx = cx(window.x1()); cx <= cx(window.x2()); cx++) {
                List<Integer> c = cells.get(cy * CELLS + cx);
                if (c == null) {
                    continue;
                }
                for (int i : c) {
                    if (!seen[i] && bounds[i].intersects(window)) {
                        seen[i] = true;
                        hits.add(i);
                    }
                }
            }
        }
        hits.sort(null);
        List<NmPolygon> out = new ArrayList<>();
        for (int i = 0; i < hits.size() && out.size() < limit; i++) {
            out.add(polygons.get(hits.get(i)));
        }
        return out;
    }

    private int cx(double x) {
        return clamp((int) Math.floor((x - extent.x1()) / cellW));
    }

    private int cy(double y) {
        return clamp((int) Math.floor((y - extent.y1()) / cellH));
    }

    private static int clamp(int c) {
        return Math.max(0, Math.min(CELLS - 1, c));
    }
}
