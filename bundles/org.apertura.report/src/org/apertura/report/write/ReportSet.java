/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.apertura.report.io.AtomicFiles;
import org.apertura.report.model.ReportData;

/**
 * Writes the chosen formats of one report into a folder. Everything is written into a temporary sibling
 * folder first and swapped in with {@link AtomicFiles#writeFolder}: an existing report folder is replaced whole
 * or, when anything fails, left as it was. Files: {@value #HTML}, {@value #JSON} with
 * {@value JsonReport#SCHEMA_FILE}, {@value #SARIF}, and the CSV tables named in {@link CsvReport}.
 */
public final class ReportSet {

    public static final String HTML = "index.html";
    public static final String JSON = "report.json";
    public static final String SARIF = "report.sarif";

    private ReportSet() {
    }

    /**
     * Writes {@code data} in {@code formats} into {@code folder} (replaced whole) and returns the names of the
     * files written, in writing order.
     */
    public static List<String> write(Path folder, ReportData data, Set<ReportFormat> formats) throws IOException {
        if (formats.isEmpty()) {
            throw new IllegalArgumentException("no report format chosen");
        }
        List<String> names = new ArrayList<>();
        AtomicFiles.writeFolder(folder, tmp -> {
            names.clear();
            if (formats.contains(ReportFormat.HTML)) {
                text(tmp, HTML, names, w -> HtmlReport.write(data, w));
            }
            if (formats.contains(ReportFormat.JSON)) {
                text(tmp, JSON, names, w -> JsonReport.write(data, w, true));
                try (InputStream in = JsonReport.openSchema()) {
                    Files.copy(in, tmp.resolve(JsonReport.SCHEMA_FILE));
                }
                names.add(JsonReport.SCHEMA_FILE);
            }
            if (formats.contains(ReportFormat.SARIF)) {
                text(tmp, SARIF, names, w -> SarifReport.write(data, w));
            }
            if (formats.contains(ReportFormat.CSV)) {
                text(tmp, CsvReport.FINDINGS, names, w -> w.write(CsvReport.findings(data.findings())));
                if (data.matrix().isPresent()) {
                    text(tmp, CsvReport.MATRIX, names, w -> w.write(CsvReport.matrix(data.matrix().get().rows())));
                }
                if (!data.headroom().isEmpty()) {
                    text(tmp, CsvReport.HEADROOM, names, w -> w.write(CsvReport.headroom(data.headroom())));
                }
                if (data.masks().isPresent()) {
                    text(tmp, CsvReport.MASKS, names, w -> w.write(CsvReport.masks(data.masks().get())));
                }
                text(tmp, CsvReport.STALE_WAIVERS, names, w -> w.write(CsvReport.staleWaivers(data.staleWaivers())));
                text(tmp, CsvReport.PROVENANCE, names, w -> w.write(CsvReport.provenance(data)));
            }
        });
        return List.copyOf(names);
    }

    @FunctionalInterface
    private interface TextContent {
        void writeTo(Writer w) throws IOException;
    }

    private static void text(Path dir, String name, List<String> names, TextContent c) throws IOException {
        try (Writer w = new BufferedWriter(Files.newBufferedWriter(dir.resolve(name), StandardCharsets.UTF_8))) {
            c.writeTo(w);
        }
        names.add(name);
    }
}
