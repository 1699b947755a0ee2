/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

import org.apertura.engine.colour.ConflictGraph;
import org.apertura.engine.colour.Decomposition;
import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.internal.EdgeIndex;
import org.apertura.engine.internal.Exec;
import org.apertura.engine.internal.FacingPair;
import org.apertura.engine.internal.PairSearch;
import org.apertura.engine.region.MergedLayer;
import org.apertura.engine.region.RegionMerger;
import org.apertura.engine.rule.AreaRule;
import org.apertura.engine.rule.DensityRule;
import org.apertura.engine.rule.Direction;
import org.apertura.engine.rule.EnclosureRule;
import org.apertura.engine.rule.EndOfLineRule;
import org.apertura.engine.rule.MaskRule;
import org.apertura.engine.rule.Metric;
import org.apertura.engine.rule.PitchRule;
import org.apertura.engine.rule.Rule;
import org.apertura.engine.rule.SpacingRule;
import org.apertura.engine.rule.WidthRule;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.LinearRing;
import org.locationtech.jts.geom.PrecisionModel;
import org.locationtech.jts.geom.prep.PreparedGeometry;
import org.locationtech.jts.geom.prep.PreparedGeometryFactory;
import org.locationtech.jts.index.strtree.STRtree;

/**
 * Checks design rules on per-layer polygons in database units. Typical use:
 * <pre>
 * CheckEngine engine = new CheckEngine(CheckOptions.defaults());
 * List&lt;Violation&gt; v = engine.check(Map.of("met1", polygons), List.of(new WidthRule("m1.1", "met1", 140)));
 * </pre>
 * Layers are merged first ({@link RegionMerger}); every check then works on merged shapes. Results are
 * sorted by {@link Violation#ORDER} and identical for every thread count. Instances are stateless
 * apart from their options and may be shared.
 */
public final class CheckEngine {

    private final CheckOptions options;

    public CheckEngine(CheckOptions options) {
        this.options = options;
    }

    private Exec exec() {
        return new Exec(options.threads(), options.progress()::progress, options.cancelled(), options.edgesPerTile());
    }

    /**
     * Merges every layer (in parallel over layers); the map is sorted by layer name. Each merged layer
     * also gets the edge index the checks search (kept with the layer, see {@link MergedLayer#derived}).
     */
    public Map<String, MergedLayer> merge(Map<String, ? extends Collection<Polygon>> layers) {
        return merge(layers, exec());
    }

    private static Map<String, MergedLayer> merge(Map<String, ? extends Collection<Polygon>> layers, Exec exec) {
        List<String> names = new ArrayList<>(new TreeMap<>(layers).keySet());
        exec.expect(names.size());
        // each layer's search index right after its merge, in the same task: layers merge at different
        // speeds, and a thread done early indexes its layer while another is still merging
        List<MergedLayer> merged = exec.map(names.size(), i -> {
            MergedLayer m = RegionMerger.merge(names.get(i), layers.get(names.get(i)), exec.threads());
            index(m);
            return List.of(m);
        });
        Map<String, MergedLayer> out = new TreeMap<>();
        for (MergedLayer m : merged) {
            out.put(m.name(), m);
        }
        return out;
    }

    /** Merges the layers and checks the rules; see {@link #checkMerged(Map, List)}. */
    public List<Violation> check(Map<String, ? extends Collection<Polygon>> layers, List<? extends Rule> rules) {
        Exec exec = exec();
        return checkMerged(merge(layers, exec), rules, exec);
    }

    /**
     * Checks rules on merged layers.
     *
     * @throws IllegalArgumentException when a rule names a layer that was not given
     * @throws java.util.concurrent.CancellationException when cancelled through the options
     */
    public List<Violation> checkMerged(Map<String, MergedLayer> layers, List<? extends Rule> rules) {
        return checkMerged(layers, rules, exec());
    }

    private static List<Violation> checkMerged(Map<String, MergedLayer> layers, List<? extends Rule> rules, Exec exec) {
        // the indexes of all layers searched by edge pairs (kept with the layers), built in parallel, one layer
        // per thread, unless the merge built them already
        Set<String> searched = new TreeSet<>();
        for (Rule rule : rules) {
            layer(layers, rule.layer(), rule);
            if (rule instanceof EnclosureRule r) {
                layer(layers, r.outerLayer(), rule);
                searched.add(r.outerLayer());
            } else if (!(rule instanceof AreaRule || rule instanceof DensityRule)) {
                searched.add(rule.layer());
            }
        }
        List<String> names = new ArrayList<>(searched);
        exec.expect(names.size());
        exec.map(names.size(), i -> {
            index(layers.get(names.get(i)));
            return List.of();
        });
        List<Violation> all = new ArrayList<>();
        for (Rule rule : rules) {
            exec.checkCancelled();
            MergedLayer layer = layer(layers, rule.layer(), rule);
            switch (rule) {
                case WidthRule r -> all.addAll(width(layer, index(layer), r, exec));
                case SpacingRule r -> all.addAll(spacing(layer, index(layer), r, exec));
                case PitchRule r -> all.addAll(pitch(layer, index(layer), r, exec));
                case EndOfLineRule r -> all.addAll(endOfLine(layer, index(layer), r, exec));
                case AreaRule r -> all.addAll(area(layer, r));
                case EnclosureRule r -> {
                    MergedLayer outer = layer(layers, r.outerLayer(), rule);
                    all.addAll(enclosure(layer, outer, index(outer), r, exec));
                }
                case DensityRule r -> all.addAll(density(layer, r, extent(layers)));
                case MaskRule r -> all.addAll(maskConflicts(layer, index(layer), r, exec));
            }
        }
        all.sort(Violation.ORDER);
        return all;
    }

    /**
     * Measure mode: widths, spacings, notches and pitches of every layer below {@code range} database
     * units (see {@link MeasureReport}). Pitch is measured for both directions: between vertical edges
     * along x and between horizontal edges along y, for edges whose line width is below the range.
     * Only neighbours are measured: a parallel run hidden by a third parallel edge lying between the two
     * edges and covering the whole run is skipped.
     */
    public MeasureReport measure(Map<String, MergedLayer> layers, long range) {
        if (range <= 0) {
            throw new IllegalArgumentException("measuring range must be positive, got " + range);
        }
        Exec exec = exec();
        Map<String, List<Extreme>> values = new TreeMap<>();
        for (MergedLayer layer : layers.values()) {
            EdgeIndex index = index(layer);
            List<Object[]> found = new ArrayList<>();
            found.addAll(PairSearch.run(layer, index, range, -1, exec, (e, f, p, out) -> {
                if (layer.shapeOf(e) == layer.shapeOf(f) && !shadowed(layer, index, e, f, p, EdgeIndex.buffer())) {
                    out.add(new Object[] {MeasureKind.WIDTH, axis(layer, e, p), extreme(layer, e, f, p, p.distance)});
                }
            }));
            double[] widths = edgeWidths(layer, index, range, exec);
            found.addAll(PairSearch.run(layer, index, range, 1, exec, (e, f, p, out) -> {
                if (shadowed(layer, index, e, f, p, EdgeIndex.buffer())) {
                    return;
                }
                boolean same = layer.shapeOf(e) == layer.shapeOf(f);
                Axis axis = axis(layer, e, p);
                out.add(new Object[] {same ? MeasureKind.NOTCH : MeasureKind.SPACING, axis, extreme(layer, e, f, p, p.distance)});
                if (!same && axis != Axis.OTHER && widths[e] < range && widths[f] < range) {
                    out.add(new Object[] {MeasureKind.PITCH, axis,
                        extreme(layer, e, f, p, p.distance + (widths[e] + widths[f]) / 2)});
                }
            }));
            for (Object[] o : found) {
                MeasureKind kind = (MeasureKind) o[0];
                Axis axis = (Axis) o[1];
                values.computeIfAbsent(MeasureReport.key(layer.name(), kind, axis), k -> new ArrayList<>()).add((Extreme) o[2]);
                values.computeIfAbsent(MeasureReport.key(layer.name(), kind, Axis.ANY), k -> new ArrayList<>()).add((Extreme) o[2]);
            }
        }
        return new MeasureReport(range, values);
    }

    /**
     * True when a run pair (e, f) is hidden by a third edge parallel to them, strictly between their
     * lines and covering the whole run: the two edges are then not neighbours.
     */
    static boolean shadowed(MergedLayer layer, EdgeIndex index, int e, int f, FacingPair p, int[][] buf) {
        if (p.type != FacingPair.RUN) {
            return false;
        }
        long ax = layer.x0(e), ay = layer.y0(e), ux = layer.x1(e) - ax, uy = layer.y1(e) - ay;
        double len = Math.hypot(ux, uy);
        double lo = ((p.px - ax) * ux + (p.py - ay) * uy), hi = ((p.qx - ax) * ux + (p.qy - ay) * uy);
        double rlo = Math.min(lo, hi), rhi = Math.max(lo, hi);
        Box b = p.marker();
        int n = index.query(b.minX(), b.minY(), b.maxX(), b.maxY(), buf);
        for (int k = 0; k < n; k++) {
            int g = buf[0][k];
            if (g == e || g == f) {
                continue;
            }
            long cx = layer.x0(g), cy = layer.y0(g), vx = layer.x1(g) - cx, vy = layer.y1(g) - cy;
            if (ux * vy - uy * vx != 0) {
                continue;
            }
            double off = Math.abs((double) (cx - ax) * uy - (double) (cy - ay) * ux) / len;
            double side = Math.signum((double) (cx - ax) * uy - (double) (cy - ay) * ux);
            double fside = Math.signum((double) (layer.x0(f) - ax) * uy - (double) (layer.y0(f) - ay) * ux);
            if (side != fside || off <= 0 || off >= p.distance) {
                continue;
            }
            double tc = (double) (cx - ax) * ux + (double) (cy - ay) * uy;
            double td = tc + (double) vx * ux + (double) vy * uy;
            if (Math.min(tc, td) <= rlo && Math.max(tc, td) >= rhi) {
                return true;
            }
        }
        return false;
    }

    private static Axis axis(MergedLayer layer, int e, FacingPair p) {
        if (p.type != FacingPair.RUN) {
            return Axis.OTHER;
        }
        if (layer.x0(e) == layer.x1(e)) {
            return Axis.X;
        }
        return layer.y0(e) == layer.y1(e) ? Axis.Y : Axis.OTHER;
    }

    private static Extreme extreme(MergedLayer layer, int e, int f, FacingPair p, double value) {
        return new Extreme(value, layer.edge(e), layer.edge(f), p.marker());
    }

    /** Builds the conflict graph for a mask rule and colours it ({@link Decomposition}). */
    public Decomposition decompose(MergedLayer layer, MaskRule rule) {
        ConflictGraph g = ConflictGraph.build(layer, index(layer), rule.sameMaskSpacing(), exec());
        return Decomposition.colour(g, rule.masks());
    }

    /** The conflict graph of a layer at a colouring distance (shapes closer than it, Euclidean). */
    public ConflictGraph conflictGraph(MergedLayer layer, long distance) {
        return ConflictGraph.build(layer, index(layer), distance, exec());
    }

    /** The layer's edge index, built once per layer and shared by every check. */
    private static EdgeIndex index(MergedLayer layer) {
        return layer.derived(EdgeIndex.class, EdgeIndex::new);
    }

    private static MergedLayer layer(Map<String, MergedLayer> layers, String name, Rule rule) {
        MergedLayer l = layers.get(name);
        if (l == null) {
            throw new IllegalArgumentException("rule " + rule.id() + " refers to layer '" + name + "' which was not given");
        }
        return l;
    }

    private static Box extent(Map<String, MergedLayer> layers) {
        Box b = null;
        for (MergedLayer l : layers.values()) {
            Box lb = l.bounds();
            if (lb != null) {
                b = b == null ? lb : b.union(lb);
            }
        }
        return b;
    }

    private static Violation pairViolation(Rule rule, MergedLayer layer, ViolationKind kind, double measured,
            double required, int e, MergedLayer other, int f, FacingPair p) {
        return new Violation(rule.id(), layer.name(), kind, measured, required, layer.edge(e), other.edge(f), p.marker());
    }

    // ---- width

    private static List<Violation> width(MergedLayer layer, EdgeIndex index, WidthRule r, Exec exec) {
        boolean euclid = r.metric() == Metric.EUCLIDEAN;
        return PairSearch.run(layer, index, r.minimum().max(), -1, exec, (e, f, p, out) -> {
            if (layer.shapeOf(e) != layer.shapeOf(f) || (!euclid && p.type != FacingPair.RUN)) {
                return;
            }
            double req = r.minimum().along(p.sepX(layer, e), p.sepY(layer, e));
            if (p.distance < req) {
                out.add(pairViolation(r, layer, ViolationKind.WIDTH, p.distance, req, e, layer, f, p));
            }
        });
    }

    /**
     * The width of the material behind each edge: the smallest distance to an inner facing edge of the
     * same shape overlapping it in projection, or {@code cap} when none is closer than cap.
     */
    static double[] edgeWidths(MergedLayer layer, EdgeIndex index, long cap, Exec exec) {
        double[] w = new double[layer.edgeCount()];
        Arrays.fill(w, cap);
        List<double[]> found = PairSearch.run(layer, index, cap, -1, exec, (e, f, p, out) -> {
            if (p.type == FacingPair.RUN && layer.shapeOf(e) == layer.shapeOf(f)) {
                out.add(new double[] {e, f, p.distance});
            }
        });
        for (double[] t : found) {
            int e = (int) t[0], f = (int) t[1];
            w[e] = Math.min(w[e], t[2]);
            w[f] = Math.min(w[f], t[2]);
        }
        return w;
    }

    // ---- spacing

    private static List<Violation> spacing(MergedLayer layer, EdgeIndex index, SpacingRule r, Exec exec) {
        boolean euclid = r.metric() == Metric.EUCLIDEAN;
        double[] widths = r.table().isPresent()
                ? edgeWidths(layer, index, r.table().get().widestThreshold(), exec) : null;
        return PairSearch.run(layer, index, r.reach(), 1, exec, (e, f, p, out) -> {
            if (!euclid && p.type != FacingPair.RUN) {
                return;
            }
            double req;
            if (widths != null) {
                long w = (long) Math.floor(Math.max(widths[e], widths[f]));
                long run = p.type == FacingPair.RUN ? (long) Math.floor(p.runLength) : 0;
                req = r.table().get().lookup(w, run);
            } else {
                req = r.minimum().along(p.sepX(layer, e), p.sepY(layer, e));
            }
            if (p.distance < req) {
                ViolationKind kind = layer.shapeOf(e) == layer.shapeOf(f) ? ViolationKind.NOTCH : ViolationKind.SPACING;
                out.add(pairViolation(r, layer, kind, p.distance, req, e, layer, f, p));
            }
        });
    }

    // ---- pitch

    private static List<Violation> pitch(MergedLayer layer, EdgeIndex index, PitchRule r, Exec exec) {
        double[] widths = edgeWidths(layer, index, r.minimum(), exec);
        boolean horizontal = r.preferred() == Direction.HORIZONTAL;
        return PairSearch.run(layer, index, r.minimum(), 1, exec, (e, f, p, out) -> {
            if (p.type != FacingPair.RUN || layer.shapeOf(e) == layer.shapeOf(f)) {
                return;
            }
            boolean edgeHorizontal = layer.y0(e) == layer.y1(e);
            boolean edgeVertical = layer.x0(e) == layer.x1(e);
            if (horizontal ? !edgeHorizontal : !edgeVertical) {
                return;
            }
            if (widths[e] >= r.minimum() || widths[f] >= r.minimum()) {
                return;
            }
            double pitch = p.distance + (widths[e] + widths[f]) / 2;
            if (pitch < r.minimum() && !shadowed(layer, index, e, f, p, EdgeIndex.buffer())) {
                out.add(pairViolation(r, layer, ViolationKind.PITCH, pitch, r.minimum(), e, layer, f, p));
            }
        });
    }

    // ---- end of line

    private static boolean isTip(MergedLayer l, int e, long tipLength) {
        long ux = l.x1(e) - l.x0(e), uy = l.y1(e) - l.y0(e);
        if ((double) ux * ux + (double) uy * uy >= (double) tipLength * tipLength) {
            return false;
        }
        return turn(l, l.previous(e), e) > 0 && turn(l, e, l.next(e)) > 0;
    }

    private static long turn(MergedLayer l, int a, int b) {
        long ax = l.x1(a) - l.x0(a), ay = l.y1(a) - l.y0(a), bx = l.x1(b) - l.x0(b), by = l.y1(b) - l.y0(b);
        return Long.signum(ax * by - ay * bx);
    }

    private static List<Violation> endOfLine(MergedLayer layer, EdgeIndex index, EndOfLineRule r, Exec exec) {
        return PairSearch.run(layer, index, r.reach(), 1, exec, (e, f, p, out) -> {
            if (p.type != FacingPair.RUN) {
                return;
            }
            boolean te = isTip(layer, e, r.tipLength()), tf = isTip(layer, f, r.tipLength());
            if (te && tf && p.distance < r.tipToTip()) {
                out.add(pairViolation(r, layer, ViolationKind.TIP_TO_TIP, p.distance, r.tipToTip(), e, layer, f, p));
            } else if (te != tf && p.distance < r.tipToSide()) {
                int tip = te ? e : f, side = te ? f : e;
                out.add(pairViolation(r, layer, ViolationKind.TIP_TO_SIDE, p.distance, r.tipToSide(), tip, layer, side, p));
            }
        });
    }

    // ---- area

    private static List<Violation> area(MergedLayer layer, AreaRule r) {
        List<Violation> out = new ArrayList<>();
        for (int s = 0; s < layer.shapeCount(); s++) {
            if (layer.area2(s) < 2 * r.minimumArea()) {
                out.add(new Violation(r.id(), layer.name(), ViolationKind.AREA, layer.area(s), r.minimumArea(), null, null,
                        layer.bounds(s)));
            }
        }
        return out;
    }

    // ---- enclosure

    private static List<Violation> enclosure(MergedLayer inner, MergedLayer outer, EdgeIndex outerIndex, EnclosureRule r,
            Exec exec) {
        long reach = r.reach();
        int n = inner.edgeCount();
        double[] encl = new double[n];
        int[] by = new int[n];
        Arrays.fill(encl, reach);
        Arrays.fill(by, -1);
        // per inner edge: nearest same-direction outer edge in front, overlapping in projection
        int[][] tiles = PairSearch.tiles(inner, exec.edgesPerTile());
        exec.expect(tiles.length);
        List<double[]> found = exec.map(tiles.length, t -> {
            List<double[]> out = new ArrayList<>();
            int[][] buf = EdgeIndex.buffer();
            for (int e : tiles[t]) {
                long ax = inner.x0(e), ay = inner.y0(e), ux = inner.x1(e) - ax, uy = inner.y1(e) - ay;
                double len = Math.hypot(ux, uy), l2 = len * len;
                int k = outerIndex.query(Math.min(ax, ax + ux) - reach, Math.min(ay, ay + uy) - reach,
                        Math.max(ax, ax + ux) + reach, Math.max(ay, ay + uy) + reach, buf);
                double best = reach;
                int bestF = -1;
                for (int i = 0; i < k; i++) {
                    int f = buf[0][i];
                    long cx = outer.x0(f), cy = outer.y0(f), vx = outer.x1(f) - cx, vy = outer.y1(f) - cy;
                    if (ux * vy - uy * vx != 0 || ux * vx + uy * vy <= 0) {
                        continue;
                    }
                    double tc = (double) (cx - ax) * ux + (double) (cy - ay) * uy;
                    double td = tc + (double) vx * ux + (double) vy * uy;
                    double lo = Math.max(0, Math.min(tc, td)), hi = Math.min(l2, Math.max(tc, td));
                    if (hi <= lo) {
                        continue;
                    }
                    double off = ((double) (cx - ax) * uy - (double) (cy - ay) * ux) / len;
                    if (off >= 0 && off < best) {
                        best = off;
                        bestF = f;
                    }
                }
                out.add(new double[] {e, best, bestF});
            }
            return out;
        });
        for (double[] t : found) {
            encl[(int) t[0]] = t[1];
            by[(int) t[0]] = (int) t[2];
        }
        // containment with JTS (any angle): each inner shape must be covered by one outer shape
        GeometryFactory gf = new GeometryFactory(new PrecisionModel(1.0));
        STRtree tree = new STRtree();
        for (int s = 0; s < outer.shapeCount(); s++) {
            Geometry g = shapeGeometry(gf, outer, s);
            tree.insert(g.getEnvelopeInternal(), PreparedGeometryFactory.prepare(g));
        }
        List<Violation> out = new ArrayList<>();
        int[] firstEdge = new int[inner.shapeCount()];
        Arrays.fill(firstEdge, -1);
        double[][] sides = new double[inner.shapeCount()][];
        int[][] sideEdge = new int[inner.shapeCount()][];
        for (int e = 0; e < n; e++) {
            int s = inner.shapeOf(e);
            if (sides[s] == null) {
                sides[s] = new double[] {reach, reach, reach, reach};
                sideEdge[s] = new int[] {-1, -1, -1, -1};
            }
            long ux = inner.x1(e) - inner.x0(e), uy = inner.y1(e) - inner.y0(e);
            // outward normal (uy, -ux): 0 = +x (right), 1 = -x (left), 2 = +y (top), 3 = -y (bottom)
            int side = Math.abs(uy) >= Math.abs(ux) ? (uy > 0 ? 0 : 1) : (ux < 0 ? 2 : 3);
            if (encl[e] < sides[s][side]) {
                sides[s][side] = encl[e];
                sideEdge[s][side] = e;
            }
        }
        for (int s = 0; s < inner.shapeCount(); s++) {
            Geometry g = shapeGeometry(gf, inner, s);
            boolean covered = false;
            for (Object o : tree.query(g.getEnvelopeInternal())) {
                if (((PreparedGeometry) o).covers(g)) {
                    covered = true;
                    break;
                }
            }
            Box box = inner.bounds(s);
            if (!covered) {
                out.add(new Violation(r.id(), inner.name(), ViolationKind.NOT_ENCLOSED, 0, r.allSides(), null, null, box));
                continue;
            }
            double min = reach;
            int minSide = -1;
            for (int k = 0; k < 4; k++) {
                if (sides[s][k] < min) {
                    min = sides[s][k];
                    minSide = k;
                }
            }
            if (minSide >= 0 && min < r.allSides()) {
                int e = sideEdge[s][minSide];
                int f = by[e];
                out.add(new Violation(r.id(), inner.name(), ViolationKind.ENCLOSURE, min, r.allSides(), inner.edge(e),
                        f >= 0 ? outer.edge(f) : null, box));
            }
            if (r.oppositeSides().isPresent()) {
                double lr = Math.min(sides[s][0], sides[s][1]), bt = Math.min(sides[s][2], sides[s][3]);
                double best = Math.max(lr, bt);
                if (best < r.oppositeSides().getAsLong()) {
                    out.add(new Violation(r.id(), inner.name(), ViolationKind.ENCLOSURE_OPPOSITE, best,
                            r.oppositeSides().getAsLong(), null, null, box));
                }
            }
        }
        return out;
    }

    /** A merged shape as a JTS polygon with holes (grid of database units). */
    public static Geometry shapeGeometry(GeometryFactory gf, MergedLayer layer, int shape) {
        List<Polygon> rings = layer.rings(shape);
        LinearRing shell = ring(gf, rings.get(0));
        LinearRing[] holes = new LinearRing[rings.size() - 1];
        for (int i = 1; i < rings.size(); i++) {
            holes[i - 1] = ring(gf, rings.get(i));
        }
        return gf.createPolygon(shell, holes);
    }

    private static LinearRing ring(GeometryFactory gf, Polygon p) {
        org.locationtech.jts.geom.Coordinate[] cs = new org.locationtech.jts.geom.Coordinate[p.size() + 1];
        for (int i = 0; i < p.size(); i++) {
            cs[i] = new org.locationtech.jts.geom.Coordinate(p.x(i), p.y(i));
        }
        cs[p.size()] = cs[0];
        return gf.createLinearRing(cs);
    }

    // ---- density

    private static List<Violation> density(MergedLayer layer, DensityRule r, Box extent) {
        List<Violation> out = new ArrayList<>();
        if (extent == null) {
            return out;
        }
        GeometryFactory gf = new GeometryFactory(new PrecisionModel(1.0));
        STRtree tree = new STRtree();
        for (int s = 0; s < layer.shapeCount(); s++) {
            Geometry g = shapeGeometry(gf, layer, s);
            tree.insert(g.getEnvelopeInternal(), g);
        }
        long[] xs = starts(extent.minX(), extent.maxX(), r.window(), r.step());
        long[] ys = starts(extent.minY(), extent.maxY(), r.window(), r.step());
        for (long wy : ys) {
            for (long wx : xs) {
                long x1 = Math.min(wx + r.window(), Math.max(extent.maxX(), wx + 1));
                long y1 = Math.min(wy + r.window(), Math.max(extent.maxY(), wy + 1));
                Geometry win = gf.toGeometry(new org.locationtech.jts.geom.Envelope(wx, x1, wy, y1));
                double covered = 0;
                for (Object o : tree.query(win.getEnvelopeInternal())) {
                    covered += ((Geometry) o).intersection(win).getArea();
                }
                double frac = covered / ((double) (x1 - wx) * (y1 - wy));
                Box box = new Box(wx, wy, x1, y1);
                if (frac < r.minimum()) {
                    out.add(new Violation(r.id(), layer.name(), ViolationKind.DENSITY_LOW, frac, r.minimum(), null, null, box));
                } else if (frac > r.maximum()) {
                    out.add(new Violation(r.id(), layer.name(), ViolationKind.DENSITY_HIGH, frac, r.maximum(), null, null, box));
                }
            }
        }
        return out;
    }

    /** Window start positions: from lo every step, the last one shifted to end at hi. */
    static long[] starts(long lo, long hi, long window, long step) {
        if (hi - lo <= window) {
            return new long[] {lo};
        }
        List<Long> s = new ArrayList<>();
        long x = lo;
        while (x + window < hi) {
            s.add(x);
            x += step;
        }
        s.add(hi - window);
        return s.stream().mapToLong(Long::longValue).distinct().toArray();
    }

    // ---- masks

    private static List<Violation> maskConflicts(MergedLayer layer, EdgeIndex index, MaskRule r, Exec exec) {
        ConflictGraph g = ConflictGraph.build(layer, index, r.sameMaskSpacing(), exec);
        Decomposition d = Decomposition.colour(g, r.masks());
        List<Violation> out = new ArrayList<>();
        for (List<Integer> cycle : d.oddCycles()) {
            Box box = null;
            double closest = Double.POSITIVE_INFINITY;
            for (int i = 0; i < cycle.size(); i++) {
                int a = cycle.get(i), b = cycle.get((i + 1) % cycle.size());
                box = box == null ? layer.bounds(a) : box.union(layer.bounds(a));
                closest = Math.min(closest, g.distance(a, b));
            }
            out.add(new Violation(r.id(), layer.name(), ViolationKind.MASK_CONFLICT, closest, r.sameMaskSpacing(), null, null, box));
        }
        for (ConflictGraph.Edge e : d.unresolved()) {
            out.add(new Violation(r.id(), layer.name(), ViolationKind.MASK_CONFLICT, e.distance(), r.sameMaskSpacing(),
                    null, null, layer.bounds(e.a()).union(layer.bounds(e.b()))));
        }
        return out;
    }
}
