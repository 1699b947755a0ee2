/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.layout;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.model.Cell;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * A layout's polygons by deck layer name, in the deck's database units.
 *
 * @param file      where the layout came from
 * @param topCell   the cell that was flattened
 * @param polygons  polygons per deck layer (GDS layer/datatype matched to the deck's layers); deck
 *                  layers the layout does not draw are absent
 * @param extent    the bounding box of every polygon of the cell on any layer (the top cell's
 *                  extent), null for an empty cell
 * @param warnings  reader and flattener warnings
 */
public record LayoutLayers(String file, String topCell, Map<String, List<Polygon>> polygons, Box extent,
        List<String> warnings) {

    /** Copies the collections. */
    public LayoutLayers {
        polygons = Map.copyOf(polygons);
        warnings = List.copyOf(warnings);
    }

    /**
     * Reads a GDSII file, flattens its top cell (or the named cell) and keeps the deck's layers.
     * When the file's database unit is a whole multiple of the deck's, coordinates are multiplied by
     * that factor; any other pair of units is refused.
     *
     * @throws IOException on read errors and format errors (naming the file and byte offset)
     * @throws IllegalArgumentException when the top cell is ambiguous or missing, or the units do not fit
     */
    public static LayoutLayers read(Path file, ResolvedDeck deck, Optional<String> cellName) throws IOException {
        GdsReadResult read = GdsReader.read(file);
        Cell top = chooseCell(file, read, cellName);
        FlattenResult flat = Flattener.flatten(top);
        double fileUnit = read.library().getMetresPerDatabaseUnit();
        double deckUnit = deck.databaseUnitMetres();
        double ratio = fileUnit / deckUnit;
        long factor = Math.round(ratio);
        if (factor < 1 || Math.abs(ratio - factor) > 1e-6 * ratio) {
            throw new IllegalArgumentException(file + ": database unit " + fileUnit + " m does not convert to the deck's "
                    + deckUnit + " m by a whole factor");
        }
        List<String> warnings = new ArrayList<>(read.warnings());
        warnings.addAll(flat.warnings());
        Map<String, List<Polygon>> byName = new TreeMap<>();
        Box extent = null;
        for (Map.Entry<LayerKey, List<Polygon>> e : flat.polygons().entrySet()) {
            List<Polygon> scaled = factor == 1 ? e.getValue() : scale(e.getValue(), factor);
            for (Polygon p : scaled) {
                long[] b = p.bounds();
                Box pb = new Box(b[0], b[1], b[2], b[3]);
                extent = extent == null ? pb : extent.union(pb);
            }
            for (Layer l : deck.layers()) {
                if (l.gdsLayer() == e.getKey().layer() && l.gdsDatatype() == e.getKey().datatype()) {
                    byName.computeIfAbsent(l.name(), k -> new ArrayList<>()).addAll(scaled);
                }
            }
        }
        return new LayoutLayers(file.toString(), top.getName(), byName, extent, warnings);
    }

    private static Cell chooseCell(Path file, GdsReadResult read, Optional<String> cellName) {
        if (cellName.isPresent()) {
            return read.library().getCells().stream().filter(c -> cellName.get().equals(c.getName())).findFirst()
                    .orElseThrow(() -> new IllegalArgumentException(file + ": no cell named '" + cellName.get() + "'"));
        }
        if (read.topCells().size() != 1) {
            throw new IllegalArgumentException(file + ": " + read.topCells().size() + " top cells ("
                    + String.join(", ", read.topCells().stream().map(Cell::getName).limit(10).toList())
                    + "); name the cell to analyse");
        }
        return read.topCells().get(0);
    }

    private static List<Polygon> scale(Collection<Polygon> ps, long f) {
        List<Polygon> out = new ArrayList<>(ps.size());
        for (Polygon p : ps) {
            long[] c = p.coordinates();
            for (int i = 0; i < c.length; i++) {
                c[i] = Math.multiplyExact(c[i], f);
            }
            out.add(Polygon.of(c));
        }
        return out;
    }
}
