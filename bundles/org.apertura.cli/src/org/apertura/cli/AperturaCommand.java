/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli;

import java.io.PrintWriter;
import java.util.Objects;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The root of the {@code apertura} command tree. The launcher script and the Equinox application
 * both run it through {@link #execute(String, PrintWriter, PrintWriter, String...)}, so batch runs and
 * the workbench's export share one implementation.
 * <p>
 * Exit codes: 0 clean, 1 violations or breaks found, 2 usage or input error.
 */
@Command(name = "apertura", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Design-rule migration workbench: lithography option changes, rule decks and layouts.",
                "An engineering aid: confirm every result with the foundry's qualified rule decks",
                "and the fab's licensed practice."},
        footer = {"", "Exit codes: 0 clean, 1 violations or breaks found, 2 usage or input error.",
                "Run 'apertura workbench' (launcher script) to open the graphical workbench."})
public final class AperturaCommand implements Runnable {

    /** Exit code: nothing found. */
    public static final int EXIT_CLEAN = 0;
    /** Exit code: violations or breaks found. */
    public static final int EXIT_FINDINGS = 1;
    /** Exit code: the command line or an input file was wrong. */
    public static final int EXIT_USAGE = 2;

    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        // No subcommand given: show what there is to run.
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * Runs the command line and returns its exit code.
     *
     * @param version the version to print for {@code --version}, e.g. the bundle version
     */
    public static int execute(String version, PrintWriter out, PrintWriter err, String... args) {
        Objects.requireNonNull(version, "version");
        CommandLine cl = new CommandLine(new AperturaCommand());
        cl.getCommandSpec().version("Apertura " + version);
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("apertura: " + ex.getMessage());
            err.println("Try 'apertura --help'.");
            err.flush();
            return EXIT_USAGE;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }
}
