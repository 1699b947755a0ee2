/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.persist.StudyResources;
import org.apertura.report.migration.SavedStudy;
import org.apertura.ui.run.StudySession.Study;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;

/**
 * Reading a saved study ({@code *.apstudy}, written by the headless command or a run) back into the
 * workbench: the EMF results model is loaded and turned into a {@link MigrationResult} by the same
 * code the reports use, then published to the {@link StudySession} so the Migration view shows it.
 */
public final class SavedStudies {

    private SavedStudies() {
    }

    /**
     * Reads a saved study.
     *
     * @throws IOException when the file is not a study result (the message names the file and, for
     *                     XML errors, the line and column), or holds a value this version does not know
     */
    public static Study read(Path file) throws IOException {
        org.apertura.migrate.model.Study model = StudyResources.load(file);
        MigrationResult result;
        try {
            result = SavedStudy.toResult(model);
        } catch (IllegalArgumentException e) {
            throw new IOException(file + ": " + e.getMessage(), e);
        }
        String layout = model.getLayout() == null || model.getLayout().isBlank() ? file.getFileName().toString()
                : model.getLayout();
        return new Study(result, Optional.empty(), Path.of(layout), Optional.of(file));
    }

    /** A job that reads the saved study and publishes it; its result names the file on failure. */
    public static Job open(Path file) {
        Job job = new Job("Opening saved study " + file.getFileName()) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                try {
                    StudySession.get().publish(read(file));
                    return Status.OK_STATUS;
                } catch (IOException | RuntimeException e) {
                    return Status.error("Cannot open " + file + ": " + e.getMessage(), e);
                }
            }
        };
        job.setUser(true);
        return job;
    }
}
