/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;

/**
 * A reviewer's decision that one finding is acceptable. A waiver names the rule and layer and locates
 * the finding by its marker box (nm) and/or its {@link Fingerprint}; at least one of the two is present.
 *
 * @param rule        the rule id the finding violates
 * @param layer       the layer of the finding
 * @param box         the finding's marker box in nm, if recorded
 * @param fingerprint the finding's fingerprint, if recorded
 * @param reason      why the finding is acceptable (not blank)
 * @param author      who decided (not blank)
 * @param date        when
 * @param origin      where the waiver was read from, as {@code file:line}, empty for waivers made in code
 */
public record Waiver(String rule, String layer, Optional<NmBox> box, Optional<String> fingerprint, String reason,
        String author, LocalDate date, Optional<String> origin) {

    /** Checks the components: text fields not blank, a box or a fingerprint present. */
    public Waiver {
        requireText(rule, "rule");
        requireText(layer, "layer");
        requireText(reason, "reason");
        requireText(author, "author");
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(box, "box");
        Objects.requireNonNull(fingerprint, "fingerprint");
        Objects.requireNonNull(origin, "origin");
        if (box.isEmpty() && fingerprint.isEmpty()) {
            throw new IllegalArgumentException("a waiver needs a box or a fingerprint to locate its finding");
        }
    }

    /** A waiver for {@code f}, carrying both its box and its fingerprint. */
    public static Waiver forFinding(Finding f, String reason, String author, LocalDate date) {
        return new Waiver(f.ruleId(), f.layer(), Optional.of(f.marker()), Optional.of(f.fingerprint()), reason,
                author, date, Optional.empty());
    }

    private static void requireText(String s, String name) {
        if (s == null || s.isBlank()) {
            throw new IllegalArgumentException("waiver " + name + " must not be blank");
        }
    }
}
