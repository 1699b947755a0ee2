/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * Writes files and folders so that readers only ever see the old content or the complete new
 * content: everything goes to a temporary sibling first and is renamed into place.
 */
public final class AtomicFiles {

    /** Produces the content of a file. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /** Produces the content of a folder, written into the given (empty) folder. */
    @FunctionalInterface
    public interface FolderContent {
        void writeInto(Path folder) throws IOException;
    }

    private AtomicFiles() {
    }

    /** Writes {@code text} as UTF-8 to {@code target}, replacing it atomically. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * Writes a file through a temporary sibling and renames it over {@code target}. If the content
     * fails, the temporary file is removed and {@code target} is untouched.
     */
    public static void write(Path target, Content content) throws IOException {
        Path dir = parentOf(target);
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
            move(tmp, target);
        } catch (IOException | RuntimeException | Error e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
    }

    /**
     * Fills a temporary sibling folder and then swaps it in for {@code target}: an existing folder is
     * renamed aside first and deleted only after the new one is in place, so a failure at any step
     * leaves either the old or the new folder complete.
     */
    public static void writeFolder(Path target, FolderContent content) throws IOException {
        Path dir = parentOf(target);
        Files.createDirectories(dir);
        Path tmp = Files.createTempDirectory(dir, "." + target.getFileName() + ".");
        try {
            content.writeInto(tmp);
        } catch (IOException | RuntimeException | Error e) {
            deleteTree(tmp);
            throw e;
        }
        Path old = null;
        if (Files.exists(target)) {
            old = Files.createTempDirectory(dir, "." + target.getFileName() + ".old.");
            Files.delete(old);
            move(target, old);
        }
        try {
            move(tmp, target);
        } catch (IOException e) {
            if (old != null) {
                move(old, target);
            }
            deleteTree(tmp);
            throw e;
        }
        if (old != null) {
            deleteTree(old);
        }
    }

    private static Path parentOf(Path target) {
        Path parent = target.toAbsolutePath().getParent();
        if (parent == null) {
            throw new IllegalArgumentException("no parent folder: " + target);
        }
        return parent;
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                Files.delete(file);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException exc) throws IOException {
                if (exc != null) {
                    throw exc;
                }
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
