/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.eclipse.jface.action.GroupMarker;
import org.eclipse.jface.action.IMenuManager;
import org.eclipse.jface.action.MenuManager;
import org.eclipse.jface.action.Separator;
import org.eclipse.ui.IWorkbenchActionConstants;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.actions.ActionFactory.IWorkbenchAction;
import org.eclipse.ui.application.ActionBarAdvisor;
import org.eclipse.ui.application.IActionBarConfigurer;

/** The window's menus: file handling, the window's views and preferences, and help. */
final class AperturaActionBarAdvisor extends ActionBarAdvisor {

    private IWorkbenchAction newWizard;
    private IWorkbenchAction save;
    private IWorkbenchAction saveAll;
    private IWorkbenchAction quit;
    private IWorkbenchAction preferences;
    private IWorkbenchAction resetPerspective;
    private IWorkbenchAction about;

    AperturaActionBarAdvisor(IActionBarConfigurer configurer) {
        super(configurer);
    }

    @Override
    protected void makeActions(IWorkbenchWindow window) {
        newWizard = register(ActionFactory.NEW_WIZARD_DROP_DOWN.create(window));
        save = register(ActionFactory.SAVE.create(window));
        saveAll = register(ActionFactory.SAVE_ALL.create(window));
        quit = register(ActionFactory.QUIT.create(window));
        preferences = register(ActionFactory.PREFERENCES.create(window));
        resetPerspective = register(ActionFactory.RESET_PERSPECTIVE.create(window));
        about = register(ActionFactory.ABOUT.create(window));
    }

    private IWorkbenchAction register(IWorkbenchAction action) {
        super.register(action);
        return action;
    }

    @Override
    protected void fillMenuBar(IMenuManager menuBar) {
        MenuManager file = new MenuManager("&File", IWorkbenchActionConstants.M_FILE);
        file.add(newWizard);
        file.add(new GroupMarker(IWorkbenchActionConstants.NEW_EXT));
        file.add(new Separator());
        file.add(save);
        file.add(saveAll);
        file.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        file.add(new Separator());
        file.add(quit);

        MenuManager window = new MenuManager("&Window", IWorkbenchActionConstants.M_WINDOW);
        window.add(resetPerspective);
        window.add(new Separator());
        window.add(preferences);

        MenuManager help = new MenuManager("&Help", IWorkbenchActionConstants.M_HELP);
        help.add(about);

        menuBar.add(file);
        menuBar.add(new GroupMarker(IWorkbenchActionConstants.MB_ADDITIONS));
        menuBar.add(window);
        menuBar.add(help);
    }
}
