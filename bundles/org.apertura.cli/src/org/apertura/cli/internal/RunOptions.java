/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.PrintWriter;

import org.apertura.engine.check.CheckOptions;

import picocli.CommandLine.Option;

/** Options every command that runs the engine shares: quiet mode and threads. */
public final class RunOptions {

    @Option(names = {"-q", "--quiet"}, description = "Print no progress and no warnings on standard error; "
            + "errors are still printed.")
    boolean quiet;

    @Option(names = {"-j", "--threads"}, paramLabel = "N",
            description = "Worker threads of the check engine (default: the number of processors). "
                    + "Results do not depend on it.")
    Integer threads;

    /** A progress printer on {@code err}, silent in quiet mode. */
    ProgressPrinter progress(PrintWriter err) {
        return new ProgressPrinter(err, quiet);
    }

    /** Engine options reporting to {@code progress}. */
    CheckOptions engine(ProgressPrinter progress) throws InputException {
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw new InputException("--threads must be at least 1, got " + n);
        }
        return new CheckOptions(n, progress::progress, () -> false);
    }

    /** Prints a warning unless quiet. */
    void warn(PrintWriter err, String text) {
        if (!quiet) {
            err.println("apertura: warning: " + text);
        }
    }
}
