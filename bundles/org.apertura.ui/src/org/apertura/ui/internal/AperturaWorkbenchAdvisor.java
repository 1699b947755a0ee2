/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.WorkbenchIds;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.IAdaptable;
import org.eclipse.swt.graphics.Point;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;
import org.eclipse.ui.application.IWorkbenchConfigurer;
import org.eclipse.ui.application.IWorkbenchWindowConfigurer;
import org.eclipse.ui.application.WorkbenchAdvisor;
import org.eclipse.ui.application.WorkbenchWindowAdvisor;
import org.eclipse.ui.ide.IDE;

/** Opens windows in the study perspective with the workspace as their input. */
final class AperturaWorkbenchAdvisor extends WorkbenchAdvisor {

    @Override
    public void initialize(IWorkbenchConfigurer configurer) {
        super.initialize(configurer);
        configurer.setSaveAndRestore(true);
        // The project explorer needs the IDE's adapters for workspace resources.
        IDE.registerAdapters();
    }

    @Override
    public void postStartup() {
        super.postStartup();
        // setting up the deck language takes a moment: do it before the first deck editor needs it
        org.eclipse.core.runtime.jobs.Job warm = org.eclipse.core.runtime.jobs.Job.create("Preparing the deck language",
                m -> {
                    org.apertura.ui.deck.DeckLanguage.get();
                    return org.eclipse.core.runtime.Status.OK_STATUS;
                });
        warm.setSystem(true);
        warm.schedule();
    }

    @Override
    public String getInitialWindowPerspectiveId() {
        return WorkbenchIds.STUDY_PERSPECTIVE;
    }

    @Override
    public IAdaptable getDefaultPageInput() {
        return ResourcesPlugin.getWorkspace().getRoot();
    }

    @Override
    public WorkbenchWindowAdvisor createWorkbenchWindowAdvisor(IWorkbenchWindowConfigurer configurer) {
        return new WorkbenchWindowAdvisor(configurer) {
            @Override
            public ActionBarAdvisor createActionBarAdvisor(IActionBarConfigurer actionBars) {
                return new AperturaActionBarAdvisor(actionBars);
            }

            @Override
            public void preWindowOpen() {
                IWorkbenchWindowConfigurer c = getWindowConfigurer();
                c.setTitle(WorkbenchIds.WINDOW_TITLE);
                c.setInitialSize(new Point(1280, 800));
                c.setShowStatusLine(true);
                c.setShowProgressIndicator(true);
            }
        };
    }
}
