/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.Locale;

/**
 * Ruler ticks and coordinate text. Tick steps are 1, 2 or 5 times a power of ten nanometres, the
 * smallest such step at least {@code minPixels} apart on screen; labels are in nanometres below one
 * micrometre and in micrometres from there, with as many decimals as the step needs.
 */
public final class Rulers {

    private Rulers() {
    }

    /**
     * The labelled tick step in nanometres.
     *
     * @param nmPerPixel nanometres one screen pixel covers (positive)
     * @param minPixels  smallest distance between labelled ticks on screen
     */
    public static double stepNm(double nmPerPixel, double minPixels) {
        if (!(nmPerPixel > 0)) {
            throw new IllegalArgumentException("nanometres per pixel must be positive: " + nmPerPixel);
        }
        double min = nmPerPixel * minPixels;
        double decade = Math.pow(10, Math.floor(Math.log10(min)));
        for (double m : new double[] {1, 2, 5, 10}) {
            if (m * decade >= min * (1 - 1e-12)) {
                return m * decade;
            }
        }
        return 10 * decade;
    }

    /**
     * A tick label for a position: {@code "350 nm"} below a micrometre, else micrometres with the
     * decimals the step needs: {@code "1.5 µm"} (step 500 nm), {@code "12 µm"} (step 2 µm).
     */
    public static String label(double valueNm, double stepNm) {
        if (stepNm >= 1000 || Math.abs(valueNm) >= 1000) {
            double um = valueNm / 1000;
            int decimals = (int) Math.max(0, Math.ceil(-Math.log10(stepNm / 1000) - 1e-9));
            return String.format(Locale.ROOT, "%." + decimals + "f µm", um);
        }
        int decimals = (int) Math.max(0, Math.ceil(-Math.log10(stepNm) - 1e-9));
        return String.format(Locale.ROOT, "%." + decimals + "f nm", valueNm);
    }

    /**
     * A cursor position for the status line: micrometres with nanometre resolution, e.g.
     * {@code "x 12.345 µm  y -0.020 µm"}; finer grids than 1 nm get more decimals.
     */
    public static String position(double xNm, double yNm, double nmPerDbu) {
        int decimals = 3 + (int) Math.max(0, Math.ceil(-Math.log10(nmPerDbu) - 1e-9));
        String f = "%." + decimals + "f";
        return "x " + String.format(Locale.ROOT, f, xNm / 1000) + " µm  y " + String.format(Locale.ROOT, f, yNm / 1000)
                + " µm";
    }
}
