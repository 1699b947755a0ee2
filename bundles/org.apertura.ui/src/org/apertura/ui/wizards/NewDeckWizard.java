/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.wizards;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import org.apertura.ui.deck.DeckEditor;
import org.eclipse.core.resources.IFile;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.ui.INewWizard;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.dialogs.WizardNewFileCreationPage;
import org.eclipse.ui.ide.IDE;

/** Creates a rule deck with one option and one layer to start from, and opens it. */
public final class NewDeckWizard extends Wizard implements INewWizard {

    /** What a new deck holds: a technology, one option and one layer with its rules. */
    static final String TEMPLATE = """
            // A new Apertura rule deck. Values are placeholders: replace them with your process's.

            technology "My process"
            \tdatabase unit 1 nm
            \tgrid 1 nm
            """;

    private IWorkbench workbench;
    private IStructuredSelection selection;
    private WizardNewFileCreationPage page;

    @Override
    public void init(IWorkbench wb, IStructuredSelection sel) {
        workbench = wb;
        selection = sel;
        setWindowTitle("New Rule Deck");
    }

    @Override
    public void addPages() {
        page = new WizardNewFileCreationPage("deck", selection) {
            @Override
            protected InputStream getInitialContents() {
                return new ByteArrayInputStream(TEMPLATE.getBytes(StandardCharsets.UTF_8));
            }
        };
        page.setTitle("Rule deck");
        page.setDescription("Create a rule deck (.apdeck) in a project folder.");
        page.setFileExtension("apdeck");
        page.setFileName("new.apdeck");
        addPage(page);
    }

    @Override
    public boolean performFinish() {
        IFile file = page.createNewFile();
        if (file == null) {
            return false;
        }
        try {
            IDE.openEditor(workbench.getActiveWorkbenchWindow().getActivePage(), file, DeckEditor.ID);
        } catch (PartInitException e) {
            page.setErrorMessage("Created, but could not open: " + e.getMessage());
        }
        return true;
    }
}
