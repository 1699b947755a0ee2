/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.ui.internal.Preferences;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.dialogs.TitleAreaDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;

/**
 * Asks for a deck, a layout and the options of a check (one option) or a migration study (source and
 * target). Deck and layout files are offered from the workspace and can be browsed for; the deck's
 * options are read in a background job when a deck is chosen.
 */
public final class RunDialog extends TitleAreaDialog {

    private final boolean migration;
    private Combo deck;
    private Combo layout;
    private Combo from;
    private Combo to;
    private Path chosenDeck;
    private Path chosenLayout;
    private String chosenFrom;
    private String chosenTo;

    /** @param migration true for a migration study (two options), false for a check (one option) */
    public RunDialog(Shell parent, boolean migration) {
        super(parent);
        this.migration = migration;
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        setTitle(migration ? "Run a migration study" : "Check a layout");
        setMessage(migration ? "Move the layers of a layout from one lithography option to another."
                : "Check every layer of a layout against one option of a deck.");
        Composite c = new Composite(area, SWT.NONE);
        c.setLayout(new GridLayout(3, false));
        c.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        deck = fileRow(c, "&Deck:", "*.apdeck", workspaceFiles("apdeck"));
        layout = fileRow(c, "&Layout:", "*.gds;*.gds2;*.gdsii", workspaceFiles("gds"));
        from = optionRow(c, migration ? "&From option:" : "&Option:");
        to = migration ? optionRow(c, "&To option:") : null;
        deck.addListener(SWT.Modify, e -> readOptions());
        readOptions();
        return area;
    }

    private Combo fileRow(Composite c, String label, String filter, List<String> offered) {
        new Label(c, SWT.NONE).setText(label);
        Combo combo = new Combo(c, SWT.DROP_DOWN);
        combo.setItems(offered.toArray(String[]::new));
        if (!offered.isEmpty()) {
            combo.select(0);
        }
        GridData d = new GridData(SWT.FILL, SWT.CENTER, true, false);
        d.widthHint = 420;
        combo.setLayoutData(d);
        Button browse = new Button(c, SWT.PUSH);
        browse.setText("Browse…");
        browse.addListener(SWT.Selection, e -> {
            FileDialog fd = new FileDialog(getShell(), SWT.OPEN);
            fd.setFilterExtensions(new String[] {filter, "*.*"});
            String f = fd.open();
            if (f != null) {
                combo.setText(f);
            }
        });
        return combo;
    }

    private Combo optionRow(Composite c, String label) {
        new Label(c, SWT.NONE).setText(label);
        Combo combo = new Combo(c, SWT.READ_ONLY);
        combo.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        return combo;
    }

    /** Files of the workspace with an extension, as absolute paths. */
    static List<String> workspaceFiles(String extension) {
        List<String> out = new ArrayList<>();
        try {
            ResourcesPlugin.getWorkspace().getRoot().accept(r -> {
                if (r.getType() == IResource.FILE && extension.equalsIgnoreCase(r.getFileExtension())
                        && r.getLocation() != null) {
                    out.add(((IFile) r).getLocation().toOSString());
                }
                return true;
            });
        } catch (CoreException e) {
            // an unreadable workspace offers nothing; the user can still browse
        }
        return out;
    }

    private void readOptions() {
        String text = deck.getText().strip();
        if (text.isEmpty() || !Files.isRegularFile(Path.of(text))) {
            setErrorMessage(text.isEmpty() ? null : "No deck file at " + text);
            return;
        }
        Path file = Path.of(text);
        Job.create("Reading options of " + file.getFileName(), m -> {
            try {
                ResolvedDeck d = LayoutCheck.loadDeck(file);
                List<String> names = d.options().stream().map(LithographyOption::name).toList();
                getShell().getDisplay().asyncExec(() -> optionsRead(text, names, null));
            } catch (IOException | RuntimeException e) {
                getShell().getDisplay().asyncExec(() -> optionsRead(text, List.of(), e.getMessage()));
            }
            return Status.OK_STATUS;
        }).schedule();
    }

    private void optionsRead(String forDeck, List<String> names, String error) {
        if (deck.isDisposed() || !deck.getText().strip().equals(forDeck)) {
            return;
        }
        setErrorMessage(error);
        String[] items = names.toArray(String[]::new);
        from.setItems(items);
        select(from, Preferences.store().getString(Preferences.SOURCE_OPTION), 0);
        if (to != null) {
            to.setItems(items);
            select(to, Preferences.store().getString(Preferences.TARGET_OPTION), items.length - 1);
        }
    }

    private static void select(Combo c, String preferred, int fallback) {
        int at = c.indexOf(preferred);
        c.select(at >= 0 ? at : Math.max(0, fallback));
    }

    @Override
    protected void okPressed() {
        if (from.getText().isEmpty() || (to != null && to.getText().isEmpty())) {
            setErrorMessage("Choose a deck whose options can be read, and the option(s).");
            return;
        }
        Path l = Path.of(layout.getText().strip());
        if (!Files.isRegularFile(l)) {
            setErrorMessage("No layout file at " + l);
            return;
        }
        chosenDeck = Path.of(deck.getText().strip());
        chosenLayout = l;
        chosenFrom = from.getText();
        chosenTo = to == null ? null : to.getText();
        super.okPressed();
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, IDialogConstants.OK_ID, migration ? "Run" : "Check", true);
        createButton(parent, IDialogConstants.CANCEL_ID, IDialogConstants.CANCEL_LABEL, false);
    }

    public Path deck() {
        return chosenDeck;
    }

    public Path layout() {
        return chosenLayout;
    }

    public String from() {
        return chosenFrom;
    }

    public String to() {
        return chosenTo;
    }
}
