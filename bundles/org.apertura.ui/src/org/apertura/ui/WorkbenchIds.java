/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui;

/** Identifiers the workbench contributes, for tests and other bundles. */
public final class WorkbenchIds {

    /** The perspective a new window opens with. */
    public static final String STUDY_PERSPECTIVE = "org.apertura.ui.perspective.study";

    /** The violations view. */
    public static final String VIOLATIONS_VIEW = "org.apertura.ui.view.violations";

    /** The migration review view. */
    public static final String MIGRATION_VIEW = "org.apertura.ui.view.migration";

    /** The layout viewer editor (GDSII files). */
    public static final String LAYOUT_EDITOR = "org.apertura.ui.editor.layout";

    /** The deck editor ({@code .apdeck} files). */
    public static final String DECK_EDITOR = "org.apertura.ui.editor.deck";

    /** The launcher that opens saved studies ({@code .apstudy} files) in the migration view. */
    public static final String SAVED_STUDY_EDITOR = "org.apertura.ui.editor.savedStudy";

    /** Title of every Apertura workbench window. */
    public static final String WINDOW_TITLE = "Apertura";

    private WorkbenchIds() {
    }
}
