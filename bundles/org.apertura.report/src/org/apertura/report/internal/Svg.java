/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apertura.report.model.EdgePair;
import org.apertura.report.model.FieldResult;
import org.apertura.report.model.Finding;
import org.apertura.report.model.Histogram;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmPolygon;
import org.apertura.report.model.NmSegment;
import org.apertura.report.model.StitchCrossing;
import org.apertura.report.model.StitchLine;

/**
 * Inline SVG pictures for the HTML report. Coordinates are mapped from nm to pixels with y pointing up (as in
 * the layout) and written with one decimal. No namespace URL is written: HTML parsers place inline
 * {@code <svg>} in the SVG namespace themselves.
 */
public final class Svg {

    /** What a layer picture drew. */
    public record Picture(String svg, boolean densityGrid, int shapes, int markers) {
    }

    /** Maps a nm box onto a pixel area with a margin, keeping the aspect ratio. */
    static final class Frame {
        final NmBox box;
        final double scale;
        final double ox;
        final double oy;
        final int w;
        final int h;

        Frame(NmBox box, int maxW, int maxH, int margin) {
            double bw = Math.max(box.width(), 1e-6);
            double bh = Math.max(box.height(), 1e-6);
            this.box = box;
            this.scale = Math.min((maxW - 2.0 * margin) / bw, (maxH - 2.0 * margin) / bh);
            this.w = (int) Math.ceil(bw * scale + 2 * margin);
            this.h = (int) Math.ceil(bh * scale + 2 * margin);
            this.ox = margin;
            this.oy = margin;
        }

        double x(double nm) {
            return ox + (nm - box.x1()) * scale;
        }

        double y(double nm) {
            return h - oy - (nm - box.y1()) * scale;
        }
    }

    private Svg() {
    }

    /**
     * A layer picture: its shapes (or, above {@code maxShapes}, a coverage grid of at most {@code grid} by
     * {@code grid} cells merged into runs) and the findings' markers, each at least 6 px and linked to the
     * finding's row. At most {@code maxMarkers} markers are drawn.
     */
    public static Picture layer(String layer, List<NmPolygon> shapes, List<Finding> findings, String colour,
            int maxW, int maxH, int maxShapes, int grid, int maxMarkers) {
        NmBox extent = null;
        for (NmPolygon p : shapes) {
            extent = extent == null ? p.bounds() : extent.union(p.bounds());
        }
        for (Finding f : findings) {
            extent = extent == null ? f.marker() : extent.union(f.marker());
        }
        if (extent == null) {
            extent = new NmBox(0, 0, 1, 1);
        }
        extent = extent.expand(Math.max(extent.width(), extent.height()) * 0.02);
        Frame fr = new Frame(extent, maxW, maxH, 8);
        StringBuilder sb = new StringBuilder();
        sb.append(open(fr.w, fr.h, "layer picture of " + layer, "pic"));
        sb.append(rect(0, 0, fr.w, fr.h, Palette.PANEL, null, 0));
        boolean densityGrid = shapes.size() > maxShapes;
        if (densityGrid) {
            sb.append(coverage(fr, shapes, colour, grid));
        } else if (!shapes.isEmpty()) {
            sb.append("<path fill=\"").append(colour).append("\" fill-opacity=\"0.5\" stroke=\"").append(colour)
                    .append("\" stroke-width=\"0.6\" d=\"");
            for (NmPolygon p : shapes) {
                path(sb, fr, p);
            }
            sb.append("\"/>\n");
        }
        int drawn = 0;
        for (Finding f : findings) {
            if (drawn >= maxMarkers) {
                break;
            }
            sb.append(marker(fr, f, 6, true));
            drawn++;
        }
        sb.append("</svg>\n");
        return new Picture(sb.toString(), densityGrid, densityGrid ? 0 : shapes.size(), drawn);
    }

    /** A thumbnail of the window around one finding: nearby shapes, the marker and the edge pair. */
    public static String thumbnail(Finding f, List<NmPolygon> nearby, NmBox window, String colour, int size) {
        Frame fr = new Frame(window, size, size, 4);
        StringBuilder sb = new StringBuilder(open(fr.w, fr.h, "violation " + f.fingerprint(), "thumb"));
        sb.append(rect(0, 0, fr.w, fr.h, Palette.PANEL, null, 0));
        if (!nearby.isEmpty()) {
            sb.append("<path fill=\"").append(colour).append("\" fill-opacity=\"0.45\" stroke=\"").append(colour)
                    .append("\" stroke-width=\"0.8\" d=\"");
            for (NmPolygon p : nearby) {
                path(sb, fr, p);
            }
            sb.append("\"/>\n");
        }
        sb.append(marker(fr, f, 4, false));
        if (f.edges().isPresent()) {
            EdgePair e = f.edges().get();
            String c = Palette.finding(f.status(), f.waived());
            sb.append(line(fr, e.a(), c, 3)).append(line(fr, e.b(), c, 3));
        }
        return sb.append("</svg>\n").toString();
    }

    /** The window shown by a thumbnail: a square centred on the marker, half a side = twice the marker's larger side + 20 nm. */
    public static NmBox window(NmBox marker) {
        double half = Math.max(marker.width(), marker.height()) * 2.0 + 20;
        double cx = (marker.x1() + marker.x2()) / 2;
        double cy = (marker.y1() + marker.y2()) / 2;
        return new NmBox(cx - half, cy - half, cx + half, cy + half);
    }

    /** A histogram of {@code bins} bars with the old rule (dashed) and the new rule (solid) drawn on it. */
    public static String histogram(Histogram h, int w, int ht, int bins) {
        double[] v = h.values();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            lo = Math.min(lo, d);
            hi = Math.max(hi, d);
        }
        for (var r : new java.util.OptionalDouble[] { h.oldRule(), h.newRule() }) {
            if (r.isPresent()) {
                lo = Math.min(lo, r.getAsDouble());
                hi = Math.max(hi, r.getAsDouble());
            }
        }
        if (!Double.isFinite(lo)) {
            lo = 0;
            hi = 1;
        }
        if (hi - lo < 1e-9) {
            lo -= 1;
            hi += 1;
        }
        double pad = (hi - lo) * 0.04;
        lo -= pad;
        hi += pad;
        int[] count = new int[bins];
        for (double d : v) {
            int b = (int) Math.floor((d - lo) / (hi - lo) * bins);
            count[Math.max(0, Math.min(bins - 1, b))]++;
        }
        int max = 1;
        for (int c : count) {
            max = Math.max(max, c);
        }
        int left = 44;
        int bottom = 30;
        int top = 22;
        double plotW = w - left - 10.0;
        double plotH = ht - bottom - top;
        StringBuilder sb = new StringBuilder(open(w, ht, "histogram of " + h.quantity().name().toLowerCase(Locale.ROOT)
                + " on " + h.layer(), "hist"));
        sb.append(rect(0, 0, w, ht, Palette.PANEL, null, 0));
        double bw = plotW / bins;
        for (int i = 0; i < bins; i++) {
            if (count[i] == 0) {
                continue;
            }
            double bh = plotH * count[i] / max;
            sb.append(rect(left + i * bw + 0.5, top + plotH - bh, Math.max(bw - 1, 0.5), bh, Palette.BARS, null, 0));
        }
        sb.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\"/>\n",
                left, top + plotH, left + plotW, top + plotH, Palette.INK));
        sb.append(text(left, ht - 10, Fmt.num(lo + pad) + " nm", "start"));
        sb.append(text(left + plotW, ht - 10, Fmt.num(hi - pad) + " nm", "end"));
        sb.append(text(left - 4, top + 8, Integer.toString(max), "end"));
        sb.append(text(left - 4, top + plotH, "0", "end"));
        if (h.oldRule().isPresent()) {
            double x = left + (h.oldRule().getAsDouble() - lo) / (hi - lo) * plotW;
            sb.append(String.format(Locale.ROOT,
                    "<line x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\" stroke-width=\"2\" "
                            + "stroke-dasharray=\"5 3\"><title>old rule %s nm</title></line>\n",
                    x, top - 4, x, top + plotH, Palette.OLD_RULE, Fmt.num(h.oldRule().getAsDouble())));
            sb.append(text(x + 3, top - 8, "old " + Fmt.num(h.oldRule().getAsDouble()), "start"));
        }
        if (h.newRule().isPresent()) {
            double x = left + (h.newRule().getAsDouble() - lo) / (hi - lo) * plotW;
            sb.append(String.format(Locale.ROOT,
                    "<line x1=\"%.1f\" y1=\"%d\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\" stroke-width=\"2\">"
                            + "<title>new rule %s nm</title></line>\n",
                    x, top - 4, x, top + plotH, Palette.NEW_RULE, Fmt.num(h.newRule().getAsDouble())));
            sb.append(text(x - 3, top - 8, "new " + Fmt.num(h.newRule().getAsDouble()), "end"));
        }
        return sb.append("</svg>\n").toString();
    }

    /** The die, the exposure field placed at the die's corner, stitching lines, keep-out bands and crossings. */
    public static String field(FieldResult f, int maxW, int maxH, int maxCrossings) {
        NmBox fieldBox = new NmBox(f.die().x1(), f.die().y1(), f.die().x1() + f.fieldWidthNm(),
                f.die().y1() + f.fieldHeightNm());
        NmBox all = f.die().union(fieldBox);
        Frame fr = new Frame(all.expand(Math.max(all.width(), all.height()) * 0.03), maxW, maxH, 8);
        StringBuilder sb = new StringBuilder(open(fr.w, fr.h, "die and exposure field", "field"));
        sb.append(rect(0, 0, fr.w, fr.h, Palette.PANEL, null, 0));
        sb.append(box(fr, fieldBox, "none", Palette.BAND, 1.5, "5 4", "exposure field of " + f.option()));
        sb.append(box(fr, f.die(), "#e4dccb", Palette.INK, 1.2, null, "die"));
        for (StitchLine l : f.lines()) {
            NmBox band = l.vertical()
                    ? new NmBox(l.positionNm() - f.keepOutNm(), f.die().y1(), l.positionNm() + f.keepOutNm(), f.die().y2())
                    : new NmBox(f.die().x1(), l.positionNm() - f.keepOutNm(), f.die().x2(), l.positionNm() + f.keepOutNm());
            if (f.keepOutNm() > 0) {
                sb.append(box(fr, band, Palette.CAUTION_BG, "none", 0, null, "keep-out band"));
            }
            NmSegment s = l.vertical() ? new NmSegment(l.positionNm(), f.die().y1(), l.positionNm(), f.die().y2())
                    : new NmSegment(f.die().x1(), l.positionNm(), f.die().x2(), l.positionNm());
            sb.append(line(fr, s, Palette.NEW, 2));
        }
        int n = 0;
        for (StitchCrossing c : f.crossings()) {
            if (n++ >= maxCrossings) {
                break;
            }
            sb.append(box(fr, c.shape(), c.crosses() ? Palette.NEW : Palette.PERSISTING, "none", 0, null,
                    c.layer() + (c.crosses() ? " crosses the line" : " in the keep-out band")));
        }
        return sb.append("</svg>\n").toString();
    }

    /** A horizontal bar: the kept length {@code factor} in ink, the headroom in the new-rule colour. */
    public static String factorBar(double factor, int w, int h) {
        double f = Math.max(0, Math.min(1, factor));
        StringBuilder sb = new StringBuilder(open(w, h, "scale factor " + Fmt.num(factor), "bar"));
        sb.append(rect(0, 0, w * f, h, Palette.BARS, null, 0));
        sb.append(rect(w * f, 0, w * (1 - f), h, "#ead9c6", null, 0));
        return sb.append("</svg>").toString();
    }

    private static String coverage(Frame fr, List<NmPolygon> shapes, String colour, int grid) {
        NmBox e = fr.box;
        int gx = grid;
        int gy = grid;
        double cw = e.width() / gx;
        double ch = e.height() / gy;
        double[] cover = new double[gx * gy];
        for (NmPolygon p : shapes) {
            NmBox b = p.bounds();
            int x0 = Math.max(0, (int) ((b.x1() - e.x1()) / cw));
            int x1 = Math.min(gx - 1, (int) ((b.x2() - e.x1()) / cw));
            int y0 = Math.max(0, (int) ((b.y1() - e.y1()) / ch));
            int y1 = Math.min(gy - 1, (int) ((b.y2() - e.y1()) / ch));
            for (int y = y0; y <= y1; y++) {
                for (int x = x0; x <= x1; x++) {
                    double ox = Math.min(b.x2(), e.x1() + (x + 1) * cw) - Math.max(b.x1(), e.x1() + x * cw);
                    double oy = Math.min(b.y2(), e.y1() + (y + 1) * ch) - Math.max(b.y1(), e.y1() + y * ch);
                    if (ox > 0 && oy > 0) {
                        cover[y * gx + x] += ox * oy / (cw * ch);
                    }
                }
            }
        }
        StringBuilder sb = new StringBuilder();
        for (int y = 0; y < gy; y++) {
            int x = 0;
            while (x < gx) {
                int level = level(cover[y * gx + x]);
                int end = x + 1;
                while (end < gx && level(cover[y * gx + end]) == level) {
                    end++;
                }
                if (level > 0) {
                    double px = fr.x(e.x1() + x * cw);
                    double py = fr.y(e.y1() + (y + 1) * ch);
                    sb.append(String.format(Locale.ROOT,
                            "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"%s\" fill-opacity=\"%.2f\"/>\n",
                            px, py, (end - x) * cw * fr.scale, ch * fr.scale, colour, level / 8.0 * 0.85));
                }
                x = end;
            }
        }
        return sb.toString();
    }

    private static int level(double coverage) {
        return coverage <= 0 ? 0 : Math.max(1, Math.min(8, (int) Math.ceil(Math.min(coverage, 1) * 8)));
    }

    private static String marker(Frame fr, Finding f, double minPx, boolean link) {
        String c = Palette.finding(f.status(), f.waived());
        double x1 = fr.x(f.marker().x1());
        double x2 = fr.x(f.marker().x2());
        double y1 = fr.y(f.marker().y2());
        double y2 = fr.y(f.marker().y1());
        double w = x2 - x1;
        double h = y2 - y1;
        if (w < minPx) {
            x1 -= (minPx - w) / 2;
            w = minPx;
        }
        if (h < minPx) {
            y1 -= (minPx - h) / 2;
            h = minPx;
        }
        String title = Html.esc(Fmt.message(f) + (f.waived() ? " [waived]" : ""));
        String r = String.format(Locale.ROOT,
                "<rect class=\"mk\" x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"%s\" fill-opacity=\"0.3\" "
                        + "stroke=\"%s\" stroke-width=\"2\"><title>%s</title></rect>",
                x1, y1, w, h, c, c, title);
        return link ? "<a href=\"#f-" + f.fingerprint() + "\">" + r + "</a>\n" : r + "\n";
    }

    private static void path(StringBuilder sb, Frame fr, NmPolygon p) {
        for (int i = 0; i < p.size(); i++) {
            sb.append(i == 0 ? 'M' : 'L').append(f1(fr.x(p.x(i)))).append(' ').append(f1(fr.y(p.y(i)))).append(' ');
        }
        sb.append('Z');
    }

    private static String line(Frame fr, NmSegment s, String colour, double width) {
        return String.format(Locale.ROOT,
                "<line x1=\"%.1f\" y1=\"%.1f\" x2=\"%.1f\" y2=\"%.1f\" stroke=\"%s\" stroke-width=\"%.1f\" "
                        + "stroke-linecap=\"round\"/>\n",
                fr.x(s.x1()), fr.y(s.y1()), fr.x(s.x2()), fr.y(s.y2()), colour, width);
    }

    private static String box(Frame fr, NmBox b, String fill, String stroke, double sw, String dash, String title) {
        return String.format(Locale.ROOT,
                "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"%s\" stroke=\"%s\" stroke-width=\"%.1f\"%s>"
                        + "<title>%s</title></rect>\n",
                fr.x(b.x1()), fr.y(b.y2()), Math.max(b.width() * fr.scale, 1), Math.max(b.height() * fr.scale, 1), fill,
                stroke, sw, dash == null ? "" : " stroke-dasharray=\"" + dash + "\"", Html.esc(title));
    }

    private static String rect(double x, double y, double w, double h, String fill, String stroke, double sw) {
        return String.format(Locale.ROOT, "<rect x=\"%.1f\" y=\"%.1f\" width=\"%.1f\" height=\"%.1f\" fill=\"%s\"%s/>\n",
                x, y, w, h, fill, stroke == null ? "" : " stroke=\"" + stroke + "\" stroke-width=\"" + sw + "\"");
    }

    private static String text(double x, double y, String s, String anchor) {
        return String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%.1f\" text-anchor=\"%s\">%s</text>\n", x, y, anchor,
                Html.esc(s));
    }

    private static String open(int w, int h, String label, String cls) {
        return "<svg class=\"" + cls + "\" width=\"" + w + "\" height=\"" + h + "\" viewBox=\"0 0 " + w + " " + h
                + "\" role=\"img\" aria-label=\"" + Html.esc(label) + "\">\n";
    }

    private static String f1(double v) {
        return Fmt.num(v, 1);
    }

    /** The findings of {@code layer} in {@code all}. */
    public static List<Finding> ofLayer(List<Finding> all, String layer) {
        List<Finding> out = new ArrayList<>();
        for (Finding f : all) {
            if (f.layer().equals(layer)) {
                out.add(f);
            }
        }
        return out;
    }
}
