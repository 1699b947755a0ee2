/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.field;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.apertura.engine.geom.Box;
import org.apertura.engine.geom.Polygon;
import org.apertura.engine.region.MergedLayer;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * The die against an option's exposure field (26 x 33 mm full field, 26 x 16.5 mm for a 4/8
 * anamorphic option, as the deck states). When the die is larger than the field along an axis it is
 * split into {@code n = ceil(die/field)} equal parts and stitched at the n - 1 lines between them; the
 * merged shapes of the critical layers that cross a line, or come closer to it than the keep-out band,
 * are listed (a crossing shape would be printed half by each exposure).
 * <p>
 * The keep-out band is the option's {@code stitch keep-out} from the deck (none: crossings only),
 * unless the caller gives an explicit override.
 * <p>
 * Exact geometry: a stitching line is the segment across the die (x = position for y in the die's y
 * range, or the transposed case), and a shape is tested by its real rings (Manhattan or any angle),
 * not by its bounding box. A shape <em>crosses</em> the line when the line passes through its interior
 * over a positive length inside the die; it lies <em>in the band</em> when its material within the
 * die's range along the line (boundary included) comes strictly closer to the line than the band.
 * Touching the line counts as distance 0. For a connected shape lying wholly inside the die the
 * bounding box gives the same answer (its projection across the line is an interval); the two differ
 * for shapes reaching past the end of the line, that is past the die edge (a declared die smaller
 * than the layout).
 */
public final class FieldCheck {

    /** At most this many hits are listed per option (all are counted). */
    public static final int MAX_HITS = 1000;

    private FieldCheck() {
    }

    /**
     * Checks the die against the field of {@code option} with the keep-out band the deck gives the
     * option ({@link LithographyOption#stitchKeepOutNm()}, 0 when it has none).
     *
     * @param die      the die in database units (the top cell's extent or a declared die)
     * @param critical the layers whose shapes must not meet a stitch line
     * @param merged   merged layers by deck layer name
     */
    public static FieldResult check(ResolvedDeck deck, String option, Box die, Collection<String> critical,
            Map<String, MergedLayer> merged) {
        return check(deck, option, die, critical, merged, OptionalDouble.empty());
    }

    /**
     * Checks the die against the field of {@code option}.
     *
     * @param die       the die in database units (the top cell's extent or a declared die)
     * @param critical  the layers whose shapes must not meet a stitch line
     * @param merged    merged layers by deck layer name
     * @param keepOutNm the keep-out band on each side of a stitch line, in nm (0: crossing only); an
     *                  explicit override of the deck's value
     */
    public static FieldResult check(ResolvedDeck deck, String option, Box die, Collection<String> critical,
            Map<String, MergedLayer> merged, double keepOutNm) {
        return check(deck, option, die, critical, merged, OptionalDouble.of(keepOutNm));
    }

    /**
     * Checks the die against the field of {@code option}.
     *
     * @param override a keep-out band in nm replacing the deck's; empty to use the deck's
     * @throws IllegalArgumentException for an unknown option or a negative band
     */
    public static FieldResult check(ResolvedDeck deck, String option, Box die, Collection<String> critical,
            Map<String, MergedLayer> merged, OptionalDouble override) {
        LithographyOption o = deck.option(option).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + option + "'"));
        double keepOutNm = override.isPresent() ? override.getAsDouble() : o.stitchKeepOutNm().orElse(0);
        if (!(keepOutNm >= 0)) {
            throw new IllegalArgumentException("keep-out band must not be negative, got " + keepOutNm);
        }
        double dbu = deck.databaseUnitNanometres().doubleValue();
        double dieX = die.width() * dbu * 1e-6;
        double dieY = die.height() * dbu * 1e-6;
        int nx = Math.max(1, (int) Math.ceil(dieX / o.fieldXMm() - 1e-9));
        int ny = Math.max(1, (int) Math.ceil(dieY / o.fieldYMm() - 1e-9));
        List<StitchLine> lines = new ArrayList<>();
        for (int i = 1; i < nx; i++) {
            lines.add(new StitchLine(Axis.X, die.minX() + Math.round((double) die.width() * i / nx)));
        }
        for (int i = 1; i < ny; i++) {
            lines.add(new StitchLine(Axis.Y, die.minY() + Math.round((double) die.height() * i / ny)));
        }
        double band = keepOutNm / dbu;
        List<StitchHit> hits = new ArrayList<>();
        int count = 0;
        for (String layer : critical) {
            MergedLayer m = merged.get(layer);
            if (m == null) {
                continue;
            }
            for (int s = 0; s < m.shapeCount(); s++) {
                Box b = m.bounds(s);
                List<Polygon> rings = null;
                for (StitchLine line : lines) {
                    boolean vertical = line.across() == Axis.X;
                    long from = vertical ? die.minY() : die.minX();
                    long to = vertical ? die.maxY() : die.maxX();
                    long lo = vertical ? b.minX() : b.minY();
                    long hi = vertical ? b.maxX() : b.maxY();
                    long along0 = vertical ? b.minY() : b.minX();
                    long along1 = vertical ? b.maxY() : b.maxX();
                    if (lo - line.position() >= band || line.position() - hi >= band || along1 < from
                            || along0 > to) {
                        continue; // the bounding box is already clear of the band
                    }
                    if (rings == null) {
                        rings = m.rings(s);
                    }
                    double distance = distance(rings, vertical, line.position(), from, to);
                    boolean crossing = distance < 0;
                    if (crossing || distance < band) {
                        count++;
                        if (hits.size() < MAX_HITS) {
                            hits.add(new StitchHit(layer, b, line, crossing, Math.max(0, distance) * dbu));
                        }
                    }
                }
            }
        }
        return new FieldResult(option, o.fieldXMm(), o.fieldYMm(), dieX, dieY, nx, ny, lines, hits, count, keepOutNm);
    }

    /**
     * The distance (database units) from a shape's material to a stitching line segment, or -1 when
     * the line passes through the shape's interior over a positive length. Exact for any angle.
     *
     * @param rings    the shape's outer ring and holes (database units)
     * @param across   {@link Axis#X} for a vertical line x = position (running along y from
     *                 {@code from} to {@code to}), {@link Axis#Y} for a horizontal line y = position
     *                 (along x)
     * @return -1 when crossing, 0 when the material touches the segment, else the smallest distance
     *         across the line from material whose coordinate along the line lies in [from, to];
     *         {@link Double#POSITIVE_INFINITY} when no material lies in that range
     */
    public static double distanceToLine(List<Polygon> rings, Axis across, long position, long from, long to) {
        return distance(rings, across == Axis.X, position, from, to);
    }

    private static double distance(List<Polygon> rings, boolean vertical, long position, long from, long to) {
        // interior of the shape on the line: even-odd intervals just left and just right of it,
        // intersected
        List<double[]> left = new ArrayList<>();
        List<double[]> right = new ArrayList<>();
        for (Polygon p : rings) {
            int n = p.size();
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                long ua = across(p, i, vertical), ub = across(p, j, vertical);
                long va = along(p, i, vertical), vb = along(p, j, vertical);
                if (ua == ub) {
                    continue;
                }
                double v = va + (double) (vb - va) * (position - ua) / (ub - ua);
                if ((ua < position) != (ub < position)) {
                    left.add(new double[] {v});
                }
                if ((ua > position) != (ub > position)) {
                    right.add(new double[] {v});
                }
            }
        }
        if (overlap(intervals(left), intervals(right), from, to)) {
            return -1;
        }
        double best = Double.POSITIVE_INFINITY;
        for (Polygon p : rings) {
            int n = p.size();
            for (int i = 0; i < n; i++) {
                int j = (i + 1) % n;
                long ua = across(p, i, vertical), ub = across(p, j, vertical);
                long va = along(p, i, vertical), vb = along(p, j, vertical);
                // the part of edge (u, v) with v in [from, to]
                double t0 = 0, t1 = 1;
                if (va == vb) {
                    if (va < from || va > to) {
                        continue;
                    }
                } else {
                    double ta = (double) (from - va) / (vb - va), tb = (double) (to - va) / (vb - va);
                    t0 = Math.max(0, Math.min(ta, tb));
                    t1 = Math.min(1, Math.max(ta, tb));
                    if (t0 > t1) {
                        continue;
                    }
                }
                double u0 = ua + t0 * (ub - ua) - position, u1 = ua + t1 * (ub - ua) - position;
                if (u0 <= 0 && u1 >= 0 || u0 >= 0 && u1 <= 0) {
                    return 0; // the boundary meets the line inside the die
                }
                best = Math.min(best, Math.min(Math.abs(u0), Math.abs(u1)));
            }
        }
        return best;
    }

    private static long across(Polygon p, int i, boolean vertical) {
        return vertical ? p.x(i) : p.y(i);
    }

    private static long along(Polygon p, int i, boolean vertical) {
        return vertical ? p.y(i) : p.x(i);
    }

    /** Sorted crossing coordinates paired into inside intervals (even-odd). */
    private static List<double[]> intervals(List<double[]> crossings) {
        double[] v = new double[crossings.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = crossings.get(i)[0];
        }
        java.util.Arrays.sort(v);
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i + 1 < v.length; i += 2) {
            out.add(new double[] {v[i], v[i + 1]});
        }
        return out;
    }

    /** Whether the two interval sets share a piece of positive length inside [from, to]. */
    private static boolean overlap(List<double[]> a, List<double[]> b, long from, long to) {
        for (double[] x : a) {
            for (double[] y : b) {
                double lo = Math.max(Math.max(x[0], y[0]), from);
                double hi = Math.min(Math.min(x[1], y[1]), to);
                if (hi > lo) {
                    return true;
                }
            }
        }
        return false;
    }
}
