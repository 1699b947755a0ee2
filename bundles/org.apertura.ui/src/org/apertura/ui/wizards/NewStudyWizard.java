/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.wizards;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;

import org.apertura.ui.run.MigrationJob;
import org.apertura.ui.views.MigrationView;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.INewWizard;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.dialogs.WizardNewFileCreationPage;

/**
 * Creates a migration study file ({@code .apstudy}: deck, layout and the two options as
 * {@code key = value} lines, paths relative to the file or absolute) and runs the study.
 */
public final class NewStudyWizard extends Wizard implements INewWizard {

    private IWorkbench workbench;
    private IStructuredSelection selection;
    private WizardNewFileCreationPage filePage;
    private Inputs inputs;

    @Override
    public void init(IWorkbench wb, IStructuredSelection sel) {
        workbench = wb;
        selection = sel;
        setWindowTitle("New Migration Study");
    }

    @Override
    public void addPages() {
        inputs = new Inputs();
        addPage(inputs);
        filePage = new WizardNewFileCreationPage("file", selection) {
            @Override
            protected InputStream getInitialContents() {
                return new ByteArrayInputStream(inputs.contents().getBytes(StandardCharsets.UTF_8));
            }
        };
        filePage.setTitle("Study file");
        filePage.setDescription("Where to keep the study's settings.");
        filePage.setFileExtension("apstudy");
        filePage.setFileName("migration.apstudy");
        addPage(filePage);
    }

    @Override
    public boolean performFinish() {
        if (filePage.createNewFile() == null) {
            return false;
        }
        new MigrationJob(Path.of(inputs.deck.getText().strip()), Path.of(inputs.layout.getText().strip()),
                inputs.from.getText().strip(), inputs.to.getText().strip(), Set.of()).schedule();
        try {
            workbench.getActiveWorkbenchWindow().getActivePage().showView(MigrationView.ID);
        } catch (PartInitException e) {
            return true;
        }
        return true;
    }

    /** Deck, layout and options. */
    private static final class Inputs extends WizardPage {
        Text deck;
        Text layout;
        Text from;
        Text to;

        Inputs() {
            super("inputs", "Migration study", null);
            setDescription("The deck, the layout and the move from one lithography option to another.");
        }

        @Override
        public void createControl(Composite parent) {
            Composite c = new Composite(parent, SWT.NONE);
            c.setLayout(new GridLayout(2, false));
            deck = row(c, "Deck file:");
            layout = row(c, "Layout file (GDSII):");
            from = row(c, "From option:");
            to = row(c, "To option:");
            setControl(c);
            setPageComplete(false);
        }

        private Text row(Composite c, String label) {
            new Label(c, SWT.NONE).setText(label);
            Text t = new Text(c, SWT.BORDER);
            t.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
            t.addListener(SWT.Modify, e -> validate());
            return t;
        }

        private void validate() {
            String error = null;
            if (!Files.isRegularFile(Path.of(deck.getText().strip()))) {
                error = "Give an existing deck file.";
            } else if (!Files.isRegularFile(Path.of(layout.getText().strip()))) {
                error = "Give an existing layout file.";
            } else if (from.getText().isBlank() || to.getText().isBlank()) {
                error = "Name the two options.";
            }
            setErrorMessage(error);
            setPageComplete(error == null);
        }

        String contents() {
            return "# Apertura migration study\n" + "deck = " + deck.getText().strip() + "\n" + "layout = "
                    + layout.getText().strip() + "\n" + "from = " + from.getText().strip() + "\n" + "to = "
                    + to.getText().strip() + "\n";
        }
    }
}
