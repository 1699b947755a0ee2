/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import java.util.Set;

import org.apertura.ui.run.MigrationJob;
import org.apertura.ui.run.RunDialog;
import org.apertura.ui.views.MigrationView;
import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.window.Window;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;

/**
 * Apertura > Run Migration Study…: asks for deck, layout and the two options, then runs the study
 * as a job over every layer whose rules or patterning differ.
 */
public final class RunMigrationHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        RunDialog dialog = new RunDialog(window.getShell(), true);
        if (dialog.open() != Window.OK) {
            return null;
        }
        new MigrationJob(dialog.deck(), dialog.layout(), dialog.from(), dialog.to(), Set.of()).schedule();
        try {
            window.getActivePage().showView(MigrationView.ID);
        } catch (PartInitException e) {
            throw new ExecutionException("Could not show the migration view", e);
        }
        return null;
    }
}
