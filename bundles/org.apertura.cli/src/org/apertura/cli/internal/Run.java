/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.PrintWriter;
import java.util.List;
import java.util.Objects;

import picocli.CommandLine.Model.CommandSpec;

/**
 * What every subcommand of one invocation shares.
 *
 * @param version the tool version recorded in reports
 * @param out     standard output: summaries and where reports went
 * @param err     standard error: progress, warnings and errors
 * @param args    the command line as given, recorded in reports
 */
public record Run(String version, PrintWriter out, PrintWriter err, List<String> args) {

    /** Checks the parts are present and copies the arguments. */
    public Run {
        Objects.requireNonNull(version, "version");
        Objects.requireNonNull(out, "out");
        Objects.requireNonNull(err, "err");
        args = List.copyOf(args);
    }

    /** Implemented by the root command, which holds the run. */
    public interface Source {
        /** The run of this invocation. */
        Run invocation();
    }

    /** The run of the invocation a subcommand belongs to. */
    static Run of(CommandSpec spec) {
        return ((Source) spec.root().userObject()).invocation();
    }

    /** Where warnings go: standard error, or nowhere in quiet mode. */
    PrintWriter warnings(boolean quiet) {
        return quiet ? new PrintWriter(java.io.Writer.nullWriter()) : err;
    }
}
