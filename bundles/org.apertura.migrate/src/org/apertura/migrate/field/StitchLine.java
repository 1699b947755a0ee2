/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.field;

import java.util.Objects;

import org.apertura.rules.resolved.Axis;

/**
 * A stitching line between two exposure fields of one die.
 *
 * @param across   the axis the line cuts: {@link Axis#X} for a vertical line at {@code x = position},
 *                 {@link Axis#Y} for a horizontal line at {@code y = position}
 * @param position the line's coordinate in database units
 */
public record StitchLine(Axis across, long position) {

    /** Checks the axis is present. */
    public StitchLine {
        Objects.requireNonNull(across, "across");
    }
}
