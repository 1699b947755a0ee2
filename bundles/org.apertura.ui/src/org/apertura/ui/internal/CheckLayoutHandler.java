/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.run.CheckJob;
import org.apertura.ui.run.RunDialog;
import org.apertura.ui.views.ViolationsView;
import org.eclipse.core.commands.AbstractHandler;
import org.eclipse.core.commands.ExecutionEvent;
import org.eclipse.core.commands.ExecutionException;
import org.eclipse.jface.window.Window;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.handlers.HandlerUtil;

/** Apertura > Check Layout…: asks for deck, layout and option, then runs the check as a job. */
public final class CheckLayoutHandler extends AbstractHandler {

    @Override
    public Object execute(ExecutionEvent event) throws ExecutionException {
        IWorkbenchWindow window = HandlerUtil.getActiveWorkbenchWindowChecked(event);
        RunDialog dialog = new RunDialog(window.getShell(), false);
        if (dialog.open() != Window.OK) {
            return null;
        }
        new CheckJob(dialog.deck(), dialog.layout(), dialog.from()).schedule();
        try {
            window.getActivePage().showView(ViolationsView.ID);
        } catch (PartInitException e) {
            throw new ExecutionException("Could not show the violations view", e);
        }
        return null;
    }
}
