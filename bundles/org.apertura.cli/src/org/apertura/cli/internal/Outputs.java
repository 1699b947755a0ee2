/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

import org.apertura.report.io.AtomicFiles;
import org.apertura.report.model.ReportData;
import org.apertura.report.write.ReportFormat;
import org.apertura.report.write.ReportSet;

/**
 * Writes the output folder of a run in one piece: the reports (through {@link ReportSet}), the text summary
 * {@value #SUMMARY} and any extra files are written into a temporary sibling folder that then replaces the
 * output folder whole, so a failed run leaves the previous folder as it was and never a half-written one.
 */
public final class Outputs {

    /** The text summary every output folder holds; it also marks the folder as Apertura's. */
    public static final String SUMMARY = "summary.txt";

    private Outputs() {
    }

    /** Prints the summary and where the reports went, on standard output. */
    static void announce(Run r, String summary, Path folder, List<String> files) {
        r.out().print(summary);
        r.out().println("reports: " + folder + " (" + String.join(", ", files) + ")");
        r.out().flush();
    }

    /**
     * Refuses an output folder that exists, is not empty and holds no {@value #SUMMARY}: replacing it would
     * delete files Apertura did not write. Call before the long work starts.
     */
    static void checkReplaceable(Path folder) throws InputException {
        if (!Files.exists(folder)) {
            return;
        }
        if (!Files.isDirectory(folder)) {
            throw new InputException(folder + ": exists and is not a folder; choose another --out");
        }
        try (Stream<Path> s = Files.list(folder)) {
            if (s.findAny().isPresent() && !Files.isRegularFile(folder.resolve(SUMMARY))) {
                throw new InputException(folder + ": the folder holds files that are not an Apertura report "
                        + "(no " + SUMMARY + "); it would be replaced whole, so choose another --out");
            }
        } catch (IOException e) {
            throw new InputException(folder + ": cannot list the output folder: " + e.getMessage(), e);
        }
    }

    /** Content of an extra file of the output folder. */
    @FunctionalInterface
    public interface Extra {
        /** Writes the file. */
        void writeTo(Path file) throws IOException;
    }

    /**
     * Writes {@code data} in {@code formats}, the summary and the extra files (name to content) into
     * {@code folder}, replacing it whole; returns the names of the files written.
     */
    static List<String> write(Path folder, ReportData data, Set<ReportFormat> formats, String summary,
            Map<String, Extra> extras) throws IOException {
        List<String> names = new ArrayList<>();
        AtomicFiles.writeFolder(folder, tmp -> {
            names.clear();
            readableByAll(tmp);
            Path inner = tmp.resolve(".reports");
            List<String> reports = ReportSet.write(inner, data, formats);
            for (String n : reports) {
                Files.move(inner.resolve(n), tmp.resolve(n), StandardCopyOption.REPLACE_EXISTING);
            }
            try (DirectoryStream<Path> left = Files.newDirectoryStream(inner)) {
                if (left.iterator().hasNext()) {
                    throw new IOException("unexpected files left by the report writer in " + inner);
                }
            }
            Files.delete(inner);
            names.addAll(reports);
            Files.writeString(tmp.resolve(SUMMARY), summary, StandardCharsets.UTF_8);
            names.add(SUMMARY);
            for (Map.Entry<String, Extra> e : new LinkedHashMap<>(extras).entrySet()) {
                e.getValue().writeTo(tmp.resolve(e.getKey()));
                names.add(e.getKey());
            }
        });
        return List.copyOf(names);
    }

    /** A file or folder name made of letters, digits, {@code . _ -} only (anything else becomes {@code _}). */
    public static String safeName(String s) {
        String t = s.replaceAll("[^A-Za-z0-9._-]", "_");
        return t.isEmpty() || t.startsWith(".") ? "_" + t : t;
    }

    /** A file name without its last extension ({@code meridian-block.gds} gives {@code meridian-block}). */
    public static String stem(Path p) {
        Path f = p.getFileName();
        String n = f == null ? p.toString() : f.toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    /** A temporary folder is private to its owner; a report folder is for reviewers: rwxr-xr-x where POSIX. */
    private static void readableByAll(Path dir) throws IOException {
        if (Files.getFileStore(dir).supportsFileAttributeView("posix")) {
            Files.setPosixFilePermissions(dir, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }
}
