/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

import org.apertura.ui.WorkbenchIds;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PlatformUI;
import org.junit.jupiter.api.Test;

/** Opens the Apertura workbench as a user would and checks what its window shows. */
class WorkbenchWindowTest {

    @Test
    void windowOpensInTheStudyPerspective() throws Exception {
        Display display = PlatformUI.getWorkbench().getDisplay();
        AtomicReference<Object[]> seen = new AtomicReference<>();
        display.syncExec(() -> {
            IWorkbenchWindow window = PlatformUI.getWorkbench().getWorkbenchWindows()[0];
            IWorkbenchPage page = window.getActivePage();
            seen.set(new Object[] {window.getShell().getText(), page.getPerspective().getId(),
                    page.findView(org.eclipse.ui.IPageLayout.ID_PROJECT_EXPLORER) != null});
        });
        assertEquals(WorkbenchIds.WINDOW_TITLE, seen.get()[0]);
        assertEquals(WorkbenchIds.STUDY_PERSPECTIVE, seen.get()[1]);
        assertTrue((Boolean) seen.get()[2], "the project explorer shows the workspace");

        AtomicReference<Path> shot = new AtomicReference<>();
        display.syncExec(() -> {
            try {
                shot.set(Screenshots.save(display, "01-workbench-opened"));
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        assertNotNull(shot.get());
        assertTrue(Files.size(shot.get()) > 1000, "screenshot holds an image");
    }
}
