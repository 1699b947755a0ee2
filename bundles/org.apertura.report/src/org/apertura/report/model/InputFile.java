/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;

/**
 * An input file of a run, recorded for reproducibility.
 *
 * @param role      what the file is to the run: {@code deck}, {@code layout}, {@code waivers}, ...
 * @param path      the path as given on the command line
 * @param sha256    SHA-256 of the file's bytes, 64 lower-case hex digits
 * @param sizeBytes the file's size in bytes
 */
public record InputFile(String role, String path, String sha256, long sizeBytes) {

    /** Checks the hash is 64 lower-case hex digits. */
    public InputFile {
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(path, "path");
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 must be 64 lower-case hex digits: " + sha256);
        }
    }

    /** Hashes {@code file} (streamed, any size) and records it under {@code role}. */
    public static InputFile hash(String role, Path file) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
        long size = 0;
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[1 << 16];
            for (int n; (n = in.read(buf)) > 0;) {
                md.update(buf, 0, n);
                size += n;
            }
        }
        return new InputFile(role, file.toString(), HexFormat.of().formatHex(md.digest()), size);
    }
}
