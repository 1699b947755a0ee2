/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.bench;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.apertura.engine.check.CheckEngine;
import org.apertura.engine.check.CheckOptions;
import org.apertura.engine.check.Violation;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.internal.EdgeIndex;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.index.strtree.STRtree;
import org.locationtech.jts.operation.union.UnaryUnionOp;

/**
 * Prints, per layout size: the engine's time (merge + width + spacing on m1 and m2), the time of a
 * straightforward JTS checker (union, STRtree, distance: spacing only) while it stays within a few
 * minutes, the engine's spacing-only time for a like-for-like ratio, the time to sort the same edges
 * (the floor), and heap bytes per edge. Arguments: sizes (default 10000 100000 1000000), "--threads N",
 * "--jts-limit SECONDS" (default 300): the JTS checker runs on the first size when it is at most 100k
 * rectangles, and on each further size while its time extrapolated from the previous one (linear,
 * +30 %) stays below the limit. A size where it is not run says so in the table ("not run") and in a
 * note naming the last measured JTS time; no extrapolated figure is printed as a measurement. At such a
 * size the JTS checker is then started once more in a separate JVM and stopped after "--jts-bound
 * SECONDS" (default 120; 0 skips this): if it finishes, its time is a measurement like any other; if it
 * is stopped, the table shows "&gt;SECONDS" and the ratio as a lower bound ("&gt;N x"), which is what
 * was measured. The engine time is the best of five runs (three above a million rectangles) after a
 * warm-up on the same workload, the sort time the best of three (the
 * floor is a minimum).
 */
public final class EngineBenchmark {

    private static final long SPACING = 50, WIDTH = 50;

    public static void main(String[] args) throws Exception {
        if (args.length == 2 && args[0].equals("--jts-child")) {
            // the bounded JTS run in its own JVM: print the time and stop
            int n = Integer.parseInt(args[1]);
            Map<String, List<Polygon>> layout = RoutingGenerator.generate(42, n);
            System.out.println("jts_s " + jtsSpacing(Map.of("m1", layout.get("m1"), "m2", layout.get("m2"))));
            return;
        }
        List<Integer> sizes = new ArrayList<>();
        int threads = Runtime.getRuntime().availableProcessors();
        double jtsLimit = 300, jtsBound = 120;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--threads" -> threads = Integer.parseInt(args[++i]);
                case "--jts-limit" -> jtsLimit = Double.parseDouble(args[++i]);
                case "--jts-bound" -> jtsBound = Double.parseDouble(args[++i]);
                default -> sizes.add(Integer.parseInt(args[i].replace("_", "")));
            }
        }
        if (sizes.isEmpty()) {
            sizes.addAll(List.of(10_000, 100_000, 1_000_000));
        }
        System.out.printf("apertura engine benchmark: %d threads, JDK %s, max heap %d MiB%n", threads,
                System.getProperty("java.version"), Runtime.getRuntime().maxMemory() >> 20);
        System.out.printf("%10s %9s %9s %9s %9s %9s %9s %8s %8s %7s %7s%n", "rects", "edges", "engine_s", "eng_sp_s",
                "jts_sp_s", "sort_s", "vs_jts", "vs_sort", "B/edge", "viol", "scale");
        double lastJts = 0, lastEngine = 0, measuredJts = 0;
        int lastSize = 0, lastJtsSize = 0;
        List<String> notes = new ArrayList<>();
        CheckEngine engine = new CheckEngine(CheckOptions.threads(threads));
        // warm-up on the measured workload (both layers, so the any-angle merge is compiled too) so that
        // no size is timed while the JIT is still compiling the engine
        warmUp(engine);
        for (int n : sizes) {
            Map<String, List<Polygon>> layout = RoutingGenerator.generate(42, n);
            Map<String, List<Polygon>> metal = Map.of("m1", layout.get("m1"), "m2", layout.get("m2"));
            long edges = 0;
            for (List<Polygon> l : metal.values()) {
                for (Polygon p : l) {
                    edges += p.size();
                }
            }
            // engine: merge + width + spacing
            List<Rule> rules = new ArrayList<>();
            rules.addAll(rules("m1"));
            rules.addAll(rules("m2"));
            double engineS = Double.POSITIVE_INFINITY;
            for (int rep = 0, reps = n > 1_000_000 ? 3 : 5; rep < reps; rep++) {
                System.gc();
                long t = System.nanoTime();
                engine.checkMerged(engine.merge(metal), rules);
                engineS = Math.min(engineS, (System.nanoTime() - t) / 1e9);
            }
            System.gc();
            long before = usedHeap();
            Map<String, MergedLayer> merged = engine.merge(metal);
            List<Violation> v = engine.checkMerged(merged, rules);
            long mergedEdges = 0, bytes = 0;
            for (MergedLayer m : merged.values()) {
                mergedEdges += m.edgeCount();
                bytes += m.retainedBytes() + m.derived(EdgeIndex.class, EdgeIndex::new).retainedBytes();
            }
            System.gc();
            long after = usedHeap();
            // engine spacing only (merge included) for the like-for-like ratio
            long t1 = System.nanoTime();
            Map<String, MergedLayer> merged2 = engine.merge(metal);
            engine.checkMerged(merged2, List.of(new SpacingRule("S1", "m1", SPACING), new SpacingRule("S2", "m2", SPACING)));
            double engineSp = (System.nanoTime() - t1) / 1e9;
            merged2 = null;
            // floor: sort the input edges (one long key per edge)
            double sortS = sortEdges(metal);
            // JTS checker while it is expected to finish within the limit
            double jtsS = Double.NaN;
            String jtsCell = null, ratioCell = null;
            boolean firstSmall = lastJts == 0 && n <= 100_000;
            if (firstSmall || lastJts > 0 && Double.isFinite(lastJts) && lastJts * ((double) n / lastSize) * 1.3 < jtsLimit) {
                jtsS = jtsSpacing(metal);
                lastJts = jtsS;
                lastJtsSize = n;
                measuredJts = jtsS;
            } else {
                String why = measuredJts > 0
                        ? String.format("JTS checker at %d rectangles: it took %.1f s (measured) at %d rectangles and linear"
                                + " growth from there would exceed the %.0f s limit (--jts-limit)", n, measuredJts,
                                lastJtsSize, jtsLimit)
                        : String.format("JTS checker at %d rectangles: it runs in this JVM first on a size of at most 100000"
                                + " and then only while its linear extrapolation stays below %.0f s (--jts-limit)", n, jtsLimit);
                lastJts = Double.POSITIVE_INFINITY;
                if (jtsBound <= 0) {
                    notes.add(why + "; NOT RUN (--jts-bound 0), no JTS figure for this size.");
                } else {
                    double bounded = boundedJts(n, jtsBound);
                    if (Double.isNaN(bounded)) {
                        notes.add(why + "; so it ran in a separate JVM, which ended without a time (see the error"
                                + " output): no JTS figure for this size.");
                    } else if (Double.isFinite(bounded)) {
                        jtsS = bounded;
                        notes.add(String.format("%s; so it ran in a separate JVM bounded to %.0f s (--jts-bound) and finished"
                                + " in %.1f s (measured).", why, jtsBound, bounded));
                    } else {
                        jtsCell = String.format(">%.0f", jtsBound);
                        ratioCell = String.format(">%.0fx", jtsBound / engineSp);
                        notes.add(String.format("%s; so it ran in a separate JVM and was stopped after %.0f s (--jts-bound)"
                                + " without finishing: its time and the ratio shown are measured lower bounds.", why, jtsBound));
                    }
                }
            }
            double scale = lastEngine > 0 ? engineS / lastEngine : Double.NaN;
            System.out.printf("%10d %9d %9.3f %9.3f %9s %9.3f %9s %8.2f %8.1f %7d %7s%n", n, edges, engineS, engineSp,
                    jtsCell != null ? jtsCell : Double.isNaN(jtsS) ? "not run" : String.format("%.3f", jtsS), sortS,
                    ratioCell != null ? ratioCell : Double.isNaN(jtsS) ? "-" : String.format("%.1fx", jtsS / engineSp),
                    engineS / sortS,
                    (double) bytes / mergedEdges, v.size(), Double.isNaN(scale) ? "-" : String.format("%.2fx", scale));
            System.out.printf("%10s merged edges %d; heap growth after merge+check (GC'd, incl. results) %.1f B/edge%n", "",
                    mergedEdges, (double) (after - before) / mergedEdges);
            lastEngine = engineS;
            lastSize = n;
        }
        for (String note : notes) {
            System.out.println(note);
        }
        System.out.println("engine_s: merge + width + spacing (Euclidean) on m1, m2, best of 5 runs (3 above 1M); eng_sp_s: merge + spacing only;");
        System.out.println("jts_sp_s: JTS union + STRtree + distance spacing on the same layers; vs_jts = jts_sp_s / eng_sp_s;");
        System.out.println("sort_s: Arrays.sort of one long key per input edge, best of three; vs_sort = engine_s / sort_s;");
        System.out.println("B/edge: engine arrays (merged layer + edge index) per merged edge; scale: engine_s / previous size.");
    }

    /**
     * Runs the JTS checker on the layout of size n in a child JVM (same Java, class path and heap limit);
     * returns its time in seconds, infinity when it was stopped after {@code boundSeconds}, NaN when it
     * ended without printing a time.
     */
    private static double boundedJts(int n, double boundSeconds) throws Exception {
        String javaCommand = ProcessHandle.current().info().command().orElse("java");
        // at most 8 GiB: this JVM keeps its own heap while the child runs
        long childHeap = Math.min(Runtime.getRuntime().maxMemory(), 8L << 30) >> 20;
        ProcessBuilder pb = new ProcessBuilder(javaCommand, "-Xmx" + childHeap + "m",
                "-XX:+UseParallelGC", "-cp", System.getProperty("java.class.path"), EngineBenchmark.class.getName(),
                "--jts-child", Integer.toString(n));
        pb.redirectErrorStream(true);
        Process child = pb.start();
        StringBuilder output = new StringBuilder();
        Thread reader = new Thread(() -> {
            try {
                output.append(new String(child.getInputStream().readAllBytes()));
            } catch (java.io.IOException e) {
                output.append(e);
            }
        });
        reader.start();
        if (!child.waitFor((long) (boundSeconds * 1000), java.util.concurrent.TimeUnit.MILLISECONDS)) {
            child.destroyForcibly().waitFor();
            reader.join();
            return Double.POSITIVE_INFINITY;
        }
        reader.join();
        for (String line : output.toString().split("\\R")) {
            if (line.startsWith("jts_s ")) {
                return Double.parseDouble(line.substring(6).trim());
            }
        }
        // ended without a time (out of memory, say): no figure
        System.err.println("JTS child run printed no time (exit " + child.exitValue() + "): " + output);
        return Double.NaN;
    }

    private static List<Rule> rules(String layer) {
        return List.of(new WidthRule("W." + layer, layer, WIDTH), new SpacingRule("S." + layer, layer, SPACING));
    }

    private static void warmUp(CheckEngine engine) {
        Map<String, List<Polygon>> layout = RoutingGenerator.generate(1, 200_000);
        Map<String, List<Polygon>> metal = Map.of("m1", layout.get("m1"), "m2", layout.get("m2"));
        List<Rule> rules = new ArrayList<>(rules("m1"));
        rules.addAll(rules("m2"));
        for (int i = 0; i < 5; i++) {
            engine.checkMerged(engine.merge(metal), rules);
        }
    }

    private static long usedHeap() {
        return ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
    }

    private static double sortEdges(Map<String, List<Polygon>> layers) {
        int n = 0;
        for (List<Polygon> l : layers.values()) {
            for (Polygon p : l) {
                n += p.size();
            }
        }
        long[] keys = new long[n];
        int k = 0;
        for (List<Polygon> l : layers.values()) {
            for (Polygon p : l) {
                for (int i = 0; i < p.size(); i++) {
                    keys[k] = (p.x(i) << 20) ^ p.y(i) ^ k;
                    k++;
                }
            }
        }
        double best = Double.POSITIVE_INFINITY;
        for (int rep = 0; rep < 3; rep++) {
            long[] copy = keys.clone();
            long t0 = System.nanoTime();
            Arrays.sort(copy);
            best = Math.min(best, (System.nanoTime() - t0) / 1e9);
        }
        return best;
    }

    /** Union each layer, index the shapes in an STRtree, report pairs closer than the spacing. */
    private static double jtsSpacing(Map<String, List<Polygon>> layers) {
        long t0 = System.nanoTime();
        GeometryFactory gf = new GeometryFactory();
        long pairs = 0;
        for (List<Polygon> l : layers.values()) {
            List<Geometry> gs = new ArrayList<>(l.size());
            for (Polygon p : l) {
                Coordinate[] cs = new Coordinate[p.size() + 1];
                for (int i = 0; i < p.size(); i++) {
                    cs[i] = new Coordinate(p.x(i), p.y(i));
                }
                cs[p.size()] = cs[0];
                gs.add(gf.createPolygon(cs));
            }
            Geometry u = UnaryUnionOp.union(gs);
            STRtree tree = new STRtree();
            List<Geometry> shapes = new ArrayList<>();
            for (int i = 0; i < u.getNumGeometries(); i++) {
                Geometry g = u.getGeometryN(i);
                shapes.add(g);
                tree.insert(g.getEnvelopeInternal(), i);
            }
            for (int i = 0; i < shapes.size(); i++) {
                Envelope env = new Envelope(shapes.get(i).getEnvelopeInternal());
                env.expandBy(SPACING);
                for (Object o : tree.query(env)) {
                    int j = (Integer) o;
                    if (j > i && shapes.get(i).distance(shapes.get(j)) < SPACING) {
                        pairs++;
                    }
                }
            }
        }
        if (pairs < 0) {
            throw new IllegalStateException();
        }
        return (System.nanoTime() - t0) / 1e9;
    }
}
