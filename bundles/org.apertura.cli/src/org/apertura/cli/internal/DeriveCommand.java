/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import org.apertura.migrate.derive.DraftDeck;
import org.apertura.report.Caution;
import org.apertura.report.io.AtomicFiles;
import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.ResolvedDeck;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code apertura derive}: a draft deck for a target option, derived from a source option. */
@Command(name = "derive", header = "A draft deck for a target option, by k1-preserving scaling.",
        sortOptions = false, usageHelpAutoWidth = true, mixinStandardHelpOptions = true,
        description = {"Derive a draft deck for the target option from the source option by k1-preserving scaling "
                + "(every length times (lambda_t/NA_t)/(lambda_s/NA_s), snapped up to the grid), adjusted for the "
                + "patterning change, with a comment on every value saying how it was derived.",
            "The draft is checked with the deck loader before it is written; it is written atomically and never "
                + "over an existing file unless --force is given."},
        footer = {"", "Examples (from the repository root):",
            "  apertura derive samples/decks/meridian-mx3.apdeck --from euv_le2 --to euv_hna",
            "  apertura derive samples/decks/meridian-mx3.apdeck --from duv_le2 \\",
            "      --to euv_se --layers M1,M2 --output drafts/mx3-euv.apdeck --force",
            "", "Exit codes: 0 written, 2 usage or input error (also: the file exists), 3 internal error."})
public final class DeriveCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DECK", description = "The rule deck (.apdeck).")
    Path deck;

    @Option(names = "--from", required = true, paramLabel = "OPTION", description = "The option to derive from.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "OPTION", description = "The option whose optics the draft is for.")
    String to;

    @Option(names = "--layers", split = ",", paramLabel = "LAYER",
            description = "Layers to derive, comma-separated (default: every layer).")
    List<String> layers = new ArrayList<>();

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "The draft deck file (default: " + ReportOptions.DEFAULT_ROOT + "/<deck>-<to>-draft.apdeck).")
    Path output;

    @Option(names = "--force", description = "Replace the output file if it exists.")
    boolean force;

    @Option(names = {"-q", "--quiet"}, description = "Print no warnings on standard error.")
    boolean quiet;

    @Override
    public Integer call() throws InputException, IOException {
        Run r = Run.of(spec);
        Path file = output != null ? output
                : Path.of(ReportOptions.DEFAULT_ROOT, Outputs.safeName(Outputs.stem(deck) + "-" + to + "-draft.apdeck"));
        if (Files.exists(file) && !force) {
            throw new InputException(file + ": exists; give --force to replace it");
        }
        if (Files.isDirectory(file)) {
            throw new InputException(file + ": is a folder; give a file name with --output");
        }
        ResolvedDeck d = Inputs.deck(deck, r.warnings(quiet));
        Inputs.option(deck, d, from);
        Inputs.option(deck, d, to);
        List<String> derived = layers.isEmpty() ? List.of() : Inputs.layers(deck, d, layers);
        DraftDeck draft = DraftDeck.derive(d, from, to, derived, file);
        if (draft.hasErrors()) {
            // the deriver must write a valid deck: this is Apertura's fault, not the user's
            StringBuilder sb = new StringBuilder("the derived draft does not validate; nothing was written:");
            draft.diagnostics().stream().filter(x -> x.severity() == DeckDiagnostic.Severity.ERROR)
                    .forEach(x -> sb.append("\n  ").append(x));
            throw new IllegalStateException(sb.toString());
        }
        if (!quiet) {
            draft.diagnostics().forEach(x -> r.err().println("apertura: draft: " + x));
        }
        AtomicFiles.writeString(file, draft.text());
        r.out().println("draft deck (option " + draft.name() + ") written to " + file);
        r.out().println("caution: " + Caution.TEXT);
        r.out().flush();
        return 0;
    }
}
