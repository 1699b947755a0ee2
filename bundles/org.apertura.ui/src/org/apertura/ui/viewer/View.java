/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import org.apertura.engine.geom.Box;

/**
 * A viewport: which world point (database units, y up) sits at the centre of a canvas of
 * {@code width x height} pixels (y down), and how many pixels one database unit takes.
 *
 * @param centreX world x at the canvas centre, database units
 * @param centreY world y at the canvas centre, database units
 * @param scale   pixels per database unit, between {@link #MIN_SCALE} and {@link #MAX_SCALE}
 * @param width   canvas width in pixels, at least 1
 * @param height  canvas height in pixels, at least 1
 */
public record View(double centreX, double centreY, double scale, int width, int height) {

    /** Smallest zoom: a billion database units per pixel. */
    public static final double MIN_SCALE = 1e-9;
    /** Largest zoom: 200 pixels per database unit. */
    public static final double MAX_SCALE = 200;

    public View {
        if (!(scale > 0) || Double.isNaN(centreX) || Double.isNaN(centreY)) {
            throw new IllegalArgumentException("invalid view: centre " + centreX + "," + centreY + " scale " + scale);
        }
        scale = Math.max(MIN_SCALE, Math.min(MAX_SCALE, scale));
        width = Math.max(1, width);
        height = Math.max(1, height);
    }

    /**
     * The view showing a whole box with a margin of 5% on each side, centred.
     */
    public static View fit(Box box, int width, int height) {
        int w = Math.max(1, width);
        int h = Math.max(1, height);
        double bw = Math.max(1, box.width());
        double bh = Math.max(1, box.height());
        double scale = Math.min(w / (bw * 1.1), h / (bh * 1.1));
        return new View((box.minX() + (double) box.maxX()) / 2, (box.minY() + (double) box.maxY()) / 2, scale, w, h);
    }

    /** World x under pixel column px. */
    public double worldX(double px) {
        return centreX + (px - width / 2.0) / scale;
    }

    /** World y under pixel row py. */
    public double worldY(double py) {
        return centreY - (py - height / 2.0) / scale;
    }

    /** Pixel column of world x. */
    public double screenX(double x) {
        return (x - centreX) * scale + width / 2.0;
    }

    /** Pixel row of world y. */
    public double screenY(double y) {
        return height / 2.0 - (y - centreY) * scale;
    }

    /** The same view on a canvas of another size, centre and scale kept. */
    public View resized(int newWidth, int newHeight) {
        return new View(centreX, centreY, scale, newWidth, newHeight);
    }

    /** The view moved so that the picture follows a drag of (dx, dy) pixels. */
    public View panBy(double dx, double dy) {
        return new View(centreX - dx / scale, centreY + dy / scale, scale, width, height);
    }

    /** The view zoomed by a factor (above 1 enlarges) keeping the world point under (px, py) in place. */
    public View zoomAbout(double px, double py, double factor) {
        double wx = worldX(px);
        double wy = worldY(py);
        double s = Math.max(MIN_SCALE, Math.min(MAX_SCALE, scale * factor));
        double cx = wx - (px - width / 2.0) / s;
        double cy = wy + (py - height / 2.0) / s;
        return new View(cx, cy, s, width, height);
    }

    /** The world window the canvas shows, rounded outwards to whole database units. */
    public Box window() {
        return Box.around(worldX(0), worldY(height), worldX(width), worldY(0));
    }

    /** True when the world point is on the canvas. */
    public boolean shows(double x, double y) {
        double sx = screenX(x);
        double sy = screenY(y);
        return sx >= 0 && sx < width && sy >= 0 && sy < height;
    }
}
