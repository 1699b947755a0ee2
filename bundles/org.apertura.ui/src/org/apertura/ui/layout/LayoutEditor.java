/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.layout;

import java.io.IOException;
import java.net.URI;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.hierarchy.CellHierarchy;
import org.apertura.layout.model.Cell;
import org.apertura.report.model.Finding;
import org.apertura.ui.findings.Findings;
import org.apertura.ui.findings.Review;
import org.apertura.ui.findings.ReviewSession;
import org.apertura.ui.internal.Preferences;
import org.apertura.ui.viewer.LayoutCanvas;
import org.apertura.ui.viewer.LayoutScene;
import org.apertura.ui.viewer.Marker;
import org.apertura.ui.viewer.Palette;
import org.apertura.ui.viewer.SceneLayer;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.IPath;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.ITreeContentProvider;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.ui.IEditorInput;
import org.eclipse.ui.IEditorSite;
import org.eclipse.ui.IFileEditorInput;
import org.eclipse.ui.IPathEditorInput;
import org.eclipse.ui.IURIEditorInput;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.part.EditorPart;

/**
 * Shows a GDSII layout: the cell hierarchy and the layers with their visibility on the left, the
 * chosen cell in the layout viewer on the right, with the findings of the current review that are
 * about this file drawn over it. Reading and flattening run as jobs with progress; the editor never
 * changes the file.
 */
public final class LayoutEditor extends EditorPart {

    /** The editor's id in plugin.xml. */
    public static final String ID = "org.apertura.ui.editor.layout";

    private Path file;
    private LayoutCanvas canvas;
    private TreeViewer cells;
    private Table layers;
    private Label summary;
    private final List<Image> swatches = new ArrayList<>();
    private GdsReadResult read;
    private final Consumer<Review> reviewListener = r -> {
        if (canvas != null && !canvas.isDisposed()) {
            canvas.getDisplay().asyncExec(this::showFindings);
        }
    };

    @Override
    public void init(IEditorSite site, IEditorInput input) throws PartInitException {
        setSite(site);
        setInput(input);
        file = pathOf(input).orElseThrow(() -> new PartInitException("not a file: " + input.getName()));
        setPartName(input.getName());
        setTitleToolTip(file.toString());
    }

    /** The file system path behind an editor input, if it has one. */
    public static Optional<Path> pathOf(IEditorInput input) {
        if (input instanceof IFileEditorInput f) {
            IPath location = f.getFile().getLocation();
            return location == null ? Optional.empty() : Optional.of(location.toPath());
        }
        if (input instanceof IPathEditorInput p) {
            return Optional.of(p.getPath().toPath());
        }
        if (input instanceof IURIEditorInput u) {
            URI uri = u.getURI();
            return "file".equals(uri.getScheme()) ? Optional.of(Path.of(uri)) : Optional.empty();
        }
        IFile adapted = input.getAdapter(IFile.class);
        return adapted == null || adapted.getLocation() == null ? Optional.empty()
                : Optional.of(adapted.getLocation().toPath());
    }

    @Override
    public void createPartControl(Composite parent) {
        SashForm sash = new SashForm(parent, SWT.HORIZONTAL);
        Composite side = new Composite(sash, SWT.NONE);
        GridLayout sideLayout = new GridLayout(1, false);
        sideLayout.marginWidth = 4;
        side.setLayout(sideLayout);

        new Label(side, SWT.NONE).setText("Cells");
        cells = new TreeViewer(side, SWT.BORDER | SWT.SINGLE);
        GridData cellsData = new GridData(SWT.FILL, SWT.FILL, true, true);
        cellsData.heightHint = 160;
        cells.getControl().setLayoutData(cellsData);
        cells.setContentProvider(new CellContent());
        cells.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return element instanceof Cell c ? c.getName() : String.valueOf(element);
            }
        });
        cells.addDoubleClickListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            if (first instanceof Cell c) {
                showCell(c);
            }
        });

        new Label(side, SWT.NONE).setText("Layers (tick to show)");
        layers = new Table(side, SWT.BORDER | SWT.CHECK | SWT.V_SCROLL);
        layers.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        layers.addListener(SWT.Selection, e -> {
            if (e.detail == SWT.CHECK && e.item instanceof TableItem item) {
                canvas.setLayerVisible(layers.indexOf(item), item.getChecked());
            }
        });
        summary = new Label(side, SWT.WRAP);
        summary.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));

        canvas = new LayoutCanvas(sash, SWT.NONE);
        canvas.setPalette(Preferences.palette());
        sash.setWeights(22, 78);
        canvas.addMarkerListener(m -> {
            if (m.source() instanceof Finding f) {
                setStatus(Findings.label(f));
            }
        });
        canvas.addDisposeListener(e -> swatches.forEach(Image::dispose));
        ReviewSession.get().addListener(reviewListener);
        load();
    }

    private void load() {
        Job job = Job.create("Reading " + file.getFileName(), monitor -> {
            SubMonitor sub = SubMonitor.convert(monitor, "Reading " + file.getFileName(), 3);
            try {
                GdsReadResult r = LayoutLoader.read(file);
                sub.worked(1);
                if (sub.isCanceled()) {
                    return Status.CANCEL_STATUS;
                }
                Cell top = LayoutLoader.mainTopCell(r);
                if (top == null) {
                    return Status.error(file + ": the library holds no cells");
                }
                sub.subTask("Flattening " + top.getName());
                LayoutScene scene = LayoutLoader.scene(r.library(), top, LayerNames.current()::nameOf);
                sub.worked(2);
                asyncUi(() -> shown(r, top, scene));
                return Status.OK_STATUS;
            } catch (IOException | RuntimeException e) {
                asyncUi(() -> summary.setText("Could not read the layout: " + e.getMessage()));
                return Status.error("Could not read " + file + ": " + e.getMessage(), e);
            }
        });
        job.setUser(true);
        job.schedule();
    }

    private void showCell(Cell cell) {
        Job job = Job.create("Flattening " + cell.getName(), (IProgressMonitor monitor) -> {
            try {
                LayoutScene scene = LayoutLoader.scene(read.library(), cell, LayerNames.current()::nameOf);
                asyncUi(() -> shown(read, cell, scene));
                return Status.OK_STATUS;
            } catch (RuntimeException e) {
                return Status.error("Could not flatten " + cell.getName() + ": " + e.getMessage(), e);
            }
        });
        job.setUser(true);
        job.schedule();
    }

    private void asyncUi(Runnable r) {
        if (canvas != null && !canvas.isDisposed()) {
            canvas.getDisplay().asyncExec(() -> {
                if (!canvas.isDisposed()) {
                    r.run();
                }
            });
        }
    }

    private void shown(GdsReadResult r, Cell cell, LayoutScene scene) {
        read = r;
        if (cells.getInput() == null) {
            cells.setInput(r);
            cells.expandToLevel(2);
        }
        canvas.setScene(scene);
        layers.removeAll();
        swatches.forEach(Image::dispose);
        swatches.clear();
        Palette palette = canvas.getPalette();
        int i = 0;
        for (SceneLayer l : scene.layers()) {
            TableItem item = new TableItem(layers, SWT.NONE);
            item.setText(String.format(Locale.ROOT, "%s   %,d", l.name(), l.size()));
            item.setChecked(true);
            item.setImage(swatch(palette.layerColour(i++)));
        }
        summary.setText(String.format(Locale.ROOT, "%s: %,d shapes on %d layers; 1 unit = %s nm%s", cell.getName(),
                scene.shapeCount(), scene.layers().size(), Findings.number(scene.nanometresPerDbu()),
                r.warnings().isEmpty() ? "" : "\n" + String.join("\n", r.warnings())));
        summary.getParent().layout();
        showFindings();
    }

    private Image swatch(int rgb) {
        Image img = new Image(canvas.getDisplay(), 14, 14);
        GC gc = new GC(img);
        gc.setBackground(new Color(canvas.getDisplay(), new RGB((rgb >> 16) & 0xFF, (rgb >> 8) & 0xFF, rgb & 0xFF)));
        gc.fillRectangle(0, 0, 14, 14);
        gc.dispose();
        swatches.add(img);
        return img;
    }

    /** Draws the current review's findings when they are about this file. */
    private void showFindings() {
        LayoutScene scene = canvas.getScene();
        Optional<Review> review = ReviewSession.get().current();
        if (scene == null || review.isEmpty() || !sameFile(review.get().layout())) {
            canvas.setMarkers(List.of());
            return;
        }
        canvas.setMarkers(markers(review.get(), scene.nanometresPerDbu()));
    }

    /** The viewer markers for the findings present in a review (fixed findings are not drawn). */
    public static List<Marker> markers(Review review, double nmPerDbu) {
        List<Marker> out = new ArrayList<>();
        for (Finding f : review.findings()) {
            if (f.status().present()) {
                out.add(new Marker(Findings.dbu(f.marker(), nmPerDbu), Findings.label(f), f.waived(), f));
            }
        }
        return out;
    }

    /** True when this editor shows that file. */
    public boolean sameFile(Path other) {
        return other.toAbsolutePath().normalize().equals(file.toAbsolutePath().normalize());
    }

    /**
     * Moves the viewer to a finding of the current review and selects it.
     *
     * @return false when the layout is not loaded yet or the finding is not drawn here
     */
    public boolean reveal(Finding finding) {
        if (canvas == null || canvas.getScene() == null) {
            return false;
        }
        for (Marker m : canvas.getMarkers()) {
            if (m.source() != null && m.source().equals(finding)) {
                canvas.reveal(m);
                return true;
            }
        }
        return false;
    }

    private void setStatus(String text) {
        getEditorSite().getActionBars().getStatusLineManager().setMessage(text);
    }

    /** The viewer widget, for tests and commands. */
    public LayoutCanvas getCanvas() {
        return canvas;
    }

    /** The file shown. */
    public Path getFile() {
        return file;
    }

    @Override
    public void setFocus() {
        canvas.getDrawingArea().setFocus();
    }

    @Override
    public void dispose() {
        ReviewSession.get().removeListener(reviewListener);
        super.dispose();
    }

    @Override
    public void doSave(IProgressMonitor monitor) {
        // a viewer: nothing to save
    }

    @Override
    public void doSaveAs() {
        // a viewer: nothing to save
    }

    @Override
    public boolean isDirty() {
        return false;
    }

    @Override
    public boolean isSaveAsAllowed() {
        return false;
    }

    /** Top cells as roots, referenced cells as children. */
    private static final class CellContent extends ArrayContentProvider implements ITreeContentProvider {
        @Override
        public Object[] getElements(Object input) {
            return input instanceof GdsReadResult r ? r.topCells().toArray() : new Object[0];
        }

        @Override
        public Object[] getChildren(Object parent) {
            return parent instanceof Cell c ? CellHierarchy.children(c).toArray() : new Object[0];
        }

        @Override
        public Object getParent(Object element) {
            return null;
        }

        @Override
        public boolean hasChildren(Object element) {
            return getChildren(element).length > 0;
        }
    }
}
