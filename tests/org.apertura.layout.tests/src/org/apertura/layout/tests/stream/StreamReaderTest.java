/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HexFormat;
import java.util.List;
import java.util.Random;
import java.util.stream.LongStream;
import java.util.stream.Stream;

import org.apertura.layout.LayerKey;
import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamCell;
import org.apertura.layout.stream.StreamFlattener;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.tests.TestData;
import org.apertura.layout.tests.gds.GdsBytes;
import org.apertura.layout.tests.gds.HandBuiltFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streaming reader gives the same layout and, flattened, the same polygons per layer as the EMF
 * reader: on every file of ../shared/data, on the hand-built hierarchy, and on generated hierarchical
 * files with every element kind, all path types, arrays, reflection, rotation and magnification.
 * Records are assembled per Calma, "GDS II Stream Format Manual", Release 6.0.
 */
class StreamReaderTest {

    static Stream<Path> allFiles() {
        return TestData.allGdsFiles().stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("allFiles")
    void realFilesGiveTheSameShapesAsTheEmfReader(Path file) throws IOException {
        GdsReadResult emf = GdsReader.read(file);
        StreamEquivalence.assertSameLayout(emf, GdsStreamReader.read(file), FlattenOptions.DEFAULTS);
        StreamEquivalence.assertSameLayout(emf, GdsStreamReader.read(Files.readAllBytes(file), file.toString()),
                FlattenOptions.DEFAULTS);
    }

    @Test
    void smallMappingWindowsGiveTheSameLayout() throws IOException {
        // the ASAP7 library is 2.0 MB (shared/data/README.md): a 64 KiB window is remapped about 30 times,
        // with records crossing window ends
        Path file = TestData.file("asap7sc7p5t_28/asap7sc7p5t_28_R_220121a.gds");
        GdsReadResult emf = GdsReader.read(file);
        StreamEquivalence.assertSameLayout(emf, GdsStreamReader.read(file, GdsStreamReader.MIN_WINDOW),
                FlattenOptions.DEFAULTS);
        StreamEquivalence.assertSameLayout(emf, GdsStreamReader.read(file, GdsStreamReader.MIN_WINDOW + 6),
                FlattenOptions.DEFAULTS);
        assertThrows(IllegalArgumentException.class, () -> GdsStreamReader.read(file, 1000));
    }

    @Test
    void zeroPaddingAfterEndlibIsReadFromAMappedFile(@TempDir Path dir) throws IOException {
        // shared/data/README.md: sim_c1 is zero-padded after ENDLIB to a 2048-byte multiple; 2,034 boxes
        Path file = TestData.file("openmpl/sim_c1.gds");
        StreamLayout layout = GdsStreamReader.read(file);
        assertEquals(2034, layout.shapeCount());
        assertTrue(layout.warnings().isEmpty(), layout.warnings().toString());
        // non-zero bytes after ENDLIB: the same warning as GdsReader
        byte[] b = Files.readAllBytes(file);
        b[b.length - 1] = 7;
        Path changed = dir.resolve("changed.gds");
        Files.write(changed, b);
        assertEquals(GdsReader.read(changed).warnings(), GdsStreamReader.read(changed).warnings());
        assertEquals("1 non-zero bytes after ENDLIB ignored", GdsStreamReader.read(changed).warnings().get(0));
    }

    @Test
    void sky130Inv1HasLi1AndMet1() throws IOException {
        StreamLayout layout = GdsStreamReader.read(TestData.file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds"));
        assertEquals(1, layout.cells().size());
        // shared/data/README.md: UNITS 0.001 user unit / 1e-9 m per database unit
        assertEquals(0.001, layout.userUnitsPerDatabaseUnit());
        assertEquals(1e-9, layout.metresPerDatabaseUnit());
        FlattenResult flat = StreamFlattener.flatten(layout, layout.topCells().get(0));
        // references.md section 1, SKY130 gds_layers.csv: li1 drawing 67/20, met1 drawing 68/20
        assertTrue(!flat.polygons(new LayerKey(67, 20)).isEmpty());
        assertTrue(!flat.polygons(new LayerKey(68, 20)).isEmpty());
    }

    @Test
    void packedShapeRecordsHoldTheCoordinatesAsStored() throws IOException {
        // a BOUNDARY on 5/3 and a CUSTOM PATH on 6/0 with extensions 2 and -1, assembled by hand
        GdsBytes g = new GdsBytes().libraryStart("P").structure("S").boundary(5, 3, 0, 0, 10, 0, 10, 5, 0, 0);
        g.empty(0x09).int16(0x0D, 2, 6).int16(0x0E, 2, 0).int16(0x21, 2, 4).int32(0x0F, 8).int32(0x30, 2)
                .int32(0x31, -1).int32(0x10, 0, 0, 100, 0).empty(0x11);
        g.empty(0x0C).int16(0x0D, 2, 7).int16(0x16, 2, 0).int32(0x10, 1, 1).ascii(0x19, "VDD").empty(0x11);
        StreamLayout layout = GdsStreamReader.read(g.endStructure().endLibrary().bytes(), "p.gds");
        StreamCell s = layout.cells().get(0);
        assertEquals(2, s.shapeCount());
        assertEquals(1, s.textCount());
        assertArrayEquals(new int[] {
            StreamCell.BOUNDARY << 28 | 4, 5 << 16 | 3, 0, 0, 10, 0, 10, 5, 0, 0,
            StreamCell.PATH << 28 | 2, 6 << 16, 4, 8, 2, -1, 0, 0, 100, 0},
            Arrays.copyOfRange(s.shapeData(), s.shapeStart(), s.shapeEnd()));
        assertEquals(new LayerKey(5, 3), StreamCell.layerKey(s.shapeData()[s.shapeStart() + 1]));
        assertEquals("P", layout.name());
    }

    @Test
    void handBuiltHierarchyFlattensAlike() {
        byte[] bytes = HandBuiltFiles.hierarchy();
        GdsReadResult r = StreamEquivalence.readBoth(bytes, "h.gds", FlattenOptions.DEFAULTS);
        assertNotNull(r);
        assertEquals(1, r.topCells().size());
    }

    @Test
    void heapBufferWithAnOffsetIsReadFromItsPosition() throws IOException {
        byte[] file = HandBuiltFiles.hierarchy();
        ByteBuffer b = ByteBuffer.allocate(file.length + 10);
        b.position(10);
        b.put(file);
        b.position(10);
        StreamLayout layout = GdsStreamReader.read(b, "h.gds");
        assertEquals(10, b.position());
        assertEquals(3, layout.cells().size());
        assertEquals(6 + 28 + 6 + 20, layout.cells().get(0).offset(),
                "LEAF's BGNSTR follows HEADER (6 bytes), BGNLIB (28), LIBNAME (6) and UNITS (20)");
    }

    static LongStream seeds() {
        return LongStream.rangeClosed(1, 40);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void generatedHierarchiesFlattenAlike(long seed) {
        byte[] bytes = generate(new Random(seed));
        GdsReadResult r = StreamEquivalence.readBoth(bytes, "gen" + seed + ".gds",
                FlattenOptions.DEFAULTS.withMaxVertices(3_000_000));
        assertNotNull(r, "generated files are valid");
    }

    /**
     * A random hierarchy: up to 7 cells, each with boundaries, boxes, paths of types 0, 1, 2 and 4
     * (some with absolute, negative width), texts, and references from cell Ci to cells Cj, j > i
     * (so no cycle), with reflection, absolute flags, magnifications 1, 2, 0.5, 3 and angles that are
     * and are not multiples of 90 degrees; arrays up to 3 x 3. Structures appear in random order, so
     * references point forwards and backwards in the file.
     */
    static byte[] generate(Random random) {
        int cells = 2 + random.nextInt(6);
        List<byte[]> structures = new ArrayList<>();
        for (int c = cells - 1; c >= 0; c--) {
            GdsBytes g = new GdsBytes();
            g.structure("C" + c);
            int elements = 1 + random.nextInt(12);
            for (int e = 0; e < elements; e++) {
                int kind = random.nextInt(c < cells - 1 ? 6 : 4);
                int layer = 1 + random.nextInt(4);
                int x = random.nextInt(2000) - 1000;
                int y = random.nextInt(2000) - 1000;
                switch (kind) {
                    case 0 -> {
                        int w = 1 + random.nextInt(100);
                        int h = 1 + random.nextInt(100);
                        g.boundary(layer, random.nextInt(3), x, y, x + w, y, x + w, y + h, x, y + h, x, y);
                    }
                    case 1 -> g.empty(0x2D).int16(0x0D, 2, layer).int16(0x2E, 2, random.nextInt(2))
                            .int32(0x10, x, y, x + 8, y, x + 8, y + 6, x, y + 6, x, y).empty(0x11);
                    case 2 -> {
                        int type = new int[] {0, 1, 2, 4}[random.nextInt(4)];
                        int width = (random.nextInt(10) * 2 + (random.nextInt(4) == 0 ? 1 : 0))
                                * (random.nextInt(5) == 0 ? -1 : 1);
                        g.empty(0x09).int16(0x0D, 2, layer).int16(0x0E, 2, 0).int16(0x21, 2, type).int32(0x0F, width);
                        if (type == 4) {
                            g.int32(0x30, random.nextInt(7) - 3).int32(0x31, random.nextInt(7) - 3);
                        }
                        int n = 1 + random.nextInt(4);
                        int[] xy = new int[2 * n];
                        int px = x;
                        int py = y;
                        for (int i = 0; i < n; i++) {
                            if (random.nextBoolean()) {
                                px += random.nextInt(200) - 100;
                            } else if (random.nextBoolean()) {
                                py += random.nextInt(200) - 100;
                            } else {
                                px += random.nextInt(50);
                                py += random.nextInt(50);
                            }
                            xy[2 * i] = px;
                            xy[2 * i + 1] = py;
                        }
                        g.int32(0x10, xy).empty(0x11);
                    }
                    case 3 -> g.empty(0x0C).int16(0x0D, 2, layer).int16(0x16, 2, 0).int32(0x10, x, y)
                            .ascii(0x19, "T" + e).empty(0x11);
                    default -> {
                        int child = c + 1 + random.nextInt(cells - c - 1);
                        boolean array = kind == 5;
                        g.empty(array ? 0x0B : 0x0A).ascii(0x12, "C" + child);
                        int strans = (random.nextBoolean() ? 0x8000 : 0) | (random.nextInt(6) == 0 ? 0x0004 : 0)
                                | (random.nextInt(6) == 0 ? 0x0002 : 0);
                        g.int16(0x1A, 1, strans);
                        double mag = new double[] {1, 1, 2, 0.5, 3}[random.nextInt(5)];
                        if (mag != 1 || random.nextBoolean()) {
                            g.record(0x1B, 5, GdsBytes.real8(mag));
                        }
                        double angle = new double[] {0, 90, 180, 270, 45, 30, -90, 450}[random.nextInt(8)];
                        if (angle != 0) {
                            g.record(0x1C, 5, GdsBytes.real8(angle));
                        }
                        if (array) {
                            int cols = 1 + random.nextInt(3);
                            int rows = 1 + random.nextInt(3);
                            g.int16(0x13, 2, cols, rows);
                            int pitchX = random.nextInt(3000);
                            int pitchY = random.nextInt(3000);
                            g.int32(0x10, x, y, x + cols * pitchX + random.nextInt(2), y, x, y + rows * pitchY);
                        } else {
                            g.int32(0x10, x, y);
                        }
                        g.empty(0x11);
                    }
                }
            }
            structures.add(g.endStructure().bytes());
        }
        Collections.shuffle(structures, random);
        GdsBytes file = new GdsBytes().libraryStart("GEN");
        for (byte[] b : structures) {
            file.hex(HexFormat.of().formatHex(b));
        }
        return file.endLibrary().bytes();
    }
}
