/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui;

/** Identifiers the workbench contributes, for tests and other bundles. */
public final class WorkbenchIds {

    /** The perspective a new window opens with. */
    public static final String STUDY_PERSPECTIVE = "org.apertura.ui.perspective.study";

    /** Title of every Apertura workbench window. */
    public static final String WINDOW_TITLE = "Apertura";

    private WorkbenchIds() {
    }
}
