/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.Objects;

import org.apertura.engine.geom.Box;

/**
 * A violation as the layout viewer draws it: a box in database units, a short label and whether a
 * reviewer waived it. {@code source} is the object it stands for (e.g. the engine's violation),
 * so that a selection in the viewer leads back to it.
 *
 * @param box    where, in database units
 * @param label  e.g. {@code "M1 spacing 28 < 32"}
 * @param waived whether a waiver covers it
 * @param source what the marker stands for; may be null
 */
public record Marker(Box box, String label, boolean waived, Object source) {

    public Marker {
        Objects.requireNonNull(box, "box");
        Objects.requireNonNull(label, "label");
    }
}
