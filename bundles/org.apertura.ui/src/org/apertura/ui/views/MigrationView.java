/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.views;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;

import org.apertura.migrate.MigrationResult;
import org.apertura.migrate.delta.RuleDelta;
import org.apertura.migrate.field.FieldResult;
import org.apertura.migrate.impact.ImpactCount;
import org.apertura.migrate.masks.LayerMasks;
import org.apertura.migrate.optics.RuleOptics;
import org.apertura.migrate.shrink.Headroom;
import org.apertura.ui.findings.Findings;
import org.apertura.ui.run.StudySession;
import org.apertura.ui.run.StudySession.Study;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.TabFolder;
import org.eclipse.swt.widgets.TabItem;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.part.ViewPart;

/**
 * The review of a migration study: the layer &times; rule matrix (old and new value, the change, and
 * the new/fixed violation counts in each cell, tinted by the change), the k1 of each layer's pitch
 * under both options, and tabs for the shrink headroom chart, the masks and exposures saved and the
 * field and stitching result.
 */
public final class MigrationView extends ViewPart {

    /** The view's id in plugin.xml. */
    public static final String ID = "org.apertura.ui.view.migration";

    /** Cell tints: tightened, relaxed, added, removed (our own soft tints). */
    private static final RGB TIGHTENED = new RGB(0xF6, 0xD2, 0xC4);
    private static final RGB RELAXED = new RGB(0xCF, 0xEB, 0xDF);
    private static final RGB ADDED = new RGB(0xD6, 0xE2, 0xF7);
    private static final RGB REMOVED = new RGB(0xE3, 0xE1, 0xDC);

    private Label summary;
    private Table matrix;
    private Canvas headroomChart;
    private Table masks;
    private Text field;
    private Text optics;
    private Study study;
    private final Consumer<Study> listener = s -> {
        if (matrix != null && !matrix.isDisposed()) {
            matrix.getDisplay().asyncExec(() -> show(s));
        }
    };

    @Override
    public void createPartControl(Composite parent) {
        parent.setLayout(new GridLayout(1, false));
        summary = new Label(parent, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        summary.setText("No migration study yet: Apertura > Run Migration Study…");
        SashForm sash = new SashForm(parent, SWT.VERTICAL);
        sash.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        matrix = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.H_SCROLL | SWT.V_SCROLL);
        matrix.setHeaderVisible(true);
        matrix.setLinesVisible(true);

        TabFolder tabs = new TabFolder(sash, SWT.TOP);
        headroomChart = new Canvas(tabs, SWT.DOUBLE_BUFFERED);
        headroomChart.addPaintListener(e -> paintHeadroom(e.gc));
        tab(tabs, "Shrink headroom", headroomChart);
        masks = new Table(tabs, SWT.BORDER | SWT.FULL_SELECTION);
        masks.setHeaderVisible(true);
        masks.setLinesVisible(true);
        for (String h : new String[] {"Layer", "Source", "Target", "Masks", "Exposures", "Scanner s/wafer"}) {
            TableColumn c = new TableColumn(masks, SWT.NONE);
            c.setText(h);
            c.setWidth(h.equals("Scanner s/wafer") ? 140 : 110);
        }
        tab(tabs, "Masks && exposures", masks);
        Composite opticsBox = new Composite(tabs, SWT.NONE);
        opticsBox.setLayout(new FillLayout());
        optics = new Text(opticsBox, SWT.MULTI | SWT.READ_ONLY | SWT.V_SCROLL | SWT.H_SCROLL);
        tab(tabs, "Optics (k1)", opticsBox);
        Composite fieldBox = new Composite(tabs, SWT.NONE);
        fieldBox.setLayout(new FillLayout());
        field = new Text(fieldBox, SWT.MULTI | SWT.READ_ONLY | SWT.V_SCROLL | SWT.WRAP);
        tab(tabs, "Field && stitching", fieldBox);
        sash.setWeights(60, 40);
        StudySession.get().addListener(listener);
        StudySession.get().current().ifPresent(this::show);
    }

    private static void tab(TabFolder tabs, String title, org.eclipse.swt.widgets.Control control) {
        TabItem item = new TabItem(tabs, SWT.NONE);
        item.setText(title);
        item.setControl(control);
    }

    /** Shows a study; called on the UI thread. */
    public void show(Study s) {
        if (matrix.isDisposed()) {
            return;
        }
        study = s;
        MigrationResult r = s.result();
        String origin = s.saved().map(f -> "saved study " + f.getFileName() + " · ").orElse("");
        summary.setText(origin + String.format(Locale.ROOT,
                "%s · %s (cell %s) · %s → %s · layers %s · %d masks saved, %d exposures saved · %d new, %d fixed violations",
                r.technology(), s.layout().getFileName(), r.topCell(), r.from(), r.to(), String.join(", ", r.layers()),
                r.masks().masksSaved(), r.masks().exposuresSaved(), r.impact().total().newCount(),
                r.impact().total().fixed()));
        fillMatrix(r);
        fillMasks(r);
        fillOptics(r);
        fillField(r);
        headroomChart.redraw();
        summary.getParent().layout();
    }

    private void fillMatrix(MigrationResult r) {
        matrix.setRedraw(false);
        matrix.removeAll();
        for (TableColumn c : matrix.getColumns()) {
            c.dispose();
        }
        Set<String> rules = new LinkedHashSet<>();
        for (RuleDelta d : r.deltas()) {
            rules.add(d.rule());
        }
        Map<String, ImpactCount> counts = new LinkedHashMap<>();
        for (ImpactCount c : r.impact().counts()) {
            counts.put(c.layer() + "\u0000" + c.rule(), c);
        }
        column(matrix, "Layer", 70);
        column(matrix, "k1 of pitch (" + r.from() + " → " + r.to() + ")", 200);
        for (String rule : rules) {
            column(matrix, rule, 170);
        }
        for (String layer : r.layers()) {
            TableItem item = new TableItem(matrix, SWT.NONE);
            item.setText(0, layer);
            item.setText(1, k1Text(r, layer));
            int col = 2;
            for (String rule : rules) {
                List<RuleDelta> ds = r.deltas().stream().filter(d -> d.layer().equals(layer) && d.rule().equals(rule))
                        .toList();
                ImpactCount c = counts.get(layer + "\u0000" + rule);
                item.setText(col, cellText(ds, c));
                if (!ds.isEmpty()) {
                    RGB tint = switch (ds.get(0).status()) {
                        case TIGHTENED -> TIGHTENED;
                        case RELAXED -> RELAXED;
                        case ADDED -> ADDED;
                        case REMOVED -> REMOVED;
                        default -> null;
                    };
                    if (tint != null) {
                        item.setBackground(col, new Color(matrix.getDisplay(), tint));
                    }
                }
                col++;
            }
        }
        for (TableColumn c : matrix.getColumns()) {
            c.pack(); // to the widest of header and cells, so no value is cut off
        }
        matrix.setRedraw(true);
    }

    private static void column(Table t, String title, int width) {
        TableColumn c = new TableColumn(t, SWT.NONE);
        c.setText(title);
        c.setWidth(width);
    }

    /** {@code "32 → 20 nm ▼ · +3 new −1 fixed"}; per-axis values are listed x then y. */
    static String cellText(List<RuleDelta> ds, ImpactCount c) {
        List<String> parts = new ArrayList<>();
        for (RuleDelta d : ds) {
            String axis = d.axis().name().equals("BOTH") || ds.size() == 1 ? "" : d.axis().name().toLowerCase(Locale.ROOT) + " ";
            String old = d.oldValue().isPresent() ? Findings.number(d.oldValue().getAsDouble()) : "–";
            String neu = d.newValue().isPresent() ? Findings.number(d.newValue().getAsDouble()) : "–";
            String mark = switch (d.status()) {
                case TIGHTENED -> " ▼";
                case RELAXED -> " ▲";
                case ADDED -> " +";
                case REMOVED -> " ×";
                default -> "";
            };
            parts.add(axis + old + " → " + neu + (d.unit().isEmpty() ? "" : " " + d.unit()) + mark);
        }
        String text = String.join("; ", parts);
        if (c != null && (c.newCount() > 0 || c.fixed() > 0)) {
            text += String.format(Locale.ROOT, " · +%d new −%d fixed", c.newCount(), c.fixed());
        }
        return text;
    }

    private static String k1Text(MigrationResult r, String layer) {
        String from = "–", to = "–";
        for (RuleOptics o : r.ruleOptics()) {
            if (!o.layer().equals(layer) || !o.rule().equals("pitch")) {
                continue;
            }
            String t = String.format(Locale.ROOT, "%.2f %s", o.k1(), o.patterning());
            if (o.option().equals(r.from())) {
                from = t;
            } else if (o.option().equals(r.to())) {
                to = t;
            }
        }
        return from + " → " + to;
    }

    private void fillMasks(MigrationResult r) {
        masks.removeAll();
        for (LayerMasks m : r.masks().layers()) {
            TableItem item = new TableItem(masks, SWT.NONE);
            item.setText(new String[] {m.layer(), m.sourcePatterning(), m.targetPatterning(),
                    m.sourceMasks() + " → " + m.targetMasks(), m.sourceExposures() + " → " + m.targetExposures(),
                    seconds(m.sourceSeconds()) + " → " + seconds(m.targetSeconds())});
        }
        TableItem total = new TableItem(masks, SWT.NONE);
        total.setText(new String[] {"Total", "", "", r.masks().sourceMasks() + " → " + r.masks().targetMasks()
                + " (" + r.masks().masksSaved() + " saved)", r.masks().exposuresSaved() + " saved",
                seconds(r.masks().sourceSeconds()) + " → " + seconds(r.masks().targetSeconds())});
        for (TableColumn c : masks.getColumns()) {
            c.pack();
        }
    }

    private static String seconds(java.util.OptionalDouble s) {
        return s.isPresent() ? String.format(Locale.ROOT, "%.1f", s.getAsDouble()) : "–";
    }

    private void fillOptics(MigrationResult r) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "%-8s %-16s %-10s %-8s %9s %6s  %s%n", "Layer", "Rule", "Option",
                "Pattern", "Value nm", "k1", "Verdict"));
        for (RuleOptics o : r.ruleOptics()) {
            sb.append(String.format(Locale.ROOT, "%-8s %-16s %-10s %-8s %9s %6.3f  %s%n", o.layer(), o.rule(),
                    o.option(), o.patterning(), Findings.number(o.valueNm()), o.k1(),
                    o.verdict().name().toLowerCase(Locale.ROOT).replace('_', ' ')));
        }
        optics.setText(sb.toString());
    }

    private void fillField(MigrationResult r) {
        StringBuilder sb = new StringBuilder();
        for (FieldResult f : r.fields()) {
            sb.append(String.format(Locale.ROOT,
                    "%s: field %.1f x %.1f mm, die %.3f x %.3f mm → %d x %d field(s)%s%n", f.option(), f.fieldXMm(),
                    f.fieldYMm(), f.dieXMm(), f.dieYMm(), f.fieldsX(), f.fieldsY(),
                    f.fits() ? ", fits in one exposure" : String.format(Locale.ROOT,
                            ", %d stitching line(s), %d critical shape(s) crossing or within %s nm", f.lines().size(),
                            f.hitCount(), Findings.number(f.keepOutNm()))));
        }
        if (!r.warnings().isEmpty()) {
            sb.append(System.lineSeparator()).append("Warnings:").append(System.lineSeparator());
            r.warnings().forEach(w -> sb.append("  ").append(w).append(System.lineSeparator()));
        }
        sb.append(System.lineSeparator()).append(MigrationResult.CAUTION);
        field.setText(sb.toString());
    }

    /** Horizontal bars: per layer and rule the linear shrink the layout still takes under the target. */
    private void paintHeadroom(GC gc) {
        Rectangle area = headroomChart.getClientArea();
        gc.setBackground(headroomChart.getDisplay().getSystemColor(SWT.COLOR_LIST_BACKGROUND));
        gc.fillRectangle(area);
        if (study == null) {
            gc.drawText("Run a migration study to see how far each layer can shrink.", 10, 10, true);
            return;
        }
        List<Headroom> rows = study.result().headroom();
        int labelWidth = 190;
        int barArea = Math.max(50, area.width - labelWidth - 190);
        double max = 0.05;
        for (Headroom h : rows) {
            max = Math.max(max, h.headroom());
        }
        Color bar = new Color(headroomChart.getDisplay(), new RGB(0x3F, 0x8F, 0xA6));
        Color open = new Color(headroomChart.getDisplay(), new RGB(0x9C, 0xC9, 0x8A));
        Color ink = headroomChart.getDisplay().getSystemColor(SWT.COLOR_LIST_FOREGROUND);
        int y = 8;
        gc.setForeground(ink);
        gc.drawText("Largest linear shrink without a new violation under " + study.result().to()
                + " (bar = headroom, 1 − factor)", 8, y, true);
        y += 22;
        for (Headroom h : rows) {
            String label = h.layer() + " " + h.rule() + (h.scope().name().equals("UNIFORM") ? "" : " (" + h.scope().name().toLowerCase(Locale.ROOT) + ")");
            gc.setForeground(ink);
            gc.drawText(label, 8, y, true);
            int w = (int) Math.round(barArea * Math.max(0, h.headroom()) / max);
            gc.setBackground(h.bounded() ? open : bar);
            gc.fillRectangle(labelWidth, y + 2, Math.max(1, w), 14);
            String value = String.format(Locale.ROOT, "%.1f %%  (×%.3f)%s", 100 * h.headroom(), h.factor(),
                    h.bounded() ? " or more" : "");
            gc.drawText(value, labelWidth + w + 6, y, true);
            y += 20;
            if (y > area.height) {
                break;
            }
        }
    }

    /** Shows tab i (0 headroom, 1 masks, 2 optics, 3 field); for tests and commands. */
    public void showTab(int i) {
        TabFolder tabs = (TabFolder) headroomChart.getParent();
        tabs.setSelection(i);
    }

    /** The summary line above the matrix, for tests. */
    public String getSummary() {
        return summary.getText();
    }

    /** The matrix table, for tests. */
    public Table getMatrix() {
        return matrix;
    }

    @Override
    public void setFocus() {
        matrix.setFocus();
    }

    @Override
    public void dispose() {
        StudySession.get().removeListener(listener);
        super.dispose();
    }
}
