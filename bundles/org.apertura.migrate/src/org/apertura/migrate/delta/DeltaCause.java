/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.delta;

/** Why a rule changes between two options; see {@link DeckDelta} for how it is decided. */
public enum DeltaCause {
    /** The value did not change. */
    NONE,
    /** The value follows the optics: it scales with λ/NA (areas with its square) within the grid. */
    OPTICS,
    /** The layer's patterning differs between the options (e.g. LE2 to single exposure). */
    PATTERNING,
    /** The target is anamorphic and the value differs per axis. */
    ANAMORPHIC_AXIS,
    /** None of the above: the deck states the target value explicitly. */
    EXPLICIT_OVERRIDE
}
