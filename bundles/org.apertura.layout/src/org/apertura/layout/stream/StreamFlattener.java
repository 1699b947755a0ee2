/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Deque;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.PointList;
import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.flatten.PathOutline;
import org.apertura.layout.flatten.Saturating;
import org.apertura.layout.flatten.Placing;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.PathType;

/**
 * Expands the hierarchy below a cell of a {@link StreamLayout} into per-layer polygons in the top
 * cell's database units, with the same rules, order, rounding, counters, bounds and exception
 * messages as {@link Flattener} applied to the EMF model of the same file: for every cell the two give
 * equal {@link FlattenResult}s.
 * <p>
 * Boundaries and boxes become polygons of their vertices (closing vertex dropped), paths their
 * outline ({@link PathOutline}); texts are left out. Arithmetic is 64-bit and exact for multiples of
 * 90 degrees with integer magnification, otherwise rounded to the database grid and counted. A depth
 * above {@link FlattenOptions#maxDepth()}, an output above {@link FlattenOptions#maxVertices()} or a
 * vertex outside the 32-bit range throws {@link LayoutHierarchyException} naming the cells.
 */
public final class StreamFlattener {

    private final StreamLayout layout;
    private final FlattenOptions options;
    private final List<List<LocalShape>> localShapes;
    private final Map<LayerKey, List<Polygon>> out = new TreeMap<>();
    private final Deque<String> cellPath = new ArrayDeque<>();
    private final Placing.Tally tally = new Placing.Tally();
    private long skipped;

    private StreamFlattener(StreamLayout layout, FlattenOptions options) {
        this.layout = layout;
        this.options = options;
        this.localShapes = new ArrayList<>(Collections.nCopies(layout.cells().size(), (List<LocalShape>) null));
    }

    /** Flattens with {@link FlattenOptions#DEFAULTS}. */
    public static FlattenResult flatten(StreamLayout layout, StreamCell top) {
        return flatten(layout, top, FlattenOptions.DEFAULTS);
    }

    /**
     * Flattens a cell of the layout and everything it references.
     *
     * @throws IllegalArgumentException if the cell is not one of the layout's cells
     */
    public static FlattenResult flatten(StreamLayout layout, StreamCell top, FlattenOptions options) {
        int topIndex = indexOf(layout, top);
        checkedDepth(layout, topIndex, options.maxDepth());
        long[] memo = new long[layout.cells().size()];
        Arrays.fill(memo, -1);
        long cost = cost(layout, topIndex, options.roundSegments(), memo);
        if (cost > options.maxVertices()) {
            throw new LayoutHierarchyException(top.name(), "flattening would give "
                    + (cost == Long.MAX_VALUE ? "more than 2^63" : Long.toString(cost))
                    + " vertices and placements, more than the bound of " + options.maxVertices());
        }
        StreamFlattener f = new StreamFlattener(layout, options);
        f.expand(topIndex, Placing.IDENTITY);
        return new FlattenResult(f.out, f.tally.rotated(), f.tally.rounded(), f.skipped);
    }

    private static int indexOf(StreamLayout layout, StreamCell cell) {
        List<StreamCell> cells = layout.cells();
        for (int i = 0; i < cells.size(); i++) {
            if (cells.get(i) == cell) {
                return i;
            }
        }
        throw new IllegalArgumentException("cell " + cell.name() + " is not part of the layout");
    }

    /** Distinct children in order of first reference. */
    private static int[] children(StreamCell cell) {
        Set<Integer> kids = new LinkedHashSet<>();
        int[] r = cell.referenceData();
        for (int i = 0; i < r.length; i += StreamCell.REF_STRIDE) {
            kids.add(r[i]);
        }
        return kids.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * Hierarchy depth as {@code CellHierarchy.checkedDepth} computes it, iteratively (no cycles: the
     * reader rejects them).
     */
    private static void checkedDepth(StreamLayout layout, int top, int maxDepth) {
        List<StreamCell> cells = layout.cells();
        int[] height = new int[cells.size()]; // 0 unknown
        int[][] kids = new int[cells.size()][];
        Deque<int[]> stack = new ArrayDeque<>(); // {cell, next child}
        kids[top] = children(cells.get(top));
        stack.push(new int[] {top, 0});
        while (!stack.isEmpty()) {
            int[] f = stack.peek();
            int[] k = kids[f[0]];
            if (f[1] < k.length) {
                int child = k[f[1]++];
                if (height[child] == 0) {
                    if (kids[child] == null) {
                        kids[child] = children(cells.get(child));
                    }
                    stack.push(new int[] {child, 0});
                }
            } else {
                int h = 1;
                for (int c : k) {
                    h = Math.max(h, height[c] + 1);
                }
                height[f[0]] = h;
                stack.pop();
            }
        }
        int depth = height[top];
        if (depth > maxDepth) {
            List<String> chain = new ArrayList<>();
            int c = top;
            while (c >= 0 && chain.size() <= maxDepth) {
                chain.add(cells.get(c).name());
                int next = -1;
                for (int child : kids[c]) {
                    if (height[child] == height[c] - 1) {
                        next = child;
                        break;
                    }
                }
                c = next;
            }
            throw new LayoutHierarchyException(String.join("/", chain) + (depth > chain.size() ? "/..." : ""),
                    "hierarchy is " + depth + " levels deep, more than the bound of " + maxDepth);
        }
    }

    /** Output vertices plus placements, saturating; memo holds -1 for unknown. */
    private static long cost(StreamLayout layout, int cell, int roundSegments, long[] memo) {
        if (memo[cell] >= 0) {
            return memo[cell];
        }
        StreamCell c = layout.cells().get(cell);
        long n = 0;
        int[] d = c.shapeData();
        int[] r = c.referenceData();
        // all terms are non-negative, so the saturating sum does not depend on the order
        int ri = 0;
        for (int i = c.shapeStart(); i < c.shapeEnd();) {
            int header = d[i];
            int kind = StreamCell.kind(header);
            int points = StreamCell.pointCount(header);
            if (kind == StreamCell.PATH) {
                n = Saturating.add(n, 2L * points + 2L * roundSegments + 4);
            } else {
                n = Saturating.add(n, points);
            }
            i += StreamCell.recordSize(header);
        }
        for (; ri < r.length; ri += StreamCell.REF_STRIDE) {
            long child = Saturating.add(cost(layout, r[ri], roundSegments, memo), 1);
            n = Saturating.add(n, Saturating.multiply(child, (long) r[ri + 4] * r[ri + 5]));
        }
        memo[cell] = n;
        return n;
    }

    private void expand(int cellIndex, Placing placing) {
        StreamCell cell = layout.cells().get(cellIndex);
        cellPath.addLast(cell.name());
        for (LocalShape s : shapesOf(cellIndex)) {
            List<Polygon> list = out.computeIfAbsent(s.layer, k -> new ArrayList<>());
            if (s.pathType == null) {
                list.add(Polygon.of(placing.apply(s.vertices, cellPath, tally)));
                continue;
            }
            long[] outline = PathOutline.outlinePlaced(placing.apply(s.vertices, cellPath, tally), s.width, s.pathType,
                    s.bgnExtn, s.endExtn, options.roundSegments());
            if (outline == null) {
                skipped++;
            } else {
                list.add(Polygon.of(outline));
            }
        }
        int[] r = cell.referenceData();
        double[] t = cell.referenceTransforms();
        for (int i = 0, k = 0; i < r.length; i += StreamCell.REF_STRIDE, k += 2) {
            int child = r[i];
            int x = r[i + 1];
            int y = r[i + 2];
            int flags = r[i + 3];
            if ((flags & StreamCell.ARRAY) != 0) {
                for (int row = 0; row < r[i + 5]; row++) {
                    for (int col = 0; col < r[i + 4]; col++) {
                        double ox = x + (double) col * r[i + 6] + (double) row * r[i + 8];
                        double oy = y + (double) col * r[i + 7] + (double) row * r[i + 9];
                        expand(child, then(placing, flags, t[k], t[k + 1], ox, oy));
                    }
                }
            } else {
                expand(child, then(placing, flags, t[k], t[k + 1], x, y));
            }
        }
        cellPath.removeLast();
    }

    private static Placing then(Placing placing, int flags, double childMag, double childAngle, double ox, double oy) {
        return placing.then((flags & StreamCell.REFLECTED) != 0, childAngle, (flags & StreamCell.ABSOLUTE_ANGLE) != 0,
                childMag, (flags & StreamCell.ABSOLUTE_MAG) != 0, ox, oy);
    }

    private List<LocalShape> shapesOf(int cellIndex) {
        List<LocalShape> shapes = localShapes.get(cellIndex);
        if (shapes != null) {
            return shapes;
        }
        StreamCell cell = layout.cells().get(cellIndex);
        shapes = new ArrayList<>(cell.shapeCount());
        int skippedHere = 0;
        int[] d = cell.shapeData();
        for (int i = cell.shapeStart(); i < cell.shapeEnd();) {
            int header = d[i];
            int kind = StreamCell.kind(header);
            int points = StreamCell.pointCount(header);
            LayerKey key = StreamCell.layerKey(d[i + 1]);
            int xy = i + StreamCell.headerSize(kind);
            if (kind == StreamCell.PATH) {
                PathType type = PathType.get(d[i + 2]);
                int width = d[i + 3];
                if (width < 0) {
                    long[] centre = new long[2 * points];
                    for (int j = 0; j < 2 * points; j++) {
                        centre[j] = d[xy + j];
                    }
                    shapes.add(new LocalShape(key, centre, type, width, d[i + 4], d[i + 5]));
                } else {
                    long[] v = PathOutline.outline(PointList.wrap(Arrays.copyOfRange(d, xy, xy + 2 * points)),
                            Math.abs((double) width) / 2.0, type, d[i + 4], d[i + 5], options.roundSegments());
                    if (v == null) {
                        skippedHere++;
                    } else {
                        shapes.add(new LocalShape(key, v, null, 0, 0, 0));
                    }
                }
            } else {
                long[] v = kind == StreamCell.RECTANGLE ? ring(StreamCell.points(d, i), 0, points) : ring(d, xy, points);
                if (v == null) {
                    skippedHere++;
                } else {
                    shapes.add(new LocalShape(key, v, null, 0, 0, 0));
                }
            }
            i += StreamCell.recordSize(header);
        }
        localShapes.set(cellIndex, shapes);
        skipped += skippedHere;
        return shapes;
    }

    /** Vertices of a stored ring without the closing vertex, or null with fewer than 3. */
    private static long[] ring(int[] d, int from, int points) {
        int n = points;
        if (n >= 2 && d[from] == d[from + 2 * n - 2] && d[from + 1] == d[from + 2 * n - 1]) {
            n--;
        }
        if (n < 3) {
            return null;
        }
        long[] v = new long[2 * n];
        for (int i = 0; i < 2 * n; i++) {
            v[i] = d[from + i];
        }
        return v;
    }

    /**
     * A shape in its cell's coordinates: polygon vertices, or for a path with an absolute width
     * ({@code pathType} set) the centre line, outlined after placement.
     */
    private record LocalShape(LayerKey layer, long[] vertices, PathType pathType, int width, int bgnExtn,
            int endExtn) {
    }
}
