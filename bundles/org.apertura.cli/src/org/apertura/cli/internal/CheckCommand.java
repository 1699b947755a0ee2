/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.Violation;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.report.migration.Histograms;
import org.apertura.report.migration.MigrationReports;
import org.apertura.report.migration.ReportContext;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.waiver.Waivers;
import org.apertura.report.write.ReportFormat;
import org.apertura.rules.resolved.ResolvedDeck;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code apertura check}: a layout against a deck under one option. */
@Command(name = "check", header = "A layout against a deck under one option.",
        sortOptions = false, usageHelpAutoWidth = true, mixinStandardHelpOptions = true,
        description = {"Check a layout against the rules of one lithography option of a deck.",
            "Prints the violations per layer and rule, open and waived, and writes the reports."},
        footer = {"", "Examples (from the repository root):",
            "  apertura check samples/decks/meridian-mx3.apdeck \\",
            "      samples/layouts/meridian-block.gds --option euv_hna",
            "  apertura check samples/decks/meridian-mx3.apdeck \\",
            "      samples/layouts/meridian-block.gds --option euv_le2 \\",
            "      --layers M1,M2 --format sarif --out review/check-m1-m2",
            "", "Exit codes: 0 no open violation, 1 violations not waived, 2 usage or input error, 3 internal error."})
public final class CheckCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DECK", description = "The rule deck (.apdeck).")
    Path deck;

    @Parameters(index = "1", paramLabel = "LAYOUT", description = "The layout (GDSII stream).")
    Path layout;

    @Option(names = "--option", required = true, paramLabel = "OPTION", description = "The lithography option whose rules apply.")
    String option;

    @Option(names = "--layers", split = ",", paramLabel = "LAYER",
            description = "Layers to check, comma-separated (default: every layer of the deck).")
    List<String> layers = new ArrayList<>();

    @Option(names = "--cell", paramLabel = "NAME", description = "The cell to check (default: the only top cell).")
    String cell;

    @Mixin
    RunOptions run;

    @Mixin
    ReportOptions reports;

    @Mixin
    WaiverOptions waiverOptions;

    @Override
    public Integer call() throws InputException, IOException {
        Run r = Run.of(spec);
        Set<ReportFormat> formats = reports.formats();
        Path folder = reports.folder("check-" + Outputs.stem(layout) + "-" + option);
        try (ProgressPrinter progress = run.progress(r.err())) {
            return call(r, formats, folder, progress);
        }
    }

    private int call(Run r, Set<ReportFormat> formats, Path folder, ProgressPrinter progress)
            throws InputException, IOException {
        CheckEngine engine = new CheckEngine(run.engine(progress));

        progress.begin("reading the deck");
        ResolvedDeck d = Inputs.deck(deck, r.err());
        progress.end();
        Inputs.option(deck, d, option);
        List<String> checked = Inputs.layers(deck, d, layers);
        Inputs.WaiverInput waivers = waiverOptions.read(deck);
        Inputs.requireFile(layout, "layout");
        Provenance prov = new Provenance(r.version(), Instant.now(), r.args(),
                Inputs.hashes(waivers, "deck", deck, "layout", layout), option, Optional.empty());

        progress.begin("reading the layout");
        LayoutLayers l = Inputs.layout(layout, d, Optional.ofNullable(cell));
        progress.end();
        l.warnings().forEach(w -> run.warn(r.err(), w));
        RuleSet rules = EngineRules.of(d, option, checked);
        rules.unsupported().forEach(u -> run.warn(r.err(), "not checked: " + u));
        progress.begin("checking");
        List<Violation> violations = engine.check(LayoutImpact.select(l.polygons(), rules.layers()), rules.rules());
        progress.end();

        progress.begin("measuring for the histograms");
        var histograms = Histograms.measure(engine, d, option, Optional.empty(), checked, l.polygons());
        progress.end();
        Set<String> shown = new LinkedHashSet<>(checked);
        violations.forEach(v -> shown.add(rules.ref(v.ruleId()).layer()));
        ReportContext ctx = ReportContext.of(d, prov, shown, Set.of())
                .withGeometry(LayoutImpact.select(l.polygons(), shown), Optional.ofNullable(l.extent()))
                .withHistograms(histograms);
        ReportData data = MigrationReports.check(d.technology(), l.file(), l.topCell(), rules, violations, ctx);
        data = Waivers.apply(data, waivers.waivers());
        String summary = Summaries.check(data, waivers);
        progress.begin("writing the reports");
        List<String> files = Outputs.write(folder, data, formats, summary, Map.of());
        progress.end();
        Outputs.announce(r, summary, folder, files);
        return data.openFindings().isEmpty() ? 0 : 1;
    }
}
