/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What a report was made from, so that it can be reproduced.
 *
 * @param toolVersion  Apertura's version
 * @param created      when the run finished (UTC)
 * @param command      the command line, one argument per entry
 * @param inputs       the input files with their SHA-256 hashes (deck and layout at least)
 * @param sourceOption the lithography option checked, or migrated from
 * @param targetOption the option migrated to, empty for a plain check
 */
public record Provenance(String toolVersion, Instant created, List<String> command, List<InputFile> inputs,
        String sourceOption, Optional<String> targetOption) {

    /** Copies the lists. */
    public Provenance {
        Objects.requireNonNull(toolVersion, "toolVersion");
        Objects.requireNonNull(created, "created");
        command = List.copyOf(command);
        inputs = List.copyOf(inputs);
        Objects.requireNonNull(sourceOption, "sourceOption");
        Objects.requireNonNull(targetOption, "targetOption");
    }

    /** The first input with the given role. */
    public Optional<InputFile> input(String role) {
        return inputs.stream().filter(i -> i.role().equals(role)).findFirst();
    }
}
