/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

import org.apertura.migrate.MigrationOptions;
import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.MigrationStudy;
import org.apertura.migrate.persist.StudyModels;
import org.apertura.migrate.persist.StudyResources;
import org.apertura.ui.WorkbenchIds;
import org.apertura.ui.run.LayoutCheck;
import org.apertura.ui.run.SavedStudies;
import org.apertura.ui.views.MigrationView;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.navigator.CommonNavigator;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A study saved by the migration API (as the headless command writes it) lies in a workspace
 * project; double-clicking it in the navigator fills the Migration view, which in the default layout
 * is tall enough to read without maximising and whose columns show their whole text.
 */
class SavedStudyTest {

    private static IProject project;
    private static IFile saved;
    private static MigrationResult result;

    @BeforeAll
    static void saveAStudy() throws Exception {
        Path samples = Ui.root().resolve("samples");
        project = Ui.project("saved-study");
        Ui.put(project, "meridian-layers.apdeck", Files.readAllBytes(samples.resolve("decks/meridian-layers.apdeck")));
        IFile deck = Ui.put(project, "meridian-mx3.apdeck",
                Files.readAllBytes(samples.resolve("decks/meridian-mx3.apdeck")));
        IFile layout = Ui.put(project, "meridian-block.gds",
                Files.readAllBytes(samples.resolve("layouts/meridian-block.gds")));
        result = MigrationStudy.run(LayoutCheck.loadDeck(deck.getLocation().toPath()), layout.getLocation().toPath(),
                "euv_se", "euv_hna", Set.of(), MigrationOptions.defaults());
        Path file = project.getLocation().toPath().resolve("meridian." + StudyResources.FILE_EXTENSION);
        StudyResources.save(StudyModels.toModel(result), file);
        saved = project.getFile(file.getFileName().toString());
        saved.refreshLocal(IResource.DEPTH_ZERO, null);
        Ui.run(() -> {
            IWorkbenchPage page = page();
            page.closeAllEditors(false);
            page.resetPerspective();
            page.getWorkbenchWindow().getShell().setBounds(Ui.display().getClientArea());
        });
    }

    private static IWorkbenchPage page() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    }

    @Test
    void doubleClickingASavedStudyInTheNavigatorFillsTheMigrationView() throws Exception {
        assertFalse(result.layers().isEmpty(), "the sample study moves some layers");
        Ui.run(() -> {
            CommonNavigator navigator = (CommonNavigator) page().showView(IPageLayout.ID_PROJECT_EXPLORER);
            navigator.getCommonViewer().expandToLevel(project, 1);
            navigator.getCommonViewer().setSelection(new StructuredSelection(saved), true);
            Tree tree = navigator.getCommonViewer().getTree();
            assertEquals(1, tree.getSelectionCount(), "the saved study is shown and selected in the navigator");
            Event e = new Event();
            e.item = tree.getSelection()[0];
            tree.notifyListeners(SWT.DefaultSelection, e);
        });
        MigrationView view = Ui.sync(() -> (MigrationView) page().findView(WorkbenchIds.MIGRATION_VIEW));
        assertNotNull(view, "opening the study brings up the Migration view");
        Ui.waitUntil("the view to show the saved study", 60,
                () -> view.getSummary().startsWith("saved study meridian.apstudy"));
        List<String> rows = Ui.sync(() -> Arrays.stream(view.getMatrix().getItems()).map(i -> i.getText(0)).toList());
        assertEquals(result.layers(), rows, "one matrix row per moved layer of the saved study");
        String cells = Ui.sync(() -> {
            StringBuilder sb = new StringBuilder();
            for (TableItem item : view.getMatrix().getItems()) {
                for (int c = 1; c < view.getMatrix().getColumnCount(); c++) {
                    sb.append(item.getText(c)).append('|');
                }
            }
            return sb.toString();
        });
        assertTrue(cells.contains("→"), "cells show old → new values: " + cells);
        assertTrue(Ui.sync(() -> view.getSummary()).contains("euv_se → euv_hna"), Ui.sync(view::getSummary));

        // the default layout, not maximised: every column as wide as its widest text, rows visible
        Ui.run(() -> {
            Table t = view.getMatrix();
            GC gc = new GC(t);
            try {
                for (int c = 0; c < t.getColumnCount(); c++) {
                    TableColumn column = t.getColumn(c);
                    int needed = gc.textExtent(column.getText()).x;
                    for (TableItem item : t.getItems()) {
                        needed = Math.max(needed, gc.textExtent(item.getText(c)).x);
                    }
                    assertTrue(column.getWidth() >= needed, "column '" + column.getText() + "' is " + column.getWidth()
                            + " px wide for text " + needed + " px wide");
                }
            } finally {
                gc.dispose();
            }
            int windowWidth = t.getShell().getClientArea().width;
            assertTrue(t.getClientArea().width > 0.8 * windowWidth, "the matrix spans the window: "
                    + t.getClientArea().width + " of " + windowWidth + " px");
            int visibleRows = (t.getClientArea().height - t.getHeaderHeight()) / t.getItemHeight();
            assertTrue(visibleRows >= rows.size(), "the matrix shows all " + rows.size() + " rows without maximising ("
                    + visibleRows + " fit)");
        });
        assertNotNull(Ui.screenshot("06-saved-study-opened-from-navigator"));
    }

    @Test
    void aFileThatIsNoStudyIsRefusedNamingTheFile() throws Exception {
        IFile bad = Ui.put(project, "broken.apstudy", "<not a study".getBytes(StandardCharsets.UTF_8));
        Path path = bad.getLocation().toPath();
        IOException e = assertThrows(IOException.class, () -> SavedStudies.read(path));
        assertTrue(e.getMessage().contains(path.toString()), e.getMessage());
    }
}
