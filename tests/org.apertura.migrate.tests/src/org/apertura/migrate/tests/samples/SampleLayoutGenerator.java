/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.tests.samples;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.apertura.layout.PointList;
import org.apertura.layout.gds.GdsWriter;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Library;

/**
 * The seeded generator of the sample block {@code samples/layouts/meridian-block.gds}, drawn for the
 * Meridian MX3 sample deck ({@code samples/decks/meridian-mx3.apdeck}, 0.25 nm database unit) at the
 * pitches of its 0.33-NA LE2 option: M1 horizontal at 20 nm pitch (10 nm lines), M2 vertical at
 * 24 nm pitch (12 nm lines), 16 nm V1 vias with landing pads on both metals.
 * <p>
 * The block holds: a routed region (M1 and M2 segments on their tracks, V1 where an M1 and an M2
 * segment cross, the neighbouring tracks cleared around each pad); a memory-like tile (an 8 x 8
 * array reference of a bit cell with two gate lines, an active band, a contact and its M1 pad); and a
 * row of 16 simple cells (placements of one inverter-like cell with a gate, two active bands, four
 * contacts and their M1 pads). Line ends on a track are mostly 32 nm or more apart; a few, chosen by
 * the seed, are 20 nm (M1) or 24 nm (M2) apart, closer than the LE2 same-mask spacing, so the LE2
 * decomposition meets odd cycles there, and two M1 line ends are 14 nm apart, below the end-of-line
 * rule of every option. Everything is on a 2 nm grid. The same seed always gives the same bytes
 * (times are written as zeros).
 * <p>
 * Run {@link #main} with the output path to rewrite the file; {@code SampleLayoutTest} checks that
 * the committed file is what the generator makes.
 */
public final class SampleLayoutGenerator {

    /** The seed of the committed sample. */
    public static final long SEED = 20260301L;

    /** Database units per nm (0.25 nm unit). */
    private static final int U = 4;

    private static final int NW = 1, ACT = 2, GATE = 7, CT = 10, M1 = 19, V1 = 21, M2 = 20;

    // routed region, nm
    private static final int REGION_X = 3000, REGION_Y = 1600;
    private static final int M1_PITCH = 20, M1_HALF = 5, M2_PITCH = 24, M2_HALF = 6;
    private static final int VIA_HALF = 8, M1_PAD_X = 12, M2_PAD_Y = 14, MIN_SEGMENT = 100;

    private final SplittableRandom random;
    private final LayoutFactory f = LayoutFactory.eINSTANCE;

    private SampleLayoutGenerator(long seed) {
        this.random = new SplittableRandom(seed);
    }

    /** Writes the sample to {@code args[0]} (default {@code samples/layouts/meridian-block.gds}). */
    public static void main(String[] args) throws IOException {
        Path out = Path.of(args.length > 0 ? args[0] : "samples/layouts/meridian-block.gds");
        Files.createDirectories(out.toAbsolutePath().getParent());
        GdsWriter.write(generate(SEED), out);
        System.out.println("wrote " + out);
    }

    /** The sample library for a seed. */
    public static Library generate(long seed) {
        return new SampleLayoutGenerator(seed).build();
    }

    private Library build() {
        Library lib = f.createLibrary();
        lib.setName("MERIDIAN_SAMPLES");
        lib.setMetresPerDatabaseUnit(0.25e-9);
        lib.setUserUnitsPerDatabaseUnit(0.25e-3);
        Cell bit = bitCell();
        Cell inv = inverterCell();
        Cell top = f.createCell();
        top.setName("MERIDIAN_BLOCK");
        routing(top);
        ArrayReference tile = f.createArrayReference();
        tile.setCell(bit);
        tile.setColumns(8);
        tile.setRows(8);
        tile.setX(U * 0);
        tile.setY(U * (REGION_Y + 200));
        tile.setColumnPitchX(U * 96);
        tile.setRowPitchY(U * 80);
        top.getElements().add(tile);
        for (int i = 0; i < 16; i++) {
            CellReference r = f.createCellReference();
            r.setCell(inv);
            r.setX(U * (1000 + 104 * i));
            r.setY(U * (REGION_Y + 200));
            top.getElements().add(r);
        }
        // an n-well under the cell row
        top.getElements().add(rect(NW, 960, REGION_Y + 160, 1000 + 104 * 16 + 40, REGION_Y + 440));
        lib.getCells().add(top);
        lib.getCells().add(bit);
        lib.getCells().add(inv);
        return lib;
    }

    private Boundary rect(int layer, int x0, int y0, int x1, int y1) {
        Boundary b = f.createBoundary();
        b.setLayer(layer);
        b.setDatatype(0);
        b.setPoints(PointList.of(U * x0, U * y0, U * x1, U * y0, U * x1, U * y1, U * x0, U * y1, U * x0, U * y0));
        return b;
    }

    // ------------------------------------------------------------------ routed region

    /** Segments [from, to) of one track, in nm along the track. */
    private List<int[]> track(int length, int tightGap, boolean allowTipToTip) {
        List<int[]> segs = new ArrayList<>();
        int pos = 2 * (random.nextInt(0, 40));
        while (true) {
            int len = 2 * random.nextInt(MIN_SEGMENT / 2, 260);
            if (pos + len > length) {
                break;
            }
            segs.add(new int[] {pos, pos + len});
            int r = random.nextInt(100);
            int gap = r < 3 ? tightGap : allowTipToTip && r == 3 ? 14 : 2 * random.nextInt(16, 60);
            pos += len + gap;
        }
        return segs;
    }

    private void routing(Cell top) {
        int m1Tracks = REGION_Y / M1_PITCH;
        int m2Tracks = REGION_X / M2_PITCH;
        List<List<int[]>> m1 = new ArrayList<>();
        List<List<int[]>> m2 = new ArrayList<>();
        int tipToTip = 0;
        for (int k = 0; k < m1Tracks; k++) {
            boolean allow = tipToTip < 2;
            List<int[]> t = track(REGION_X, 20, allow);
            for (int i = 1; i < t.size(); i++) {
                if (t.get(i)[0] - t.get(i - 1)[1] == 14) {
                    tipToTip++;
                }
            }
            m1.add(t);
        }
        for (int j = 0; j < m2Tracks; j++) {
            m2.add(track(REGION_Y, 24, false));
        }
        // vias where an M1 and an M2 segment cross well inside both, 48 nm apart at least; the
        // neighbouring tracks are cleared around each landing pad, and a via is only kept when every
        // via so far still sits well inside its segments afterwards
        List<int[]> vias = new ArrayList<>();
        for (int k = 1; k < m1Tracks - 1; k++) {
            int y = k * M1_PITCH + M1_PITCH / 2;
            for (int[] s : List.copyOf(m1.get(k))) {
                if (random.nextInt(100) >= 35) {
                    continue;
                }
                int j = (s[0] + 20 + random.nextInt(Math.max(1, s[1] - s[0] - 40))) / M2_PITCH;
                if (j < 1 || j >= m2Tracks - 1) {
                    continue;
                }
                int x = j * M2_PITCH + M2_PITCH / 2;
                int[] via = {x, y, k, j};
                if (vias.stream().anyMatch(v -> Math.abs(v[0] - x) < 48 && Math.abs(v[1] - y) < 48)) {
                    continue;
                }
                List<List<int[]>> m1c = new ArrayList<>(m1);
                List<List<int[]>> m2c = new ArrayList<>(m2);
                clear(m1c, m2c, via);
                vias.add(via);
                if (vias.stream().allMatch(v -> landed(m1c, m2c, v))) {
                    m1 = m1c;
                    m2 = m2c;
                } else {
                    vias.remove(vias.size() - 1);
                }
            }
        }
        for (int k = 0; k < m1Tracks; k++) {
            int yc = k * M1_PITCH + M1_PITCH / 2;
            for (int[] s : m1.get(k)) {
                top.getElements().add(rect(M1, s[0], yc - M1_HALF, s[1], yc + M1_HALF));
            }
        }
        for (int j = 0; j < m2Tracks; j++) {
            int xc = j * M2_PITCH + M2_PITCH / 2;
            for (int[] s : m2.get(j)) {
                top.getElements().add(rect(M2, xc - M2_HALF, s[0], xc + M2_HALF, s[1]));
            }
        }
        for (int[] v : vias) {
            top.getElements().add(rect(V1, v[0] - VIA_HALF, v[1] - VIA_HALF, v[0] + VIA_HALF, v[1] + VIA_HALF));
            top.getElements().add(rect(M1, v[0] - M1_PAD_X, v[1] - VIA_HALF, v[0] + M1_PAD_X, v[1] + VIA_HALF));
            top.getElements().add(rect(M2, v[0] - VIA_HALF, v[1] - M2_PAD_Y, v[0] + VIA_HALF, v[1] + M2_PAD_Y));
        }
    }

    /** Clears the tracks beside a via's landing pads. */
    private static void clear(List<List<int[]>> m1, List<List<int[]>> m2, int[] v) {
        for (int dk : new int[] {-1, 1}) {
            m1.set(v[2] + dk, cut(m1.get(v[2] + dk), v[0] - M1_PAD_X - 24, v[0] + M1_PAD_X + 24));
        }
        for (int dj : new int[] {-1, 1}) {
            m2.set(v[3] + dj, cut(m2.get(v[3] + dj), v[1] - M2_PAD_Y - 24, v[1] + M2_PAD_Y + 24));
        }
    }

    /** Whether a via still lies well inside an M1 and an M2 segment. */
    private static boolean landed(List<List<int[]>> m1, List<List<int[]>> m2, int[] v) {
        return covers(m1.get(v[2]), v[0] - 24, v[0] + 24) && covers(m2.get(v[3]), v[1] - 24, v[1] + 24);
    }

    private static boolean covers(List<int[]> segs, int from, int to) {
        return segs.stream().anyMatch(s -> s[0] <= from && s[1] >= to);
    }

    /** The segments with [from, to) removed; pieces shorter than the minimum are dropped. */
    private static List<int[]> cut(List<int[]> segs, int from, int to) {
        List<int[]> out = new ArrayList<>();
        for (int[] s : segs) {
            if (s[1] <= from || s[0] >= to) {
                out.add(s);
                continue;
            }
            if (from - s[0] >= MIN_SEGMENT) {
                out.add(new int[] {s[0], from});
            }
            if (s[1] - to >= MIN_SEGMENT) {
                out.add(new int[] {to, s[1]});
            }
        }
        return out;
    }

    // ------------------------------------------------------------------ cells

    /** 96 x 80 nm: two gate lines at 48 nm pitch, an active band, a contact with its M1 pad. */
    private Cell bitCell() {
        Cell c = f.createCell();
        c.setName("BITCELL");
        c.getElements().add(rect(GATE, 16, 0, 32, 80));
        c.getElements().add(rect(GATE, 64, 0, 80, 80));
        c.getElements().add(rect(ACT, 0, 20, 96, 60));
        c.getElements().add(rect(CT, 40, 32, 56, 48));
        c.getElements().add(rect(M1, 28, 30, 68, 50));
        return c;
    }

    /** 104 x 200 nm: one gate, two active bands, four contacts with their M1 pads. */
    private Cell inverterCell() {
        Cell c = f.createCell();
        c.setName("INVCELL");
        c.getElements().add(rect(GATE, 44, 20, 60, 180));
        c.getElements().add(rect(ACT, 0, 30, 104, 70));
        c.getElements().add(rect(ACT, 0, 130, 104, 170));
        for (int y : new int[] {42, 142}) {
            for (int x : new int[] {12, 72}) {
                c.getElements().add(rect(CT, x, y, x + 16, y + 16));
                c.getElements().add(rect(M1, x - 8, y - 6, x + 24, y + 22));
            }
        }
        return c;
    }
}
