/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.internal;

import org.apertura.ui.WorkbenchIds;
import org.eclipse.ui.IFolderLayout;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IPerspectiveFactory;

/**
 * The migration-study perspective: in the upper half the workspace's decks, layouts and saved results
 * on the left, editors in the middle, the outline on the right; across the whole lower half the
 * violations, the migration review and the problems.
 */
public final class StudyPerspective implements IPerspectiveFactory {

    @Override
    public void createInitialLayout(IPageLayout layout) {
        String editors = layout.getEditorArea();
        // the review panels come first so that they span the whole window width and take half its height:
        // the migration matrix has a column per rule and needs both to be read without maximising the view
        IFolderLayout bottom = layout.createFolder("org.apertura.ui.perspective.bottom", IPageLayout.BOTTOM, 0.5f,
                editors);
        layout.addView(IPageLayout.ID_PROJECT_EXPLORER, IPageLayout.LEFT, 0.22f, editors);
        layout.addView(IPageLayout.ID_OUTLINE, IPageLayout.RIGHT, 0.78f, editors);
        bottom.addView(WorkbenchIds.VIOLATIONS_VIEW);
        bottom.addView(WorkbenchIds.MIGRATION_VIEW);
        bottom.addView(IPageLayout.ID_PROBLEM_VIEW);
        bottom.addPlaceholder(IPageLayout.ID_PROGRESS_VIEW);
        layout.addShowViewShortcut(WorkbenchIds.VIOLATIONS_VIEW);
        layout.addShowViewShortcut(WorkbenchIds.MIGRATION_VIEW);
        layout.addShowViewShortcut(IPageLayout.ID_PROBLEM_VIEW);
        layout.addShowViewShortcut(IPageLayout.ID_PROGRESS_VIEW);
    }
}
