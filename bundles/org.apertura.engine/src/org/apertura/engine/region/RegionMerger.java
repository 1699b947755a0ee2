/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.function.IntConsumer;
import java.util.stream.IntStream;

import org.apertura.engine.geom.Polygon;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.operation.overlayng.UnaryUnionNG;

/**
 * Merges the polygons of one layer into {@link MergedLayer} shapes: overlapping and abutting polygons
 * become one shape, enclosed empty areas become holes. Polygons may be given in either orientation;
 * they must not cross themselves (the union follows the non-zero rule of each polygon's own
 * orientation).
 */
public final class RegionMerger {

    private RegionMerger() {
    }

    /**
     * Merges {@code polygons}. Manhattan polygons are merged by the exact scanline; when there are
     * non-Manhattan polygons, only they and the Manhattan shapes they touch are merged again with JTS on
     * the database-unit grid (see the package documentation), the other shapes stay as the scanline
     * made them.
     */
    public static MergedLayer merge(String name, Collection<Polygon> polygons) {
        return merge(name, polygons, 1);
    }

    /**
     * Merges {@code polygons} as {@link #merge(String, Collection)} does, with the any-angle unions of
     * separate clusters spread over up to {@code threads} threads; the result does not depend on the
     * thread count.
     */
    public static MergedLayer merge(String name, Collection<Polygon> polygons, int threads) {
        List<Polygon> manhattan = new ArrayList<>(polygons.size());
        List<Polygon> other = new ArrayList<>();
        for (Polygon p : polygons) {
            (p.isManhattan() ? manhattan : other).add(p);
        }
        ClusteredMerge clustered = new ClusteredMerge(name, manhattan, other);
        MergedLayer m = clustered.layer();
        if (other.isEmpty()) {
            return m;
        }
        // only shapes grouped with a non-Manhattan polygon can touch one
        boolean[] candidate = clustered.nearShapes();
        GeometryFactory gf = new GeometryFactory(new PrecisionModel(1.0));
        org.locationtech.jts.index.strtree.STRtree tree = new org.locationtech.jts.index.strtree.STRtree();
        // mixed: the non-Manhattan polygons first, then the scanline shapes touching one of them
        List<Geometry> mixed = new ArrayList<>();
        for (Polygon p : other) {
            Geometry g = toJts(gf, p);
            tree.insert(g.getEnvelopeInternal(), mixed.size());
            mixed.add(g);
        }
        int[] parent = UnionFind.singletons(other.size());
        List<Integer> near = new ArrayList<>();
        org.locationtech.jts.geom.Envelope env = new org.locationtech.jts.geom.Envelope();
        boolean[] drop = new boolean[m.shapeCount()];
        for (int s = 0; s < m.shapeCount(); s++) {
            if (!candidate[s]) {
                continue;
            }
            org.apertura.engine.geom.Box b = m.bounds(s);
            env.init(b.minX(), b.maxX(), b.minY(), b.maxY());
            near.clear();
            tree.query(env, item -> near.add((Integer) item));
            Geometry shape = null;
            int id = -1;
            for (int o : near) {
                if (shape == null) {
                    shape = shapeToJts(gf, m, s);
                }
                if (shape.intersects(mixed.get(o))) {
                    if (id < 0) {
                        drop[s] = true;
                        id = mixed.size();
                        mixed.add(shape);
                        parent = grow(parent, id);
                    }
                    UnionFind.union(parent, id, o);
                }
            }
        }
        for (int i = 0; i < other.size(); i++) {
            near.clear();
            tree.query(mixed.get(i).getEnvelopeInternal(), item -> near.add((Integer) item));
            for (int j : near) {
                if (j > i && UnionFind.find(parent, i) != UnionFind.find(parent, j) && mixed.get(i).intersects(mixed.get(j))) {
                    UnionFind.union(parent, i, j);
                }
            }
        }
        // clusters that touch nothing outside themselves are merged one by one: a single overlay of all
        // of them costs far more (its snap-rounding noder sees every segment at once)
        int[] count = new int[mixed.size() + 1];
        for (int i = 0; i < mixed.size(); i++) {
            count[UnionFind.find(parent, i) + 1]++;
        }
        for (int i = 0; i < mixed.size(); i++) {
            count[i + 1] += count[i];
        }
        Geometry[] byCluster = new Geometry[mixed.size()];
        int[] fill = Arrays.copyOf(count, mixed.size());
        for (int i = 0; i < mixed.size(); i++) {
            byCluster[fill[UnionFind.find(parent, i)]++] = mixed.get(i);
        }
        int[] clusters = IntStream.range(0, mixed.size()).filter(c -> count[c + 1] > count[c]).toArray();
        Geometry[] unions = new Geometry[clusters.length];
        IntConsumer unite = k -> unions[k] = UnaryUnionNG.union(
                gf.createGeometryCollection(Arrays.copyOfRange(byCluster, count[clusters[k]], count[clusters[k] + 1])),
                gf.getPrecisionModel());
        if (threads > 1 && clusters.length >= 64) {
            ForkJoinPool pool = new ForkJoinPool(threads);
            try {
                pool.submit(() -> IntStream.range(0, clusters.length).parallel().forEach(unite)).get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new CancellationException("interrupted while merging layer " + name);
            } catch (ExecutionException e) {
                throw e.getCause() instanceof RuntimeException re ? re : new IllegalStateException(e.getCause());
            } finally {
                pool.shutdownNow();
            }
        } else {
            for (int k = 0; k < clusters.length; k++) {
                unite.accept(k);
            }
        }
        List<long[]> shells = new ArrayList<>();
        List<List<long[]>> holes = new ArrayList<>();
        for (Geometry u : unions) {
            collect(u, shells, holes);
        }
        sortShapes(shells, holes);
        return m.replace(drop, shells, holes);
    }

    /**
     * The union of Manhattan polygons by one sweep over the whole layer, without first grouping
     * polygons whose boxes meet. {@link #merge} gives exactly this result (same rings, same order) for
     * Manhattan input, faster; this path stays as the reference it is tested against.
     *
     * @throws IllegalArgumentException when a polygon has an edge that is neither horizontal nor vertical
     */
    public static MergedLayer mergeBySingleSweep(String name, Collection<Polygon> polygons) {
        for (Polygon p : polygons) {
            if (!p.isManhattan()) {
                throw new IllegalArgumentException("layer " + name + ": the single sweep takes Manhattan polygons only");
            }
        }
        return new ManhattanMerge(name, polygons).run();
    }

    private static int[] grow(int[] parent, int id) {
        int[] p = id < parent.length ? parent : Arrays.copyOf(parent, Math.max(2 * parent.length, id + 1));
        p[id] = id;
        return p;
    }



    private static Geometry shapeToJts(GeometryFactory gf, MergedLayer m, int s) {
        List<Polygon> rings = m.rings(s);
        org.locationtech.jts.geom.LinearRing shell = ((org.locationtech.jts.geom.Polygon) toJts(gf, rings.get(0))).getExteriorRing();
        org.locationtech.jts.geom.LinearRing[] hs = new org.locationtech.jts.geom.LinearRing[rings.size() - 1];
        for (int i = 1; i < rings.size(); i++) {
            hs[i - 1] = ((org.locationtech.jts.geom.Polygon) toJts(gf, rings.get(i))).getExteriorRing();
        }
        return gf.createPolygon(shell, hs);
    }

    /** Merges with JTS on the integer grid whatever the edge angles. */
    public static MergedLayer mergeWithJts(String name, Collection<Polygon> polygons) {
        GeometryFactory gf = new GeometryFactory(new PrecisionModel(1.0));
        List<Geometry> geoms = new ArrayList<>(polygons.size());
        for (Polygon p : polygons) {
            geoms.add(toJts(gf, p));
        }
        Geometry union = UnaryUnionNG.union(gf.buildGeometry(geoms), gf.getPrecisionModel());
        List<long[]> shells = new ArrayList<>();
        List<List<long[]>> holes = new ArrayList<>();
        collect(union, shells, holes);
        return fromRings(name, shells, holes);
    }

    private static void collect(Geometry union, List<long[]> shells, List<List<long[]>> holes) {
        for (int i = 0; i < union.getNumGeometries(); i++) {
            Geometry g = union.getGeometryN(i);
            if (!(g instanceof org.locationtech.jts.geom.Polygon jp) || jp.isEmpty()) {
                continue;
            }
            long[] shell = ringCoords(jp.getExteriorRing().getCoordinates(), true);
            if (shell == null) {
                continue;
            }
            List<long[]> hs = new ArrayList<>();
            for (int h = 0; h < jp.getNumInteriorRing(); h++) {
                long[] hole = ringCoords(jp.getInteriorRingN(h).getCoordinates(), false);
                if (hole != null) {
                    hs.add(hole);
                }
            }
            shells.add(shell);
            holes.add(hs);
        }
    }

    /** Sorts shapes by the lowest-leftmost vertex of their shell (a deterministic order). */
    private static void sortShapes(List<long[]> shells, List<List<long[]>> holes) {
        int n = shells.size();
        long[][] keys = new long[n][];
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            keys[i] = minVertex(shells.get(i));
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> keys[a][0] != keys[b][0] ? Long.compare(keys[a][0], keys[b][0])
                : Long.compare(keys[a][1], keys[b][1]));
        List<long[]> s2 = new ArrayList<>(n);
        List<List<long[]>> h2 = new ArrayList<>(n);
        for (int i : order) {
            s2.add(shells.get(i));
            h2.add(holes.get(i));
        }
        shells.clear();
        shells.addAll(s2);
        holes.clear();
        holes.addAll(h2);
    }

    /** Builds a layer from shells (counter-clockwise) and their holes (clockwise), sorted by {@link #sortShapes}. */
    private static MergedLayer fromRings(String name, List<long[]> shells, List<List<long[]>> holes) {
        sortShapes(shells, holes);
        MergedLayer empty = new MergedLayer(name, new long[0], new int[] {0}, new int[0], 0, true);
        return empty.replace(new boolean[0], shells, holes);
    }

    private static long[] minVertex(long[] r) {
        long bx = Long.MAX_VALUE, by = Long.MAX_VALUE;
        for (int i = 0; i < r.length; i += 2) {
            if (r[i] < bx || r[i] == bx && r[i + 1] < by) {
                bx = r[i];
                by = r[i + 1];
            }
        }
        return new long[] {bx, by};
    }

    /** JTS polygon (shell only) on the fixed grid for one of our polygons. */
    public static Geometry toJts(GeometryFactory gf, Polygon p) {
        int n = p.size();
        Coordinate[] cs = new Coordinate[n + 1];
        for (int i = 0; i < n; i++) {
            cs[i] = new Coordinate(p.x(i), p.y(i));
        }
        cs[n] = cs[0];
        LinearRing ring = gf.createLinearRing(cs);
        return gf.createPolygon(ring);
    }

    /**
     * Ring coordinates without closing point, duplicate or collinear vertices, oriented
     * counter-clockwise for shells and clockwise for holes; null when degenerate.
     */
    static long[] ringCoords(Coordinate[] cs, boolean shell) {
        int n = cs.length - 1;
        long[] c = new long[2 * n];
        for (int i = 0; i < n; i++) {
            c[2 * i] = Math.round(cs[i].x);
            c[2 * i + 1] = Math.round(cs[i].y);
        }
        c = simplify(c);
        if (c == null) {
            return null;
        }
        long a2 = 0;
        int m = c.length / 2;
        for (int i = 0; i < m; i++) {
            int j = (i + 1) % m;
            a2 += c[2 * i] * c[2 * j + 1] - c[2 * j] * c[2 * i + 1];
        }
        if (a2 == 0) {
            return null;
        }
        if ((a2 > 0) != shell) {
            long[] rev = new long[c.length];
            for (int i = 0; i < m; i++) {
                rev[2 * i] = c[2 * (m - 1 - i)];
                rev[2 * i + 1] = c[2 * (m - 1 - i) + 1];
            }
            c = rev;
        }
        return c;
    }

    /** Drops repeated and collinear vertices; null when fewer than three remain. */
    static long[] simplify(long[] c) {
        int n = c.length / 2;
        boolean changed = true;
        long[] cur = c;
        while (changed && n >= 3) {
            changed = false;
            // repeated vertices first: judged together with collinearity, both copies of a repeated
            // vertex would look collinear (a zero-length neighbour edge) and vanish in the same pass
            long[] out = new long[2 * n];
            int m = 0;
            for (int i = 0; i < n; i++) {
                int p = (i + n - 1) % n;
                if (cur[2 * i] == cur[2 * p] && cur[2 * i + 1] == cur[2 * p + 1]) {
                    changed = true;
                    continue;
                }
                out[2 * m] = cur[2 * i];
                out[2 * m + 1] = cur[2 * i + 1];
                m++;
            }
            if (m == 0) {
                // every vertex equal to its predecessor: a single point
                return null;
            }
            cur = out;
            n = m;
            out = new long[2 * n];
            m = 0;
            for (int i = 0; i < n; i++) {
                int p = (i + n - 1) % n, q = (i + 1) % n;
                long ax = cur[2 * i] - cur[2 * p], ay = cur[2 * i + 1] - cur[2 * p + 1];
                long bx = cur[2 * q] - cur[2 * i], by = cur[2 * q + 1] - cur[2 * i + 1];
                if (ax * by - ay * bx == 0) {
                    changed = true;
                    continue;
                }
                out[2 * m] = cur[2 * i];
                out[2 * m + 1] = cur[2 * i + 1];
                m++;
            }
            cur = Arrays.copyOf(out, 2 * m);
            n = m;
        }
        return n >= 3 ? cur : null;
    }
}
