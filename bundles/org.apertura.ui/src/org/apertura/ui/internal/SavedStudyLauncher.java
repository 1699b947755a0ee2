/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.WorkbenchIds;
import org.apertura.ui.run.SavedStudies;
import org.eclipse.core.runtime.IPath;
import org.eclipse.ui.IEditorLauncher;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;

/**
 * Opening a saved study ({@code *.apstudy}) from the navigator: brings up the Migration view and
 * reads the study in a job; the view fills when the job publishes it. Registered in plugin.xml as
 * the launcher of the extension, so double-click and Open both land here.
 */
public final class SavedStudyLauncher implements IEditorLauncher {

    @Override
    public void open(IPath file) {
        IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
        IWorkbenchPage page = window == null ? null : window.getActivePage();
        if (page != null) {
            try {
                page.showView(WorkbenchIds.MIGRATION_VIEW);
            } catch (PartInitException e) {
                // the study is still published; the view shows it whenever it is opened
            }
        }
        SavedStudies.open(file.toPath()).schedule();
    }
}
