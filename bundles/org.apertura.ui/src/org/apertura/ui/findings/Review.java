/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.findings;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.apertura.report.model.Finding;

/**
 * The findings of one check or migration run over one layout.
 *
 * @param title    a one-line description, e.g. {@code "meridian-block.gds under EUV-033"}
 * @param layout   the layout file the findings are about
 * @param deck     the deck checked against; its waiver file lives beside it
 * @param sourceOption the option checked, or migrated from
 * @param targetOption the option migrated to; empty for a plain check
 * @param findings the findings, markers in nanometres
 */
public record Review(String title, Path layout, Optional<Path> deck, String sourceOption, Optional<String> targetOption,
        List<Finding> findings) {

    public Review {
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(sourceOption, "sourceOption");
        Objects.requireNonNull(targetOption, "targetOption");
        Objects.requireNonNull(layout, "layout");
        Objects.requireNonNull(deck, "deck");
        findings = List.copyOf(findings);
    }

    /** This review with other findings. */
    public Review withFindings(List<Finding> other) {
        return new Review(title, layout, deck, sourceOption, targetOption, other);
    }
}
