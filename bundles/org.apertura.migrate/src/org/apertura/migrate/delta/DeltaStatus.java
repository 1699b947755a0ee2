/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.delta;

/** How a rule changes from the source option to the target option. */
public enum DeltaStatus {
    /** The target asks more of the layout (a larger minimum, a smaller maximum). */
    TIGHTENED,
    /** The target asks less of the layout. */
    RELAXED,
    /** Same value under both options. */
    UNCHANGED,
    /** The rule exists only under the target option. */
    ADDED,
    /** The rule exists only under the source option. */
    REMOVED
}
