/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CancellationException;

import org.apertura.report.model.Finding;
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
 * Checks a layout against one option of a deck as a user job (progress in the progress view,
 * cancellable), then shows the findings in the violations view and the layout editor.
 */
public final class CheckJob extends Job {

    private final Path deck;
    private final Path layout;
    private final String option;
    private volatile List<Finding> findings;

    public CheckJob(Path deck, Path layout, String option) {
        super("Checking " + layout.getFileName() + " under " + option);
        this.deck = deck;
        this.layout = layout;
        this.option = option;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor sub = SubMonitor.convert(monitor, getName(), JobSteps.DECK_TICKS + EngineProgress.ticks());
        try {
            ResolvedDeck resolved = JobSteps.loadDeck(deck, sub);
            sub.subTask("Checking");
            findings = LayoutCheck.check(resolved, layout, option,
                    EngineProgress.options(Preferences.threads(), sub.newChild(EngineProgress.ticks())));
            ReviewSession.get().publish(new Review(layout.getFileName() + " under " + option, layout,
                    Optional.of(deck), option, Optional.empty(), findings));
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            return Status.CANCEL_STATUS;
        } catch (IOException | RuntimeException e) {
            return Status.error("Check of " + layout.getFileName() + " failed: " + e.getMessage(), e);
        }
    }

    /** The findings once the job is done; null before. */
    public List<Finding> findings() {
        return findings;
    }
}
