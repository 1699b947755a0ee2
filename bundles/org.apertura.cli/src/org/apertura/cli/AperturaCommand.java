/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Objects;

import org.apertura.cli.internal.CheckCommand;
import org.apertura.cli.internal.CompareCommand;
import org.apertura.cli.internal.DeriveCommand;
import org.apertura.cli.internal.InputException;
import org.apertura.cli.internal.MigrateCommand;
import org.apertura.cli.internal.RenderCommand;
import org.apertura.cli.internal.Run;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The root of the {@code apertura} command tree. The launcher script and the Equinox application
 * both run it through {@link #execute(String, PrintWriter, PrintWriter, String...)}, so batch runs and
 * the workbench's export share one implementation.
 * <p>
 * Exit codes: 0 clean, 1 violations or breaks found, 2 usage or input error, 3 internal error (a bug:
 * the stack trace is printed).
 */
@Command(name = "apertura", mixinStandardHelpOptions = true, sortOptions = false,
        subcommands = {CheckCommand.class, CompareCommand.class, MigrateCommand.class, DeriveCommand.class,
            RenderCommand.class},
        description = {"Design-rule migration workbench: lithography option changes, rule decks and layouts.",
                "An engineering aid: confirm every result with the foundry's qualified rule decks",
                "and the fab's licensed practice."},
        footer = {"", "Exit codes: 0 clean, 1 violations or breaks found, 2 usage or input error, 3 internal error.",
                "Run 'apertura <command> --help' for a command's options and examples.",
                "Run 'apertura workbench' (launcher script) to open the graphical workbench."})
public final class AperturaCommand implements Runnable, Run.Source {

    /** Exit code: nothing found. */
    public static final int EXIT_CLEAN = 0;
    /** Exit code: violations or breaks found. */
    public static final int EXIT_FINDINGS = 1;
    /** Exit code: the command line or an input file was wrong. */
    public static final int EXIT_USAGE = 2;
    /** Exit code: Apertura failed on valid input (a bug); the stack trace is printed. */
    public static final int EXIT_INTERNAL = 3;

    @Spec
    private CommandSpec spec;

    private final Run run;

    private AperturaCommand(Run run) {
        this.run = run;
    }

    /** What every subcommand shares: version, streams and the command line as given. */
    @Override
    public Run invocation() {
        return run;
    }

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
        CommandLine cl = new CommandLine(new AperturaCommand(new Run(version, out, err, List.of(args))));
        cl.getCommandSpec().version("Apertura " + version);
        cl.setOut(out);
        cl.setErr(err);
        cl.setParameterExceptionHandler((ex, a) -> {
            err.println("apertura: " + ex.getMessage());
            String sub = ex.getCommandLine() == null || ex.getCommandLine().getParent() == null ? ""
                    : ex.getCommandLine().getCommandName() + " ";
            err.println("Try 'apertura " + sub + "--help'.");
            err.flush();
            return EXIT_USAGE;
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            if (ex instanceof InputException) {
                err.println("apertura: " + ex.getMessage());
                err.flush();
                return EXIT_USAGE;
            }
            err.println("apertura: internal error: " + ex);
            ex.printStackTrace(err);
            err.flush();
            return EXIT_INTERNAL;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }
}
