/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/**
 * Locates the shared test data. The repository root is found by walking up from the working
 * directory to the first folder holding both {@code bundles/} and {@code tests/}; the data folder is
 * {@code ../shared/data} relative to that root (on developer machines /work/shared/data beside
 * /work/main; CI clones the repository with shared/ beside it in the same way). The Tycho and the
 * plain Maven test runs both start inside the repository, so the walk always finds it.
 */
public final class TestData {

    private TestData() {
    }

    /** The repository root (the folder with bundles/ and tests/). */
    public static Path repositoryRoot() {
        Path dir = Path.of("").toAbsolutePath();
        for (Path p = dir; p != null; p = p.getParent()) {
            if (Files.isDirectory(p.resolve("bundles")) && Files.isDirectory(p.resolve("tests"))) {
                return p;
            }
        }
        throw new IllegalStateException("no folder with bundles/ and tests/ above " + dir);
    }

    /** The shared data folder, {@code <repository root>/../shared/data}. */
    public static Path dataFolder() {
        Path data = repositoryRoot().resolve("../shared/data").normalize();
        if (!Files.isDirectory(data)) {
            throw new IllegalStateException("shared data folder missing: " + data);
        }
        return data;
    }

    /** A file under the data folder, e.g. {@code file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds")}. */
    public static Path file(String relative) {
        Path p = dataFolder().resolve(relative);
        if (!Files.isRegularFile(p)) {
            throw new IllegalStateException("shared data file missing: " + p);
        }
        return p;
    }

    /** Every .gds file under the data folder, sorted. */
    public static List<Path> allGdsFiles() {
        try (Stream<Path> s = Files.walk(dataFolder())) {
            return s.filter(p -> p.getFileName().toString().endsWith(".gds")).sorted().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
