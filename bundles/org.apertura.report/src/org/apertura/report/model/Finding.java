/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;
import java.util.Optional;

/**
 * One violation place as reported.
 *
 * @param fingerprint stable identity, see {@link Fingerprint}
 * @param ruleId      the deck rule's id
 * @param ruleKind    the kind of check (width, spacing, pitch, tip-to-tip, area, ...), lower case
 * @param layer       the deck layer
 * @param measured    the measured value in {@code unit}
 * @param required    the rule value in {@code unit}
 * @param unit        nm for lengths, nm2 for areas, a fraction for densities
 * @param marker      the marker box in nm (the measured gap or the offending region)
 * @param edges       the offending edge pair, for edge-pair kinds
 * @param status      new, fixed, persisting, or open for a plain check
 * @param waiver      the waiver that covers this finding, if any
 */
public record Finding(String fingerprint, String ruleId, String ruleKind, String layer, double measured,
        double required, ValueUnit unit, NmBox marker, Optional<EdgePair> edges, FindingStatus status,
        Optional<Waiver> waiver) {

    /** Checks the components are present. */
    public Finding {
        Objects.requireNonNull(fingerprint, "fingerprint");
        Objects.requireNonNull(ruleId, "ruleId");
        Objects.requireNonNull(ruleKind, "ruleKind");
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(marker, "marker");
        Objects.requireNonNull(edges, "edges");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(waiver, "waiver");
    }

    /** A finding without waiver, its fingerprint computed from its place. */
    public static Finding of(String ruleId, String ruleKind, String layer, double measured, double required,
            ValueUnit unit, NmBox marker, Optional<EdgePair> edges, FindingStatus status) {
        return new Finding(Fingerprint.of(ruleId, layer, ruleKind, marker, edges), ruleId, ruleKind, layer, measured,
                required, unit, marker, edges, status, Optional.empty());
    }

    /** This finding covered by {@code w} (or by nothing, when empty). */
    public Finding withWaiver(Optional<Waiver> w) {
        return new Finding(fingerprint, ruleId, ruleKind, layer, measured, required, unit, marker, edges, status, w);
    }

    /** True when a waiver covers the finding. */
    public boolean waived() {
        return waiver.isPresent();
    }

    /** True when the finding is present in the result and not waived: what a reviewer must still act on. */
    public boolean open() {
        return status.present() && waiver.isEmpty();
    }
}
