/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/**
 * Measure mode results: for each layer, kind and axis, every measured value below the measuring range
 * (one value per facing edge pair, Euclidean metric; a parallel run counts once whatever its length;
 * runs hidden by a third parallel edge between them are not neighbours and are left out)
 * and the smallest value with its place, for histograms and shrink headroom. Values are in database
 * units and sorted ascending.
 */
public final class MeasureReport {

    /** Values of one layer, kind and axis. */
    public record Distribution(String layer, MeasureKind kind, Axis axis, double[] sortedValues, Optional<Extreme> minimum) {

        /** Number of measured values. */
        public int count() {
            return sortedValues.length;
        }

        /** A copy of the values, ascending. */
        public double[] values() {
            return sortedValues.clone();
        }

        /** Counts per bin of {@code binWidth} database units starting at 0. */
        public int[] histogram(double binWidth) {
            if (sortedValues.length == 0) {
                return new int[0];
            }
            int bins = (int) Math.floor(sortedValues[sortedValues.length - 1] / binWidth) + 1;
            int[] h = new int[bins];
            for (double v : sortedValues) {
                h[(int) Math.floor(v / binWidth)]++;
            }
            return h;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Distribution d && layer.equals(d.layer) && kind == d.kind && axis == d.axis
                    && Arrays.equals(sortedValues, d.sortedValues) && minimum.equals(d.minimum);
        }

        @Override
        public int hashCode() {
            return layer.hashCode() * 31 + kind.hashCode() * 7 + axis.hashCode() + Arrays.hashCode(sortedValues);
        }

        @Override
        public String toString() {
            return "Distribution[" + layer + " " + kind + " " + axis + " n=" + sortedValues.length + " min=" + minimum + "]";
        }
    }

    static final Comparator<Extreme> ORDER = Comparator.comparingDouble(Extreme::value)
            .thenComparing(Extreme::place)
            .thenComparing(Extreme::edgeA)
            .thenComparing(Extreme::edgeB);

    private final long range;
    private final Map<String, Distribution> byKey;

    MeasureReport(long range, Map<String, List<Extreme>> values) {
        this.range = range;
        this.byKey = new TreeMap<>();
        for (Map.Entry<String, List<Extreme>> e : values.entrySet()) {
            String[] k = e.getKey().split("\u0000");
            List<Extreme> list = e.getValue();
            double[] v = new double[list.size()];
            Extreme min = null;
            for (int i = 0; i < v.length; i++) {
                Extreme x = list.get(i);
                v[i] = x.value();
                if (min == null || ORDER.compare(x, min) < 0) {
                    min = x;
                }
            }
            Arrays.sort(v);
            byKey.put(e.getKey(), new Distribution(k[0], MeasureKind.valueOf(k[1]), Axis.valueOf(k[2]), v, Optional.ofNullable(min)));
        }
    }

    static String key(String layer, MeasureKind kind, Axis axis) {
        return layer + "\u0000" + kind + "\u0000" + axis;
    }

    /** The measuring range: only values below it were collected. */
    public long range() {
        return range;
    }

    /** The distribution of a layer, kind and axis ({@link Axis#ANY} for all); empty when nothing was measured. */
    public Distribution distribution(String layer, MeasureKind kind, Axis axis) {
        Distribution d = byKey.get(key(layer, kind, axis));
        return d != null ? d : new Distribution(layer, kind, axis, new double[0], Optional.empty());
    }

    /** The smallest value of a layer, kind and axis with its place. */
    public Optional<Extreme> minimum(String layer, MeasureKind kind, Axis axis) {
        return distribution(layer, kind, axis).minimum();
    }
}
