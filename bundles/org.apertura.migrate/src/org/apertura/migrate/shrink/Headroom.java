/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.shrink;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apertura.engine.geom.Box;

/**
 * How far one layer can shrink under one rule (or under all its rules when {@code rule} is {@code *}).
 *
 * @param layer       the deck layer
 * @param rule        the rule name, {@code *} for the layer as a whole
 * @param scope       uniform, or along one axis
 * @param factor      the smallest linear scale factor (at most 1) the layout takes without a new
 *                    violation of the rule; when {@code bounded} the true factor is at most this
 * @param bounded     true when no place limits the shrink down to {@code factor}, so the true factor is
 *                    at most it and the headroom at least {@code headroom()}: the probe's floor
 *                    (1 / probe factor), for measure-mode rules the rule over the measuring range,
 *                    or 0 when no place can newly fail at all (see {@link MeasuredShrink})
 * @param limitingPlace where the limit is (database units), empty when bounded
 * @param measured    the limiting measured value at scale 1, in nm (nm² for areas), empty when bounded
 * @param required    the rule value the limiting place must keep, in nm (nm² for areas), empty when bounded
 */
public record Headroom(String layer, String rule, ShrinkScope scope, double factor, boolean bounded,
        Optional<Box> limitingPlace, OptionalDouble measured, OptionalDouble required) {

    /** Checks the components are present. */
    public Headroom {
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(scope, "scope");
        Objects.requireNonNull(limitingPlace, "limitingPlace");
        Objects.requireNonNull(measured, "measured");
        Objects.requireNonNull(required, "required");
    }

    /** The linear shrink available, {@code 1 - factor} (0.25 means 25 % smaller). */
    public double headroom() {
        return 1 - factor;
    }
}
