/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.colour;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apertura.engine.internal.EdgeIndex;
import org.apertura.engine.internal.Exec;
import org.apertura.engine.internal.PairSearch;
import org.apertura.engine.region.MergedLayer;

/**
 * Undirected graph whose vertices are the merged shapes of a layer (numbered as in
 * {@link MergedLayer}) and whose edges join two shapes closer than the colouring distance (Euclidean,
 * strictly; shapes touching at a corner have distance 0). Edges are sorted by (a, b) with a < b and
 * carry the smallest distance between the two shapes.
 */
public final class ConflictGraph {

    /** A conflict between shapes {@code a < b} at {@code distance} database units. */
    public record Edge(int a, int b, double distance) {
    }

    private final int vertices;
    private final List<Edge> edges;
    private final int[] adjStart;
    private final int[] adj;

    /** A graph over {@code vertices} vertices with the given edges (any order, duplicates merged). */
    public ConflictGraph(int vertices, List<Edge> edges) {
        this.vertices = vertices;
        List<Edge> sorted = new ArrayList<>(edges.size());
        for (Edge e : edges) {
            if (e.a() == e.b() || e.a() < 0 || e.b() < 0 || e.a() >= vertices || e.b() >= vertices) {
                throw new IllegalArgumentException("bad conflict edge " + e + " for " + vertices + " vertices");
            }
            sorted.add(e.a() < e.b() ? e : new Edge(e.b(), e.a(), e.distance()));
        }
        sorted.sort((x, y) -> x.a() != y.a() ? Integer.compare(x.a(), y.a()) : Integer.compare(x.b(), y.b()));
        List<Edge> dedup = new ArrayList<>(sorted.size());
        for (Edge e : sorted) {
            Edge last = dedup.isEmpty() ? null : dedup.get(dedup.size() - 1);
            if (last != null && last.a() == e.a() && last.b() == e.b()) {
                if (e.distance() < last.distance()) {
                    dedup.set(dedup.size() - 1, e);
                }
            } else {
                dedup.add(e);
            }
        }
        this.edges = List.copyOf(dedup);
        adjStart = new int[vertices + 1];
        for (Edge e : dedup) {
            adjStart[e.a() + 1]++;
            adjStart[e.b() + 1]++;
        }
        for (int v = 0; v < vertices; v++) {
            adjStart[v + 1] += adjStart[v];
        }
        adj = new int[2 * dedup.size()];
        int[] fill = Arrays.copyOf(adjStart, vertices);
        for (Edge e : dedup) {
            adj[fill[e.a()]++] = e.b();
            adj[fill[e.b()]++] = e.a();
        }
    }

    /** The conflict graph of a layer's merged shapes at {@code distance} database units. */
    public static ConflictGraph build(MergedLayer layer, EdgeIndex index, long distance, Exec exec) {
        List<Edge> found = PairSearch.run(layer, index, distance, 1, exec, (e, f, p, out) -> {
            int a = layer.shapeOf(e), b = layer.shapeOf(f);
            if (a != b) {
                out.add(new Edge(Math.min(a, b), Math.max(a, b), p.distance));
            }
        });
        return new ConflictGraph(layer.shapeCount(), found);
    }

    public int vertexCount() {
        return vertices;
    }

    public List<Edge> edges() {
        return edges;
    }

    /** Neighbours of v in ascending order. */
    public int[] neighbours(int v) {
        int[] n = Arrays.copyOfRange(adj, adjStart[v], adjStart[v + 1]);
        Arrays.sort(n);
        return n;
    }

    int degree(int v) {
        return adjStart[v + 1] - adjStart[v];
    }

    int neighbour(int v, int i) {
        return adj[adjStart[v] + i];
    }

    /** Distance of the conflict between a and b, or infinity when they do not conflict. */
    public double distance(int a, int b) {
        int lo = Math.min(a, b), hi = Math.max(a, b);
        int i = java.util.Collections.binarySearch(edges, new Edge(lo, hi, 0),
                (x, y) -> x.a() != y.a() ? Integer.compare(x.a(), y.a()) : Integer.compare(x.b(), y.b()));
        return i >= 0 ? edges.get(i).distance() : Double.POSITIVE_INFINITY;
    }

    /** Connected components, each sorted, ordered by their smallest vertex (isolated vertices included). */
    public List<int[]> components() {
        int[] comp = new int[vertices];
        Arrays.fill(comp, -1);
        List<int[]> out = new ArrayList<>();
        int[] queue = new int[vertices];
        for (int s = 0; s < vertices; s++) {
            if (comp[s] >= 0) {
                continue;
            }
            int head = 0, tail = 0;
            queue[tail++] = s;
            comp[s] = out.size();
            while (head < tail) {
                int v = queue[head++];
                for (int i = adjStart[v]; i < adjStart[v + 1]; i++) {
                    int w = adj[i];
                    if (comp[w] < 0) {
                        comp[w] = out.size();
                        queue[tail++] = w;
                    }
                }
            }
            int[] c = Arrays.copyOf(queue, tail);
            Arrays.sort(c);
            out.add(c);
        }
        return out;
    }
}
