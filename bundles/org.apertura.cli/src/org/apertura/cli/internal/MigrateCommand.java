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

import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.SummaryTable;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.migrate.persist.StudyModels;
import org.apertura.migrate.persist.StudyResources;
import org.apertura.engine.check.CheckEngine;
import org.apertura.report.migration.Histograms;
import org.apertura.report.migration.MigrationReports;
import org.apertura.report.migration.ReportContext;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
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

/** {@code apertura migrate}: the full migration of a layout from one option of a deck to another. */
@Command(name = "migrate", header = "The full migration of a layout between two options of a deck.",
        sortOptions = false, usageHelpAutoWidth = true, mixinStandardHelpOptions = true,
        description = {"Migrate a layout from one lithography option of a deck to another: the deck delta, "
                + "k1 per rule, new, fixed and persisting violations, shrink headroom, masks and exposures, "
                + "multiple-patterning changes and the exposure field.",
            "Prints the summary table and writes the reports, the summary and the study result (study.apstudy, "
                + "for 'apertura render' and the workbench) into one folder."},
        footer = {"", "Examples (from the repository root):",
            "  apertura migrate samples/decks/meridian-mx3.apdeck \\",
            "      samples/layouts/meridian-block.gds --from euv_le2 --to euv_hna",
            "  apertura migrate samples/decks/meridian-mx3.apdeck \\",
            "      samples/layouts/meridian-block.gds --from euv_le2 --to euv_hna \\",
            "      --layers M1,V1,M2 --format html,sarif --out review/m1-m2",
            "", "Exit codes: 0 no open breaks, 1 new violations not waived, 2 usage or input error, 3 internal error."})
public final class MigrateCommand implements Callable<Integer> {

    /** The file name of the study result in the output folder. */
    public static final String STUDY_FILE = "study." + StudyResources.FILE_EXTENSION;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DECK", description = "The rule deck (.apdeck).")
    Path deck;

    @Parameters(index = "1", paramLabel = "LAYOUT", description = "The layout (GDSII stream).")
    Path layout;

    @Option(names = "--from", required = true, paramLabel = "OPTION", description = "The option the layout is drawn for.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "OPTION", description = "The option to move to.")
    String to;

    @Option(names = "--layers", split = ",", paramLabel = "LAYER",
            description = "Layers to move, comma-separated (default: every layer whose patterning or rules differ).")
    List<String> layers = new ArrayList<>();

    @Option(names = "--cell", paramLabel = "NAME", description = "The cell to analyse (default: the only top cell).")
    String cell;

    @Option(names = "--die", paramLabel = "WxH", description = "Declared die size in mm, e.g. 20x30 "
            + "(default: the cell's extent).")
    String die;

    @Option(names = "--keep-out", paramLabel = "NM",
            description = "Keep-out band on each side of a stitching line, nm; overrides the deck's "
                    + "'stitch keep-out' of the options (default: the deck's value).")
    Double keepOut;

    @Option(names = "--per-axis", description = "Measure the shrink headroom per axis as well "
            + "(always done for an anamorphic target).")
    boolean perAxis;

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
        Path folder = reports.folder("migrate-" + Outputs.stem(layout) + "-" + from + "-" + to);
        try (ProgressPrinter progress = run.progress(r.err())) {
            return call(r, formats, folder, progress);
        }
    }

    private int call(Run r, Set<ReportFormat> formats, Path folder, ProgressPrinter progress)
            throws InputException, IOException {
        MigrationOptions opts = options(progress);

        progress.begin("reading the deck");
        ResolvedDeck d = Inputs.deck(deck, r.err());
        progress.end();
        Inputs.option(deck, d, from);
        Inputs.option(deck, d, to);
        Set<String> moved = new LinkedHashSet<>(layers.isEmpty() ? List.of() : Inputs.layers(deck, d, layers));
        Inputs.WaiverInput waivers = waiverOptions.read(deck);
        Inputs.requireFile(layout, "layout");
        Provenance prov = new Provenance(r.version(), Instant.now(), r.args(),
                Inputs.hashes(waivers, "deck", deck, "layout", layout), from, Optional.of(to));

        progress.begin("reading the layout");
        LayoutLayers l = Inputs.layout(layout, d, Optional.ofNullable(cell));
        progress.end();
        progress.begin("analysing the migration");
        MigrationResult result = MigrationStudy.run(d, l.polygons(), l.extent(), l.file(), l.topCell(), l.warnings(),
                from, to, moved, opts);
        progress.end();
        result.warnings().forEach(w -> run.warn(r.err(), w));

        progress.begin("measuring for the histograms");
        List<org.apertura.report.model.Histogram> histograms = Histograms.measure(
                new CheckEngine(run.engine(progress)), d, from, Optional.of(to), result.layers(), l.polygons());
        progress.end();
        ReportData data = report(d, result, prov, l, histograms);
        data = Waivers.apply(data, waivers.waivers());
        String summary = Summaries.migration(SummaryTable.render(result), data, waivers);
        progress.begin("writing the reports");
        List<String> files = Outputs.write(folder, data, formats, summary,
                Map.of(STUDY_FILE, file -> StudyResources.save(StudyModels.toModel(result), file)));
        progress.end();
        Outputs.announce(r, summary, folder, files);
        return hasOpenBreaks(data) ? 1 : 0;
    }

    /** True when a new violation is not waived. */
    static boolean hasOpenBreaks(ReportData data) {
        return data.findings().stream().anyMatch(f -> f.status() == FindingStatus.NEW && f.open());
    }

    private MigrationOptions options(ProgressPrinter progress) throws InputException {
        MigrationOptions o = MigrationOptions.defaults().withEngine(run.engine(progress)).withPerAxisShrink(perAxis);
        if (keepOut != null) {
            if (!(keepOut >= 0) || keepOut.isInfinite()) {
                throw new InputException("--keep-out must be a non-negative number of nm, got " + keepOut);
            }
            o = o.withStitchKeepOut(keepOut);
        }
        if (die != null) {
            String[] wh = die.toLowerCase(java.util.Locale.ROOT).split("x");
            try {
                if (wh.length != 2) {
                    throw new NumberFormatException();
                }
                double w = Double.parseDouble(wh[0].strip()), h = Double.parseDouble(wh[1].strip());
                if (!(w > 0 && h > 0) || Double.isInfinite(w) || Double.isInfinite(h)) {
                    throw new NumberFormatException();
                }
                o = o.withDie(w, h);
            } catch (NumberFormatException e) {
                throw new InputException("--die must be WIDTHxHEIGHT in mm with positive numbers, e.g. 20x30, got '"
                        + die + "'");
            }
        }
        if (cell != null) {
            o = o.withTopCell(cell);
        }
        return o;
    }

    /**
     * The report of a study, with pictures of the moved layers and of every layer with a finding when the layout
     * is given (null for a saved study), and the histograms.
     */
    static ReportData report(ResolvedDeck d, MigrationResult result, Provenance prov, LayoutLayers l,
            List<org.apertura.report.model.Histogram> histograms) {
        ReportData bare = MigrationReports.migration(result, ReportContext.of(d, prov, List.of(), Set.of()));
        Set<String> shown = new LinkedHashSet<>(result.layers());
        bare.findings().stream().map(Finding::layer).forEach(shown::add);
        ReportContext ctx = ReportContext.of(d, prov, shown, Set.copyOf(result.layers()))
                .withGeometry(l == null ? Map.of() : LayoutImpact.select(l.polygons(), shown),
                        l == null ? Optional.empty() : Optional.ofNullable(l.extent()))
                .withHistograms(histograms);
        return MigrationReports.migration(result, ctx);
    }
}
