/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.views;

import java.io.IOException;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TreeSet;
import java.util.function.Consumer;
import java.util.function.Function;

import org.apertura.report.model.Finding;
import org.apertura.ui.findings.Findings;
import org.apertura.ui.findings.Review;
import org.apertura.ui.findings.ReviewSession;
import org.apertura.ui.internal.Preferences;
import org.apertura.ui.layout.LayoutEditor;
import org.eclipse.core.filesystem.EFS;
import org.eclipse.jface.action.Action;
import org.eclipse.jface.dialogs.IInputValidator;
import org.eclipse.jface.dialogs.InputDialog;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.viewers.Viewer;
import org.eclipse.jface.viewers.ViewerComparator;
import org.eclipse.jface.viewers.ViewerFilter;
import org.eclipse.jface.window.Window;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.IEditorReference;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.part.ViewPart;

/**
 * The findings of the current review as a table: filter by layer, rule, status and waiver; sort by
 * any column (click its header, click again to reverse); double-click a row to move the layout
 * viewer to it (opening the layout when needed); waive the selected finding with a reason.
 */
public final class ViolationsView extends ViewPart {

    /** The view's id in plugin.xml. */
    public static final String ID = "org.apertura.ui.view.violations";

    private static final String ALL = "(all)";

    private TableViewer table;
    private Combo layerFilter;
    private Combo ruleFilter;
    private Combo statusFilter;
    private Combo waiverFilter;
    private Label heading;
    private Action waive;
    private final Consumer<Review> listener = r -> {
        if (table != null && !table.getControl().isDisposed()) {
            table.getControl().getDisplay().asyncExec(this::refresh);
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        heading = new Label(parent, SWT.NONE);
        heading.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Composite filters = new Composite(parent, SWT.NONE);
        filters.setLayout(new GridLayout(8, false));
        filters.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        layerFilter = filter(filters, "Layer:");
        ruleFilter = filter(filters, "Rule:");
        statusFilter = filter(filters, "Status:");
        waiverFilter = filter(filters, "Waiver:");
        waiverFilter.setItems(ALL, "open", "waived");
        waiverFilter.select(0);

        table = new TableViewer(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.MULTI | SWT.V_SCROLL | SWT.H_SCROLL);
        table.getTable().setHeaderVisible(true);
        table.getTable().setLinesVisible(true);
        table.getControl().setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        table.setContentProvider(ArrayContentProvider.getInstance());
        Sorter sorter = new Sorter();
        table.setComparator(sorter);
        column("Status", 90, f -> f.status().name().toLowerCase(Locale.ROOT) + (f.waived() ? " (waived)" : ""),
                Comparator.comparing((Finding f) -> f.status()).thenComparing(Finding::waived), sorter);
        column("Layer", 70, Finding::layer, Comparator.comparing(Finding::layer), sorter);
        column("Rule", 140, Finding::ruleId, Comparator.comparing(Finding::ruleId), sorter);
        column("Kind", 90, Finding::ruleKind, Comparator.comparing(Finding::ruleKind), sorter);
        column("Measured", 90, f -> Findings.number(f.measured()) + " " + f.unit().symbol(),
                Comparator.comparingDouble(Finding::measured), sorter);
        column("Required", 90, f -> Findings.number(f.required()) + " " + f.unit().symbol(),
                Comparator.comparingDouble(Finding::required), sorter);
        column("Where (µm)", 150,
                f -> String.format(Locale.ROOT, "%.3f, %.3f", (f.marker().x1() + f.marker().x2()) / 2000,
                        (f.marker().y1() + f.marker().y2()) / 2000),
                Comparator.comparingDouble((Finding f) -> f.marker().x1()).thenComparingDouble(f -> f.marker().y1()),
                sorter);
        column("Waiver", 200, f -> f.waiver().map(w -> w.reason() + " (" + w.author() + ", " + w.date() + ")").orElse(""),
                Comparator.comparing((Finding f) -> f.waiver().map(w -> w.reason()).orElse("")), sorter);
        table.addFilter(new ViewerFilter() {
            @Override
            public boolean select(Viewer viewer, Object parentElement, Object element) {
                return element instanceof Finding f && accepts(f);
            }
        });
        table.addDoubleClickListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            if (first instanceof Finding f) {
                reveal(f);
            }
        });
        waive = new Action("Waive…") {
            @Override
            public void run() {
                waiveSelection();
            }
        };
        waive.setToolTipText("Waive the selected finding, with a reason kept in the waiver file beside the deck");
        getViewSite().getActionBars().getToolBarManager().add(waive);
        table.addSelectionChangedListener(e -> waive.setEnabled(!e.getSelection().isEmpty()));
        waive.setEnabled(false);
        getSite().setSelectionProvider(table);
        ReviewSession.get().addListener(listener);
        refresh();
    }

    private Combo filter(Composite parent, String label) {
        new Label(parent, SWT.NONE).setText(label);
        Combo combo = new Combo(parent, SWT.READ_ONLY);
        combo.setItems(ALL);
        combo.select(0);
        GridData d = new GridData();
        d.widthHint = 120;
        combo.setLayoutData(d);
        combo.addListener(SWT.Selection, e -> table.refresh());
        return combo;
    }

    private void column(String title, int width, Function<Finding, String> text, Comparator<Finding> order,
            Sorter sorter) {
        TableViewerColumn c = new TableViewerColumn(table, SWT.NONE);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((Finding) element);
            }
        });
        c.getColumn().addListener(SWT.Selection, e -> sorter.sortBy(c.getColumn(), order));
    }

    private boolean accepts(Finding f) {
        return matches(layerFilter, f.layer()) && matches(ruleFilter, f.ruleId())
                && matches(statusFilter, f.status().name().toLowerCase(Locale.ROOT))
                && matches(waiverFilter, f.waived() ? "waived" : "open");
    }

    private static boolean matches(Combo filter, String value) {
        String chosen = filter.getText();
        return chosen.isEmpty() || ALL.equals(chosen) || chosen.equals(value);
    }

    /** Rebuilds the table and the filter choices from the current review. */
    private void refresh() {
        if (table.getControl().isDisposed()) {
            return;
        }
        Optional<Review> review = ReviewSession.get().current();
        List<Finding> findings = review.map(Review::findings).orElse(List.of());
        refill(layerFilter, findings.stream().map(Finding::layer).toList());
        refill(ruleFilter, findings.stream().map(Finding::ruleId).toList());
        refill(statusFilter, findings.stream().map(f -> f.status().name().toLowerCase(Locale.ROOT)).toList());
        table.setInput(findings);
        long waived = findings.stream().filter(Finding::waived).count();
        heading.setText(review.map(r -> String.format(Locale.ROOT, "%s: %,d findings, %,d waived", r.title(),
                findings.size(), waived)).orElse("No review yet: run a check or a migration (Apertura menu)"));
        heading.getParent().layout();
    }

    private static void refill(Combo combo, List<String> values) {
        String chosen = combo.getText();
        TreeSet<String> distinct = new TreeSet<>(values);
        String[] items = new String[distinct.size() + 1];
        items[0] = ALL;
        int i = 1;
        for (String v : distinct) {
            items[i++] = v;
        }
        combo.setItems(items);
        int at = combo.indexOf(chosen);
        combo.select(Math.max(0, at));
    }

    /** Sets a filter by its visible text ({@code "(all)"} clears it); for tests and commands. */
    public void setFilter(String which, String value) {
        Combo c = switch (which) {
            case "layer" -> layerFilter;
            case "rule" -> ruleFilter;
            case "status" -> statusFilter;
            case "waiver" -> waiverFilter;
            default -> throw new IllegalArgumentException("unknown filter " + which);
        };
        c.select(Math.max(0, c.indexOf(value)));
        table.refresh();
    }

    /** The table, for tests. */
    public TableViewer getViewer() {
        return table;
    }

    /**
     * Moves the layout viewer to a finding: finds the editor showing the review's layout, opens it
     * when there is none, and reveals the finding once the layout is loaded.
     */
    public void reveal(Finding f) {
        Optional<Review> review = ReviewSession.get().current();
        if (review.isEmpty()) {
            return;
        }
        IWorkbenchPage page = getSite().getPage();
        LayoutEditor editor = null;
        for (IEditorReference ref : page.getEditorReferences()) {
            if (LayoutEditor.ID.equals(ref.getId()) && ref.getEditor(true) instanceof LayoutEditor e
                    && e.sameFile(review.get().layout())) {
                editor = e;
            }
        }
        if (editor == null) {
            try {
                IEditorPart opened = IDE.openEditorOnFileStore(page,
                        EFS.getLocalFileSystem().getStore(review.get().layout().toUri()));
                if (opened instanceof LayoutEditor e) {
                    editor = e;
                }
            } catch (PartInitException e) {
                MessageDialog.openError(getSite().getShell(), "Apertura", "Could not open the layout: " + e.getMessage());
                return;
            }
        }
        if (editor == null) {
            return;
        }
        page.bringToTop(editor);
        LayoutEditor target = editor;
        revealWhenLoaded(target, f, 0);
    }

    private void revealWhenLoaded(LayoutEditor editor, Finding f, int attempt) {
        if (editor.reveal(f) || attempt > 600) {
            return;
        }
        // the layout is still being read in its job: look again shortly
        table.getControl().getDisplay().timerExec(100, () -> {
            if (!table.getControl().isDisposed()) {
                revealWhenLoaded(editor, f, attempt + 1);
            }
        });
    }

    private void waiveSelection() {
        Object first = table.getStructuredSelection().getFirstElement();
        if (!(first instanceof Finding f)) {
            return;
        }
        if (f.waived()) {
            MessageDialog.openInformation(getSite().getShell(), "Waive", "This finding is already waived.");
            return;
        }
        IInputValidator notBlank = text -> text == null || text.isBlank() ? "Give a reason for the waiver." : null;
        InputDialog dialog = new InputDialog(getSite().getShell(), "Waive finding",
                "Why is this finding acceptable?\n" + Findings.label(f), "", notBlank);
        if (dialog.open() != Window.OK) {
            return;
        }
        try {
            ReviewSession.get().waive(f, dialog.getValue().strip(), Preferences.reviewer());
        } catch (IOException | RuntimeException e) {
            MessageDialog.openError(getSite().getShell(), "Waive", "Could not record the waiver: " + e.getMessage());
        }
    }

    @Override
    public void setFocus() {
        table.getControl().setFocus();
    }

    @Override
    public void dispose() {
        ReviewSession.get().removeListener(listener);
        super.dispose();
    }

    /** Sorts by the clicked column; a second click reverses. */
    private final class Sorter extends ViewerComparator {
        private Comparator<Finding> order = Comparator.comparing(Finding::layer).thenComparing(Finding::ruleId);
        private TableColumn column;
        private boolean descending;

        void sortBy(TableColumn c, Comparator<Finding> o) {
            descending = c == column && !descending;
            column = c;
            order = o;
            table.getTable().setSortColumn(c);
            table.getTable().setSortDirection(descending ? SWT.DOWN : SWT.UP);
            table.refresh();
        }

        @Override
        public int compare(Viewer viewer, Object a, Object b) {
            int c = order.compare((Finding) a, (Finding) b);
            return descending ? -c : c;
        }
    }
}
