/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.colour;

import java.util.List;
import java.util.Objects;

import org.apertura.engine.geom.Box;

/**
 * The decomposition of one layer under one option.
 *
 * @param option          the option
 * @param masks           mask count (2 or 3)
 * @param sameMaskNm      the colouring distance: shapes closer than this must go on different masks
 * @param shapes          merged shapes of the layer
 * @param conflictEdges   pairs of shapes closer than the colouring distance
 * @param colourable      whether every component was coloured without conflict
 * @param conflicts       the conflicts: one box (database units) around each odd cycle for two masks,
 *                        or around each conflict edge left unresolved for three masks
 * @param shapesPerMask   how many shapes each mask received
 */
public record Colouring(String option, int masks, double sameMaskNm, int shapes, int conflictEdges, boolean colourable,
        List<Box> conflicts, List<Integer> shapesPerMask) {

    /** Copies the lists. */
    public Colouring {
        Objects.requireNonNull(option, "option");
        conflicts = List.copyOf(conflicts);
        shapesPerMask = List.copyOf(shapesPerMask);
    }
}
