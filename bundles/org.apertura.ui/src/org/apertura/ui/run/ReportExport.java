/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.OptionalInt;
import java.util.Set;
import java.util.TreeSet;

import org.apertura.migrate.MigrationResult;
import org.apertura.report.migration.MigrationReports;
import org.apertura.report.migration.ReportContext;
import org.apertura.report.model.Finding;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.LayerInfo;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ReportKind;
import org.apertura.report.write.ReportFormat;
import org.apertura.report.write.ReportSet;
import org.apertura.ui.findings.Review;

/**
 * Writes the current review through the report writers (HTML, JSON, CSV, SARIF) into a folder, with
 * the hashes of deck and layout. When the review is the migration study the workbench shows, the
 * report is the report bundle's full migration report (matrix, headroom, masks, field) with the
 * review's findings and waivers; otherwise it holds the findings and waivers of the check.
 */
public final class ReportExport {

    /** The tool version recorded in reports written from the workbench. */
    public static final String TOOL_VERSION = "0.1.0";

    private ReportExport() {
    }

    /** The report data of a review. */
    public static ReportData data(Review review) throws IOException {
        List<InputFile> inputs = new ArrayList<>();
        if (review.deck().isPresent()) {
            inputs.add(InputFile.hash("deck", review.deck().get()));
        }
        inputs.add(InputFile.hash("layout", review.layout()));
        List<String> command = new ArrayList<>(List.of("apertura-workbench", "export", review.layout().toString(),
                review.sourceOption()));
        review.targetOption().ifPresent(command::add);
        Provenance p = new Provenance(TOOL_VERSION, Instant.now(), command, inputs, review.sourceOption(),
                review.targetOption());
        java.util.Optional<StudySession.Study> study = StudySession.get().current()
                .filter(st -> st.layout().equals(review.layout()) && review.targetOption().isPresent()
                        && st.result().to().equals(review.targetOption().get()));
        if (study.isPresent() && review.deck().isPresent()) {
            org.apertura.rules.resolved.ResolvedDeck deck = LayoutCheck.loadDeck(review.deck().get());
            MigrationResult r = study.get().result();
            ReportContext context = ReportContext.of(deck, p, deck.layersByName().keySet(), Set.copyOf(r.layers()));
            ReportData full = MigrationReports.migration(r, context);
            return full.withFindings(review.findings(), full.staleWaivers());
        }
        ReportKind kind = review.targetOption().isPresent() ? ReportKind.MIGRATION : ReportKind.CHECK;
        ReportData.Builder b = ReportData.builder(kind, review.title(), p);
        Set<String> layers = new TreeSet<>();
        for (Finding f : review.findings()) {
            layers.add(f.layer());
        }
        for (String l : layers) {
            b.layer(new LayerInfo(l, OptionalInt.empty(), OptionalInt.empty(), review.targetOption().isPresent()));
        }
        b.findings(review.findings());
        return b.build();
    }

    /**
     * Writes every format into {@code folder} (atomically, by the report writers).
     *
     * @return the files written, relative to the folder
     */
    public static List<String> write(Review review, Path folder) throws IOException {
        return ReportSet.write(folder, data(review), EnumSet.allOf(ReportFormat.class));
    }
}
