/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.viewer;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.apertura.engine.geom.Box;
import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;

/**
 * The layout viewer widget: a drawing area with a ruler on top and on the left and a line of
 * coordinates below.
 * <p>
 * Interaction: the mouse wheel zooms about the pointer; dragging with any button pans; {@code F} or
 * {@code Home} fits the scene; {@code +}/{@code -} zoom about the centre; arrow keys pan by a tenth.
 * <p>
 * Drawing never happens on the UI thread: every change of view, visibility or palette schedules a
 * system {@link Job} that renders the window with a {@link SceneRenderer} (cancelling the job before
 * it); until it returns, the previous picture is shown moved and scaled to the new view, so panning
 * and zooming answer at once whatever the size of the layout. Violation markers are drawn over the
 * picture on the UI thread (they are few), no smaller than {@value #MIN_MARKER_PIXELS} pixels.
 */
public final class LayoutCanvas extends Composite {

    /** Smallest on-screen size of a violation marker, pixels. */
    public static final int MIN_MARKER_PIXELS = 9;
    private static final int RULER = 24;

    private final Canvas area;
    private final Canvas topRuler;
    private final Canvas leftRuler;
    private final Label status;
    private final SceneRenderer renderer = new SceneRenderer();
    private final List<Consumer<View>> viewListeners = new CopyOnWriteArrayList<>();
    private final List<Consumer<Marker>> markerListeners = new CopyOnWriteArrayList<>();

    private LayoutScene scene;
    private boolean[] visible = new boolean[0];
    private Palette palette = Palette.HARBOUR;
    private View view = new View(0, 0, 1, 1, 1);
    private List<Marker> markers = List.of();
    private Marker selected;

    private Image picture;
    private SceneRenderer.Frame frame;
    private RenderJob job;
    private volatile int generation;
    private long lastRenderMillis;
    private Point dragFrom;
    private Point pointer;

    public LayoutCanvas(Composite parent, int style) {
        super(parent, style);
        GridLayout layout = new GridLayout(2, false);
        layout.marginWidth = layout.marginHeight = 0;
        layout.horizontalSpacing = layout.verticalSpacing = 0;
        setLayout(layout);

        Canvas corner = new Canvas(this, SWT.NONE);
        corner.setLayoutData(new GridData(RULER, RULER));
        corner.addPaintListener(e -> {
            e.gc.setBackground(rulerBackground());
            e.gc.fillRectangle(corner.getClientArea());
        });
        topRuler = new Canvas(this, SWT.DOUBLE_BUFFERED);
        GridData top = new GridData(SWT.FILL, SWT.TOP, true, false);
        top.heightHint = RULER;
        topRuler.setLayoutData(top);
        topRuler.addPaintListener(e -> paintRuler(e.gc, true));
        leftRuler = new Canvas(this, SWT.DOUBLE_BUFFERED);
        GridData left = new GridData(SWT.LEFT, SWT.FILL, false, true);
        left.widthHint = RULER;
        leftRuler.setLayoutData(left);
        leftRuler.addPaintListener(e -> paintRuler(e.gc, false));

        area = new Canvas(this, SWT.DOUBLE_BUFFERED | SWT.NO_BACKGROUND);
        area.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        area.addPaintListener(e -> paintArea(e.gc));
        area.addListener(SWT.Resize, e -> {
            Rectangle r = area.getClientArea();
            boolean first = view.width() <= 1;
            view = view.resized(r.width, r.height);
            if (first && scene != null) {
                fit();
            } else {
                requestRender();
            }
        });
        area.addListener(SWT.MouseVerticalWheel, this::wheel);
        area.addListener(SWT.MouseDown, e -> {
            dragFrom = new Point(e.x, e.y);
            area.setFocus();
        });
        area.addListener(SWT.MouseUp, e -> {
            if (dragFrom != null && Math.abs(e.x - dragFrom.x) + Math.abs(e.y - dragFrom.y) < 3 && e.button == 1) {
                pick(e.x, e.y);
            }
            dragFrom = null;
        });
        area.addListener(SWT.MouseMove, this::move);
        area.addListener(SWT.MouseExit, e -> {
            pointer = null;
            topRuler.redraw();
            leftRuler.redraw();
        });
        area.addListener(SWT.KeyDown, this::key);

        status = new Label(this, SWT.NONE);
        status.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 2, 1));
        status.setText("No layout loaded");
        addDisposeListener(e -> {
            generation++;
            if (job != null) {
                job.cancel();
            }
            if (picture != null) {
                picture.dispose();
            }
        });
    }

    /** Shows a scene, all layers visible, fitted to the canvas. */
    public void setScene(LayoutScene newScene) {
        checkWidget();
        scene = newScene;
        visible = new boolean[newScene == null ? 0 : newScene.layers().size()];
        java.util.Arrays.fill(visible, true);
        selected = null;
        fit();
    }

    public LayoutScene getScene() {
        checkWidget();
        return scene;
    }

    /** Shows or hides layer i of the scene. */
    public void setLayerVisible(int layer, boolean show) {
        checkWidget();
        if (layer >= 0 && layer < visible.length && visible[layer] != show) {
            visible[layer] = show;
            requestRender();
        }
    }

    public boolean isLayerVisible(int layer) {
        checkWidget();
        return layer >= 0 && layer < visible.length && visible[layer];
    }

    public void setPalette(Palette newPalette) {
        checkWidget();
        palette = Objects.requireNonNull(newPalette, "palette");
        topRuler.redraw();
        leftRuler.redraw();
        requestRender();
    }

    public Palette getPalette() {
        checkWidget();
        return palette;
    }

    /** The violation markers drawn over the layout. */
    public void setMarkers(List<Marker> newMarkers) {
        checkWidget();
        markers = List.copyOf(newMarkers);
        if (selected != null && !markers.contains(selected)) {
            selected = null;
        }
        area.redraw();
    }

    public List<Marker> getMarkers() {
        checkWidget();
        return markers;
    }

    public Marker getSelectedMarker() {
        checkWidget();
        return selected;
    }

    /** The current view (centre, scale, canvas size). */
    public View getView() {
        checkWidget();
        return view;
    }

    /** Sets the view, e.g. to restore one; the canvas size is kept. */
    public void setView(View newView) {
        checkWidget();
        view = new View(newView.centreX(), newView.centreY(), newView.scale(), view.width(), view.height());
        viewChanged();
    }

    /** The last finished render, or null before the first one. */
    public SceneRenderer.Frame getFrame() {
        checkWidget();
        return frame;
    }

    /** Fits the whole scene into the canvas. */
    public void fit() {
        checkWidget();
        if (scene != null && scene.bounds().isPresent()) {
            view = View.fit(scene.bounds().get(), view.width(), view.height());
        }
        viewChanged();
    }

    /**
     * Moves to a marker: centres it with enough surroundings to see what it is about (about six times
     * its size, at least 400 database units across) and selects it.
     */
    public void reveal(Marker marker) {
        checkWidget();
        Box b = marker.box();
        long grow = Math.max(200, 3 * Math.max(b.width(), b.height()));
        view = View.fit(new Box(b.minX() - grow, b.minY() - grow, b.maxX() + grow, b.maxY() + grow), view.width(),
                view.height());
        selected = marker;
        viewChanged();
    }

    /** Selects a marker without moving; null clears the selection. */
    public void select(Marker marker) {
        checkWidget();
        selected = marker;
        area.redraw();
    }

    /** Called with the new view after every zoom, pan, fit or resize (on the UI thread). */
    public void addViewListener(Consumer<View> listener) {
        viewListeners.add(listener);
    }

    /** Called when a click in the canvas selects a marker. */
    public void addMarkerListener(Consumer<Marker> listener) {
        markerListeners.add(listener);
    }

    /** The drawing area, for focus and tests. */
    public Canvas getDrawingArea() {
        checkWidget();
        return area;
    }

    /** The text of the coordinates line. */
    public String getStatusText() {
        checkWidget();
        return status.getText();
    }

    /** True while a render for the current view is still running. */
    public boolean isRendering() {
        checkWidget();
        return frame == null || !frame.view().equals(view);
    }

    private void viewChanged() {
        requestRender();
        topRuler.redraw();
        leftRuler.redraw();
        updateStatus();
        for (Consumer<View> l : viewListeners) {
            l.accept(view);
        }
    }

    private void requestRender() {
        area.redraw();
        if (scene == null || view.width() <= 1) {
            return;
        }
        int gen = ++generation;
        if (job != null) {
            job.cancel();
        }
        job = new RenderJob(scene, view, visible.clone(), palette, gen);
        job.schedule();
    }

    private final class RenderJob extends Job {
        private final LayoutScene jobScene;
        private final View jobView;
        private final boolean[] jobVisible;
        private final Palette jobPalette;
        private final int gen;

        RenderJob(LayoutScene scene, View view, boolean[] visible, Palette palette, int gen) {
            super("Drawing layout");
            this.jobScene = scene;
            this.jobView = view;
            this.jobVisible = visible;
            this.jobPalette = palette;
            this.gen = gen;
            setSystem(true);
            setPriority(Job.INTERACTIVE);
            setRule(RENDER_RULE);
        }

        @Override
        protected IStatus run(IProgressMonitor monitor) {
            long t0 = System.nanoTime();
            SceneRenderer.Frame f = renderer.render(jobScene, jobView, jobVisible, jobPalette,
                    () -> monitor.isCanceled() || gen != generation);
            if (f.image() == null) {
                return Status.CANCEL_STATUS;
            }
            long millis = (System.nanoTime() - t0) / 1_000_000;
            if (!isDisposed()) {
                getDisplay().asyncExec(() -> accept(f, gen, millis));
            }
            return Status.OK_STATUS;
        }
    }

    /** One render at a time: the renderer's buffers are shared. */
    private static final org.eclipse.core.runtime.jobs.ISchedulingRule RENDER_RULE = new org.eclipse.core.runtime.jobs.ISchedulingRule() {
        @Override
        public boolean contains(org.eclipse.core.runtime.jobs.ISchedulingRule rule) {
            return rule == this;
        }

        @Override
        public boolean isConflicting(org.eclipse.core.runtime.jobs.ISchedulingRule rule) {
            return rule == this;
        }
    };

    private void accept(SceneRenderer.Frame f, int gen, long millis) {
        if (isDisposed() || gen != generation) {
            return;
        }
        if (picture != null) {
            picture.dispose();
        }
        picture = new Image(getDisplay(), f.image());
        frame = f;
        lastRenderMillis = millis;
        area.redraw();
        updateStatus();
    }

    private void paintArea(GC gc) {
        Rectangle r = area.getClientArea();
        Color bg = colour(palette.background());
        gc.setBackground(bg);
        gc.fillRectangle(r);
        if (picture != null && frame != null) {
            View fv = frame.view();
            // where the last picture's corners are under the current view
            double x0 = view.screenX(fv.worldX(0));
            double y0 = view.screenY(fv.worldY(0));
            double x1 = view.screenX(fv.worldX(fv.width()));
            double y1 = view.screenY(fv.worldY(fv.height()));
            if (fv.scale() == view.scale()) {
                gc.drawImage(picture, (int) Math.round(x0), (int) Math.round(y0));
            } else if (x1 - x0 < 40_000 && y1 - y0 < 40_000) {
                gc.drawImage(picture, 0, 0, fv.width(), fv.height(), (int) Math.round(x0), (int) Math.round(y0),
                        (int) Math.round(x1 - x0), (int) Math.round(y1 - y0));
            }
        }
        if (scene == null) {
            gc.setForeground(colour(palette.grid()));
            gc.drawText("Open a GDSII layout (File > Open, or double-click one in the navigator)", 16, 16, true);
        }
        paintMarkers(gc);
    }

    private void paintMarkers(GC gc) {
        if (markers.isEmpty()) {
            return;
        }
        gc.setAntialias(SWT.OFF);
        Color open = colour(palette.marker());
        Color waived = colour(palette.waived());
        for (Marker m : markers) {
            if (m == selected) {
                continue;
            }
            Rectangle s = markerRect(m);
            if (s == null) {
                continue;
            }
            gc.setForeground(m.waived() ? waived : open);
            gc.setLineStyle(m.waived() ? SWT.LINE_DOT : SWT.LINE_SOLID);
            gc.setLineWidth(2);
            gc.drawRectangle(s);
            if (!m.waived()) {
                gc.drawLine(s.x, s.y, s.x + s.width, s.y + s.height);
            }
        }
        if (selected != null) {
            Rectangle s = markerRect(selected);
            if (s != null) {
                gc.setForeground(colour(palette.highlight()));
                gc.setLineStyle(SWT.LINE_SOLID);
                gc.setLineWidth(3);
                gc.drawRectangle(s);
                int cx = s.x + s.width / 2;
                int cy = s.y + s.height / 2;
                gc.setLineWidth(1);
                gc.drawLine(cx, s.y - 18, cx, s.y - 4);
                gc.drawLine(cx, s.y + s.height + 4, cx, s.y + s.height + 18);
                gc.drawLine(s.x - 18, cy, s.x - 4, cy);
                gc.drawLine(s.x + s.width + 4, cy, s.x + s.width + 18, cy);
                gc.setForeground(colour(palette.highlight()));
                gc.drawText(selected.label(), s.x + s.width + 8, s.y + s.height + 6, true);
            }
        }
        gc.setLineWidth(1);
        gc.setLineStyle(SWT.LINE_SOLID);
    }

    private Rectangle markerRect(Marker m) {
        double x0 = view.screenX(m.box().minX());
        double x1 = view.screenX(m.box().maxX());
        double y0 = view.screenY(m.box().maxY());
        double y1 = view.screenY(m.box().minY());
        if (x1 < -MIN_MARKER_PIXELS || y1 < -MIN_MARKER_PIXELS || x0 > view.width() + MIN_MARKER_PIXELS
                || y0 > view.height() + MIN_MARKER_PIXELS) {
            return null;
        }
        double cx = (x0 + x1) / 2;
        double cy = (y0 + y1) / 2;
        double w = Math.max(MIN_MARKER_PIXELS, x1 - x0);
        double h = Math.max(MIN_MARKER_PIXELS, y1 - y0);
        return new Rectangle((int) Math.round(cx - w / 2), (int) Math.round(cy - h / 2), (int) Math.round(w),
                (int) Math.round(h));
    }

    private void pick(int x, int y) {
        Marker best = null;
        for (Marker m : markers) {
            Rectangle s = markerRect(m);
            if (s != null && s.contains(x, y)) {
                best = m;
            }
        }
        if (best != null) {
            selected = best;
            area.redraw();
            for (Consumer<Marker> l : markerListeners) {
                l.accept(best);
            }
        }
    }

    private void paintRuler(GC gc, boolean horizontal) {
        Canvas c = horizontal ? topRuler : leftRuler;
        Rectangle r = c.getClientArea();
        gc.setBackground(rulerBackground());
        gc.fillRectangle(r);
        if (scene == null) {
            return;
        }
        Color ink = colour(palette.grid());
        gc.setForeground(ink);
        double nmPerDbu = scene.nanometresPerDbu();
        double nmPerPixel = nmPerDbu / view.scale();
        double step = Rulers.stepNm(nmPerPixel, horizontal ? 90 : 70);
        double minor = step / 5;
        double fromNm = horizontal ? view.worldX(0) * nmPerDbu : view.worldY(view.height()) * nmPerDbu;
        double toNm = horizontal ? view.worldX(view.width()) * nmPerDbu : view.worldY(0) * nmPerDbu;
        Color text = colour(textOn(palette.background()));
        for (double v = Math.floor(fromNm / minor) * minor; v <= toNm; v += minor) {
            double dbu = v / nmPerDbu;
            int p = (int) Math.round(horizontal ? view.screenX(dbu) : view.screenY(dbu));
            boolean major = Math.abs(v / step - Math.rint(v / step)) < 1e-6;
            int len = major ? RULER - 6 : 5;
            if (horizontal) {
                gc.drawLine(p, RULER - len, p, RULER);
            } else {
                gc.drawLine(RULER - len, p, RULER, p);
            }
            if (major) {
                String label = Rulers.label(Math.abs(v) < minor / 1e6 ? 0 : v, step);
                gc.setForeground(text);
                if (horizontal) {
                    gc.drawText(label, p + 3, 1, true);
                } else {
                    Point ext = gc.textExtent(label);
                    org.eclipse.swt.graphics.Transform t = new org.eclipse.swt.graphics.Transform(getDisplay());
                    t.translate(1, p - 3);
                    t.rotate(-90);
                    gc.setTransform(t);
                    gc.drawText(label, 0, 0, true);
                    gc.setTransform(null);
                    t.dispose();
                    if (ext.x < 0) {
                        break;
                    }
                }
                gc.setForeground(ink);
            }
        }
        if (pointer != null) {
            gc.setForeground(colour(palette.highlight()));
            if (horizontal) {
                gc.drawLine(pointer.x, 0, pointer.x, RULER);
            } else {
                gc.drawLine(0, pointer.y, RULER, pointer.y);
            }
        }
    }

    private void wheel(Event e) {
        if (scene == null) {
            return;
        }
        double factor = e.count > 0 ? 1.25 : 0.8;
        view = view.zoomAbout(e.x, e.y, factor);
        viewChanged();
    }

    private void move(Event e) {
        pointer = new Point(e.x, e.y);
        if (dragFrom != null && (e.stateMask & SWT.BUTTON_MASK) != 0) {
            view = view.panBy(e.x - dragFrom.x, e.y - dragFrom.y);
            dragFrom = new Point(e.x, e.y);
            viewChanged();
        } else {
            updateStatus();
            topRuler.redraw();
            leftRuler.redraw();
        }
    }

    private void key(Event e) {
        if (scene == null) {
            return;
        }
        switch (e.keyCode) {
            case 'f', SWT.HOME -> fit();
            case '+', '=', SWT.KEYPAD_ADD -> zoomCentre(1.5);
            case '-', SWT.KEYPAD_SUBTRACT -> zoomCentre(1 / 1.5);
            case SWT.ARROW_LEFT -> panFraction(0.1, 0);
            case SWT.ARROW_RIGHT -> panFraction(-0.1, 0);
            case SWT.ARROW_UP -> panFraction(0, 0.1);
            case SWT.ARROW_DOWN -> panFraction(0, -0.1);
            default -> {
                return;
            }
        }
    }

    /** Zooms about the canvas centre. */
    public void zoomCentre(double factor) {
        checkWidget();
        view = view.zoomAbout(view.width() / 2.0, view.height() / 2.0, factor);
        viewChanged();
    }

    private void panFraction(double fx, double fy) {
        view = view.panBy(fx * view.width(), fy * view.height());
        viewChanged();
    }

    private void updateStatus() {
        if (scene == null) {
            return;
        }
        double nmPerDbu = scene.nanometresPerDbu();
        List<String> parts = new ArrayList<>();
        if (pointer != null) {
            parts.add(Rulers.position(view.worldX(pointer.x) * nmPerDbu, view.worldY(pointer.y) * nmPerDbu, nmPerDbu));
        }
        parts.add(String.format(Locale.ROOT, "1 px = %s", Rulers.label(nmPerDbu / view.scale(),
                Math.min(999, nmPerDbu / view.scale() / 10))));
        if (frame != null) {
            parts.add(String.format(Locale.ROOT, "%,d shapes in view, %,d as dots, drawn in %d ms",
                    frame.shapesDrawn() + frame.shapesAsDots(), frame.shapesAsDots(), lastRenderMillis));
        }
        status.setText(String.join("    ", parts));
    }

    private Color rulerBackground() {
        return colour(mix(palette.background(), textOn(palette.background()), 24));
    }

    private static int textOn(int background) {
        int r = (background >> 16) & 0xFF, g = (background >> 8) & 0xFF, b = background & 0xFF;
        return 0.299 * r + 0.587 * g + 0.114 * b > 140 ? 0x202830 : 0xD8E2EA;
    }

    private static int mix(int a, int b, int alpha) {
        return SceneRenderer.blend(a, b, alpha);
    }

    private Color colour(int rgb) {
        return new Color(getDisplay(), new RGB((rgb >> 16) & 0xFF, (rgb >> 8) & 0xFF, rgb & 0xFF));
    }
}
