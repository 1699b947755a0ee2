/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.colour;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A mask assignment of a {@link ConflictGraph}.
 * <p>
 * <b>Two masks</b>: breadth-first 2-colouring per component, exact. Each conflict edge joining two
 * vertices of equal colour closes an odd cycle (tree path from one end to the common ancestor and
 * back down to the other end), which is reported as the shapes of that cycle; the component is then
 * not colourable and its assignment is the (conflicting) BFS colouring.
 * <p>
 * <b>Three masks</b>: vertices of degree below 3 are peeled off repeatedly (they can always be
 * coloured last). A remaining core of at most {@value #EXACT_LIMIT} vertices is searched exactly
 * (backtracking in DSATUR order, at most {@value #NODE_BUDGET} search nodes). Larger cores, or cores
 * whose search ran out of budget, are coloured by the DSATUR heuristic choosing for each vertex the
 * mask with the fewest already-coloured conflicting neighbours; edges left with equal masks are
 * reported as unresolved. Such a component is reported as {@link Method#HEURISTIC}: not colourable by
 * the heuristic, which does not prove that no 3-colouring exists.
 */
public final class Decomposition {

    /** Largest core (after peeling) searched exactly for three masks. */
    public static final int EXACT_LIMIT = 60;
    /** Search-node budget of the exact three-mask search per component. */
    public static final long NODE_BUDGET = 2_000_000;

    /** How a component was coloured. */
    public enum Method {
        /** exact two-colouring */
        BIPARTITE,
        /** exact three-colouring search (a negative answer is a proof) */
        EXACT_SEARCH,
        /** three-colouring heuristic (a negative answer is not a proof) */
        HEURISTIC
    }

    /** Result for one connected component (shapes ascending). */
    public record Component(List<Integer> shapes, Method method, boolean coloured) {
    }

    private final int masks;
    private final int[] mask;
    private final List<Component> components;
    private final List<List<Integer>> oddCycles;
    private final List<ConflictGraph.Edge> unresolved;

    private Decomposition(int masks, int[] mask, List<Component> components, List<List<Integer>> oddCycles,
            List<ConflictGraph.Edge> unresolved) {
        this.masks = masks;
        this.mask = mask;
        this.components = List.copyOf(components);
        this.oddCycles = List.copyOf(oddCycles);
        this.unresolved = List.copyOf(unresolved);
    }

    public int masks() {
        return masks;
    }

    /** Mask (0 .. masks-1) of a shape. */
    public int mask(int shape) {
        return mask[shape];
    }

    /** True when every component was coloured without conflict. */
    public boolean colourable() {
        return components.stream().allMatch(Component::coloured);
    }

    public List<Component> components() {
        return components;
    }

    /** Two masks: one odd cycle (shapes in cycle order) per conflict edge closing one. */
    public List<List<Integer>> oddCycles() {
        return oddCycles;
    }

    /** Three masks: conflict edges the heuristic left with equal masks. */
    public List<ConflictGraph.Edge> unresolved() {
        return unresolved;
    }

    /** Colours {@code g} with 2 or 3 masks. */
    public static Decomposition colour(ConflictGraph g, int masks) {
        if (masks == 2) {
            return twoColour(g);
        }
        if (masks == 3) {
            return threeColour(g);
        }
        throw new IllegalArgumentException("mask count must be 2 or 3, got " + masks);
    }

    private static Decomposition twoColour(ConflictGraph g) {
        int n = g.vertexCount();
        int[] colour = new int[n];
        int[] parent = new int[n];
        int[] depth = new int[n];
        Arrays.fill(colour, -1);
        List<Component> comps = new ArrayList<>();
        List<List<Integer>> cycles = new ArrayList<>();
        int[] queue = new int[n];
        for (int s = 0; s < n; s++) {
            if (colour[s] >= 0) {
                continue;
            }
            int head = 0, tail = 0;
            queue[tail++] = s;
            colour[s] = 0;
            parent[s] = -1;
            depth[s] = 0;
            boolean ok = true;
            while (head < tail) {
                int v = queue[head++];
                for (int i = 0; i < g.degree(v); i++) {
                    int w = g.neighbour(v, i);
                    if (colour[w] < 0) {
                        colour[w] = 1 - colour[v];
                        parent[w] = v;
                        depth[w] = depth[v] + 1;
                        queue[tail++] = w;
                    } else if (colour[w] == colour[v] && v < w) {
                        ok = false;
                        cycles.add(cycle(v, w, parent, depth));
                    }
                }
            }
            int[] c = Arrays.copyOf(queue, tail);
            Arrays.sort(c);
            comps.add(new Component(boxed(c), Method.BIPARTITE, ok));
        }
        cycles.sort((a, b) -> {
            int c = Integer.compare(a.size(), b.size());
            for (int i = 0; c == 0 && i < a.size(); i++) {
                c = Integer.compare(a.get(i), b.get(i));
            }
            return c;
        });
        return new Decomposition(2, colour, comps, cycles, List.of());
    }

    /** The odd cycle closed by edge (v, w) of equal colour: v .. lca .. w. */
    private static List<Integer> cycle(int v, int w, int[] parent, int[] depth) {
        List<Integer> left = new ArrayList<>(), right = new ArrayList<>();
        int a = v, b = w;
        while (depth[a] > depth[b]) {
            left.add(a);
            a = parent[a];
        }
        while (depth[b] > depth[a]) {
            right.add(b);
            b = parent[b];
        }
        while (a != b) {
            left.add(a);
            right.add(b);
            a = parent[a];
            b = parent[b];
        }
        left.add(a);
        for (int i = right.size() - 1; i >= 0; i--) {
            left.add(right.get(i));
        }
        return List.copyOf(left);
    }

    private static List<Integer> boxed(int[] a) {
        List<Integer> l = new ArrayList<>(a.length);
        for (int v : a) {
            l.add(v);
        }
        return List.copyOf(l);
    }

    private static Decomposition threeColour(ConflictGraph g) {
        int n = g.vertexCount();
        int[] colour = new int[n];
        Arrays.fill(colour, -1);
        List<Component> comps = new ArrayList<>();
        List<ConflictGraph.Edge> unresolved = new ArrayList<>();
        for (int[] comp : g.components()) {
            // peel vertices of degree < 3 within the component
            int[] deg = new int[comp.length];
            int[] pos = new int[n];
            for (int i = 0; i < comp.length; i++) {
                pos[comp[i]] = i;
            }
            boolean[] removed = new boolean[comp.length];
            int[] stack = new int[comp.length];
            int sp = 0;
            for (int i = 0; i < comp.length; i++) {
                deg[i] = g.degree(comp[i]);
                if (deg[i] < 3) {
                    removed[i] = true;
                    stack[sp++] = i;
                }
            }
            for (int k = 0; k < sp; k++) {
                int v = comp[stack[k]];
                for (int j = 0; j < g.degree(v); j++) {
                    int wi = pos[g.neighbour(v, j)];
                    if (!removed[wi] && --deg[wi] < 3) {
                        removed[wi] = true;
                        stack[sp++] = wi;
                    }
                }
            }
            List<Integer> core = new ArrayList<>();
            for (int i = 0; i < comp.length; i++) {
                if (!removed[i]) {
                    core.add(comp[i]);
                }
            }
            Method method = Method.EXACT_SEARCH;
            boolean ok = true;
            if (!core.isEmpty()) {
                boolean solved = false;
                if (core.size() <= EXACT_LIMIT) {
                    Boolean r = exact(g, core, colour);
                    if (r != null) {
                        solved = true;
                        ok = r;
                        if (!ok) {
                            // no 3-colouring exists: fall back to the heuristic for an assignment
                            for (int v : core) {
                                colour[v] = -1;
                            }
                            dsatur(g, core, colour);
                        }
                    }
                }
                if (!solved) {
                    method = Method.HEURISTIC;
                    for (int v : core) {
                        colour[v] = -1;
                    }
                    ok = dsatur(g, core, colour);
                }
            }
            // colour peeled vertices in reverse order: at most 2 coloured neighbours each
            for (int k = sp - 1; k >= 0; k--) {
                int v = comp[stack[k]];
                boolean[] used = new boolean[3];
                for (int j = 0; j < g.degree(v); j++) {
                    int c = colour[g.neighbour(v, j)];
                    if (c >= 0) {
                        used[c] = true;
                    }
                }
                int c = 0;
                while (used[c]) {
                    c++;
                }
                colour[v] = c;
            }
            comps.add(new Component(boxed(comp), method, ok));
        }
        for (ConflictGraph.Edge e : g.edges()) {
            if (colour[e.a()] == colour[e.b()]) {
                unresolved.add(e);
            }
        }
        return new Decomposition(3, colour, comps, List.of(), unresolved);
    }

    /** Exact backtracking; true/false when decided within budget, null when out of budget. */
    private static Boolean exact(ConflictGraph g, List<Integer> core, int[] colour) {
        int m = core.size();
        int[] verts = core.stream().mapToInt(Integer::intValue).toArray();
        java.util.Map<Integer, Integer> idx = new java.util.HashMap<>();
        for (int i = 0; i < m; i++) {
            idx.put(verts[i], i);
        }
        int[][] nb = new int[m][];
        for (int i = 0; i < m; i++) {
            List<Integer> l = new ArrayList<>();
            for (int j = 0; j < g.degree(verts[i]); j++) {
                Integer k = idx.get(g.neighbour(verts[i], j));
                if (k != null) {
                    l.add(k);
                }
            }
            nb[i] = l.stream().mapToInt(Integer::intValue).toArray();
        }
        int[] c = new int[m];
        Arrays.fill(c, -1);
        long[] nodes = {0};
        Boolean r = search(nb, c, 0, nodes);
        if (r != null && r) {
            for (int i = 0; i < m; i++) {
                colour[verts[i]] = c[i];
            }
        }
        return r;
    }

    private static Boolean search(int[][] nb, int[] c, int coloured, long[] nodes) {
        if (coloured == c.length) {
            return true;
        }
        if (++nodes[0] > NODE_BUDGET) {
            return null;
        }
        // DSATUR: most constrained uncoloured vertex, ties by degree then index
        int best = -1, bestSat = -1, bestDeg = -1;
        for (int v = 0; v < c.length; v++) {
            if (c[v] >= 0) {
                continue;
            }
            int sat = Integer.bitCount(usedMask(nb, c, v));
            if (sat > bestSat || sat == bestSat && nb[v].length > bestDeg) {
                best = v;
                bestSat = sat;
                bestDeg = nb[v].length;
            }
        }
        int used = usedMask(nb, c, best);
        for (int col = 0; col < 3; col++) {
            if ((used & (1 << col)) != 0) {
                continue;
            }
            c[best] = col;
            Boolean r = search(nb, c, coloured + 1, nodes);
            if (r == null || r) {
                if (r == null) {
                    c[best] = -1;
                }
                return r;
            }
            c[best] = -1;
            if (coloured == 0) {
                break; // symmetry: the first vertex's mask is arbitrary
            }
        }
        return false;
    }

    private static int usedMask(int[][] nb, int[] c, int v) {
        int used = 0;
        for (int w : nb[v]) {
            if (c[w] >= 0) {
                used |= 1 << c[w];
            }
        }
        return used;
    }

    /** DSATUR heuristic; true when no conflict remains among {@code core}. */
    private static boolean dsatur(ConflictGraph g, List<Integer> core, int[] colour) {
        boolean ok = true;
        java.util.Set<Integer> inCore = new java.util.HashSet<>(core);
        for (int step = 0; step < core.size(); step++) {
            int best = -1, bestSat = -1, bestDeg = -1;
            for (int v : core) {
                if (colour[v] >= 0) {
                    continue;
                }
                int used = 0;
                for (int j = 0; j < g.degree(v); j++) {
                    int c = colour[g.neighbour(v, j)];
                    if (c >= 0) {
                        used |= 1 << c;
                    }
                }
                int sat = Integer.bitCount(used);
                if (sat > bestSat || sat == bestSat && g.degree(v) > bestDeg) {
                    best = v;
                    bestSat = sat;
                    bestDeg = g.degree(v);
                }
            }
            int[] clash = new int[3];
            for (int j = 0; j < g.degree(best); j++) {
                int w = g.neighbour(best, j);
                if (inCore.contains(w) && colour[w] >= 0) {
                    clash[colour[w]]++;
                }
            }
            int pick = 0;
            for (int col = 1; col < 3; col++) {
                if (clash[col] < clash[pick]) {
                    pick = col;
                }
            }
            if (clash[pick] > 0) {
                ok = false;
            }
            colour[best] = pick;
        }
        return ok;
    }
}
