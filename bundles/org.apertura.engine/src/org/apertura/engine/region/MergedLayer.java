/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.geom.Segment;

/**
 * The merged shapes of one layer. Boundary edges are stored ring by ring in flat arrays (about 40
 * bytes per edge); every ring is directed with the material on its left, so outer rings run
 * counter-clockwise and holes clockwise. Consecutive edges are never collinear.
 * <p>
 * Instances are immutable and safe to share between threads. Create them with {@link RegionMerger}.
 */
public final class MergedLayer {

    private final String name;
    private final long[] xy;
    private final int[] ringStart;
    private final int[] ringShape;
    private final int[] edgeRing;
    private final int shapeCount;
    private final long[] shapeArea2;
    private final long[] shapeBox;
    private final int[] shapeOuterRing;
    private final int[] shapeRingStart;
    private final int[] shapeRings;
    private final boolean manhattan;
    private final ConcurrentHashMap<Class<?>, Object> derived = new ConcurrentHashMap<>(2);

    MergedLayer(String name, long[] xy, int[] ringStart, int[] ringShape, int shapeCount, boolean manhattan) {
        this.name = name;
        this.xy = xy;
        this.ringStart = ringStart;
        this.ringShape = ringShape;
        this.shapeCount = shapeCount;
        this.manhattan = manhattan;
        int rings = ringShape.length;
        this.edgeRing = new int[xy.length / 4];
        this.shapeArea2 = new long[shapeCount];
        this.shapeBox = new long[4 * shapeCount];
        this.shapeOuterRing = new int[shapeCount];
        Arrays.fill(shapeOuterRing, -1);
        for (int s = 0; s < shapeCount; s++) {
            shapeBox[4 * s] = Long.MAX_VALUE;
            shapeBox[4 * s + 1] = Long.MAX_VALUE;
            shapeBox[4 * s + 2] = Long.MIN_VALUE;
            shapeBox[4 * s + 3] = Long.MIN_VALUE;
        }
        for (int r = 0; r < rings; r++) {
            int s = ringShape[r];
            long a2 = 0;
            for (int e = ringStart[r]; e < ringStart[r + 1]; e++) {
                edgeRing[e] = r;
                long x0 = xy[4 * e], y0 = xy[4 * e + 1], x1 = xy[4 * e + 2], y1 = xy[4 * e + 3];
                a2 += x0 * y1 - x1 * y0;
                shapeBox[4 * s] = Math.min(shapeBox[4 * s], x0);
                shapeBox[4 * s + 1] = Math.min(shapeBox[4 * s + 1], y0);
                shapeBox[4 * s + 2] = Math.max(shapeBox[4 * s + 2], x0);
                shapeBox[4 * s + 3] = Math.max(shapeBox[4 * s + 3], y0);
            }
            shapeArea2[s] += a2;
            if (a2 > 0) {
                shapeOuterRing[s] = r;
            }
        }
        // rings grouped by shape, in ring order
        shapeRingStart = new int[shapeCount + 1];
        for (int r = 0; r < rings; r++) {
            shapeRingStart[ringShape[r] + 1]++;
        }
        for (int s = 0; s < shapeCount; s++) {
            shapeRingStart[s + 1] += shapeRingStart[s];
        }
        shapeRings = new int[rings];
        int[] fill = Arrays.copyOf(shapeRingStart, shapeCount);
        for (int r = 0; r < rings; r++) {
            shapeRings[fill[ringShape[r]]++] = r;
        }
    }

    /**
     * This layer without the shapes flagged in {@code drop}, followed by new shapes given as shells
     * (counter-clockwise, interleaved coordinates) with their holes (clockwise). Kept shapes keep their
     * relative order.
     */
    MergedLayer replace(boolean[] drop, List<long[]> shells, List<List<long[]>> holes) {
        int keptEdges = 0, keptRings = 0;
        int[] newShape = new int[shapeCount];
        int shapes = 0;
        for (int s = 0; s < shapeCount; s++) {
            newShape[s] = drop[s] ? -1 : shapes++;
        }
        for (int r = 0; r < ringShape.length; r++) {
            if (!drop[ringShape[r]]) {
                keptEdges += ringStart[r + 1] - ringStart[r];
                keptRings++;
            }
        }
        int addEdges = 0, addRings = 0;
        for (int i = 0; i < shells.size(); i++) {
            addEdges += shells.get(i).length / 2;
            addRings++;
            for (long[] h : holes.get(i)) {
                addEdges += h.length / 2;
                addRings++;
            }
        }
        long[] nxy = new long[4 * (keptEdges + addEdges)];
        int[] nStart = new int[keptRings + addRings + 1];
        int[] nShape = new int[keptRings + addRings];
        int e = 0, rr = 0;
        boolean isManhattan = manhattan;
        for (int r = 0; r < ringShape.length; r++) {
            if (drop[ringShape[r]]) {
                continue;
            }
            nStart[rr] = e;
            nShape[rr] = newShape[ringShape[r]];
            int len = ringStart[r + 1] - ringStart[r];
            System.arraycopy(xy, 4 * ringStart[r], nxy, 4 * e, 4 * len);
            e += len;
            rr++;
        }
        for (int i = 0; i < shells.size(); i++) {
            List<long[]> all = new ArrayList<>();
            all.add(shells.get(i));
            all.addAll(holes.get(i));
            for (long[] ring : all) {
                nStart[rr] = e;
                nShape[rr] = shapes;
                int n = ring.length / 2;
                for (int k = 0; k < n; k++) {
                    int k1 = (k + 1) % n;
                    nxy[4 * e] = ring[2 * k];
                    nxy[4 * e + 1] = ring[2 * k + 1];
                    nxy[4 * e + 2] = ring[2 * k1];
                    nxy[4 * e + 3] = ring[2 * k1 + 1];
                    if (ring[2 * k] != ring[2 * k1] && ring[2 * k + 1] != ring[2 * k1 + 1]) {
                        isManhattan = false;
                    }
                    e++;
                }
                rr++;
            }
            shapes++;
        }
        nStart[rr] = e;
        return new MergedLayer(name, nxy, nStart, nShape, shapes, isManhattan);
    }

    /**
     * Data derived from this layer alone (such as a search index), computed on the first request and
     * kept with the layer, so that every check of the layer shares it. Thread-safe: concurrent first
     * requests compute it once.
     */
    public <T> T derived(Class<T> kind, Function<MergedLayer, ? extends T> compute) {
        return kind.cast(derived.computeIfAbsent(kind, k -> compute.apply(this)));
    }

    /** The layer name given by the caller. */
    public String name() {
        return name;
    }

    /** True when every boundary edge is horizontal or vertical. */
    public boolean isManhattan() {
        return manhattan;
    }

    public int edgeCount() {
        return edgeRing.length;
    }

    public int ringCount() {
        return ringShape.length;
    }

    public int shapeCount() {
        return shapeCount;
    }

    /** Edge {@code e} directed with the material on its left. */
    public Segment edge(int e) {
        return new Segment(xy[4 * e], xy[4 * e + 1], xy[4 * e + 2], xy[4 * e + 3]);
    }

    public long x0(int e) {
        return xy[4 * e];
    }

    public long y0(int e) {
        return xy[4 * e + 1];
    }

    public long x1(int e) {
        return xy[4 * e + 2];
    }

    public long y1(int e) {
        return xy[4 * e + 3];
    }

    /** The shape (connected merged region) edge {@code e} belongs to. */
    public int shapeOf(int e) {
        return ringShape[edgeRing[e]];
    }

    public int ringOf(int e) {
        return edgeRing[e];
    }

    /** The edge after {@code e} along its ring. */
    public int next(int e) {
        int r = edgeRing[e];
        return e + 1 < ringStart[r + 1] ? e + 1 : ringStart[r];
    }

    /** The edge before {@code e} along its ring. */
    public int previous(int e) {
        int r = edgeRing[e];
        return e > ringStart[r] ? e - 1 : ringStart[r + 1] - 1;
    }

    /** Twice the area of a shape (outer ring minus holes), exact, in square database units. */
    public long area2(int shape) {
        return shapeArea2[shape];
    }

    /** Area of a shape (outer ring minus holes) in square database units. */
    public double area(int shape) {
        return shapeArea2[shape] / 2.0;
    }

    /** Bounding box of a shape. */
    public Box bounds(int shape) {
        return new Box(shapeBox[4 * shape], shapeBox[4 * shape + 1], shapeBox[4 * shape + 2], shapeBox[4 * shape + 3]);
    }

    /** Bounding box of all shapes, or null for an empty layer. */
    public Box bounds() {
        Box b = null;
        for (int s = 0; s < shapeCount; s++) {
            b = b == null ? bounds(s) : b.union(bounds(s));
        }
        return b;
    }

    /** The rings of a shape as polygons, outer ring first (counter-clockwise), then holes (clockwise). */
    public List<Polygon> rings(int shape) {
        List<Polygon> out = new ArrayList<>();
        int outer = shapeOuterRing[shape];
        out.add(ring(outer));
        for (int k = shapeRingStart[shape]; k < shapeRingStart[shape + 1]; k++) {
            if (shapeRings[k] != outer) {
                out.add(ring(shapeRings[k]));
            }
        }
        return out;
    }

    /** Index of the outer ring of a shape. */
    public int outerRing(int shape) {
        return shapeOuterRing[shape];
    }

    /** Ring {@code r} as a polygon. */
    public Polygon ring(int r) {
        int n = ringStart[r + 1] - ringStart[r];
        long[] c = new long[2 * n];
        for (int i = 0; i < n; i++) {
            c[2 * i] = xy[4 * (ringStart[r] + i)];
            c[2 * i + 1] = xy[4 * (ringStart[r] + i) + 1];
        }
        return Polygon.of(c);
    }

    /** Index of the first edge of ring {@code r}; ring r ends before {@code ringStart(r + 1)}. */
    public int ringStart(int r) {
        return ringStart[r];
    }

    /** Heap bytes held by this layer's arrays (for benchmarks). */
    public long retainedBytes() {
        return 16L + 8L * xy.length + 4L * (ringStart.length + ringShape.length + edgeRing.length
                + shapeOuterRing.length + shapeRingStart.length + shapeRings.length)
                + 8L * (shapeArea2.length + shapeBox.length) + 8 * 16;
    }
}
