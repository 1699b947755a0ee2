/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.delta.DeckDelta;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.masks.MaskBudget;
import org.apertura.migrate.optics.OpticsAnalysis;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.report.migration.MigrationReports;
import org.apertura.report.migration.ReportContext;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.write.ReportFormat;
import org.apertura.rules.resolved.ResolvedDeck;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code apertura compare}: two options of a deck, without a layout. */
@Command(name = "compare", header = "Two options of a deck: rule delta, k1 per rule, masks (no layout).",
        sortOptions = false, usageHelpAutoWidth = true, mixinStandardHelpOptions = true,
        description = {"Compare two lithography options of a deck: every rule value old and new with its ratio, "
                + "status and cause, the k1 each pitch-like rule implies under both options, and the masks "
                + "and exposures per layer. No layout is needed.",
            "Prints the changed rules and writes the reports."},
        footer = {"", "Examples (from the repository root):",
            "  apertura compare samples/decks/meridian-mx3.apdeck --from euv_le2 --to euv_hna",
            "  apertura compare samples/decks/meridian-mx3.apdeck --from duv_le2 \\",
            "      --to euv_se --layers M1,M2 --format csv",
            "", "Exit codes: 0 done (a comparison finds no violations), 2 usage or input error, 3 internal error."})
public final class CompareCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DECK", description = "The rule deck (.apdeck).")
    Path deck;

    @Option(names = "--from", required = true, paramLabel = "OPTION", description = "The option compared from.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "OPTION", description = "The option compared to.")
    String to;

    @Option(names = "--layers", split = ",", paramLabel = "LAYER",
            description = "Layers to compare, comma-separated (default: every layer whose patterning or rules differ).")
    List<String> layers = new ArrayList<>();

    @Option(names = {"-q", "--quiet"}, description = "Print no warnings on standard error.")
    boolean quiet;

    @Mixin
    ReportOptions reports;

    @Override
    public Integer call() throws InputException, IOException {
        Run r = Run.of(spec);
        Set<ReportFormat> formats = reports.formats();
        Path folder = reports.folder("compare-" + Outputs.stem(deck) + "-" + from + "-" + to);
        ResolvedDeck d = Inputs.deck(deck, r.warnings(quiet));
        Inputs.option(deck, d, from);
        Inputs.option(deck, d, to);
        List<String> compared = layers.isEmpty() ? MigrationStudy.changedLayers(d, from, to)
                : Inputs.layers(deck, d, layers);
        Provenance prov = new Provenance(r.version(), Instant.now(), r.args(),
                List.of(Inputs.hash("deck", deck)), from, Optional.of(to));
        List<RuleDelta> deltas = DeckDelta.compare(d, from, to, compared);
        List<RuleOptics> optics = new ArrayList<>(OpticsAnalysis.rules(d, from, compared));
        optics.addAll(OpticsAnalysis.rules(d, to, compared));
        MaskBudget masks = MaskBudget.of(d, from, to, compared);
        ReportData data = MigrationReports.comparison(d.technology(), from, to, deltas, optics, masks,
                ReportContext.of(d, prov, compared, Set.copyOf(compared)));
        String summary = Summaries.comparison(d.technology(), from, to, deltas, optics, masks);
        List<String> files = Outputs.write(folder, data, formats, summary, Map.of());
        Outputs.announce(r, summary, folder, files);
        return 0;
    }
}
