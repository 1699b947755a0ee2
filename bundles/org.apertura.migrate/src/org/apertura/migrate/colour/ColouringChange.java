/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.colour;

import java.util.Objects;
import java.util.Optional;

/**
 * A layer's multiple patterning before and after the migration.
 *
 * @param layer      the deck layer
 * @param transition leaving, entering or staying multi-mask
 * @param source     the decomposition under the source option, when multi-mask there and the deck
 *                   gives a same-mask spacing
 * @param target     the decomposition under the target option, likewise
 * @param note       why a side is missing (e.g. no same-mask spacing in the deck), empty otherwise
 */
public record ColouringChange(String layer, Transition transition, Optional<Colouring> source,
        Optional<Colouring> target, String note) {

    /** Checks the components are present. */
    public ColouringChange {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(transition, "transition");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(note, "note");
    }

    /** Conflicts that disappear: all source conflicts when leaving multi-patterning, else 0. */
    public int vanishing() {
        return transition == Transition.LEAVING ? source.map(c -> c.conflicts().size()).orElse(0) : 0;
    }

    /** Conflicts that appear: all target conflicts when entering multi-patterning, else 0. */
    public int appearing() {
        return transition == Transition.ENTERING ? target.map(c -> c.conflicts().size()).orElse(0) : 0;
    }
}
