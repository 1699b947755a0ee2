/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.nio.file.Path;
import java.util.Set;

import org.apertura.report.write.ReportFormat;

import picocli.CommandLine.Option;

/** Options of commands that write reports: formats and output folder. */
public final class ReportOptions {

    /** The folder all default output folders go into, relative to the working directory. */
    public static final String DEFAULT_ROOT = "apertura-out";

    @Option(names = {"-f", "--format"}, paramLabel = "LIST", defaultValue = "all",
            description = "Report formats, comma-separated: html, json, csv, sarif, or all (default: ${DEFAULT-VALUE}).")
    String format;

    @Option(names = {"-o", "--out"}, paramLabel = "FOLDER",
            description = "Folder for the reports, replaced whole when the run succeeds (default: "
                    + DEFAULT_ROOT + "/<command>-<input>-<options>). An existing folder is only replaced "
                    + "if it holds an earlier Apertura report.")
    Path out;

    /** The chosen formats, or an input error naming the unknown one. */
    Set<ReportFormat> formats() throws InputException {
        try {
            return ReportFormat.parseList(format);
        } catch (IllegalArgumentException e) {
            throw new InputException("--format: " + e.getMessage());
        }
    }

    /**
     * The output folder: as given, or {@value #DEFAULT_ROOT}/{@code defaultName}; refused before any work
     * starts when it exists and was not written by Apertura ({@link Outputs#checkReplaceable}).
     */
    Path folder(String defaultName) throws InputException {
        Path folder = out != null ? out : Path.of(DEFAULT_ROOT, Outputs.safeName(defaultName));
        Outputs.checkReplaceable(folder);
        return folder;
    }
}
