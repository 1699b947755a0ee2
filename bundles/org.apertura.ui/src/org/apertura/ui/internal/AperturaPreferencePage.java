/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.viewer.Palette;
import org.eclipse.jface.preference.ComboFieldEditor;
import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.jface.preference.IntegerFieldEditor;
import org.eclipse.jface.preference.StringFieldEditor;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;

/** Preferences of the Apertura workbench: palette, threads, default options, reviewer name. */
public final class AperturaPreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    public AperturaPreferencePage() {
        super(GRID);
        setDescription("Settings for checks, migrations and the layout viewer.");
    }

    @Override
    public void init(IWorkbench workbench) {
        setPreferenceStore(Preferences.store());
    }

    @Override
    protected void createFieldEditors() {
        String[][] palettes = new String[Palette.ALL.size()][];
        for (int i = 0; i < palettes.length; i++) {
            palettes[i] = new String[] {Palette.ALL.get(i).name(), Palette.ALL.get(i).name()};
        }
        addField(new ComboFieldEditor(Preferences.PALETTE, "Layout viewer &palette:", palettes, getFieldEditorParent()));
        IntegerFieldEditor threads = new IntegerFieldEditor(Preferences.THREADS,
                "Engine &threads (0 = one per processor):", getFieldEditorParent());
        threads.setValidRange(0, 1024);
        addField(threads);
        addField(new StringFieldEditor(Preferences.SOURCE_OPTION, "Default &source option:", getFieldEditorParent()));
        addField(new StringFieldEditor(Preferences.TARGET_OPTION, "Default t&arget option:", getFieldEditorParent()));
        addField(new StringFieldEditor(Preferences.REVIEWER, "&Reviewer name for waivers:", getFieldEditorParent()));
    }

    @Override
    public boolean performOk() {
        boolean ok = super.performOk();
        try {
            ((org.eclipse.ui.preferences.ScopedPreferenceStore) Preferences.store()).save();
        } catch (java.io.IOException e) {
            setErrorMessage("Could not save the preferences: " + e.getMessage());
            return false;
        }
        return ok;
    }
}
