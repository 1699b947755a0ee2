/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.region;

import java.util.Arrays;
import java.util.Collection;

import org.apertura.engine.geom.Polygon;

/**
 * Exact union of Manhattan polygons by a scanline over x. The vertical edges of the input are sorted
 * by x; a segment tree over the compressed y coordinates holds the coverage count. At each x the
 * y-ranges whose coverage changes between zero and non-zero become vertical boundary edges (the
 * maximal ones), which are then linked into rings through their end points at equal y, and holes are
 * attached to their shapes by a second sweep. O(n log n) time for n input edges.
 */
final class ManhattanMerge {

    private final String name;
    private final Collection<Polygon> polygons;

    // compressed y coordinates and the coverage tree
    private long[] ys;
    private int[] mn, mx, lz;

    // output vertical boundary edges in sweep order
    private long[] vx = new long[16];
    private int[] vlo = new int[16], vhi = new int[16];
    private boolean[] vup = new boolean[16];
    private int vn;

    ManhattanMerge(String name, Collection<Polygon> polygons) {
        this.name = name;
        this.polygons = polygons;
    }

    MergedLayer run() {
        Rings r = rings();
        return new MergedLayer(name, r.xy(), r.ringStart(), r.ringShape(), r.shapes(), true);
    }

    /**
     * Boundary rings in sweep order: ring r holds edges ringStart[r] .. ringStart[r + 1] - 1 (four
     * coordinates each in xy), starts with its first vertical edge in sweep order (by x, right-facing
     * before left-facing, then by lower y) and belongs to shape ringShape[r]; shapes are numbered in
     * the order of their first ring.
     */
    record Rings(long[] xy, int[] ringStart, int[] ringShape, int shapes) {
    }

    Rings rings() {
        // 1. vertical edges of the input with their coverage change
        int count = 0;
        for (Polygon p : polygons) {
            count += p.size();
        }
        long[] ex = new long[count / 2 + 1];
        long[] ey0 = new long[ex.length], ey1 = new long[ex.length];
        int[] ed = new int[ex.length];
        long[] yAll = new long[2 * ex.length];
        int m = 0, yc = 0;
        for (Polygon p : polygons) {
            long a2 = p.signedArea2();
            if (a2 == 0) {
                continue;
            }
            int orient = a2 > 0 ? 1 : -1;
            int n = p.size();
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                long x0 = p.x(i), y0 = p.y(i), y1 = p.y(j);
                if (y0 == y1) {
                    continue;
                }
                if (m == ex.length) {
                    ex = Arrays.copyOf(ex, 2 * m);
                    ey0 = Arrays.copyOf(ey0, 2 * m);
                    ey1 = Arrays.copyOf(ey1, 2 * m);
                    ed = Arrays.copyOf(ed, 2 * m);
                    yAll = Arrays.copyOf(yAll, 4 * m);
                }
                ex[m] = x0;
                ey0[m] = Math.min(y0, y1);
                ey1[m] = Math.max(y0, y1);
                // counter-clockwise: a downward edge is a left side, entering material
                ed[m] = (y1 < y0 ? 1 : -1) * orient;
                yAll[yc++] = y0;
                yAll[yc++] = y1;
                m++;
            }
        }
        if (m == 0) {
            return new Rings(new long[0], new int[] {0}, new int[0], 0);
        }
        Arrays.sort(yAll, 0, yc);
        int u = 0;
        for (int i = 0; i < yc; i++) {
            if (u == 0 || yAll[i] != yAll[u - 1]) {
                yAll[u++] = yAll[i];
            }
        }
        ys = Arrays.copyOf(yAll, u);
        yAll = null;
        int leaves = Math.max(1, u - 1);
        mn = new int[4 * leaves];
        mx = new int[4 * leaves];
        lz = new int[4 * leaves];

        // sort edge indices by x (pack x rank and index into one long)
        long[] key = new long[m];
        long minX = Long.MAX_VALUE;
        for (int i = 0; i < m; i++) {
            minX = Math.min(minX, ex[i]);
        }
        int idxBits = 64 - Long.numberOfLeadingZeros(Math.max(1, m - 1));
        if (idxBits > 31) {
            throw new IllegalArgumentException("layer " + name + " has too many edges: " + m);
        }
        for (int i = 0; i < m; i++) {
            long dx = ex[i] - minX;
            if (dx >= (1L << (63 - idxBits))) {
                throw new IllegalArgumentException("layer " + name + ": coordinates span too wide for the scanline: " + dx);
            }
            key[i] = (dx << idxBits) | i;
        }
        Arrays.sort(key);
        long mask = (1L << idxBits) - 1;

        // 2. sweep
        int[] lo = new int[16], hi = new int[16], dl = new int[16];
        int[] runsBefore = new int[32], runsAfter = new int[32];
        int i = 0;
        while (i < m) {
            int first = (int) (key[i] & mask);
            long x = ex[first];
            int b = 0;
            while (i < m && ex[(int) (key[i] & mask)] == x) {
                int k = (int) (key[i] & mask);
                if (b == lo.length) {
                    lo = Arrays.copyOf(lo, 2 * b);
                    hi = Arrays.copyOf(hi, 2 * b);
                    dl = Arrays.copyOf(dl, 2 * b);
                }
                lo[b] = Arrays.binarySearch(ys, ey0[k]);
                hi[b] = Arrays.binarySearch(ys, ey1[k]);
                dl[b] = ed[k];
                b++;
                i++;
            }
            // union of the touched ranges
            long[] rk = new long[b];
            for (int k = 0; k < b; k++) {
                rk[k] = ((long) lo[k] << 32) | hi[k];
            }
            Arrays.sort(rk);
            int[] ul = new int[b], uh = new int[b];
            int un = 0;
            for (int k = 0; k < b; k++) {
                int l = (int) (rk[k] >>> 32), h = (int) rk[k];
                if (un > 0 && l <= uh[un - 1]) {
                    uh[un - 1] = Math.max(uh[un - 1], h);
                } else {
                    ul[un] = l;
                    uh[un] = h;
                    un++;
                }
            }
            int nb = 0;
            for (int k = 0; k < un; k++) {
                runsBefore = zeroRuns(ul[k], uh[k], runsBefore, nb);
                nb = runCount;
            }
            for (int k = 0; k < b; k++) {
                add(1, 0, leaves, lo[k], hi[k], dl[k]);
            }
            int na = 0;
            for (int k = 0; k < un; k++) {
                runsAfter = zeroRuns(ul[k], uh[k], runsAfter, na);
                na = runCount;
            }
            // right-facing edges (material ends: zero after, not before) first, then left-facing
            emitDifference(x, runsAfter, na, runsBefore, nb, true);
            emitDifference(x, runsBefore, nb, runsAfter, na, false);
        }
        mn = mx = lz = null;
        return link();
    }

    private int runCount;

    /** Appends the maximal runs of zero-coverage leaves within [l, h) to out (pairs), merging touching runs. */
    private int[] zeroRuns(int l, int h, int[] out, int n) {
        runCount = n;
        runsOut = out;
        collect(1, 0, Math.max(1, ys.length - 1), l, h);
        return runsOut;
    }

    private int[] runsOut;

    private void collect(int node, int nl, int nr, int l, int h) {
        if (h <= nl || nr <= l || mn[node] > 0) {
            return;
        }
        if (l <= nl && nr <= h && mx[node] == 0) {
            int c = runCount;
            if (c > 0 && runsOut[2 * c - 1] == nl) {
                runsOut[2 * c - 1] = nr;
            } else {
                if (2 * c + 2 > runsOut.length) {
                    runsOut = Arrays.copyOf(runsOut, 2 * runsOut.length);
                }
                runsOut[2 * c] = nl;
                runsOut[2 * c + 1] = nr;
                runCount = c + 1;
            }
            return;
        }
        push(node);
        int mid = (nl + nr) >>> 1;
        collect(2 * node, nl, mid, l, h);
        collect(2 * node + 1, mid, nr, l, h);
    }

    private void push(int node) {
        int z = lz[node];
        if (z != 0) {
            for (int c = 2 * node; c <= 2 * node + 1; c++) {
                mn[c] += z;
                mx[c] += z;
                lz[c] += z;
            }
            lz[node] = 0;
        }
    }

    private void add(int node, int nl, int nr, int l, int h, int d) {
        if (h <= nl || nr <= l) {
            return;
        }
        if (l <= nl && nr <= h) {
            mn[node] += d;
            mx[node] += d;
            lz[node] += d;
            return;
        }
        push(node);
        int mid = (nl + nr) >>> 1;
        add(2 * node, nl, mid, l, h, d);
        add(2 * node + 1, mid, nr, l, h, d);
        mn[node] = Math.min(mn[2 * node], mn[2 * node + 1]);
        mx[node] = Math.max(mx[2 * node], mx[2 * node + 1]);
    }

    /** Emits a \ b (sorted disjoint leaf runs) as vertical edges at x. */
    private void emitDifference(long x, int[] a, int na, int[] b, int nb, boolean up) {
        int j = 0;
        for (int k = 0; k < na; k++) {
            int l = a[2 * k], h = a[2 * k + 1];
            int cur = l;
            while (j < nb && b[2 * j + 1] <= cur) {
                j++;
            }
            int jj = j;
            while (cur < h) {
                if (jj < nb && b[2 * jj] < h) {
                    int bl = b[2 * jj], bh = b[2 * jj + 1];
                    if (bl > cur) {
                        emit(x, cur, bl, up);
                    }
                    cur = Math.max(cur, bh);
                    jj++;
                } else {
                    emit(x, cur, h, up);
                    cur = h;
                }
            }
        }
    }

    private void emit(long x, int l, int h, boolean up) {
        if (vn == vx.length) {
            vx = Arrays.copyOf(vx, 2 * vn);
            vlo = Arrays.copyOf(vlo, 2 * vn);
            vhi = Arrays.copyOf(vhi, 2 * vn);
            vup = Arrays.copyOf(vup, 2 * vn);
        }
        vx[vn] = x;
        vlo[vn] = l;
        vhi[vn] = h;
        vup[vn] = up;
        vn++;
    }

    /** Links the vertical boundary edges into rings and groups rings into shapes. */
    private Rings link() {
        int n = vn;
        // endpoints 2k (bottom) and 2k+1 (top), bucketed by y rank in sweep order (stable)
        int[] start = new int[ys.length + 1];
        for (int k = 0; k < n; k++) {
            start[vlo[k] + 1]++;
            start[vhi[k] + 1]++;
        }
        for (int r = 0; r < ys.length; r++) {
            start[r + 1] += start[r];
        }
        int[] fill = Arrays.copyOf(start, ys.length);
        int[] order = new int[2 * n];
        for (int k = 0; k < n; k++) {
            order[fill[vlo[k]]++] = 2 * k;
            order[fill[vhi[k]]++] = 2 * k + 1;
        }
        fill = null;
        int[] partner = new int[2 * n];
        for (int r = 0; r < ys.length; r++) {
            for (int p = start[r]; p < start[r + 1]; p += 2) {
                partner[order[p]] = order[p + 1];
                partner[order[p + 1]] = order[p];
            }
        }
        order = null;
        start = null;
        // walk rings
        int[] ringOfV = new int[n];
        Arrays.fill(ringOfV, -1);
        long[] xy = new long[8 * n];
        int[] ringStart = new int[n / 2 + 2];
        int rings = 0, e = 0;
        int[] ringFirstV = new int[n / 2 + 1];
        for (int k0 = 0; k0 < n; k0++) {
            if (ringOfV[k0] >= 0) {
                continue;
            }
            if (rings + 1 >= ringStart.length) {
                ringStart = Arrays.copyOf(ringStart, 2 * ringStart.length);
                ringFirstV = Arrays.copyOf(ringFirstV, 2 * ringFirstV.length);
            }
            ringStart[rings] = e;
            ringFirstV[rings] = k0;
            int k = k0;
            do {
                ringOfV[k] = rings;
                long x = vx[k];
                long sy = ys[vup[k] ? vlo[k] : vhi[k]];
                int endPoint = vup[k] ? 2 * k + 1 : 2 * k;
                long ey = ys[vup[k] ? vhi[k] : vlo[k]];
                int nextPoint = partner[endPoint];
                int next = nextPoint >> 1;
                // vertical edge
                xy[4 * e] = x;
                xy[4 * e + 1] = sy;
                xy[4 * e + 2] = x;
                xy[4 * e + 3] = ey;
                e++;
                // horizontal edge to the next vertical edge's start
                xy[4 * e] = x;
                xy[4 * e + 1] = ey;
                xy[4 * e + 2] = vx[next];
                xy[4 * e + 3] = ey;
                e++;
                k = next;
            } while (k != k0);
            rings++;
        }
        ringStart[rings] = e;
        // shapes: a ring whose first (leftmost) vertical edge is right-facing is a hole
        int[] parent = UnionFind.singletons(rings);
        boolean anyHole = false;
        for (int r = 0; r < rings; r++) {
            if (vup[ringFirstV[r]]) {
                anyHole = true;
                break;
            }
        }
        if (anyHole) {
            attachHoles(n, ringOfV, ringFirstV, rings, parent);
        }
        int[] shapeOfRoot = new int[rings];
        Arrays.fill(shapeOfRoot, -1);
        int[] ringShape = new int[rings];
        int shapes = 0;
        for (int r = 0; r < rings; r++) {
            int root = UnionFind.find(parent, r);
            if (shapeOfRoot[root] < 0) {
                shapeOfRoot[root] = shapes++;
            }
            ringShape[r] = shapeOfRoot[root];
        }
        return new Rings(Arrays.copyOf(xy, 4 * e), Arrays.copyOf(ringStart, rings + 1), ringShape, shapes);
    }

    /** Second sweep: each hole joins the ring of the nearest boundary edge to its left. */
    private void attachHoles(int n, int[] ringOfV, int[] ringFirstV, int rings, int[] parent) {
        int leaves = Math.max(1, ys.length - 1);
        int[] assign = new int[4 * leaves];
        Arrays.fill(assign, -1);
        boolean[] holeFirst = new boolean[n];
        for (int r = 0; r < rings; r++) {
            if (vup[ringFirstV[r]]) {
                holeFirst[ringFirstV[r]] = true;
            }
        }
        for (int k = 0; k < n; k++) {
            if (holeFirst[k]) {
                int left = query(assign, 1, 0, leaves, vlo[k]);
                if (left < 0) {
                    throw new IllegalStateException("hole without enclosing edge in layer " + name);
                }
                UnionFind.union(parent, ringOfV[k], ringOfV[left]);
            }
            assignRange(assign, 1, 0, leaves, vlo[k], vhi[k], k);
        }
        // holes link to holes or outers; unions already connect them transitively
    }

    private static int query(int[] t, int node, int nl, int nr, int leaf) {
        int best = -1;
        while (true) {
            if (t[node] >= 0) {
                best = t[node];
                // later assignments on children are pushed down; the node value is current
            }
            if (nr - nl == 1) {
                return best;
            }
            int mid = (nl + nr) >>> 1;
            if (t[node] >= 0) {
                return best;
            }
            if (leaf < mid) {
                node = 2 * node;
                nr = mid;
            } else {
                node = 2 * node + 1;
                nl = mid;
            }
        }
    }

    private static void assignRange(int[] t, int node, int nl, int nr, int l, int h, int v) {
        if (h <= nl || nr <= l) {
            return;
        }
        if (l <= nl && nr <= h) {
            t[node] = v;
            return;
        }
        if (t[node] >= 0) {
            t[2 * node] = t[node];
            t[2 * node + 1] = t[node];
            t[node] = -1;
        }
        int mid = (nl + nr) >>> 1;
        assignRange(t, 2 * node, nl, mid, l, h, v);
        assignRange(t, 2 * node + 1, mid, nr, l, h, v);
    }


}
