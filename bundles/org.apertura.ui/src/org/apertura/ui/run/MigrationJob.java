/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.CancellationException;

import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.ui.findings.Review;
import org.apertura.ui.findings.ReviewSession;
import org.apertura.ui.internal.Preferences;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;

/**
 * Runs a migration study as a user job (progress, cancel) and publishes it to the migration view,
 * its layout findings (new, fixed, persisting) to the violations view.
 */
public final class MigrationJob extends Job {

    private final Path deck;
    private final Path layout;
    private final String from;
    private final String to;
    private final Set<String> layers;
    private volatile MigrationResult result;

    /**
     * @param layers the layers to move; empty for every layer whose rules or patterning differ
     */
    public MigrationJob(Path deck, Path layout, String from, String to, Set<String> layers) {
        super("Migrating " + layout.getFileName() + " from " + from + " to " + to);
        this.deck = deck;
        this.layout = layout;
        this.from = from;
        this.to = to;
        this.layers = Set.copyOf(layers);
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor sub = SubMonitor.convert(monitor, getName(), JobSteps.DECK_TICKS + EngineProgress.ticks());
        try {
            ResolvedDeck resolved = JobSteps.loadDeck(deck, sub);
            sub.subTask("Analysing");
            MigrationOptions opts = MigrationOptions.defaults()
                    .withEngine(EngineProgress.options(Preferences.threads(), sub.newChild(EngineProgress.ticks())));
            MigrationResult r = MigrationStudy.run(resolved, layout, from, to, layers, opts);
            result = r;
            StudySession.get().publish(new StudySession.Study(r, deck, layout));
            ReviewSession.get().publish(new Review(layout.getFileName() + ": " + from + " → " + to, layout,
                    Optional.of(deck), from, Optional.of(to), LayoutCheck.findings(r.impact(), resolved.databaseUnitNanometres().doubleValue())));
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            return Status.CANCEL_STATUS;
        } catch (IOException | RuntimeException e) {
            return Status.error("Migration of " + layout.getFileName() + " failed: " + e.getMessage(), e);
        }
    }

    /** The study once the job is done; null before. */
    public MigrationResult result() {
        return result;
    }
}
