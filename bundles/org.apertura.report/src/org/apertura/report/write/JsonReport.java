/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.IOException;
import java.io.InputStream;
import java.io.Writer;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.apertura.report.Caution;
import org.apertura.report.json.JsonWriter;
import org.apertura.report.model.EdgePair;
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
import org.apertura.report.model.NmSegment;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.StitchCrossing;
import org.apertura.report.model.StitchLine;
import org.apertura.report.model.Waiver;

/**
 * Writes a report as JSON following the schema {@value #SCHEMA_RESOURCE} (JSON Schema draft-07, shipped
 * in this bundle and written beside every report). Numbers are written in their shortest round-trip form,
 * so a reader gets back exactly the doubles the analysis produced. Geometry for pictures is included
 * unless left out by the caller.
 */
public final class JsonReport {

    /** Class-path location of the report schema inside this bundle. */
    public static final String SCHEMA_RESOURCE = "/schema/apertura-report.schema.json";

    /** File name of the schema when written beside a report. */
    public static final String SCHEMA_FILE = "apertura-report.schema.json";

    private JsonReport() {
    }

    /** Opens the report schema shipped in the bundle. */
    public static InputStream openSchema() throws IOException {
        InputStream in = JsonReport.class.getResourceAsStream(SCHEMA_RESOURCE);
        if (in == null) {
            throw new IOException("report schema " + SCHEMA_RESOURCE + " is missing from the bundle");
        }
        return in;
    }

    /** Writes {@code data} to {@code out}; geometry is included when {@code withGeometry}. */
    public static void write(ReportData data, Writer out, boolean withGeometry) {
        JsonWriter w = new JsonWriter(out);
        w.beginObject();
        w.member("format", "apertura-report");
        w.member("formatVersion", 1);
        w.member("kind", data.kind().name().toLowerCase(Locale.ROOT));
        w.member("title", data.title());
        w.member("caution", Caution.TEXT);
        provenance(w.name("provenance"), data.provenance());
        summary(w.name("summary"), data);
        w.name("layers").beginArray();
        for (LayerInfo l : data.layers()) {
            w.beginObject().member("name", l.name());
            optInt(w.name("gdsLayer"), l.gdsLayer());
            optInt(w.name("gdsDatatype"), l.gdsDatatype());
            w.member("moved", l.moved()).endObject();
        }
        w.endArray();
        w.name("findings").beginArray();
        for (Finding f : data.findings()) {
            finding(w, f);
        }
        w.endArray();
        w.name("staleWaivers").beginArray();
        for (Waiver s : data.staleWaivers()) {
            waiver(w, s);
        }
        w.endArray();
        data.matrix().ifPresent(m -> {
            w.name("matrix").beginArray();
            for (MatrixRow r : m.rows()) {
                matrixRow(w, r);
            }
            w.endArray();
        });
        w.name("histograms").beginArray();
        for (Histogram h : data.histograms()) {
            w.beginObject().member("layer", h.layer()).member("quantity", lower(h.quantity()));
            w.name("values").beginArray();
            for (double v : h.values()) {
                w.value(v);
            }
            w.endArray();
            opt(w.name("oldRule"), h.oldRule());
            opt(w.name("newRule"), h.newRule());
            w.endObject();
        }
        w.endArray();
        w.name("headroom").beginArray();
        for (HeadroomRow h : data.headroom()) {
            w.beginObject().member("layer", h.layer()).member("rule", h.rule()).member("factor", h.factor())
                    .member("headroom", h.headroom()).member("bounded", h.bounded());
            opt(w.name("factorX"), h.factorX());
            opt(w.name("factorY"), h.factorY());
            optBox(w.name("limitingPlace"), h.limitingPlace());
            opt(w.name("measured"), h.measured());
            opt(w.name("required"), h.required());
            w.endObject();
        }
        w.endArray();
        data.masks().ifPresent(m -> masks(w.name("masks"), m));
        data.field().ifPresent(f -> field(w.name("field"), f));
        w.name("geometry").beginArray();
        if (withGeometry) {
            for (LayerGeometry g : data.geometry()) {
                w.beginObject().member("layer", g.layer()).name("polygons").beginArray();
                for (NmPolygon p : g.polygons()) {
                    w.beginArray();
                    for (int i = 0; i < p.size(); i++) {
                        w.value(p.x(i)).value(p.y(i));
                    }
                    w.endArray();
                }
                w.endArray().endObject();
            }
        }
        w.endArray();
        w.endObject();
        w.finish();
    }

    private static void provenance(JsonWriter w, Provenance p) {
        w.beginObject().member("toolVersion", p.toolVersion())
                .member("created", DateTimeFormatter.ISO_INSTANT.format(p.created()));
        w.name("command").beginArray();
        p.command().forEach(w::value);
        w.endArray();
        w.name("inputs").beginArray();
        for (InputFile f : p.inputs()) {
            w.beginObject().member("role", f.role()).member("path", f.path()).member("sha256", f.sha256())
                    .member("sizeBytes", f.sizeBytes()).endObject();
        }
        w.endArray();
        w.member("sourceOption", p.sourceOption());
        w.name("targetOption").value(p.targetOption().orElse(null));
        w.endObject();
    }

    private static void summary(JsonWriter w, ReportData d) {
        w.beginObject().member("new", d.count(FindingStatus.NEW)).member("fixed", d.count(FindingStatus.FIXED))
                .member("persisting", d.count(FindingStatus.PERSISTING)).member("open", d.count(FindingStatus.OPEN))
                .member("waived", d.waivedFindings().size()).member("unwaived", d.openFindings().size())
                .member("staleWaivers", d.staleWaivers().size()).endObject();
    }

    private static void finding(JsonWriter w, Finding f) {
        w.beginObject().member("fingerprint", f.fingerprint()).member("ruleId", f.ruleId())
                .member("ruleKind", f.ruleKind()).member("layer", f.layer()).member("measured", f.measured())
                .member("required", f.required()).member("unit", f.unit().symbol());
        box(w.name("marker"), f.marker());
        w.name("edges");
        if (f.edges().isPresent()) {
            EdgePair e = f.edges().get();
            w.beginArray();
            segment(w, e.a());
            segment(w, e.b());
            w.endArray();
        } else {
            w.nullValue();
        }
        w.member("status", lower(f.status()));
        w.name("waiver");
        if (f.waiver().isPresent()) {
            waiver(w, f.waiver().get());
        } else {
            w.nullValue();
        }
        w.endObject();
    }

    static void waiver(JsonWriter w, Waiver v) {
        w.beginObject().member("rule", v.rule()).member("layer", v.layer());
        optBox(w.name("box"), v.box());
        w.name("fingerprint").value(v.fingerprint().orElse(null));
        w.member("reason", v.reason()).member("author", v.author()).member("date", v.date().toString());
        w.name("origin").value(v.origin().orElse(null));
        w.endObject();
    }

    private static void matrixRow(JsonWriter w, MatrixRow r) {
        w.beginObject().member("layer", r.layer()).member("rule", r.rule()).member("axis", r.axis())
                .member("unit", r.unit().symbol());
        opt(w.name("oldValue"), r.oldValue());
        opt(w.name("newValue"), r.newValue());
        opt(w.name("difference"), r.difference());
        opt(w.name("ratio"), r.ratio());
        w.member("change", lower(r.change())).member("cause", r.cause());
        opt(w.name("k1Old"), r.k1Old());
        opt(w.name("k1New"), r.k1New());
        w.member("newCount", r.newCount()).member("fixedCount", r.fixedCount()).endObject();
    }

    private static void masks(JsonWriter w, MaskSummary m) {
        w.beginObject().name("rows").beginArray();
        for (MaskRow r : m.rows()) {
            w.beginObject().member("layer", r.layer()).member("oldPatterning", r.oldPatterning())
                    .member("newPatterning", r.newPatterning()).member("oldMasks", r.oldMasks())
                    .member("newMasks", r.newMasks()).member("oldExposures", r.oldExposures())
                    .member("newExposures", r.newExposures());
            opt(w.name("oldSeconds"), r.oldSeconds());
            opt(w.name("newSeconds"), r.newSeconds());
            w.endObject();
        }
        w.endArray();
        w.name("totals").beginObject().member("oldMasks", m.oldMasks()).member("newMasks", m.newMasks())
                .member("masksSaved", m.masksSaved()).member("oldExposures", m.oldExposures())
                .member("newExposures", m.newExposures()).member("exposuresSaved", m.exposuresSaved());
        opt(w.name("oldSeconds"), m.oldSeconds());
        opt(w.name("newSeconds"), m.newSeconds());
        w.endObject().endObject();
    }

    private static void field(JsonWriter w, FieldResult f) {
        w.beginObject().member("option", f.option());
        box(w.name("die"), f.die());
        w.member("fieldWidth", f.fieldWidthNm()).member("fieldHeight", f.fieldHeightNm())
                .member("keepOut", f.keepOutNm()).member("fits", f.fits());
        w.name("lines").beginArray();
        for (StitchLine l : f.lines()) {
            w.beginObject().member("vertical", l.vertical()).member("position", l.positionNm()).endObject();
        }
        w.endArray();
        w.name("crossings").beginArray();
        for (StitchCrossing c : f.crossings()) {
            w.beginObject().member("layer", c.layer());
            box(w.name("shape"), c.shape());
            w.member("crosses", c.crosses()).endObject();
        }
        w.endArray().endObject();
    }

    static void box(JsonWriter w, NmBox b) {
        w.beginArray().value(b.x1()).value(b.y1()).value(b.x2()).value(b.y2()).endArray();
    }

    private static void segment(JsonWriter w, NmSegment s) {
        w.beginArray().value(s.x1()).value(s.y1()).value(s.x2()).value(s.y2()).endArray();
    }

    private static void optBox(JsonWriter w, Optional<NmBox> b) {
        if (b.isPresent()) {
            box(w, b.get());
        } else {
            w.nullValue();
        }
    }

    private static void opt(JsonWriter w, OptionalDouble v) {
        if (v.isPresent()) {
            w.value(v.getAsDouble());
        } else {
            w.nullValue();
        }
    }

    private static void optInt(JsonWriter w, OptionalInt v) {
        if (v.isPresent()) {
            w.value(v.getAsInt());
        } else {
            w.nullValue();
        }
    }

    static String lower(Enum<?> e) {
        return e.name().toLowerCase(Locale.ROOT);
    }
}
