/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.IOException;
import java.io.Writer;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.apertura.report.Caution;
import org.apertura.report.internal.Fmt;
import org.apertura.report.internal.Html;
import org.apertura.report.internal.Palette;
import org.apertura.report.internal.ShapeIndex;
import org.apertura.report.internal.Svg;
import org.apertura.report.model.FieldResult;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.HeadroomRow;
import org.apertura.report.model.Histogram;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.LayerGeometry;
import org.apertura.report.model.LayerInfo;
import org.apertura.report.model.MaskRow;
import org.apertura.report.model.MaskSummary;
import org.apertura.report.model.MatrixRow;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.NmPolygon;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.ReportKind;
import org.apertura.report.model.RuleChange;
import org.apertura.report.model.RuleMatrix;
import org.apertura.report.model.StitchCrossing;
import org.apertura.report.model.Waiver;

/**
 * Writes a self-contained HTML report: one file with inline CSS and inline SVG, no script, no external
 * resource and no URL, so it opens from disk with no network. The markup is also well-formed XML.
 *
 * <p>Bounds that keep the file small on large layouts: a layer picture draws at most
 * {@value #MAX_SHAPES_PER_PICTURE} shapes; above that it draws a coverage grid of
 * {@value #COVERAGE_GRID}&times;{@value #COVERAGE_GRID} cells (bounding-box coverage in 8 shades, runs merged)
 * instead. At most {@value #MAX_MARKERS_PER_PICTURE} markers per picture, {@value #MAX_THUMBNAILS}
 * violation thumbnails in all (new first, then persisting, open, waived, fixed), {@value #MAX_THUMBNAIL_SHAPES}
 * shapes per thumbnail and {@value #MAX_TABLE_ROWS} rows per findings table; the report says where a bound cut
 * something, and the CSV and JSON files always hold everything.
 */
public final class HtmlReport {

    public static final int MAX_SHAPES_PER_PICTURE = 2500;
    public static final int COVERAGE_GRID = 64;
    public static final int MAX_MARKERS_PER_PICTURE = 2000;
    public static final int MAX_THUMBNAILS = 200;
    public static final int MAX_THUMBNAIL_SHAPES = 300;
    public static final int MAX_TABLE_ROWS = 2000;
    public static final int HISTOGRAM_BINS = 40;

    private static final Comparator<Finding> DISPLAY = Comparator
            .comparingInt((Finding f) -> switch (f.status()) {
            case NEW -> 0;
            case PERSISTING -> 1;
            case OPEN -> 2;
            case FIXED -> 3;
            })
            .thenComparing(Finding::layer).thenComparing(Finding::ruleId)
            .thenComparingDouble(f -> f.marker().x1()).thenComparingDouble(f -> f.marker().y1());

    private final ReportData d;
    private final StringBuilder out = new StringBuilder(1 << 16);
    private final Map<String, ShapeIndex> indexes = new HashMap<>();
    private final Map<String, Integer> layerColour = new HashMap<>();
    private final Set<String> ids = new HashSet<>();
    private int thumbnails;

    private HtmlReport(ReportData d) {
        this.d = d;
        int i = 0;
        for (String l : layerNames()) {
            layerColour.put(l, i++);
        }
    }

    /** The report as one HTML document. */
    public static String render(ReportData data) {
        return new HtmlReport(data).build();
    }

    /** Writes {@link #render(ReportData)} to {@code out}. */
    public static void write(ReportData data, Writer out) throws IOException {
        out.write(render(data));
    }

    private String build() {
        Provenance p = d.provenance();
        out.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\"/>\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>\n")
                .append("<title>").append(e(d.title())).append(" \u2014 Apertura report</title>\n<style>\n")
                .append(css()).append("</style>\n</head>\n<body>\n");
        out.append("<header class=\"band\"><div class=\"brand\">Apertura</div><h1>").append(e(d.title()))
                .append("</h1><p class=\"sub\">").append(e(kindLabel())).append(" \u00b7 option ")
                .append(e(p.sourceOption()));
        p.targetOption().ifPresent(t -> out.append(" \u2192 ").append(e(t)));
        out.append(" \u00b7 ").append(e(DateTimeFormatter.ISO_INSTANT.format(p.created()))).append(" \u00b7 Apertura ")
                .append(e(p.toolVersion())).append("</p></header>\n");
        out.append("<div class=\"caution\" id=\"caution\"><strong>Caution.</strong> ").append(e(Caution.TEXT))
                .append("</div>\n");
        nav();
        summary();
        overview();
        layers();
        findings();
        staleWaivers();
        histograms();
        headroom();
        masks();
        field();
        provenance();
        out.append("<footer><p class=\"caution-foot\">").append(e(Caution.TEXT)).append("</p></footer>\n");
        out.append("</body>\n</html>\n");
        return out.toString();
    }

    private void nav() {
        out.append("<nav>");
        link("overview", d.matrix().isPresent() ? "Matrix" : "Findings by rule");
        link("layers", "Layers");
        link("findings", "Findings");
        link("stale", "Stale waivers");
        if (!d.histograms().isEmpty()) {
            link("histograms", "Histograms");
        }
        if (!d.headroom().isEmpty()) {
            link("headroom", "Shrink headroom");
        }
        if (d.masks().isPresent()) {
            link("masks", "Masks");
        }
        if (d.field().isPresent()) {
            link("field", "Field");
        }
        link("provenance", "Provenance");
        out.append("</nav>\n");
    }

    private void link(String id, String label) {
        out.append("<a href=\"#").append(id).append("\">").append(e(label)).append("</a>");
    }

    private void summary() {
        out.append("<section id=\"summary\" class=\"cards\">\n");
        if (d.kind() == ReportKind.CHECK) {
            card("Violations", d.count(FindingStatus.OPEN), Palette.OPEN);
        } else {
            card("New (breaks)", d.count(FindingStatus.NEW), Palette.NEW);
            card("Fixed", d.count(FindingStatus.FIXED), Palette.FIXED);
            card("Persisting", d.count(FindingStatus.PERSISTING), Palette.PERSISTING);
        }
        card("Not waived", d.openFindings().size(), Palette.INK);
        card("Waived", d.waivedFindings().size(), Palette.WAIVED);
        card("Stale waivers", d.staleWaivers().size(), Palette.MUTED);
        d.matrix().ifPresent(m -> {
            card("Rules tightened", m.rows().stream().filter(r -> r.change() == RuleChange.TIGHTENED).count(),
                    Palette.NEW);
            card("Rules relaxed", m.rows().stream().filter(r -> r.change() == RuleChange.RELAXED).count(),
                    Palette.FIXED);
        });
        d.masks().ifPresent(m -> card(m.masksSaved() >= 0 ? "Masks saved" : "Masks added", Math.abs(m.masksSaved()),
                Palette.BAND));
        d.headroom().stream().filter(h -> h.rule().equals("*")).min(Comparator.comparingDouble(HeadroomRow::headroom))
                .ifPresent(h -> cardText("Least headroom", pct(h.headroom()) + " (" + h.layer() + ")", Palette.BARS));
        out.append("</section>\n");
    }

    private void card(String label, long n, String colour) {
        cardText(label, Long.toString(n), colour);
    }

    private void cardText(String label, String value, String colour) {
        out.append("<div class=\"card\" style=\"border-top-color:").append(colour).append("\"><div class=\"num\">")
                .append(e(value)).append("</div><div class=\"lbl\">").append(e(label)).append("</div></div>\n");
    }

    private void overview() {
        out.append("<section id=\"overview\" class=\"overview\">\n<div class=\"ov-table\">\n");
        if (d.matrix().isPresent()) {
            out.append("<h2>Layer \u00d7 rule matrix</h2>\n");
            matrix(d.matrix().get());
        } else {
            out.append("<h2>Findings by layer and rule</h2>\n");
            countMatrix();
        }
        out.append("</div>\n");
        Optional<String> busiest = layerNames().stream()
                .max(Comparator.comparingLong(l -> d.findings().stream()
                        .filter(f -> f.layer().equals(l) && f.status().present()).count()));
        busiest.ifPresent(l -> {
            out.append("<div class=\"ov-pic\"><h2>Layer ").append(e(l)).append("</h2>\n");
            Svg.Picture pic = picture(l, 560, 420);
            out.append(pic.svg()).append(legend()).append("</div>\n");
        });
        out.append("</section>\n");
    }

    private void matrix(RuleMatrix m) {
        List<String> rules = m.rules();
        out.append("<table class=\"matrix\"><thead><tr><th>layer</th>");
        for (String r : rules) {
            out.append("<th>").append(e(r)).append("</th>");
        }
        out.append("</tr></thead><tbody>\n");
        for (String layer : m.layers()) {
            out.append("<tr><th>").append(e(layer)).append("</th>");
            for (String rule : rules) {
                List<MatrixRow> cell = m.cell(layer, rule);
                if (cell.isEmpty()) {
                    out.append("<td class=\"none\">\u2014</td>");
                    continue;
                }
                MatrixRow first = cell.get(0);
                StringBuilder title = new StringBuilder();
                for (MatrixRow r : cell) {
                    title.append(r.axis()).append(": ").append(r.change().name().toLowerCase(Locale.ROOT)).append(", ")
                            .append(r.cause()).append(". ");
                }
                out.append("<td style=\"background:").append(Palette.change(first.change())).append("\" title=\"")
                        .append(e(title.toString().trim())).append("\">");
                for (MatrixRow r : cell) {
                    out.append("<div class=\"v\">");
                    if (cell.size() > 1 || !r.axis().equals("both")) {
                        out.append("<span class=\"ax\">").append(e(r.axis())).append("</span> ");
                    }
                    out.append(e(Fmt.num(r.oldValue(), "\u2013"))).append(" \u2192 ")
                            .append(e(Fmt.num(r.newValue(), "\u2013"))).append(' ').append(e(r.unit().symbol()))
                            .append("</div>");
                    out.append("<div class=\"m\">").append(e(r.change().name().toLowerCase(Locale.ROOT)));
                    r.ratio().ifPresent(x -> out.append(" \u00d7").append(Fmt.num(x, 3)));
                    if (r.k1Old().isPresent() || r.k1New().isPresent()) {
                        out.append(" \u00b7 k1 ").append(Fmt.num(r.k1Old(), "\u2013")).append("\u2192")
                                .append(Fmt.num(r.k1New(), "\u2013"));
                    }
                    out.append("</div>");
                    if (r.newCount() > 0 || r.fixedCount() > 0) {
                        out.append("<div class=\"m\"><span class=\"cnt-new\">+").append(r.newCount())
                                .append(" new</span> <span class=\"cnt-fix\">").append(r.fixedCount())
                                .append(" fixed</span></div>");
                    }
                }
                out.append("</td>");
            }
            out.append("</tr>\n");
        }
        out.append("</tbody></table>\n");
        out.append("<p class=\"key\"><span style=\"background:").append(Palette.change(RuleChange.TIGHTENED))
                .append("\">tightened</span> <span style=\"background:")
                .append(Palette.change(RuleChange.RELAXED))
                .append("\">relaxed</span> <span style=\"background:")
                .append(Palette.change(RuleChange.UNCHANGED))
                .append("\">unchanged</span> <span style=\"background:")
                .append(Palette.change(RuleChange.ADDED))
                .append("\">added</span> <span style=\"background:")
                .append(Palette.change(RuleChange.REMOVED))
                .append("\">removed</span> \u00b7 values old \u2192 new, ratio new/old, k1 under old \u2192 new option")
                .append("</p>\n");
    }

    private void countMatrix() {
        List<String> layers = layerNames();
        LinkedHashSet<String> rules = new LinkedHashSet<>();
        d.findings().forEach(f -> rules.add(f.ruleId()));
        out.append("<table class=\"matrix\"><thead><tr><th>layer</th>");
        for (String r : rules) {
            out.append("<th>").append(e(r)).append("</th>");
        }
        out.append("<th>total</th></tr></thead><tbody>\n");
        for (String l : layers) {
            out.append("<tr><th>").append(e(l)).append("</th>");
            long total = 0;
            for (String r : rules) {
                long n = d.findings().stream().filter(f -> f.layer().equals(l) && f.ruleId().equals(r) && f.status().present())
                        .count();
                long w = d.findings().stream().filter(f -> f.layer().equals(l) && f.ruleId().equals(r) && f.status().present()
                        && f.waived()).count();
                total += n;
                out.append("<td").append(n - w > 0 ? " style=\"background:" + Palette.change(
                        RuleChange.TIGHTENED) + "\"" : "").append(">").append(n);
                if (w > 0) {
                    out.append(" <span class=\"m\">(").append(w).append(" waived)</span>");
                }
                out.append("</td>");
            }
            out.append("<td>").append(total).append("</td></tr>\n");
        }
        out.append("</tbody></table>\n");
    }

    private void layers() {
        out.append("<section id=\"layers\"><h2>Layers</h2>\n<div class=\"pics\">\n");
        for (String l : layerNames()) {
            out.append("<figure>");
            Svg.Picture pic = picture(l, 640, 480);
            out.append(pic.svg());
            long present = d.findings().stream().filter(f -> f.layer().equals(l) && f.status().present()).count();
            out.append("<figcaption><strong>").append(e(l)).append("</strong> \u00b7 ");
            layerInfo(l).ifPresent(li -> {
                li.gdsLayer().ifPresent(n -> out.append("GDS ").append(n));
                li.gdsDatatype().ifPresent(n -> out.append('/').append(n));
                if (li.gdsLayer().isPresent()) {
                    out.append(" \u00b7 ");
                }
                if (li.moved()) {
                    out.append("moved \u00b7 ");
                }
            });
            out.append(present).append(" violation place(s) marked");
            if (pic.densityGrid()) {
                out.append(" \u00b7 more than ").append(MAX_SHAPES_PER_PICTURE).append(" shapes: drawn as a ")
                        .append(COVERAGE_GRID).append("\u00d7").append(COVERAGE_GRID).append(" coverage grid");
            } else {
                out.append(" \u00b7 ").append(pic.shapes()).append(" shapes");
            }
            long all = d.findings().stream().filter(f -> f.layer().equals(l)).count();
            if (pic.markers() < all) {
                out.append(" \u00b7 first ").append(pic.markers()).append(" of ").append(all).append(" markers drawn");
            }
            out.append("</figcaption></figure>\n");
        }
        out.append("</div>\n").append(legend()).append("</section>\n");
    }

    private Svg.Picture picture(String layer, int w, int h) {
        List<NmPolygon> shapes = d.geometry(layer).map(LayerGeometry::polygons).orElse(List.of());
        List<Finding> fs = new ArrayList<>(Svg.ofLayer(d.findings(), layer));
        // draw fixed first so present findings lie on top
        fs.sort(DISPLAY.reversed());
        return Svg.layer(layer, shapes, fs, Palette.layer(layerColour.getOrDefault(layer, 0)), w, h,
                MAX_SHAPES_PER_PICTURE, COVERAGE_GRID, MAX_MARKERS_PER_PICTURE);
    }

    private String legend() {
        StringBuilder sb = new StringBuilder("<p class=\"legend\">");
        if (d.kind() == ReportKind.CHECK) {
            sb.append(swatch(Palette.OPEN, "violation"));
        } else {
            sb.append(swatch(Palette.NEW, "new")).append(swatch(Palette.PERSISTING, "persisting"))
                    .append(swatch(Palette.FIXED, "fixed"));
        }
        return sb.append(swatch(Palette.WAIVED, "waived")).append("</p>\n").toString();
    }

    private static String swatch(String colour, String label) {
        return "<span class=\"sw\" style=\"border-color:" + colour + ";background:" + colour + "4d\"></span>"
                + Html.esc(label) + " ";
    }

    private void findings() {
        List<Finding> open = new ArrayList<>(d.openFindings());
        List<Finding> waived = new ArrayList<>(d.waivedFindings());
        List<Finding> fixed = new ArrayList<>(d.findings().stream().filter(f -> f.status() == FindingStatus.FIXED).toList());
        open.sort(DISPLAY);
        waived.sort(DISPLAY);
        fixed.sort(DISPLAY);
        out.append("<section id=\"findings\"><h2>Findings</h2>\n");
        int total = open.size() + waived.size() + fixed.size();
        if (total > MAX_THUMBNAILS) {
            out.append("<p class=\"note\">Thumbnails are drawn for the first ").append(MAX_THUMBNAILS).append(" of ")
                    .append(total).append(" findings (not waived first, then waived, then fixed).</p>\n");
        }
        out.append("<h3 id=\"open\">Not waived (").append(open.size()).append(")</h3>\n");
        table(open, false);
        out.append("<h3 id=\"waived\">Waived (").append(waived.size()).append(")</h3>\n");
        table(waived, true);
        if (d.kind() != ReportKind.CHECK) {
            out.append("<h3 id=\"fixed\">Fixed by the move (").append(fixed.size()).append(")</h3>\n");
            table(fixed, false);
        }
        out.append("</section>\n");
    }

    private void table(List<Finding> fs, boolean waived) {
        if (fs.isEmpty()) {
            out.append("<p class=\"none\">None.</p>\n");
            return;
        }
        out.append("<table class=\"findings\"><thead><tr><th>picture</th><th>status</th><th>layer</th><th>rule</th>")
                .append("<th>kind</th><th>measured</th><th>required</th><th>marker (nm)</th><th>fingerprint</th>");
        if (waived) {
            out.append("<th>reason</th><th>author</th><th>date</th>");
        }
        out.append("</tr></thead><tbody>\n");
        int rows = 0;
        for (Finding f : fs) {
            if (rows++ >= MAX_TABLE_ROWS) {
                break;
            }
            String id = "f-" + f.fingerprint();
            out.append("<tr").append(ids.add(id) ? " id=\"" + id + "\"" : "").append("><td class=\"th\">");
            if (thumbnails < MAX_THUMBNAILS) {
                thumbnails++;
                NmBox win = Svg.window(f.marker());
                ShapeIndex idx = indexes.computeIfAbsent(f.layer(),
                        l -> new ShapeIndex(d.geometry(l).map(LayerGeometry::polygons).orElse(List.of())));
                out.append(Svg.thumbnail(f, idx.query(win, MAX_THUMBNAIL_SHAPES), win,
                        Palette.layer(layerColour.getOrDefault(f.layer(), 0)), 120));
            }
            String c = Palette.finding(f.status(), f.waived());
            out.append("</td><td><span class=\"tag\" style=\"background:").append(c).append("\">")
                    .append(f.status().name().toLowerCase(Locale.ROOT)).append("</span></td><td>").append(e(f.layer()))
                    .append("</td><td>").append(e(f.ruleId())).append("</td><td>").append(e(f.ruleKind()))
                    .append("</td><td class=\"n\">").append(e(Fmt.value(f.measured(), f.unit())))
                    .append("</td><td class=\"n\">").append(e(Fmt.value(f.required(), f.unit())))
                    .append("</td><td class=\"n\">").append(e(boxText(f.marker()))).append("</td><td><code>")
                    .append(e(f.fingerprint())).append("</code></td>");
            if (waived) {
                Waiver w = f.waiver().orElseThrow();
                out.append("<td>").append(e(w.reason())).append("</td><td>").append(e(w.author())).append("</td><td>")
                        .append(e(w.date().toString())).append("</td>");
            }
            out.append("</tr>\n");
        }
        out.append("</tbody></table>\n");
        if (fs.size() > MAX_TABLE_ROWS) {
            out.append("<p class=\"note\">First ").append(MAX_TABLE_ROWS).append(" of ").append(fs.size())
                    .append(" rows shown; findings.csv and report.json hold all of them.</p>\n");
        }
    }

    private void staleWaivers() {
        out.append("<section id=\"stale\"><h2>Stale waivers (").append(d.staleWaivers().size()).append(")</h2>\n");
        if (d.staleWaivers().isEmpty()) {
            out.append("<p class=\"none\">Every waiver matched a finding.</p>\n</section>\n");
            return;
        }
        out.append("<p>These waivers match no violation present in this run: the place was fixed or changed. ")
                .append("Review and remove them.</p>\n<table><thead><tr><th>rule</th><th>layer</th><th>box (nm)</th>")
                .append("<th>fingerprint</th><th>reason</th><th>author</th><th>date</th><th>where</th></tr></thead><tbody>\n");
        for (Waiver w : d.staleWaivers()) {
            out.append("<tr><td>").append(e(w.rule())).append("</td><td>").append(e(w.layer())).append("</td><td>")
                    .append(e(w.box().map(HtmlReport::boxText).orElse("\u2014"))).append("</td><td><code>")
                    .append(e(w.fingerprint().orElse("\u2014"))).append("</code></td><td>").append(e(w.reason()))
                    .append("</td><td>").append(e(w.author())).append("</td><td>").append(e(w.date().toString()))
                    .append("</td><td>").append(e(w.origin().orElse(""))).append("</td></tr>\n");
        }
        out.append("</tbody></table>\n</section>\n");
    }

    private void histograms() {
        if (d.histograms().isEmpty()) {
            return;
        }
        out.append("<section id=\"histograms\"><h2>Measured widths, spacings and pitches</h2>\n")
                .append("<p>Bars: measured values. Dashed line: rule under the source option; solid line: rule ")
                .append("under the target option.</p>\n<div class=\"pics\">\n");
        for (Histogram h : d.histograms()) {
            out.append("<figure>").append(Svg.histogram(h, 420, 200, HISTOGRAM_BINS)).append("<figcaption><strong>")
                    .append(e(h.layer())).append("</strong> ").append(h.quantity().name().toLowerCase(Locale.ROOT)).append(" \u00b7 ")
                    .append(h.count()).append(" values");
            if (h.newRule().isPresent()) {
                double r = h.newRule().getAsDouble();
                long below = java.util.Arrays.stream(h.values()).filter(v -> v < r).count();
                out.append(" \u00b7 ").append(below).append(" below the new rule");
            }
            out.append("</figcaption></figure>\n");
        }
        out.append("</div>\n</section>\n");
    }

    private void headroom() {
        if (d.headroom().isEmpty()) {
            return;
        }
        out.append("<section id=\"headroom\"><h2>Shrink headroom</h2>\n<p>The smallest linear scale factor each layer ")
                .append("takes under the target option without a new violation; \u201cat least\u201d where nothing ")
                .append("limited the search.</p>\n<table><thead><tr><th>layer</th><th>rule</th><th>factor</th>")
                .append("<th>headroom</th><th></th><th>x only</th><th>y only</th><th>limiting place (nm)</th>")
                .append("<th>measured</th><th>required</th></tr></thead><tbody>\n");
        for (HeadroomRow h : d.headroom()) {
            out.append("<tr><td>").append(e(h.layer())).append("</td><td>").append(e(h.rule())).append("</td><td class=\"n\">")
                    .append(Fmt.num(h.factor(), 4)).append("</td><td class=\"n\">").append(h.bounded() ? "\u2265 " : "")
                    .append(pct(h.headroom())).append("</td><td>").append(Svg.factorBar(h.factor(), 120, 10))
                    .append("</td><td class=\"n\">").append(Fmt.num(h.factorX(), "\u2014")).append("</td><td class=\"n\">")
                    .append(Fmt.num(h.factorY(), "\u2014")).append("</td><td class=\"n\">")
                    .append(e(h.limitingPlace().map(HtmlReport::boxText).orElse("\u2014"))).append("</td><td class=\"n\">")
                    .append(Fmt.num(h.measured(), "\u2014")).append("</td><td class=\"n\">")
                    .append(Fmt.num(h.required(), "\u2014")).append("</td></tr>\n");
        }
        out.append("</tbody></table>\n</section>\n");
    }

    private void masks() {
        if (d.masks().isEmpty()) {
            return;
        }
        MaskSummary m = d.masks().get();
        out.append("<section id=\"masks\"><h2>Masks and exposures</h2>\n<table><thead><tr><th>layer</th>")
                .append("<th>patterning</th><th>masks</th><th>exposures</th><th>scanner s/wafer</th><th>saved</th>")
                .append("</tr></thead><tbody>\n");
        for (MaskRow r : m.rows()) {
            out.append("<tr><td>").append(e(r.layer())).append("</td><td>").append(e(r.oldPatterning())).append(" \u2192 ")
                    .append(e(r.newPatterning())).append("</td><td class=\"n\">").append(r.oldMasks()).append(" \u2192 ")
                    .append(r.newMasks()).append("</td><td class=\"n\">").append(r.oldExposures()).append(" \u2192 ")
                    .append(r.newExposures()).append("</td><td class=\"n\">").append(Fmt.num(r.oldSeconds(), "\u2014"))
                    .append(" \u2192 ").append(Fmt.num(r.newSeconds(), "\u2014")).append("</td><td class=\"n\">")
                    .append(signed(r.masksSaved())).append(" mask(s)</td></tr>\n");
        }
        out.append("<tr class=\"total\"><td>total</td><td></td><td class=\"n\">").append(m.oldMasks()).append(" \u2192 ")
                .append(m.newMasks()).append("</td><td class=\"n\">").append(m.oldExposures()).append(" \u2192 ")
                .append(m.newExposures()).append("</td><td class=\"n\">").append(Fmt.num(m.oldSeconds(), "\u2014"))
                .append(" \u2192 ").append(Fmt.num(m.newSeconds(), "\u2014")).append("</td><td class=\"n\">")
                .append(signed(m.masksSaved())).append(" mask(s), ").append(signed(m.exposuresSaved()))
                .append(" exposure(s)</td></tr>\n</tbody></table>\n</section>\n");
    }

    private void field() {
        if (d.field().isEmpty()) {
            return;
        }
        FieldResult f = d.field().get();
        out.append("<section id=\"field\"><h2>Exposure field and stitching</h2>\n<p>Die ")
                .append(Fmt.num(f.die().width() / 1e6, 3)).append(" \u00d7 ").append(Fmt.num(f.die().height() / 1e6, 3))
                .append(" mm against the field of ").append(e(f.option())).append(", ")
                .append(Fmt.num(f.fieldWidthNm() / 1e6, 3)).append(" \u00d7 ").append(Fmt.num(f.fieldHeightNm() / 1e6, 3))
                .append(" mm: ");
        if (f.fits()) {
            out.append("<strong>fits one field</strong>, no stitching.</p>\n");
        } else {
            long crossing = f.crossings().stream().filter(StitchCrossing::crosses).count();
            out.append("<strong>needs stitching</strong> along ").append(f.lines().size()).append(" line(s); ")
                    .append(crossing).append(" critical shape(s) cross a line, ").append(f.crossings().size() - crossing)
                    .append(" lie in the keep-out band of ").append(Fmt.num(f.keepOutNm())).append(" nm.</p>\n");
        }
        out.append(Svg.field(f, 520, 360, MAX_TABLE_ROWS));
        if (!f.crossings().isEmpty()) {
            out.append("<table><thead><tr><th>layer</th><th>shape (nm)</th><th>where</th></tr></thead><tbody>\n");
            int n = 0;
            for (StitchCrossing c : f.crossings()) {
                if (n++ >= MAX_TABLE_ROWS) {
                    break;
                }
                out.append("<tr><td>").append(e(c.layer())).append("</td><td class=\"n\">").append(e(boxText(c.shape())))
                        .append("</td><td>").append(c.crosses() ? "crosses the line" : "in the keep-out band")
                        .append("</td></tr>\n");
            }
            out.append("</tbody></table>\n");
        }
        out.append("</section>\n");
    }

    private void provenance() {
        Provenance p = d.provenance();
        out.append("<section id=\"provenance\"><h2>Provenance</h2>\n<table class=\"prov\"><tbody>\n");
        row("Apertura version", p.toolVersion());
        row("created (UTC)", DateTimeFormatter.ISO_INSTANT.format(p.created()));
        row("command", String.join(" ", p.command()));
        row("source option", p.sourceOption());
        row("target option", p.targetOption().orElse("\u2014 (plain check)"));
        out.append("</tbody></table>\n<table><thead><tr><th>input</th><th>path</th><th>SHA-256</th><th>bytes</th></tr>")
                .append("</thead><tbody>\n");
        for (InputFile f : p.inputs()) {
            out.append("<tr><td>").append(e(f.role())).append("</td><td>").append(e(f.path())).append("</td><td><code>")
                    .append(e(f.sha256())).append("</code></td><td class=\"n\">").append(f.sizeBytes())
                    .append("</td></tr>\n");
        }
        out.append("</tbody></table>\n</section>\n");
    }

    private void row(String k, String v) {
        out.append("<tr><th>").append(e(k)).append("</th><td>").append(e(v)).append("</td></tr>\n");
    }

    private List<String> layerNames() {
        LinkedHashSet<String> s = new LinkedHashSet<>();
        d.layers().forEach(l -> s.add(l.name()));
        d.findings().forEach(f -> s.add(f.layer()));
        d.geometry().forEach(g -> s.add(g.layer()));
        return new ArrayList<>(s);
    }

    private Optional<LayerInfo> layerInfo(String name) {
        return d.layers().stream().filter(l -> l.name().equals(name)).findFirst();
    }

    private String kindLabel() {
        return switch (d.kind()) {
        case CHECK -> "check";
        case COMPARE -> "option comparison";
        case MIGRATION -> "migration";
        };
    }

    private static String boxText(NmBox b) {
        return "(" + Fmt.num(b.x1()) + ", " + Fmt.num(b.y1()) + ") \u2013 (" + Fmt.num(b.x2()) + ", " + Fmt.num(b.y2()) + ")";
    }

    private static String pct(double fraction) {
        return Fmt.num(fraction * 100, 1) + " %";
    }

    private static String signed(int n) {
        return n > 0 ? "+" + n : Integer.toString(n);
    }

    private static String e(String s) {
        return Html.esc(s);
    }

    private static String css() {
        return ":root{--paper:" + Palette.PAPER + ";--panel:" + Palette.PANEL + ";--ink:" + Palette.INK + ";--muted:"
                + Palette.MUTED + ";--line:" + Palette.RULE_LINE + ";--band:" + Palette.BAND + "}\n"
                + "*{box-sizing:border-box}\n"
                + "body{margin:0;background:var(--paper);color:var(--ink);font:14px/1.45 'DejaVu Sans',system-ui,sans-serif}\n"
                + ".band{background:var(--band);color:" + Palette.BAND_TEXT + ";padding:14px 28px 12px}\n"
                + ".brand{font-size:12px;letter-spacing:.25em;text-transform:uppercase;opacity:.8}\n"
                + "h1{margin:2px 0 4px;font-size:22px;font-weight:600}\n"
                + ".sub{margin:0;opacity:.85;font-size:13px}\n"
                + ".caution{margin:14px 28px 0;padding:10px 14px;background:" + Palette.CAUTION_BG
                + ";border-left:5px solid " + Palette.CAUTION_EDGE + "}\n"
                + "nav{margin:10px 28px 0;font-size:13px}nav a{margin-right:14px;color:var(--band)}\n"
                + "section{margin:16px 28px;padding:14px 18px;background:var(--panel);border:1px solid var(--line);border-radius:6px}\n"
                + "h2{margin:0 0 10px;font-size:17px;color:var(--band)}h3{font-size:15px;margin:16px 0 6px}\n"
                + ".cards{display:flex;flex-wrap:wrap;gap:10px;background:none;border:none;padding:0}\n"
                + ".card{min-width:120px;padding:8px 12px;background:var(--panel);border:1px solid var(--line);border-top:4px solid;border-radius:5px}\n"
                + ".card .num{font-size:22px;font-weight:600}.card .lbl{font-size:12px;color:var(--muted)}\n"
                + ".overview{display:flex;flex-wrap:wrap;gap:24px;align-items:flex-start}\n"
                + ".ov-table{flex:1 1 520px;overflow-x:auto}.ov-pic{flex:0 0 auto}\n"
                + "table{border-collapse:collapse;font-size:12.5px}th,td{border:1px solid var(--line);padding:4px 7px;vertical-align:top}\n"
                + "thead th{background:#ebe5d8;text-align:left}tbody th{text-align:left;background:#f3efe6}\n"
                + ".matrix td{min-width:110px}.matrix .v{font-weight:600}.m{font-size:11px;color:#3d4a4f}\n"
                + ".ax{font-size:10px;color:var(--muted);text-transform:uppercase}\n"
                + ".cnt-new{color:" + Palette.NEW + "}.cnt-fix{color:" + Palette.FIXED + "}\n"
                + ".key span{padding:1px 6px;margin-right:4px;border-radius:3px}.key{font-size:12px;color:var(--muted)}\n"
                + ".pics{display:flex;flex-wrap:wrap;gap:16px}figure{margin:0}figcaption{font-size:12px;color:var(--muted);max-width:640px}\n"
                + "svg{display:block;border:1px solid var(--line);background:var(--panel)}svg text{font-size:11px;fill:var(--ink)}\n"
                + "svg.bar{border:none;display:inline-block}\n"
                + ".legend{font-size:12px}.sw{display:inline-block;width:12px;height:12px;border:2px solid;margin:0 4px -2px 10px}\n"
                + ".findings td.th{padding:2px}.tag{color:#fff;padding:1px 6px;border-radius:3px;font-size:11px}\n"
                + "td.n{text-align:right;white-space:nowrap}code{font-size:11.5px}\n"
                + ".note,.none{color:var(--muted);font-style:italic}\n"
                + "tr.total td{font-weight:600;background:#f3efe6}\n"
                + ".prov th{width:160px}\n"
                + "footer{margin:8px 28px 28px;font-size:12px;color:var(--muted)}\n";
    }
}
