/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.impact;

import java.util.Objects;
import java.util.Optional;

import org.apertura.engine.check.Violation;
import org.apertura.engine.check.ViolationKind;
import org.apertura.engine.geom.Box;
import org.apertura.migrate.check.RuleRef;

/**
 * One violation place and what the migration does to it.
 *
 * @param status new, fixed or persisting
 * @param rule   the deck rule (layer and rule name) violated
 * @param kind   the engine's violation kind
 * @param marker where (database units): the target violation's marker when there is one, else the
 *               source violation's
 * @param source the violation under the source option, if any
 * @param target the violation under the target option, if any
 */
public record ViolationChange(ImpactStatus status, RuleRef rule, ViolationKind kind, Box marker,
        Optional<Violation> source, Optional<Violation> target) {

    /** Checks the components agree with the status. */
    public ViolationChange {
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(marker, "marker");
        if (source.isPresent() != (status != ImpactStatus.NEW) || target.isPresent() != (status != ImpactStatus.FIXED)) {
            throw new IllegalArgumentException("violations present do not match status " + status);
        }
    }
}
