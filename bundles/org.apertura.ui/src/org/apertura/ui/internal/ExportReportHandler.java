/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.apertura.ui.findings.Review;
import org.apertura.ui.findings.ReviewSession;
import org.apertura.ui.run.ReportExport;
import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.DirectoryDialog;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.handlers.HandlerUtil;

/** Apertura > Export Report…: writes the current review as HTML, JSON, CSV and SARIF into a folder. */
public final class ExportReportHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        Optional<Review> review = ReviewSession.get().current();
        if (review.isEmpty()) {
            MessageDialog.openInformation(window.getShell(), "Export report",
                    "There is nothing to export yet: run a check or a migration study first.");
            return null;
        }
        DirectoryDialog dialog = new DirectoryDialog(window.getShell());
        dialog.setMessage("Folder for the report (HTML, JSON, CSV, SARIF)");
        String folder = dialog.open();
        if (folder == null) {
            return null;
        }
        Job job = Job.create("Writing report to " + folder, m -> {
            try {
                List<String> files = ReportExport.write(review.get(), Path.of(folder));
                return Status.info("Wrote " + String.join(", ", files));
            } catch (IOException | RuntimeException e) {
                return Status.error("Could not write the report: " + e.getMessage(), e);
            }
        });
        job.setUser(true);
        job.schedule();
        return null;
    }
}
