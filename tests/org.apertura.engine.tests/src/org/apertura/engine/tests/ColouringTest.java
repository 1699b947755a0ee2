/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.colour.ConflictGraph;
import org.apertura.engine.colour.Decomposition;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.tests.support.JtsOracle;
import org.apertura.engine.tests.support.RandomLayouts;
import org.jgrapht.Graph;
import org.jgrapht.GraphTests;
import org.jgrapht.alg.color.BrownBacktrackColoring;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleGraph;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;

/**
 * Mask assignment against JGraphT 1.5.3 (GraphTests.isBipartite, BrownBacktrackColoring for the exact
 * chromatic number) and conflict graphs against JTS distances.
 */
class ColouringTest {

    static Graph<Integer, DefaultEdge> jgrapht(ConflictGraph g) {
        Graph<Integer, DefaultEdge> j = new SimpleGraph<>(DefaultEdge.class);
        for (int v = 0; v < g.vertexCount(); v++) {
            j.addVertex(v);
        }
        for (ConflictGraph.Edge e : g.edges()) {
            j.addEdge(e.a(), e.b());
        }
        return j;
    }

    static ConflictGraph random(Random r, int n, double p) {
        List<ConflictGraph.Edge> edges = new ArrayList<>();
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                if (r.nextDouble() < p) {
                    edges.add(new ConflictGraph.Edge(a, b, 1));
                }
            }
        }
        return new ConflictGraph(n, edges);
    }

    /** Checks the 2-mask result against JGraphT and validates every odd cycle. */
    static void checkTwoMasks(ConflictGraph g, Decomposition d) {
        Graph<Integer, DefaultEdge> j = jgrapht(g);
        assertThat(d.colourable()).isEqualTo(GraphTests.isBipartite(j));
        if (d.colourable()) {
            assertThat(d.oddCycles()).isEmpty();
            for (ConflictGraph.Edge e : g.edges()) {
                assertThat(d.mask(e.a())).isNotEqualTo(d.mask(e.b()));
            }
        } else {
            assertThat(d.oddCycles()).isNotEmpty();
        }
        for (List<Integer> cycle : d.oddCycles()) {
            assertThat(cycle.size() % 2).isEqualTo(1);
            assertThat(new HashSet<>(cycle)).hasSize(cycle.size());
            for (int i = 0; i < cycle.size(); i++) {
                assertThat(j.containsEdge(cycle.get(i), cycle.get((i + 1) % cycle.size()))).isTrue();
            }
        }
        // each component's verdict equals JGraphT's on that component
        for (Decomposition.Component c : d.components()) {
            Graph<Integer, DefaultEdge> sub = new org.jgrapht.graph.AsSubgraph<>(j, new HashSet<>(c.shapes()));
            assertThat(c.coloured()).isEqualTo(GraphTests.isBipartite(sub));
        }
    }

    @Test
    void twoMasksEqualJgraphtBipartiteTest() {
        Random r = new Random(2);
        for (int c = 0; c < 2000; c++) {
            int n = 1 + r.nextInt(40);
            ConflictGraph g = random(r, n, r.nextDouble() * 4 / n);
            checkTwoMasks(g, Decomposition.colour(g, 2));
        }
    }

    @Test
    void threeMasksExactOnSmallGraphsEqualsChromaticNumber() {
        Random r = new Random(3);
        for (int c = 0; c < 600; c++) {
            int n = 2 + r.nextInt(24); // JGraphT 1.5.3's BrownBacktrackColoring fails on a single vertex
            ConflictGraph g = random(r, n, r.nextDouble() * 8 / n);
            Decomposition d = Decomposition.colour(g, 3);
            int chromatic = new BrownBacktrackColoring<>(jgrapht(g)).getChromaticNumber();
            assertThat(d.colourable()).as("case %d chromatic %d", c, chromatic).isEqualTo(chromatic <= 3);
            assertThat(d.components()).allMatch(x -> x.method() == Decomposition.Method.EXACT_SEARCH);
            if (d.colourable()) {
                assertThat(d.unresolved()).isEmpty();
                for (ConflictGraph.Edge e : g.edges()) {
                    assertThat(d.mask(e.a())).isNotEqualTo(d.mask(e.b()));
                }
            }
        }
    }

    @Test
    void threeMasksHeuristicBeyondTheBoundIsStatedAndReportsLeftoverConflicts() {
        // K4 is not 3-colourable; chained with a large 4-regular core the component exceeds the bound
        Random r = new Random(4);
        List<ConflictGraph.Edge> edges = new ArrayList<>();
        int n = 200;
        for (int v = 0; v < n; v++) {
            edges.add(new ConflictGraph.Edge(v, (v + 1) % n, 1));
            edges.add(new ConflictGraph.Edge(v, (v + 7) % n, 1));
        }
        for (int a = 0; a < 4; a++) {
            for (int b = a + 1; b < 4; b++) {
                edges.add(new ConflictGraph.Edge(a, b, 1));
            }
        }
        ConflictGraph g = new ConflictGraph(n, edges);
        Decomposition d = Decomposition.colour(g, 3);
        assertThat(d.components()).singleElement().satisfies(c -> {
            assertThat(c.method()).isEqualTo(Decomposition.Method.HEURISTIC);
            assertThat(c.coloured()).isFalse();
        });
        assertThat(d.unresolved()).isNotEmpty().allSatisfy(e -> assertThat(d.mask(e.a())).isEqualTo(d.mask(e.b())));
        assertThat(r).isNotNull();
    }

    @Test
    void conflictGraphOfRandomLayoutsEqualsJtsDistanceGraph() {
        Random r = new Random(5);
        CheckEngine engine = new CheckEngine(CheckOptions.threads(1));
        for (int c = 0; c < 400; c++) {
            List<Polygon> shapes = c % 2 == 0 ? RandomLayouts.manhattan(r, 2 + r.nextInt(20)) : RandomLayouts.octilinear(r, 2 + r.nextInt(12));
            long dist = 2 + r.nextInt(25);
            MergedLayer m = RegionMerger.merge("L", shapes);
            ConflictGraph g = engine.conflictGraph(m, dist);
            // reference: JTS union polygons matched to engine shapes by an interior point
            List<org.locationtech.jts.geom.Polygon> polys = JtsOracle.union(shapes);
            assertThat(polys).hasSize(m.shapeCount());
            int[] toEngine = new int[polys.size()];
            for (int i = 0; i < polys.size(); i++) {
                Geometry pt = polys.get(i).getInteriorPoint();
                toEngine[i] = -1;
                for (int s = 0; s < m.shapeCount(); s++) {
                    if (CheckEngine.shapeGeometry(JtsOracle.GF, m, s).covers(pt)) {
                        toEngine[i] = s;
                    }
                }
                assertThat(toEngine[i]).isNotNegative();
            }
            Set<List<Integer>> expected = new HashSet<>();
            for (int i = 0; i < polys.size(); i++) {
                for (int j = i + 1; j < polys.size(); j++) {
                    double d = polys.get(i).distance(polys.get(j));
                    if (d < dist - 1e-9) {
                        expected.add(List.of(Math.min(toEngine[i], toEngine[j]), Math.max(toEngine[i], toEngine[j])));
                    }
                }
            }
            Set<List<Integer>> actual = new HashSet<>();
            g.edges().forEach(e -> actual.add(List.of(e.a(), e.b())));
            assertThat(actual).as("case %d", c).isEqualTo(expected);
            checkTwoMasks(g, Decomposition.colour(g, 2));
        }
    }
}
