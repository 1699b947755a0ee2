/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.SummaryTable;
import org.apertura.migrate.model.Study;
import org.apertura.migrate.persist.StudyResources;
import org.apertura.report.migration.SavedStudy;
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

/** {@code apertura render}: reports from a saved study result. */
@Command(name = "render", header = "Reports from a saved study result (.apstudy).",
        sortOptions = false, usageHelpAutoWidth = true, mixinStandardHelpOptions = true,
        description = {"Write the reports of a saved migration study (the study.apstudy a migrate run leaves in its "
                + "output folder) again, e.g. in other formats or with the current waivers, without running the "
                + "analysis again.",
            "The deck gives the database unit, the layer numbers and the default waiver file; it must be the deck "
                + "the study was made with. A saved study keeps no shapes, so the reports have no layout pictures; "
                + "findings keep their marker boxes and fingerprints."},
        footer = {"", "Examples (from the repository root):",
            "  apertura render samples/decks/meridian-mx3.apdeck \\",
            "      apertura-out/migrate-meridian-block-euv_le2-euv_hna/study.apstudy \\",
            "      --format sarif --out review/sarif",
            "", "Exit codes: 0 no open breaks, 1 new violations not waived, 2 usage or input error, 3 internal error."})
public final class RenderCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DECK", description = "The rule deck the study was made with.")
    Path deck;

    @Parameters(index = "1", paramLabel = "STUDY", description = "The saved study (." + StudyResources.FILE_EXTENSION + ").")
    Path study;

    @Option(names = {"-q", "--quiet"}, description = "Print no warnings on standard error.")
    boolean quiet;

    @Mixin
    ReportOptions reports;

    @Mixin
    WaiverOptions waiverOptions;

    @Override
    public Integer call() throws InputException, IOException {
        Run r = Run.of(spec);
        Set<ReportFormat> formats = reports.formats();
        Path folder = reports.folder("render-" + studyName(study));
        ResolvedDeck d = Inputs.deck(deck, r.warnings(quiet));
        Inputs.requireFile(study, "study");
        Study s;
        try {
            s = StudyResources.load(study);
        } catch (IOException e) {
            throw new InputException(Inputs.oneLine(String.valueOf(e.getMessage())), e);
        }
        MigrationResult result;
        try {
            result = SavedStudy.toResult(s);
        } catch (IllegalArgumentException | NullPointerException e) {
            throw new InputException(study + ": not a complete study result: " + e.getMessage(), e);
        }
        if (!result.technology().equals(d.technology())) {
            throw new InputException(deck + ": deck '" + d.technology() + "' is not the deck of the study ('"
                    + result.technology() + "')");
        }
        Inputs.option(deck, d, result.from());
        Inputs.option(deck, d, result.to());
        Inputs.WaiverInput waivers = waiverOptions.read(deck);
        Provenance prov = new Provenance(r.version(), Instant.now(), r.args(),
                Inputs.hashes(waivers, "deck", deck, "study", study), result.from(), Optional.of(result.to()));
        ReportData data = MigrateCommand.report(d, result, prov, null, List.of());
        data = Waivers.apply(data, waivers.waivers());
        String summary = Summaries.migration(SummaryTable.render(result), data, waivers);
        List<String> files = Outputs.write(folder, data, formats, summary, Map.of());
        Outputs.announce(r, summary, folder, files);
        return MigrateCommand.hasOpenBreaks(data) ? 1 : 0;
    }

    /** The study's folder name when the file is the {@value MigrateCommand#STUDY_FILE} of a run, else its stem. */
    private static String studyName(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        if (abs.getFileName() != null && abs.getFileName().toString().equals(MigrateCommand.STUDY_FILE)
                && abs.getParent() != null && abs.getParent().getFileName() != null) {
            return abs.getParent().getFileName().toString();
        }
        return Outputs.stem(p);
    }
}
