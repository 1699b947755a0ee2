/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** How a rule value changes from the source to the target option. */
public enum RuleChange {
    /** the target demands more (a larger minimum) */
    TIGHTENED,
    /** the target demands less */
    RELAXED,
    /** equal values */
    UNCHANGED,
    /** only the target has the rule */
    ADDED,
    /** only the source has the rule */
    REMOVED
}
