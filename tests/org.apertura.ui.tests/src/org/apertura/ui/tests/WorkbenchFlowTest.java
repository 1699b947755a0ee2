/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Set;

import org.apertura.engine.geom.Box;
import org.apertura.report.model.Finding;
import org.apertura.ui.WorkbenchIds;
import org.apertura.ui.deck.DeckEditor;
import org.apertura.ui.findings.Findings;
import org.apertura.ui.findings.ReviewSession;
import org.apertura.ui.layout.LayoutEditor;
import org.apertura.ui.run.CheckJob;
import org.apertura.ui.run.MigrationJob;
import org.apertura.ui.viewer.LayoutCanvas;
import org.apertura.ui.viewer.View;
import org.apertura.ui.views.MigrationView;
import org.apertura.ui.views.ViolationsView;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IMarker;
import org.eclipse.core.resources.IProject;
import org.eclipse.core.resources.IResource;
import org.eclipse.jface.text.source.Annotation;
import org.eclipse.jface.text.source.IAnnotationModel;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Table;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IPageLayout;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.ide.IDE;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestMethodOrder;

/**
 * What a user does with the sample scenario (samples/decks, samples/layouts): open the sample deck
 * with an error put in and see its marker; run the sample migration and see the matrix filled;
 * check the layout, double-click a violation and see the viewer move to it. Each step saves a
 * screenshot into target/screenshots.
 */
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class WorkbenchFlowTest {

    private static final String SOURCE = "euv_se";
    private static final String TARGET = "euv_hna";

    private static IProject project;
    private static IFile deck;
    private static IFile layout;

    @BeforeAll
    static void copySamples() throws Exception {
        Path samples = Ui.root().resolve("samples");
        project = Ui.project("meridian");
        Ui.put(project, "meridian-layers.apdeck", Files.readAllBytes(samples.resolve("decks/meridian-layers.apdeck")));
        deck = Ui.put(project, "meridian-mx3.apdeck", Files.readAllBytes(samples.resolve("decks/meridian-mx3.apdeck")));
        layout = Ui.put(project, "meridian-block.gds", Files.readAllBytes(samples.resolve("layouts/meridian-block.gds")));
        Ui.run(() -> {
            IWorkbenchPage page = page();
            page.resetPerspective();
            // no window manager under Xvfb: give the window the whole screen by hand
            page.getWorkbenchWindow().getShell().setBounds(Ui.display().getClientArea());
        });
    }

    private static IWorkbenchPage page() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    }

    @Test
    @Order(1)
    void deckWithAnInjectedErrorShowsAMarkerInTheEditorAndTheProblemsView() throws Exception {
        String text = Files.readString(deck.getLocation().toPath());
        String anchor = "on CT {\n\twidth 16 nm";
        assertTrue(text.contains(anchor), "the sample deck still has the CT block this test edits");
        // a zero spacing is never valid (issue: non-positive value)
        String broken = text.replace(anchor, anchor + "\n\tspacing 0 nm");
        int injectedLine = (int) broken.substring(0, broken.indexOf("spacing 0 nm")).chars().filter(c -> c == '\n').count()
                + 1;
        IFile file = Ui.put(project, "broken.apdeck", broken.getBytes(StandardCharsets.UTF_8));

        IEditorPart editor = Ui.sync(() -> IDE.openEditor(page(), file, WorkbenchIds.DECK_EDITOR));
        assertTrue(editor instanceof DeckEditor, "the deck opens in the deck editor");
        Ui.waitUntil("an error marker on broken.apdeck", 120,
                () -> errorMarkers(file).stream().anyMatch(m -> m.getAttribute(IMarker.LINE_NUMBER, -1) == injectedLine));
        Ui.run(() -> page().showView(IPageLayout.ID_PROBLEM_VIEW));
        // the editor's annotation model carries the marker as an error annotation (ruler and squiggle)
        Ui.waitUntil("an error annotation in the editor", 30, () -> {
            DeckEditor d = (DeckEditor) editor;
            IAnnotationModel model = d.getDocumentProvider().getAnnotationModel(d.getEditorInput());
            for (Iterator<Annotation> it = model.getAnnotationIterator(); it.hasNext();) {
                if (it.next().getType().endsWith(".error")) {
                    return true;
                }
            }
            return false;
        });
        Ui.run(() -> ((DeckEditor) editor).selectAndReveal(broken.indexOf("spacing 0 nm"), 12));
        assertNotNull(Ui.screenshot("02-deck-editor-error-marker"));

        // the untouched sample deck validates without errors
        IEditorPart clean = Ui.sync(() -> IDE.openEditor(page(), deck, WorkbenchIds.DECK_EDITOR));
        Ui.waitUntil("validation of the sample deck", 120, () -> !((DeckEditor) clean).isValidating());
        assertEquals(List.of(), errorMarkers(deck).stream().map(m -> m.getAttribute(IMarker.MESSAGE, "")).toList());
        Ui.run(() -> page().closeAllEditors(false));
    }

    private static List<IMarker> errorMarkers(IFile file) {
        try {
            return Arrays.stream(file.findMarkers(DeckEditor.MARKER, false, IResource.DEPTH_ZERO))
                    .filter(m -> m.getAttribute(IMarker.SEVERITY, -1) == IMarker.SEVERITY_ERROR).toList();
        } catch (org.eclipse.core.runtime.CoreException e) {
            return List.of();
        }
    }

    @Test
    @Order(2)
    void sampleMigrationFillsTheMatrix() throws Exception {
        MigrationJob job = new MigrationJob(deck.getLocation().toPath(), layout.getLocation().toPath(), SOURCE, TARGET,
                Set.of());
        Ui.run(() -> page().showView(WorkbenchIds.MIGRATION_VIEW));
        job.schedule();
        job.join();
        assertTrue(job.getResult().isOK(), () -> job.getResult().toString());
        List<String> moved = job.result().layers();
        assertFalse(moved.isEmpty(), "the sample moves some layers");
        MigrationView view = Ui.sync(() -> (MigrationView) page().findView(WorkbenchIds.MIGRATION_VIEW));
        Ui.waitUntil("the matrix to fill", 30, () -> view.getMatrix().getItemCount() == moved.size());
        List<String> rows = Ui.sync(() -> {
            Table t = view.getMatrix();
            return Arrays.stream(t.getItems()).map(i -> i.getText(0)).toList();
        });
        assertEquals(moved, rows, "one matrix row per moved layer, in deck order");
        String firstCells = Ui.sync(() -> {
            StringBuilder sb = new StringBuilder();
            for (int c = 1; c < view.getMatrix().getColumnCount(); c++) {
                sb.append(view.getMatrix().getItem(0).getText(c)).append('|');
            }
            return sb.toString();
        });
        assertTrue(firstCells.contains("→"), "cells show old → new values: " + firstCells);
        Ui.run(() -> page().setPartState(page().findViewReference(WorkbenchIds.MIGRATION_VIEW),
                IWorkbenchPage.STATE_MAXIMIZED));
        assertNotNull(Ui.screenshot("03-migration-matrix"));
        Ui.run(() -> view.showTab(1));
        assertNotNull(Ui.screenshot("03b-migration-masks"));
        Ui.run(() -> page().setPartState(page().findViewReference(WorkbenchIds.MIGRATION_VIEW),
                IWorkbenchPage.STATE_RESTORED));
    }

    @Test
    @Order(3)
    void doubleClickingAViolationMovesTheViewerToIt() throws Exception {
        Path layoutPath = layout.getLocation().toPath();
        CheckJob check = new CheckJob(deck.getLocation().toPath(), layoutPath, TARGET);
        check.schedule();
        check.join();
        assertTrue(check.getResult().isOK(), () -> check.getResult().toString());
        List<Finding> findings = check.findings();
        assertFalse(findings.isEmpty(), "the sample block has violations under " + TARGET);

        LayoutEditor editor = (LayoutEditor) Ui.sync(() -> IDE.openEditor(page(), layout, WorkbenchIds.LAYOUT_EDITOR));
        LayoutCanvas canvas = Ui.sync(editor::getCanvas);
        Ui.waitUntil("the layout to load and draw", 120, () -> canvas.getScene() != null && !canvas.isRendering());
        Ui.waitUntil("the markers of the check", 30, () -> canvas.getMarkers().size() == findings.size());
        assertNotNull(Ui.screenshot("04-layout-viewer-with-violations"));
        View before = Ui.sync(canvas::getView);

        ViolationsView view = (ViolationsView) Ui.sync(() -> page().showView(WorkbenchIds.VIOLATIONS_VIEW));
        Ui.waitUntil("the table to fill", 30, () -> view.getViewer().getTable().getItemCount() == findings.size());
        // the row the user double-clicks: the first one as the table sorts them
        Finding target = Ui.sync(() -> (Finding) view.getViewer().getElementAt(0));
        Ui.run(() -> {
            view.getViewer().setSelection(new StructuredSelection(target), true);
            Event e = new Event();
            e.item = view.getViewer().getTable().getItem(0);
            view.getViewer().getTable().notifyListeners(SWT.DefaultSelection, e);
        });
        double nmPerDbu = Ui.sync(() -> canvas.getScene().nanometresPerDbu());
        Box box = Findings.dbu(target.marker(), nmPerDbu);
        double cx = (box.minX() + box.maxX()) / 2.0;
        double cy = (box.minY() + box.maxY()) / 2.0;
        Ui.waitUntil("the viewer to centre the violation", 30, () -> {
            View v = canvas.getView();
            return canvas.getSelectedMarker() != null && canvas.getSelectedMarker().source().equals(target)
                    && Math.abs(v.centreX() - cx) <= 1 && Math.abs(v.centreY() - cy) <= 1 && !canvas.isRendering();
        });
        View after = Ui.sync(canvas::getView);
        assertTrue(after.scale() > before.scale(), "the viewer zoomed in on the violation");
        assertTrue(Ui.sync(() -> ReviewSession.get().current().isPresent()));
        assertNotNull(Ui.screenshot("05-violation-double-clicked"));
    }
}
