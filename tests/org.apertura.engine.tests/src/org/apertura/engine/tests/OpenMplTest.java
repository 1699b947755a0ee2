/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.colour.ConflictGraph;
import org.apertura.engine.colour.Decomposition;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.tests.support.JtsOracle;
import org.apertura.engine.tests.support.MiniGds;
import org.apertura.engine.tests.support.TestData;
import org.jgrapht.Graph;
import org.jgrapht.GraphTests;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.AsSubgraph;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleGraph;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * The OpenMPL benchmark layout sim_c1 (limbo018/OpenMPL, BSD-3-Clause; 2,034 boxes on layer 1, 1 nm
 * database unit). The conflict graph at a stated colouring distance is built by the engine and,
 * independently, from JTS distances between the JTS-union polygons (STRtree candidates), then
 * compared: same edges, same component count (JGraphT ConnectivityInspector) and the same odd-cycle
 * verdict per component (JGraphT GraphTests.isBipartite). The distances are our choice, stated here:
 * 100 nm (OpenMPL's usual setting for these benchmarks, from memory) and 120 nm.
 */
class OpenMplTest {

    @ParameterizedTest(name = "colouring distance {0} nm")
    @ValueSource(longs = {100, 120})
    void conflictGraphMatchesJtsAndJgrapht(long distance) throws IOException {
        Path file = TestData.root().resolve("openmpl").resolve("sim_c1.gds");
        List<Polygon> boxes = MiniGds.read(file).layer(1, 0);
        assertThat(boxes).hasSize(2034);
        MergedLayer m = RegionMerger.merge("sim_c1", boxes);
        ConflictGraph g = new CheckEngine(CheckOptions.threads(2)).conflictGraph(m, distance);

        List<org.locationtech.jts.geom.Polygon> polys = JtsOracle.union(boxes);
        assertThat(polys).hasSize(m.shapeCount());
        // match JTS polygons to engine shapes through an interior point
        STRtree shapes = new STRtree();
        for (int s = 0; s < m.shapeCount(); s++) {
            Geometry sg = CheckEngine.shapeGeometry(JtsOracle.GF, m, s);
            shapes.insert(sg.getEnvelopeInternal(), new Object[] {s, sg});
        }
        int[] toEngine = new int[polys.size()];
        STRtree tree = new STRtree();
        for (int i = 0; i < polys.size(); i++) {
            Geometry pt = polys.get(i).getInteriorPoint();
            toEngine[i] = -1;
            for (Object o : shapes.query(pt.getEnvelopeInternal())) {
                Object[] e = (Object[]) o;
                if (((Geometry) e[1]).covers(pt)) {
                    toEngine[i] = (Integer) e[0];
                }
            }
            assertThat(toEngine[i]).isNotNegative();
            tree.insert(polys.get(i).getEnvelopeInternal(), i);
        }
        Graph<Integer, DefaultEdge> ref = new SimpleGraph<>(DefaultEdge.class);
        for (int i = 0; i < polys.size(); i++) {
            ref.addVertex(toEngine[i]);
        }
        for (int i = 0; i < polys.size(); i++) {
            org.locationtech.jts.geom.Envelope env = new org.locationtech.jts.geom.Envelope(polys.get(i).getEnvelopeInternal());
            env.expandBy(distance);
            for (Object o : tree.query(env)) {
                int j = (Integer) o;
                if (j > i && polys.get(i).distance(polys.get(j)) < distance) {
                    ref.addEdge(toEngine[i], toEngine[j]);
                }
            }
        }
        Set<List<Integer>> expected = new HashSet<>();
        for (DefaultEdge e : ref.edgeSet()) {
            int a = ref.getEdgeSource(e), b = ref.getEdgeTarget(e);
            expected.add(List.of(Math.min(a, b), Math.max(a, b)));
        }
        Set<List<Integer>> actual = new HashSet<>();
        g.edges().forEach(e -> actual.add(List.of(e.a(), e.b())));
        assertThat(actual).isEqualTo(expected);

        List<Set<Integer>> refComponents = new ConnectivityInspector<>(ref).connectedSets();
        Decomposition d = Decomposition.colour(g, 2);
        assertThat(d.components()).hasSize(refComponents.size());
        int oddComponents = 0;
        for (Decomposition.Component c : d.components()) {
            boolean bipartite = GraphTests.isBipartite(new AsSubgraph<>(ref, new HashSet<>(c.shapes())));
            assertThat(c.coloured()).isEqualTo(bipartite);
            if (!bipartite) {
                oddComponents++;
            }
        }
        ColouringTest.checkTwoMasks(g, d);
        System.out.printf("sim_c1 at %d nm: %d shapes, %d conflict edges, %d components, %d not 2-colourable, %d odd cycles%n",
                distance, m.shapeCount(), g.edges().size(), d.components().size(), oddComponents, d.oddCycles().size());
        List<Integer> sizes = new ArrayList<>();
        assertThat(sizes).isEmpty();
    }
}
