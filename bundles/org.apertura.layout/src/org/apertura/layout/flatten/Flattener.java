/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.PointList;
import org.apertura.layout.hierarchy.CellHierarchy;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Path;

/**
 * Expands the hierarchy below a cell into per-layer polygons in the top cell's database units.
 * <p>
 * Boundaries and boxes become polygons of their vertices (closing vertex dropped, vertex order as
 * stored, so orientation is as drawn and reversed by a reflecting placement), paths their outline
 * ({@link PathOutline}); texts are left out. A placement maps a point p of the placed cell to
 * origin + rotate(angle) * magnification * (reflected ? (p.x, -p.y) : p), origins of array
 * instance (c, r) being origin + c * columnPitch + r * rowPitch. Placements compose; an absolute
 * magnification or angle replaces the accumulated one instead of combining with it.
 * <p>
 * Arithmetic is 64-bit and exact for rotations by multiples of 90 degrees with integer
 * magnification. Other placements are computed in double precision and rounded to the nearest
 * database unit, and counted in {@link FlattenResult#rotatedShapes()} and
 * {@link FlattenResult#roundedShapes()}. Paths with an absolute width (negative WIDTH) are placed
 * as centre lines and outlined afterwards, so their width and extensions are not magnified.
 * <p>
 * Before expanding, the hierarchy is checked: a cyclic reference, a missing cell, a depth above
 * {@link FlattenOptions#maxDepth()} or an output size above {@link FlattenOptions#maxVertices()}
 * throws {@link LayoutHierarchyException} naming the cells; so does a vertex outside the 32-bit
 * range after transformation (naming the chain of cells where it happened).
 */
public final class Flattener {

    private final FlattenOptions options;
    private final Map<Cell, List<LocalShape>> localShapes = new IdentityHashMap<>();
    private final Map<LayerKey, List<Polygon>> out = new TreeMap<>();
    private final Deque<String> cellPath = new ArrayDeque<>();
    private final Placing.Tally tally = new Placing.Tally();
    private long skipped;

    private Flattener(FlattenOptions options) {
        this.options = options;
    }

    /** Flattens with {@link FlattenOptions#DEFAULTS}. */
    public static FlattenResult flatten(Cell top) {
        return flatten(top, FlattenOptions.DEFAULTS);
    }

    /** Flattens a cell and everything it references. */
    public static FlattenResult flatten(Cell top, FlattenOptions options) {
        CellHierarchy.checkedDepth(top, options.maxDepth());
        long cost = cost(top, options.roundSegments(), new IdentityHashMap<>());
        if (cost > options.maxVertices()) {
            throw new LayoutHierarchyException(top.getName(), "flattening would give "
                    + (cost == Long.MAX_VALUE ? "more than 2^63" : Long.toString(cost))
                    + " vertices and placements, more than the bound of " + options.maxVertices());
        }
        Flattener f = new Flattener(options);
        f.expand(top, Placing.IDENTITY);
        return new FlattenResult(f.out, f.tally.rotated(), f.tally.rounded(), f.skipped);
    }

    /**
     * Output vertices plus placements after expansion (saturating at Long.MAX_VALUE), so that arrays
     * of empty cells are bounded too; depth is already bounded, so the recursion is shallow.
     */
    private static long cost(Cell cell, int roundSegments, Map<Cell, Long> memo) {
        Long known = memo.get(cell);
        if (known != null) {
            return known;
        }
        long n = 0;
        for (Element e : cell.getElements()) {
            if (e instanceof CellReference ref) {
                long child = Saturating.add(cost(ref.getCell(), roundSegments, memo), 1);
                n = Saturating.add(n, Saturating.multiply(child, CellHierarchy.instanceCount(ref)));
            } else if (e instanceof Boundary b) {
                n = Saturating.add(n, size(b.getPoints()));
            } else if (e instanceof Box b) {
                n = Saturating.add(n, size(b.getPoints()));
            } else if (e instanceof Path p) {
                n = Saturating.add(n, 2L * size(p.getPoints()) + 2L * roundSegments + 4);
            }
        }
        memo.put(cell, n);
        return n;
    }

    private static long size(PointList points) {
        return points == null ? 0 : points.size();
    }

    private void expand(Cell cell, Placing placing) {
        cellPath.addLast(cell.getName());
        for (LocalShape s : shapesOf(cell)) {
            List<Polygon> list = out.computeIfAbsent(s.layer, k -> new ArrayList<>());
            if (s.absolutePath == null) {
                list.add(Polygon.of(placing.apply(s.vertices, cellPath, tally)));
                continue;
            }
            // absolute width: place the centre line, then draw the outline at the stored width
            Path path = s.absolutePath;
            long[] outline = PathOutline.outlinePlaced(placing.apply(s.vertices, cellPath, tally), path.getWidth(),
                    path.getPathType(), path.getBeginExtension(), path.getEndExtension(), options.roundSegments());
            if (outline == null) {
                skipped++;
            } else {
                list.add(Polygon.of(outline));
            }
        }
        for (Element e : cell.getElements()) {
            if (e instanceof ArrayReference a) {
                for (int r = 0; r < a.getRows(); r++) {
                    for (int c = 0; c < a.getColumns(); c++) {
                        double ox = a.getX() + (double) c * a.getColumnPitchX() + (double) r * a.getRowPitchX();
                        double oy = a.getY() + (double) c * a.getColumnPitchY() + (double) r * a.getRowPitchY();
                        expand(a.getCell(), placing.then(a, ox, oy));
                    }
                }
            } else if (e instanceof CellReference ref) {
                expand(ref.getCell(), placing.then(ref, ref.getX(), ref.getY()));
            }
        }
        cellPath.removeLast();
    }

    private List<LocalShape> shapesOf(Cell cell) {
        List<LocalShape> shapes = localShapes.get(cell);
        if (shapes != null) {
            return shapes;
        }
        shapes = new ArrayList<>();
        int skippedHere = 0;
        for (Element e : cell.getElements()) {
            if (e instanceof Boundary b) {
                long[] v = ring(b.getPoints());
                if (v == null) {
                    skippedHere++;
                } else {
                    shapes.add(new LocalShape(new LayerKey(b.getLayer(), b.getDatatype()), v, null));
                }
            } else if (e instanceof Box b) {
                long[] v = ring(b.getPoints());
                if (v == null) {
                    skippedHere++;
                } else {
                    shapes.add(new LocalShape(new LayerKey(b.getLayer(), b.getBoxType()), v, null));
                }
            } else if (e instanceof Path p) {
                LayerKey key = new LayerKey(p.getLayer(), p.getDatatype());
                if (p.getWidth() < 0) {
                    long[] centre = new long[2 * p.getPoints().size()];
                    for (int i = 0; i < p.getPoints().size(); i++) {
                        centre[2 * i] = p.getPoints().x(i);
                        centre[2 * i + 1] = p.getPoints().y(i);
                    }
                    shapes.add(new LocalShape(key, centre, p));
                } else {
                    long[] v = PathOutline.outline(p, options.roundSegments());
                    if (v == null) {
                        skippedHere++;
                    } else {
                        shapes.add(new LocalShape(key, v, null));
                    }
                }
            }
        }
        localShapes.put(cell, shapes);
        // degenerate shapes count once per cell definition
        skipped += skippedHere;
        return shapes;
    }

    /** Vertices of a stored ring without the closing vertex, or null with fewer than 3. */
    private static long[] ring(PointList points) {
        if (points == null) {
            return null;
        }
        int n = points.size();
        if (points.isClosed()) {
            n--;
        }
        if (n < 3) {
            return null;
        }
        long[] v = new long[2 * n];
        for (int i = 0; i < n; i++) {
            v[2 * i] = points.x(i);
            v[2 * i + 1] = points.y(i);
        }
        return v;
    }

    /**
     * A shape of a cell in its own coordinates: polygon vertices, or for an absolute-width path
     * ({@code absolutePath} set) the centre line, outlined only after placement.
     */
    private record LocalShape(LayerKey layer, long[] vertices, Path absolutePath) {
    }
}
