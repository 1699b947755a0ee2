/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.List;
import java.util.Optional;

import org.apertura.engine.geom.Box;

/**
 * What the layout viewer shows: the layers of one flattened cell, in drawing order (first drawn
 * first), with the size of a database unit. Immutable; build it off the UI thread (packing and
 * indexing is linear in the number of vertices).
 */
public final class LayoutScene {

    private final String title;
    private final double metresPerDbu;
    private final List<SceneLayer> layers;
    private final Box bounds;

    /**
     * @param title        name of what is shown, e.g. the cell name
     * @param metresPerDbu size of one database unit in metres (1e-9 for a nanometre grid)
     * @param layers       the layers in drawing order
     */
    public LayoutScene(String title, double metresPerDbu, List<SceneLayer> layers) {
        if (!(metresPerDbu > 0) || Double.isInfinite(metresPerDbu)) {
            throw new IllegalArgumentException("database unit must be a positive size in metres, got " + metresPerDbu);
        }
        this.title = title;
        this.metresPerDbu = metresPerDbu;
        this.layers = List.copyOf(layers);
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (SceneLayer l : this.layers) {
            for (int i = 0; i < l.size(); i++) {
                minX = Math.min(minX, l.minX(i));
                minY = Math.min(minY, l.minY(i));
                maxX = Math.max(maxX, l.maxX(i));
                maxY = Math.max(maxY, l.maxY(i));
            }
        }
        bounds = minX > maxX ? null : new Box(minX, minY, maxX, maxY);
    }

    public String title() {
        return title;
    }

    /** Size of one database unit in metres. */
    public double metresPerDbu() {
        return metresPerDbu;
    }

    /** The size of one database unit in nanometres. */
    public double nanometresPerDbu() {
        return metresPerDbu * 1e9;
    }

    /** The layers in drawing order. */
    public List<SceneLayer> layers() {
        return layers;
    }

    /** Total number of shapes over all layers. */
    public long shapeCount() {
        long n = 0;
        for (SceneLayer l : layers) {
            n += l.size();
        }
        return n;
    }

    /** The box around every shape, or empty when the scene has none. */
    public Optional<Box> bounds() {
        return Optional.ofNullable(bounds);
    }
}
