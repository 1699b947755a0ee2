/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeMap;

import org.apertura.engine.geom.Polygon;

/**
 * Seeded routing-like layouts in database units: layer "m1" with horizontal wires on tracks, "m2" with
 * vertical wires, "via" squares where an m1 and an m2 wire cross, jogs joining neighbouring tracks, a
 * few 45-degree wire pieces on m2, and a few deliberate spacing and width errors. Track pitch
 * {@value #PITCH}, wire width {@value #WIDTH} (spacing 50).
 */
public final class RoutingGenerator {

    public static final long PITCH = 100, WIDTH = 50;

    private RoutingGenerator() {
    }

    /** About {@code rectangles} shapes in total (45 % m1, 45 % m2, 10 % vias). */
    public static Map<String, List<Polygon>> generate(long seed, int rectangles) {
        SplittableRandom r = new SplittableRandom(seed);
        // a track of T pitches holds about T / 26.5 wires; square die of T tracks
        int tracks = Math.max(8, (int) Math.sqrt(0.45 * rectangles * 26.5));
        List<Polygon> m1 = new ArrayList<>(), m2 = new ArrayList<>(), via = new ArrayList<>();
        int perLayer = (int) (0.45 * rectangles);
        wires(r, tracks, perLayer, true, m1);
        wires(r, tracks, perLayer, false, m2);
        // vias on crossings of an m1 track and an m2 track that both carry metal there is checked
        // approximately: place on random grid crossings (vias may land off wires: they are a separate layer)
        int vias = rectangles - m1.size() - m2.size();
        for (int i = 0; i < vias; i++) {
            long x = r.nextInt(tracks) * PITCH, y = r.nextInt(tracks) * PITCH;
            via.add(Polygon.rectangle(x, y, x + WIDTH, y + WIDTH));
        }
        Map<String, List<Polygon>> out = new TreeMap<>();
        out.put("m1", m1);
        out.put("m2", m2);
        out.put("via", via);
        return out;
    }

    private static void wires(SplittableRandom r, int tracks, int budget, boolean horizontal, List<Polygon> out) {
        long length = (long) tracks * PITCH;
        for (int t = 0; t < tracks && out.size() < budget; t++) {
            long pos = r.nextInt(10) * PITCH;
            long across = (long) t * PITCH;
            while (pos < length && out.size() < budget) {
                long len = (2 + r.nextInt(40)) * PITCH + WIDTH;
                long end = Math.min(length, pos + len);
                add(out, horizontal, pos, across, end, across + WIDTH);
                int roll = r.nextInt(1000);
                if (roll < 30 && t + 1 < tracks && out.size() < budget) {
                    // jog to the next track
                    long at = pos + (r.nextInt((int) Math.max(1, (end - pos - WIDTH) / PITCH))) * PITCH;
                    add(out, horizontal, at, across, at + WIDTH, across + PITCH + WIDTH);
                } else if (roll < 32 && !horizontal && out.size() < budget) {
                    // a 45-degree piece leaving the wire end
                    long x = across, y = end;
                    out.add(Polygon.of(x, y - WIDTH, x + WIDTH, y - WIDTH, x + WIDTH + 3 * PITCH, y + 3 * PITCH - WIDTH,
                            x + 3 * PITCH, y + 3 * PITCH - WIDTH));
                } else if (roll < 33 && out.size() < budget) {
                    // a deliberate width error: a narrow stub
                    add(out, horizontal, end - WIDTH, across + WIDTH, end - WIDTH + 20, across + WIDTH + 30);
                }
                pos = end + (1 + r.nextInt(10)) * PITCH;
            }
        }
    }

    private static void add(List<Polygon> out, boolean horizontal, long a0, long b0, long a1, long b1) {
        out.add(horizontal ? Polygon.rectangle(a0, b0, a1, b1) : Polygon.rectangle(b0, a0, b1, a1));
    }
}
