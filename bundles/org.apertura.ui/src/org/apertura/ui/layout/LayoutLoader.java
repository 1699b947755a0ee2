/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.layout;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.hierarchy.CellHierarchy;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Library;
import org.apertura.ui.viewer.LayoutScene;
import org.apertura.ui.viewer.SceneLayer;

/** Reads GDSII files and turns cells into viewer scenes. Plain Java; call it from a job. */
public final class LayoutLoader {

    private LayoutLoader() {
    }

    /** Reads a GDSII stream file (see {@link GdsReader} for the errors it reports). */
    public static GdsReadResult read(Path file) throws IOException {
        return GdsReader.read(file);
    }

    /**
     * The top cell to show first: of the cells nobody references, the one with the most shapes once
     * expanded (a library of standard cells has many tops; a block has one).
     */
    public static Cell mainTopCell(GdsReadResult read) {
        List<Cell> tops = read.topCells().isEmpty() ? read.library().getCells() : read.topCells();
        Map<Cell, Long> memo = new IdentityHashMap<>();
        Cell best = null;
        long bestCount = -1;
        for (Cell c : tops) {
            long n = expandedShapes(c, memo, 0);
            if (n > bestCount) {
                best = c;
                bestCount = n;
            }
        }
        return best;
    }

    private static long expandedShapes(Cell cell, Map<Cell, Long> memo, int depth) {
        Long known = memo.get(cell);
        if (known != null) {
            return known;
        }
        if (depth > 64) {
            return 0; // deeper hierarchies are refused by the flattener anyway
        }
        memo.put(cell, 0L); // guards against cycles; the reader refuses them already
        long n = 0;
        for (Element e : cell.getElements()) {
            if (e instanceof CellReference ref && ref.getCell() != null) {
                long child = expandedShapes(ref.getCell(), memo, depth + 1);
                n = sat(n + sat(child * CellHierarchy.instanceCount(ref)));
            } else {
                n++;
            }
        }
        memo.put(cell, n);
        return n;
    }

    private static long sat(long v) {
        return v < 0 ? Long.MAX_VALUE : v;
    }

    /**
     * Flattens a cell and packs it for the viewer.
     *
     * @param names the name shown for each GDSII layer (e.g. from a deck); returning null shows
     *              {@code layer/datatype}
     */
    public static LayoutScene scene(Library library, Cell cell, Function<LayerKey, String> names) {
        FlattenResult flat = Flattener.flatten(cell);
        List<SceneLayer> layers = new ArrayList<>();
        for (Map.Entry<LayerKey, List<Polygon>> e : flat.polygons().entrySet()) {
            LayerKey key = e.getKey();
            String name = names.apply(key);
            layers.add(new SceneLayer(name == null ? key.toString() : name + " (" + key + ")", key.layer(),
                    key.datatype(), e.getValue()));
        }
        return new LayoutScene(cell.getName(), library.getMetresPerDatabaseUnit(), layers);
    }
}
