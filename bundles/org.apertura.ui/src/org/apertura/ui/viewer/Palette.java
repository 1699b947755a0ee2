/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.List;
import java.util.Locale;

/**
 * The colours of the layout viewer: a background, a grid colour, the marker colours for open and
 * waived violations and the highlight of the selected one, and a cycle of layer colours with their
 * fill patterns. Colours are 0xRRGGBB integers. Apertura's palettes are its own: {@link #HARBOUR}
 * (dark, the default) and {@link #PAPER} (light, for printing and screenshots in documents).
 *
 * @param name        the name shown in the preferences
 * @param background  canvas background
 * @param grid        ruler ticks and grid lines
 * @param marker      outline of an open violation
 * @param waived      outline of a waived violation
 * @param highlight   outline of the selected violation
 * @param layers      layer colours, used in turn (layer i gets {@code layers[i % n]})
 * @param hatches     fill patterns, used in turn
 */
public record Palette(String name, int background, int grid, int marker, int waived, int highlight,
        List<Integer> layers, List<Hatch> hatches) {

    /** Dark harbour-at-night palette: ink blue ground, sea and lantern colours. */
    public static final Palette HARBOUR = new Palette("Harbour", 0x101B26, 0x3C5166, 0xFF5A36, 0x8C96A0, 0xFFF07A,
            List.of(0x3FB7C6, 0xE8A33D, 0x8FD16A, 0xD66BA8, 0x6E8BF0, 0xE4D8B4, 0x52C49A, 0xF07F5B, 0xB08CE6,
                    0x9EC4D8, 0xC9B23C, 0x7AA36E),
            List.of(Hatch.RISING, Hatch.FALLING, Hatch.DOTS, Hatch.LATTICE, Hatch.ROWS, Hatch.COLUMNS,
                    Hatch.CHECKER, Hatch.WASH));

    /** Light palette on warm paper, darker inks. */
    public static final Palette PAPER = new Palette("Paper", 0xF7F3EA, 0xB9B2A4, 0xC8102E, 0x7D7D7D, 0x1F5FBF,
            List.of(0x1C7C8C, 0xB86E00, 0x4F8A2B, 0xA2336F, 0x3A53B5, 0x7A6A3A, 0x1F8F66, 0xC0502E, 0x6F4BB0,
                    0x4D7F98, 0x8C7A00, 0x4E6E45),
            List.of(Hatch.RISING, Hatch.FALLING, Hatch.DOTS, Hatch.LATTICE, Hatch.ROWS, Hatch.COLUMNS,
                    Hatch.CHECKER, Hatch.WASH));

    /** Every palette, in the order the preferences list them. */
    public static final List<Palette> ALL = List.of(HARBOUR, PAPER);

    public Palette {
        if (layers.isEmpty() || hatches.isEmpty()) {
            throw new IllegalArgumentException("a palette needs at least one layer colour and one hatch");
        }
        layers = List.copyOf(layers);
        hatches = List.copyOf(hatches);
    }

    /** The colour of the i-th layer of a scene. */
    public int layerColour(int i) {
        return layers.get(Math.floorMod(i, layers.size()));
    }

    /**
     * The pattern of the i-th layer; it changes only after every colour was used once, so that
     * neighbouring layers differ in colour first.
     */
    public Hatch layerHatch(int i) {
        return hatches.get(Math.floorMod(i + i / layers.size(), hatches.size()));
    }

    /** The palette with this name (case-insensitive), or {@link #HARBOUR} when none has it. */
    public static Palette named(String name) {
        for (Palette p : ALL) {
            if (p.name.toLowerCase(Locale.ROOT).equals(name == null ? "" : name.toLowerCase(Locale.ROOT))) {
                return p;
            }
        }
        return HARBOUR;
    }
}
