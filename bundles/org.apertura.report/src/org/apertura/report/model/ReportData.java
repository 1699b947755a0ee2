/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything a report shows. Required: kind, title, provenance, layers and findings. Optional sections
 * are empty lists or empty optionals: a plain check has no matrix, no headroom and no masks.
 *
 * @param kind          what produced the report
 * @param title         a one-line title
 * @param provenance    inputs, options, tool version and time
 * @param layers        the layers involved
 * @param findings      all findings, waived or not, in a stable order
 * @param staleWaivers  waivers that matched no present finding on this run
 * @param matrix        the layer &times; rule matrix (comparisons and migrations)
 * @param histograms    measured-value histograms
 * @param headroom      shrink headroom rows
 * @param masks         masks and exposures
 * @param field         the field / stitching result
 * @param geometry      shapes per layer, for pictures only
 */
public record ReportData(ReportKind kind, String title, Provenance provenance, List<LayerInfo> layers,
        List<Finding> findings, List<Waiver> staleWaivers, Optional<RuleMatrix> matrix, List<Histogram> histograms,
        List<HeadroomRow> headroom, Optional<MaskSummary> masks, Optional<FieldResult> field,
        List<LayerGeometry> geometry) {

    /** Copies the lists and checks the required parts are present. */
    public ReportData {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(provenance, "provenance");
        layers = List.copyOf(layers);
        findings = List.copyOf(findings);
        staleWaivers = List.copyOf(staleWaivers);
        Objects.requireNonNull(matrix, "matrix");
        histograms = List.copyOf(histograms);
        headroom = List.copyOf(headroom);
        Objects.requireNonNull(masks, "masks");
        Objects.requireNonNull(field, "field");
        geometry = List.copyOf(geometry);
    }

    /** A builder starting with the required parts. */
    public static Builder builder(ReportKind kind, String title, Provenance provenance) {
        return new Builder(kind, title, provenance);
    }

    /** This report with other findings and stale waivers (used when waivers are applied). */
    public ReportData withFindings(List<Finding> f, List<Waiver> stale) {
        return new ReportData(kind, title, provenance, layers, f, stale, matrix, histograms, headroom, masks, field,
                geometry);
    }

    /** Count of findings with {@code status}, waived or not. */
    public long count(FindingStatus status) {
        return findings.stream().filter(f -> f.status() == status).count();
    }

    /** Findings present in the result and not waived. */
    public List<Finding> openFindings() {
        return findings.stream().filter(Finding::open).toList();
    }

    /** Findings present in the result and waived. */
    public List<Finding> waivedFindings() {
        return findings.stream().filter(f -> f.status().present() && f.waived()).toList();
    }

    /** The shapes of {@code layer}, if the report carries them. */
    public Optional<LayerGeometry> geometry(String layer) {
        return geometry.stream().filter(g -> g.layer().equals(layer)).findFirst();
    }

    /** Collects a report; optional sections default to empty. */
    public static final class Builder {
        private final ReportKind kind;
        private final String title;
        private final Provenance provenance;
        private final List<LayerInfo> layers = new ArrayList<>();
        private final List<Finding> findings = new ArrayList<>();
        private final List<Waiver> stale = new ArrayList<>();
        private RuleMatrix matrix;
        private final List<Histogram> histograms = new ArrayList<>();
        private final List<HeadroomRow> headroom = new ArrayList<>();
        private MaskSummary masks;
        private FieldResult field;
        private final List<LayerGeometry> geometry = new ArrayList<>();

        private Builder(ReportKind kind, String title, Provenance provenance) {
            this.kind = kind;
            this.title = title;
            this.provenance = provenance;
        }

        public Builder layer(LayerInfo l) {
            layers.add(l);
            return this;
        }

        public Builder findings(List<Finding> f) {
            findings.addAll(f);
            return this;
        }

        public Builder finding(Finding f) {
            findings.add(f);
            return this;
        }

        public Builder staleWaiver(Waiver w) {
            stale.add(w);
            return this;
        }

        public Builder matrix(RuleMatrix m) {
            matrix = m;
            return this;
        }

        public Builder histogram(Histogram h) {
            histograms.add(h);
            return this;
        }

        public Builder headroom(HeadroomRow h) {
            headroom.add(h);
            return this;
        }

        public Builder masks(MaskSummary m) {
            masks = m;
            return this;
        }

        public Builder field(FieldResult f) {
            field = f;
            return this;
        }

        public Builder geometry(LayerGeometry g) {
            geometry.add(g);
            return this;
        }

        public ReportData build() {
            return new ReportData(kind, title, provenance, layers, findings, stale, Optional.ofNullable(matrix),
                    histograms, headroom, Optional.ofNullable(masks), Optional.ofNullable(field), geometry);
        }
    }
}
