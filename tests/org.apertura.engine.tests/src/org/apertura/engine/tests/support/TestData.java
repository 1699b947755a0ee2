/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests.support;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Finds the shared test data folder: the system property {@code apertura.data} when set, else the first
 * {@code shared/data} found walking up from the working directory (the shared folder lies beside the
 * repository), else /work/shared/data.
 */
public final class TestData {

    private TestData() {
    }

    public static Path root() {
        String prop = System.getProperty("apertura.data");
        if (prop != null && !prop.isBlank()) {
            return Path.of(prop);
        }
        for (Path p = Path.of("").toAbsolutePath(); p != null; p = p.getParent()) {
            Path candidate = p.resolve("shared").resolve("data");
            if (Files.isDirectory(candidate.resolve("sky130_fd_sc_hd"))) {
                return candidate;
            }
        }
        return Path.of("/work/shared/data");
    }
}
