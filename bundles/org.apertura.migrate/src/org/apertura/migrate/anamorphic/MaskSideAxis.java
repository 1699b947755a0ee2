/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.anamorphic;

import java.util.Objects;
import java.util.OptionalDouble;

import org.apertura.rules.resolved.Axis;

/**
 * One axis of a mask-side check: the smallest wafer feature (or space) measured along the axis, its
 * size on the mask, and the deck's mask-side minimum. Lengths in nm.
 *
 * @param axis           the axis the sizes are measured along
 * @param demagnification the option's reduction along the axis
 * @param waferMinimum   the smallest wafer-side size along the axis, empty when none lies below
 *                       {@code probe ·} the wafer-side equivalent of the minimum
 * @param maskMinimum    the deck's mask-side minimum along the axis
 * @param margin         mask size over mask minimum ({@code waferMinimum·demagnification/maskMinimum});
 *                       below 1 the mask cannot be made; empty when waferMinimum is empty
 * @param violations     places whose mask-side size along this axis is below the minimum
 */
public record MaskSideAxis(Axis axis, double demagnification, OptionalDouble waferMinimum, double maskMinimum,
        OptionalDouble margin, int violations) {

    /** Checks the components are present. */
    public MaskSideAxis {
        Objects.requireNonNull(axis, "axis");
        Objects.requireNonNull(waferMinimum, "waferMinimum");
        Objects.requireNonNull(margin, "margin");
    }

    /** The mask-side size of the smallest wafer feature, {@code waferMinimum · demagnification}. */
    public OptionalDouble maskSize() {
        return waferMinimum.isPresent() ? OptionalDouble.of(waferMinimum.getAsDouble() * demagnification)
                : OptionalDouble.empty();
    }
}
