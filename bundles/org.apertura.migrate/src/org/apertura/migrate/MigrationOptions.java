/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.apertura.engine.check.CheckOptions;
import org.apertura.migrate.shrink.ShrinkHeadroom;

/**
 * Settings of a migration study.
 *
 * @param engine          how the check engine runs (threads, progress, cancellation)
 * @param shrinkProbe     probe factor of the shrink measurement where measure mode does not apply
 *                        (per-axis figures, end-of-line, enclosure, spacing tables, mask side): places
 *                        are measured down to {@code 1/shrinkProbe} of their size (at least 2); the
 *                        uniform width, spacing, pitch and area headroom has no such floor
 * @param perAxisShrink   also measure the shrink per axis; it is always measured when the target
 *                        option is anamorphic
 * @param dieWidthMm      a declared die width; the top cell's extent when empty
 * @param dieHeightMm     a declared die height; the top cell's extent when empty
 * @param stitchKeepOutNm an explicit override of the keep-out band on each side of a stitching line, in
 *                        nm, applied to both options; empty (the default) to take each option's
 *                        {@code stitch keep-out} from the deck (no band when the deck gives none)
 * @param criticalLayers  layers whose shapes must not meet a stitching line; the moved layers when empty
 * @param topCell         the cell to analyse; the file's only top cell when empty
 */
public record MigrationOptions(CheckOptions engine, int shrinkProbe, boolean perAxisShrink, OptionalDouble dieWidthMm,
        OptionalDouble dieHeightMm, OptionalDouble stitchKeepOutNm, Set<String> criticalLayers, Optional<String> topCell) {

    /** Checks the settings. */
    public MigrationOptions {
        Objects.requireNonNull(engine, "engine");
        if (shrinkProbe < 2) {
            throw new IllegalArgumentException("shrink probe must be at least 2, got " + shrinkProbe);
        }
        Objects.requireNonNull(dieWidthMm, "dieWidthMm");
        Objects.requireNonNull(dieHeightMm, "dieHeightMm");
        if (dieWidthMm.isPresent() != dieHeightMm.isPresent()) {
            throw new IllegalArgumentException("declare both die width and height, or neither");
        }
        Objects.requireNonNull(stitchKeepOutNm, "stitchKeepOutNm");
        if (stitchKeepOutNm.isPresent() && !(stitchKeepOutNm.getAsDouble() >= 0)) {
            throw new IllegalArgumentException(
                    "stitch keep-out must not be negative, got " + stitchKeepOutNm.getAsDouble());
        }
        criticalLayers = Set.copyOf(criticalLayers);
        Objects.requireNonNull(topCell, "topCell");
    }

    /**
     * All processors, probe {@value ShrinkHeadroom#DEFAULT_PROBE}, uniform shrink, die from the layout,
     * keep-out band from the deck.
     */
    public static MigrationOptions defaults() {
        return new MigrationOptions(CheckOptions.defaults(), ShrinkHeadroom.DEFAULT_PROBE, false, OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty(), Set.of(), Optional.empty());
    }

    /** A copy with a declared die size in mm. */
    public MigrationOptions withDie(double widthMm, double heightMm) {
        return new MigrationOptions(engine, shrinkProbe, perAxisShrink, OptionalDouble.of(widthMm),
                OptionalDouble.of(heightMm), stitchKeepOutNm, criticalLayers, topCell);
    }

    /** A copy with the given engine settings. */
    public MigrationOptions withEngine(CheckOptions e) {
        return new MigrationOptions(e, shrinkProbe, perAxisShrink, dieWidthMm, dieHeightMm, stitchKeepOutNm,
                criticalLayers, topCell);
    }

    /**
     * A copy whose keep-out band, in nm, overrides the decks' {@code stitch keep-out} for every option.
     *
     * @throws IllegalArgumentException for a negative band
     */
    public MigrationOptions withStitchKeepOut(double nm) {
        return new MigrationOptions(engine, shrinkProbe, perAxisShrink, dieWidthMm, dieHeightMm,
                OptionalDouble.of(nm), criticalLayers, topCell);
    }

    /** A copy that takes the keep-out band of each option from the deck (no override). */
    public MigrationOptions withDeckStitchKeepOut() {
        return new MigrationOptions(engine, shrinkProbe, perAxisShrink, dieWidthMm, dieHeightMm,
                OptionalDouble.empty(), criticalLayers, topCell);
    }

    /** A copy that measures the shrink per axis as well. */
    public MigrationOptions withPerAxisShrink(boolean on) {
        return new MigrationOptions(engine, shrinkProbe, on, dieWidthMm, dieHeightMm, stitchKeepOutNm, criticalLayers,
                topCell);
    }

    /** A copy analysing the named cell. */
    public MigrationOptions withTopCell(String cell) {
        return new MigrationOptions(engine, shrinkProbe, perAxisShrink, dieWidthMm, dieHeightMm, stitchKeepOutNm,
                criticalLayers, Optional.of(cell));
    }
}
