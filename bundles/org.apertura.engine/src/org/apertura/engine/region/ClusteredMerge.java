/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apertura.engine.geom.Polygon;
import org.apertura.engine.internal.RadixSort;

/**
 * The Manhattan union of a layer, computed cluster by cluster and identical, array for array, to one
 * {@link ManhattanMerge} sweep over all polygons.
 * <p>
 * Why: in routed layers most polygons touch nothing, and a sweep over the whole layer pays a coverage
 * tree update for every edge of them. Here polygons whose closed bounding boxes meet are grouped first
 * (a uniform grid of power-of-two cells and union-find); a rectangle alone in its group becomes its
 * ring directly, every other group gets its own small sweep. Groups never share boundary points (their
 * boxes are disjoint), so each group's rings are exactly the rings the whole-layer sweep makes for it,
 * and sorting all rings by their first vertical edge (x, right-facing first, lower y) restores the
 * whole-layer order. When boxes overlap so much that grouping would cost more than a sweep (more than
 * {@value #PAIR_BUDGET_PER_BOX} box pairs per box in grid cells), the whole-layer sweep runs instead.
 * <p>
 * Polygons that are not Manhattan take part in the grouping only: shapes of a group holding one of them
 * are marked as near ({@link #nearShapes()}), so the any-angle merge that follows needs to look at
 * those shapes only.
 */
final class ClusteredMerge {

    private static final int PAIR_BUDGET_PER_BOX = 32;
    private static final int MAX_CELLS = 1 << 24;

    private final String name;
    private final List<Polygon> manhattan;
    private final List<Polygon> other;
    private MergedLayer layer;
    private boolean[] near;

    ClusteredMerge(String name, List<Polygon> manhattan, List<Polygon> other) {
        this.name = name;
        this.manhattan = manhattan;
        this.other = other;
    }

    /** The merged Manhattan polygons. */
    MergedLayer layer() {
        if (layer == null) {
            run();
        }
        return layer;
    }

    /** Per shape of {@link #layer()}: true when its group of touching boxes holds a non-Manhattan polygon. */
    boolean[] nearShapes() {
        if (layer == null) {
            run();
        }
        return near;
    }

    private void run() {
        // items: Manhattan polygons with area first, then the other polygons
        List<Polygon> items = new ArrayList<>(manhattan.size() + other.size());
        int cap = manhattan.size() + other.size();
        long[] x0 = new long[cap], y0 = new long[cap], x1 = new long[cap], y1 = new long[cap];
        boolean[] rectangle = new boolean[cap];
        for (Polygon p : manhattan) {
            int i = items.size();
            boolean rect = isRectangle(p);
            bounds(p, i, x0, y0, x1, y1);
            if (rect ? x0[i] < x1[i] && y0[i] < y1[i] : p.signedArea2() != 0) {
                rectangle[i] = rect;
                items.add(p);
            }
        }
        int nm = items.size();
        for (Polygon p : other) {
            bounds(p, items.size(), x0, y0, x1, y1);
            items.add(p);
        }
        int n = items.size();
        int[] parent = group(n, x0, y0, x1, y1);
        if (parent == null) {
            wholeLayer(items, nm);
            return;
        }
        // members of each group, groups in order of their root
        int[] count = new int[n + 1];
        int[] rootOf = new int[n];
        for (int i = 0; i < n; i++) {
            rootOf[i] = UnionFind.find(parent, i);
            count[rootOf[i] + 1]++;
        }
        for (int i = 0; i < n; i++) {
            count[i + 1] += count[i];
        }
        int[] members = new int[n];
        int[] fill = new int[n];
        System.arraycopy(count, 0, fill, 0, n);
        for (int i = 0; i < n; i++) {
            members[fill[rootOf[i]]++] = i;
        }
        fill = null;

        RingList out = new RingList(nm);
        List<Polygon> part = new ArrayList<>();
        int shapeBase = 0;
        for (int root = 0; root < n; root++) {
            int from = count[root], to = count[root + 1];
            if (from == to) {
                continue;
            }
            if (to - from == 1 && rectangle[members[from]]) {
                int i = members[from];
                out.rectangle(x0[i], y0[i], x1[i], y1[i], shapeBase++);
                continue;
            }
            part.clear();
            boolean hasOther = false;
            for (int k = from; k < to; k++) {
                if (members[k] < nm) {
                    part.add(items.get(members[k]));
                } else {
                    hasOther = true;
                }
            }
            if (part.isEmpty()) {
                continue;
            }
            ManhattanMerge.Rings r = new ManhattanMerge(name, part).rings();
            out.add(r, shapeBase, hasOther);
            shapeBase += r.shapes();
        }
        finish(out, shapeBase);
    }

    /** Union-find parents of box groups, or null when the grid would cost more than a sweep. */
    private static int[] group(int n, long[] x0, long[] y0, long[] x1, long[] y1) {
        int[] parent = UnionFind.singletons(n);
        if (n < 2) {
            return parent;
        }
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            minX = Math.min(minX, x0[i]);
            minY = Math.min(minY, y0[i]);
            maxX = Math.max(maxX, x1[i]);
            maxY = Math.max(maxY, y1[i]);
        }
        if (maxX - minX >= Integer.MAX_VALUE || maxY - minY >= Integer.MAX_VALUE) {
            return null;
        }
        // boxes as 32-bit offsets side by side: one cache line per box in the pair tests
        int[] box = new int[4 * n];
        for (int i = 0; i < n; i++) {
            box[4 * i] = (int) (x0[i] - minX);
            box[4 * i + 1] = (int) (y0[i] - minY);
            box[4 * i + 2] = (int) (x1[i] - minX);
            box[4 * i + 3] = (int) (y1[i] - minY);
        }
        double area = (double) (maxX - minX + 1) * (maxY - minY + 1);
        long side = Math.max(1, (long) Math.ceil(Math.sqrt(area / n)));
        int shift = 64 - Long.numberOfLeadingZeros(side - 1);
        while (shift < 31 && (((maxX - minX) >> shift) + 1) * (((maxY - minY) >> shift) + 1) > MAX_CELLS) {
            shift++;
        }
        int cols = (int) (((maxX - minX) >> shift) + 1), rows = (int) (((maxY - minY) >> shift) + 1);
        int[] start = new int[cols * rows + 1];
        long registrations = 0;
        for (int i = 0; i < n; i++) {
            int ca = box[4 * i] >> shift, cb = box[4 * i + 2] >> shift;
            int ra = box[4 * i + 1] >> shift, rb = box[4 * i + 3] >> shift;
            registrations += (long) (cb - ca + 1) * (rb - ra + 1);
            if (registrations > 16L * n + 1_000_000) {
                return null;
            }
            for (int r = ra; r <= rb; r++) {
                for (int c = ca; c <= cb; c++) {
                    start[r * cols + c + 1]++;
                }
            }
        }
        long pairs = 0;
        for (int c = 0; c < cols * rows; c++) {
            long k = start[c + 1];
            pairs += k * (k - 1) / 2;
            start[c + 1] += start[c];
        }
        if (pairs > (long) PAIR_BUDGET_PER_BOX * n + 1_000_000) {
            return null;
        }
        int[] items = new int[(int) registrations];
        int[] fill = new int[cols * rows];
        System.arraycopy(start, 0, fill, 0, cols * rows);
        for (int i = 0; i < n; i++) {
            int ca = box[4 * i] >> shift, cb = box[4 * i + 2] >> shift;
            int ra = box[4 * i + 1] >> shift, rb = box[4 * i + 3] >> shift;
            for (int r = ra; r <= rb; r++) {
                for (int c = ca; c <= cb; c++) {
                    items[fill[r * cols + c]++] = i;
                }
            }
        }
        fill = null;
        for (int c = 0; c < cols * rows; c++) {
            for (int a = start[c], end = start[c + 1]; a < end; a++) {
                int i = items[a];
                int ix0 = box[4 * i], iy0 = box[4 * i + 1], ix1 = box[4 * i + 2], iy1 = box[4 * i + 3];
                for (int b = a + 1; b < end; b++) {
                    int j = 4 * items[b];
                    // closed boxes: touching at an edge or a corner joins the group
                    if (box[j] <= ix1 && ix0 <= box[j + 2] && box[j + 1] <= iy1 && iy0 <= box[j + 3]) {
                        UnionFind.union(parent, i, items[b]);
                    }
                }
            }
        }
        return parent;
    }

    private static void bounds(Polygon p, int i, long[] x0, long[] y0, long[] x1, long[] y1) {
        long ax = Long.MAX_VALUE, ay = Long.MAX_VALUE, bx = Long.MIN_VALUE, by = Long.MIN_VALUE;
        for (int k = 0, size = p.size(); k < size; k++) {
            long x = p.x(k), y = p.y(k);
            ax = Math.min(ax, x);
            bx = Math.max(bx, x);
            ay = Math.min(ay, y);
            by = Math.max(by, y);
        }
        x0[i] = ax;
        y0[i] = ay;
        x1[i] = bx;
        y1[i] = by;
    }

    private static boolean isRectangle(Polygon p) {
        if (p.size() != 4) {
            return false;
        }
        return p.x(0) == p.x(1) && p.y(1) == p.y(2) && p.x(2) == p.x(3) && p.y(3) == p.y(0)
                || p.y(0) == p.y(1) && p.x(1) == p.x(2) && p.y(2) == p.y(3) && p.x(3) == p.x(0);
    }

    private void wholeLayer(List<Polygon> items, int nm) {
        ManhattanMerge.Rings r = new ManhattanMerge(name, items.subList(0, nm)).rings();
        layer = new MergedLayer(name, r.xy(), r.ringStart(), r.ringShape(), r.shapes(), true);
        near = new boolean[r.shapes()];
        if (nm < items.size()) {
            Arrays.fill(near, true);
        }
    }

    /** Sorts the rings into whole-layer sweep order and numbers shapes by their first ring. */
    private void finish(RingList out, int provisionalShapes) {
        int rings = out.rings;
        long minX = Long.MAX_VALUE, minY = Long.MAX_VALUE, maxX = Long.MIN_VALUE, maxY = Long.MIN_VALUE;
        for (int r = 0; r < rings; r++) {
            long base = 4L * out.start[r];
            long x = out.xy[(int) base], ya = out.xy[(int) base + 1], yb = out.xy[(int) base + 3];
            minX = Math.min(minX, x);
            maxX = Math.max(maxX, x);
            minY = Math.min(minY, Math.min(ya, yb));
            maxY = Math.max(maxY, Math.min(ya, yb));
        }
        int xBits = rings == 0 ? 0 : 64 - Long.numberOfLeadingZeros(maxX - minX);
        int yBits = rings == 0 ? 0 : 64 - Long.numberOfLeadingZeros(maxY - minY);
        long[] key = new long[rings];
        long[] xs = null, ys = null;
        if (xBits + yBits + 1 > 63) {
            // coordinates too far apart for one key: use their ranks among the rings' start edges
            xs = new long[rings];
            ys = new long[rings];
            for (int r = 0; r < rings; r++) {
                int b = 4 * out.start[r];
                xs[r] = out.xy[b];
                ys[r] = Math.min(out.xy[b + 1], out.xy[b + 3]);
            }
            xs = distinct(xs);
            ys = distinct(ys);
            xBits = 32 - Integer.numberOfLeadingZeros(xs.length);
            yBits = 32 - Integer.numberOfLeadingZeros(ys.length);
        }
        for (int r = 0; r < rings; r++) {
            int b = 4 * out.start[r];
            long x = out.xy[b], ya = out.xy[b + 1], yb = out.xy[b + 3];
            // a right-facing (upward) edge comes before a left-facing one at the same x
            long facing = yb > ya ? 0 : 1;
            long lo = Math.min(ya, yb);
            long kx = xs == null ? x - minX : Arrays.binarySearch(xs, x);
            long ky = ys == null ? lo - minY : Arrays.binarySearch(ys, lo);
            key[r] = kx << (yBits + 1) | facing << yBits | ky;
        }
        int[] order = RadixSort.order(key);
        int edges = out.edges;
        long[] xy = new long[4 * edges];
        int[] ringStart = new int[rings + 1];
        int[] ringShape = new int[rings];
        int[] shapeNumber = new int[provisionalShapes];
        Arrays.fill(shapeNumber, -1);
        boolean[] nearShape = new boolean[provisionalShapes];
        int shapes = 0, e = 0;
        for (int k = 0; k < rings; k++) {
            int r = order[k];
            int len = out.start[r + 1] - out.start[r];
            System.arraycopy(out.xy, 4 * out.start[r], xy, 4 * e, 4 * len);
            ringStart[k] = e;
            e += len;
            int s = out.shape[r];
            if (shapeNumber[s] < 0) {
                shapeNumber[s] = shapes;
                nearShape[shapes] = out.near[r];
                shapes++;
            }
            ringShape[k] = shapeNumber[s];
        }
        ringStart[rings] = e;
        layer = new MergedLayer(name, xy, ringStart, ringShape, shapes, true);
        near = Arrays.copyOf(nearShape, shapes);
    }

    private static long[] distinct(long[] v) {
        Arrays.sort(v);
        int u = 0;
        for (int i = 0; i < v.length; i++) {
            if (u == 0 || v[i] != v[u - 1]) {
                v[u++] = v[i];
            }
        }
        return Arrays.copyOf(v, u);
    }



    /** Rings gathered group by group, with a provisional shape number and the near flag. */
    private static final class RingList {
        long[] xy;
        int[] start;
        int[] shape;
        boolean[] near;
        int rings, edges;

        RingList(int expectedRings) {
            xy = new long[16 * Math.max(1, expectedRings)];
            start = new int[Math.max(1, expectedRings) + 1];
            shape = new int[Math.max(1, expectedRings)];
            near = new boolean[Math.max(1, expectedRings)];
        }

        private void room(int moreRings, int moreEdges) {
            if (rings + moreRings >= shape.length) {
                int cap = Math.max(2 * shape.length, rings + moreRings + 1);
                start = Arrays.copyOf(start, cap + 1);
                shape = Arrays.copyOf(shape, cap);
                near = Arrays.copyOf(near, cap);
            }
            if (4L * (edges + moreEdges) > xy.length) {
                xy = Arrays.copyOf(xy, (int) Math.min(Integer.MAX_VALUE - 8,
                        Math.max(2L * xy.length, 4L * (edges + moreEdges))));
            }
        }

        /** The ring the sweep makes for a lone rectangle: left edge downwards first, counter-clockwise. */
        void rectangle(long ax, long ay, long bx, long by, int s) {
            room(1, 4);
            int b = 4 * edges;
            long[] c = xy;
            c[b] = ax;
            c[b + 1] = by;
            c[b + 2] = ax;
            c[b + 3] = ay;
            c[b + 4] = ax;
            c[b + 5] = ay;
            c[b + 6] = bx;
            c[b + 7] = ay;
            c[b + 8] = bx;
            c[b + 9] = ay;
            c[b + 10] = bx;
            c[b + 11] = by;
            c[b + 12] = bx;
            c[b + 13] = by;
            c[b + 14] = ax;
            c[b + 15] = by;
            start[rings] = edges;
            shape[rings] = s;
            near[rings] = false;
            rings++;
            edges += 4;
            start[rings] = edges;
        }

        void add(ManhattanMerge.Rings r, int shapeBase, boolean isNear) {
            int n = r.ringShape().length;
            int m = r.ringStart()[n];
            room(n, m);
            System.arraycopy(r.xy(), 0, xy, 4 * edges, 4 * m);
            for (int k = 0; k < n; k++) {
                start[rings] = edges + r.ringStart()[k];
                shape[rings] = shapeBase + r.ringShape()[k];
                near[rings] = isNear;
                rings++;
            }
            edges += m;
            start[rings] = edges;
        }
    }
}
