/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.write;

import java.io.Writer;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.apertura.report.Caution;
import org.apertura.report.internal.Fmt;
import org.apertura.report.json.JsonWriter;
import org.apertura.report.model.EdgePair;
import org.apertura.report.model.Finding;
import org.apertura.report.model.FindingStatus;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.Provenance;
import org.apertura.report.model.ReportData;
import org.apertura.report.model.Waiver;

/**
 * Writes a report as SARIF 2.1.0 (OASIS Static Analysis Results Interchange Format) for code-review tools.
 *
 * <p>One run; {@code tool.driver} is Apertura with one rule entry per rule id found. Each finding is a result
 * whose location points at the layout file (the {@code layout} input) as artifact, names the layer as a
 * logical location of kind {@code layer}, and carries the marker box and edge pair in nm in the location's
 * property bag ({@code markerNm}, {@code edgesNm}). Findings of a migration carry {@code baselineState}: new,
 * unchanged (persisting) or absent (fixed, written as {@code kind: pass}, {@code level: none}). A waived finding
 * carries an external, accepted suppression with the reason as justification. The fingerprint goes into
 * {@code partialFingerprints["aperturaPlace/v1"]}. Input hashes, options and the caution are in the
 * invocation, the artifacts and the run's property bag.
 */
public final class SarifReport {

    /** The schema URI written in {@code $schema}. */
    public static final String SCHEMA_URI =
            "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";

    /** The key of the fingerprint in {@code partialFingerprints}. */
    public static final String FINGERPRINT_KEY = "aperturaPlace/v1";

    private SarifReport() {
    }

    /** Writes {@code data} as SARIF to {@code out}. */
    public static void write(ReportData data, Writer out) {
        Provenance p = data.provenance();
        JsonWriter w = new JsonWriter(out);
        w.beginObject().member("$schema", SCHEMA_URI).member("version", "2.1.0");
        w.name("runs").beginArray().beginObject();

        Map<String, List<Finding>> byRule = new LinkedHashMap<>();
        for (Finding f : data.findings()) {
            byRule.computeIfAbsent(f.ruleId(), k -> new ArrayList<>()).add(f);
        }
        List<String> ruleIds = new ArrayList<>(byRule.keySet());
        w.name("tool").beginObject().name("driver").beginObject().member("name", "Apertura")
                .member("version", p.toolVersion());
        w.name("rules").beginArray();
        for (String id : ruleIds) {
            List<Finding> fs = byRule.get(id);
            Set<String> layers = new LinkedHashSet<>();
            Set<String> kinds = new LinkedHashSet<>();
            fs.forEach(f -> {
                layers.add(f.layer());
                kinds.add(f.ruleKind());
            });
            w.beginObject().member("id", id);
            w.name("shortDescription").beginObject()
                    .member("text", String.join("/", kinds) + " rule " + id + " on " + String.join(", ", layers))
                    .endObject();
            w.name("defaultConfiguration").beginObject().member("level", "error").endObject();
            w.name("properties").beginObject();
            strings(w.name("layers"), layers);
            strings(w.name("ruleKinds"), kinds);
            w.endObject();
            w.endObject();
        }
        w.endArray().endObject().endObject();

        w.name("invocations").beginArray().beginObject().member("executionSuccessful", true)
                .member("commandLine", String.join(" ", p.command()));
        strings(w.name("arguments"), p.command().size() > 1 ? p.command().subList(1, p.command().size()) : List.of());
        w.member("endTimeUtc", DateTimeFormatter.ISO_INSTANT.format(p.created()));
        w.endObject().endArray();

        int layoutIndex = -1;
        w.name("artifacts").beginArray();
        for (int i = 0; i < p.inputs().size(); i++) {
            InputFile in = p.inputs().get(i);
            if (layoutIndex < 0 && in.role().equals("layout")) {
                layoutIndex = i;
            }
            w.beginObject().name("location").beginObject().member("uri", uri(in.path())).endObject();
            w.member("length", in.sizeBytes());
            w.name("roles").beginArray().value(role(in.role())).endArray();
            w.name("hashes").beginObject().member("sha-256", in.sha256()).endObject();
            w.name("properties").beginObject().member("aperturaRole", in.role()).endObject();
            w.endObject();
        }
        w.endArray();

        w.name("results").beginArray();
        for (Finding f : data.findings()) {
            result(w, f, ruleIds.indexOf(f.ruleId()), layoutIndex, layoutIndex < 0 ? null : p.inputs().get(layoutIndex));
        }
        w.endArray();

        w.name("properties").beginObject().member("caution", Caution.TEXT)
                .member("reportKind", JsonReport.lower(data.kind())).member("title", data.title())
                .member("sourceOption", p.sourceOption());
        w.name("targetOption").value(p.targetOption().orElse(null));
        w.name("staleWaivers").beginArray();
        for (Waiver s : data.staleWaivers()) {
            JsonReport.waiver(w, s);
        }
        w.endArray();
        w.endObject();

        w.endObject().endArray().endObject();
        w.finish();
    }

    private static void result(JsonWriter w, Finding f, int ruleIndex, int layoutIndex, InputFile layout) {
        boolean fixed = f.status() == FindingStatus.FIXED;
        w.beginObject().member("ruleId", f.ruleId()).member("ruleIndex", ruleIndex)
                .member("kind", fixed ? "pass" : "fail").member("level", fixed ? "none" : "error");
        w.name("message").beginObject().member("text", Fmt.message(f)).endObject();
        w.name("locations").beginArray().beginObject();
        if (layout != null) {
            w.name("physicalLocation").beginObject().name("artifactLocation").beginObject()
                    .member("uri", uri(layout.path())).member("index", layoutIndex).endObject().endObject();
        }
        w.name("logicalLocations").beginArray().beginObject().member("name", f.layer()).member("kind", "layer")
                .endObject().endArray();
        w.name("properties").beginObject();
        JsonReport.box(w.name("markerNm"), f.marker());
        if (f.edges().isPresent()) {
            EdgePair e = f.edges().get();
            w.name("edgesNm").beginArray();
            w.beginArray().value(e.a().x1()).value(e.a().y1()).value(e.a().x2()).value(e.a().y2()).endArray();
            w.beginArray().value(e.b().x1()).value(e.b().y1()).value(e.b().x2()).value(e.b().y2()).endArray();
            w.endArray();
        }
        w.endObject();
        w.endObject().endArray();
        w.name("partialFingerprints").beginObject().member(FINGERPRINT_KEY, f.fingerprint()).endObject();
        switch (f.status()) {
        case NEW -> w.member("baselineState", "new");
        case PERSISTING -> w.member("baselineState", "unchanged");
        case FIXED -> w.member("baselineState", "absent");
        case OPEN -> {
            // a plain check has no baseline
        }
        }
        if (f.waiver().isPresent()) {
            Waiver v = f.waiver().get();
            w.name("suppressions").beginArray().beginObject().member("kind", "external").member("status", "accepted")
                    .member("justification", v.reason());
            w.name("properties").beginObject().member("author", v.author()).member("date", v.date().toString());
            w.name("origin").value(v.origin().orElse(null));
            w.endObject().endObject().endArray();
        }
        w.name("properties").beginObject().member("status", JsonReport.lower(f.status()))
                .member("layer", f.layer()).member("ruleKind", f.ruleKind()).member("measured", f.measured())
                .member("required", f.required()).member("unit", f.unit().symbol()).endObject();
        w.endObject();
    }

    private static void strings(JsonWriter w, Iterable<String> values) {
        w.beginArray();
        values.forEach(w::value);
        w.endArray();
    }

    private static String role(String aperturaRole) {
        return switch (aperturaRole) {
        case "layout" -> "analysisTarget";
        case "deck", "waivers" -> "userSpecifiedConfiguration";
        default -> "referencedOnCommandLine";
        };
    }

    /** A URI reference for a path as given: file URI when absolute, relative reference otherwise. */
    static String uri(String path) {
        Path p = Path.of(path);
        if (p.isAbsolute()) {
            return p.toUri().toASCIIString();
        }
        try {
            return new URI(null, null, path.replace('\\', '/'), null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("path cannot be written as a URI: " + path, e);
        }
    }
}
