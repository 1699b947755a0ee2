/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.migration;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.report.model.Histogram;
import org.apertura.report.model.LayerInfo;
import org.apertura.report.model.Provenance;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * What a report needs besides the analysis result itself.
 *
 * @param databaseUnitNm the size of one database unit of the deck in nm (0.25 for a deck written
 *                       {@code database unit 0.25 nm}); must be positive
 * @param provenance     inputs with their hashes, options, tool version and time
 * @param layers         the layers to list in the report, in deck order
 * @param geometry       polygons per deck layer in database units, for pictures; empty for no pictures
 * @param extent         the analysed cell's extent in database units; where the die is drawn in the field
 *                       picture (empty: the die is placed at the origin)
 * @param histograms     measured-value histograms, already in nm
 */
public record ReportContext(double databaseUnitNm, Provenance provenance, List<LayerInfo> layers,
        Map<String, List<Polygon>> geometry, Optional<Box> extent, List<Histogram> histograms) {

    /** Copies the collections and checks the unit. */
    public ReportContext {
        if (!(databaseUnitNm > 0) || Double.isInfinite(databaseUnitNm)) {
            throw new IllegalArgumentException("database unit must be a positive number of nm, got " + databaseUnitNm);
        }
        Objects.requireNonNull(provenance, "provenance");
        layers = List.copyOf(layers);
        geometry = Map.copyOf(geometry);
        Objects.requireNonNull(extent, "extent");
        histograms = List.copyOf(histograms);
    }

    /** A context without pictures, extent or histograms. */
    public static ReportContext of(ResolvedDeck deck, Provenance provenance, Collection<String> layers,
            Set<String> moved) {
        return new ReportContext(deck.databaseUnitNanometres().doubleValue(), provenance, layerInfos(deck, layers, moved),
                Map.of(), Optional.empty(), List.of());
    }

    /** This context with pictures drawn from {@code polygons} (database units) and the cell extent. */
    public ReportContext withGeometry(Map<String, List<Polygon>> polygons, Optional<Box> cellExtent) {
        return new ReportContext(databaseUnitNm, provenance, layers, polygons, cellExtent, histograms);
    }

    /** This context with histograms. */
    public ReportContext withHistograms(List<Histogram> h) {
        return new ReportContext(databaseUnitNm, provenance, layers, geometry, extent, h);
    }

    /**
     * The deck's layers among {@code names}, in deck order, with their GDSII numbers; {@code moved} says which
     * ones the run moves to the target option. Names the deck does not know are left out.
     */
    public static List<LayerInfo> layerInfos(ResolvedDeck deck, Collection<String> names, Set<String> moved) {
        List<LayerInfo> out = new ArrayList<>();
        for (Layer l : deck.layers()) {
            if (names.contains(l.name())) {
                out.add(new LayerInfo(l.name(), OptionalInt.of(l.gdsLayer()), OptionalInt.of(l.gdsDatatype()),
                        moved.contains(l.name())));
            }
        }
        return out;
    }
}
