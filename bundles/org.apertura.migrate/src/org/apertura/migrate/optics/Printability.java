/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.optics;

/** The verdict on a pitch under one lithography option and patterning scheme. */
public enum Printability {
    /** k1 at or above the option's practical floor in one exposure. */
    SINGLE_EXPOSURE,
    /** k1 at or above the practical floor only because the pattern is split over several exposures. */
    WITH_SPLIT,
    /** At or above the physical limit 0.25 but below the option's practical floor: risky. */
    BELOW_PRACTICAL_FLOOR,
    /** Below k1 = 0.25 per exposure: not printable with this split. */
    BELOW_PHYSICAL_LIMIT
}
