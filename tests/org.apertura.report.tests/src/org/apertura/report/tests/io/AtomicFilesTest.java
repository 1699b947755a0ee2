/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.apertura.report.io.AtomicFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @TempDir
    Path dir;

    @Test
    void failedWriteLeavesTheOldFileWhole() throws IOException {
        Path report = dir.resolve("report.csv");
        AtomicFiles.writeString(report, "old,content\n");
        assertThrows(IOException.class, () -> AtomicFiles.write(report, out -> {
            out.write("half of the new".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("old,content\n", Files.readString(report));
        assertEquals(1, countEntries(dir), "no temporary file is left behind");
    }

    @Test
    void folderIsSwappedWhole() throws IOException {
        Path out = dir.resolve("report");
        AtomicFiles.writeFolder(out, f -> Files.writeString(f.resolve("index.html"), "v1"));
        assertThrows(IllegalStateException.class, () -> AtomicFiles.writeFolder(out, f -> {
            Files.writeString(f.resolve("index.html"), "v2 half");
            throw new IllegalStateException("renderer failed");
        }));
        assertEquals("v1", Files.readString(out.resolve("index.html")));
        AtomicFiles.writeFolder(out, f -> Files.writeString(f.resolve("index.html"), "v3"));
        assertEquals("v3", Files.readString(out.resolve("index.html")));
        assertEquals(1, countEntries(dir));
        assertTrue(Files.isDirectory(out));
    }

    private static long countEntries(Path d) throws IOException {
        try (Stream<Path> s = Files.list(d)) {
            return s.count();
        }
    }
}
