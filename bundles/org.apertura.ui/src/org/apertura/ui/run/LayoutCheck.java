/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.migrate.check.EngineRules;
import org.apertura.migrate.check.RuleSet;
import org.apertura.migrate.impact.LayoutImpact;
import org.apertura.migrate.impact.ViolationChange;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.report.migration.MigrationReports;

/** Plain-Java steps the workbench's jobs run: load a deck, check a layout, convert results. */
public final class LayoutCheck {

    private LayoutCheck() {
    }

    /**
     * Loads and resolves a deck.
     *
     * @throws IOException naming the file and the first error when the deck has errors
     */
    public static ResolvedDeck loadDeck(Path deck) throws IOException {
        DeckLoadResult r = new DeckLoader().load(deck);
        if (r.hasErrors() || r.deck().isEmpty()) {
            String first = r.errors().isEmpty() ? "it could not be resolved" : r.errors().get(0).toString();
            throw new IOException(deck + " has " + r.errors().size() + " error(s); first: " + first);
        }
        return r.deck().get();
    }

    /**
     * Checks every layer of a layout that the deck gives rules under an option.
     *
     * @return the findings, status {@link FindingStatus#OPEN}, in the engine's order, converted by the
     *         report bundle ({@link MigrationReports#finding}) so that they match the headless reports
     */
    public static List<Finding> check(ResolvedDeck deck, Path layout, String option, CheckOptions engineOptions)
            throws IOException {
        LayoutLayers layers = LayoutLayers.read(layout, deck, Optional.empty());
        RuleSet rules = EngineRules.of(deck, option, deck.layersByName().keySet());
        CheckEngine engine = new CheckEngine(engineOptions);
        List<Violation> found = new ArrayList<>(
                engine.check(LayoutImpact.select(layers.polygons(), rules.layers()), rules.rules()));
        found.sort(Violation.ORDER);
        double nm = deck.databaseUnitNanometres().doubleValue();
        List<Finding> out = new ArrayList<>(found.size());
        for (Violation v : found) {
            // the report bundle's conversion, so that fingerprints and waivers agree with the headless command
            out.add(MigrationReports.finding(v, rules.ref(v.ruleId()), FindingStatus.OPEN, nm));
        }
        return out;
    }

    /** Findings for a migration's layout impact: new, fixed and persisting places. */
    public static List<Finding> findings(LayoutImpact impact, double nmPerDbu) {
        List<Finding> out = new ArrayList<>();
        for (ViolationChange c : impact.changes()) {
            out.add(MigrationReports.finding(c, nmPerDbu));
        }
        return out;
    }
}
