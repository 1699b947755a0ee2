/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.Random;
import java.util.Set;
import java.util.stream.LongStream;
import java.util.stream.Stream;

import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamCell;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.stream.StreamReadOptions;
import org.apertura.layout.tests.TestData;
import org.apertura.layout.tests.gds.GdsBytes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streaming reader cut into parts parsed by several threads gives exactly what one thread gives:
 * the same cells with the same packed values, warnings and skipped-record counts, and for bad input
 * the same first error in file order (file, byte offset, problem), also when a later part holds an
 * error too, when a later part repeats a name of an earlier part, and when coordinates contain the
 * bytes of a structure start (so that a part starts at a false place). Records are assembled per
 * Calma, "GDS II Stream Format Manual", Release 6.0. No timing is checked here (see bench/layout).
 */
class ParallelReadTest {

    private static final FlattenOptions BOUNDED = FlattenOptions.DEFAULTS.withMaxVertices(3_000_000);
    private static final int[] MORE_THREADS = {4, 8};

    static Stream<Path> allFiles() {
        return TestData.allGdsFiles().stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("allFiles")
    void everyDataFileReadsIdenticallyInParts(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        StreamLayout sequential = StreamEquivalence.readEveryWay(bytes, file.toString());
        for (int threads : MORE_THREADS) {
            StreamEquivalence.assertIdentical(sequential,
                    GdsStreamReader.read(bytes, file.toString(), StreamEquivalence.forcedParts(threads)), threads + " threads");
            // mapped from the file, in small windows, so that parts remap and records cross window ends
            StreamEquivalence.assertIdentical(sequential, GdsStreamReader.read(file,
                    StreamEquivalence.forcedParts(threads).withWindowBytes(GdsStreamReader.MIN_WINDOW)),
                    threads + " threads, mapped");
        }
        StreamEquivalence.assertIdentical(sequential, GdsStreamReader.read(file), "default options");
    }

    @Test
    void asap7IsCutIntoPartsAtStructureStarts() throws IOException {
        // the ASAP7 library holds 212 cells (shared/data/README.md); cut in 4, each later part must
        // start at the BGNSTR of one of them
        byte[] bytes = Files.readAllBytes(TestData.file("asap7sc7p5t_28/asap7sc7p5t_28_R_220121a.gds"));
        long[] starts = GdsStreamReader.partStarts(ByteBuffer.wrap(bytes), StreamEquivalence.forcedParts(4));
        assertEquals(4, starts.length, Arrays.toString(starts));
        StreamLayout layout = GdsStreamReader.read(bytes, "asap7.gds", StreamEquivalence.sequential());
        Set<Long> structureStarts = new HashSet<>();
        for (StreamCell c : layout.cells()) {
            structureStarts.add(c.offset());
        }
        assertEquals(0, starts[0]);
        for (int i = 1; i < starts.length; i++) {
            assertTrue(structureStarts.contains(starts[i]), "part start " + starts[i]);
            assertTrue(starts[i] > starts[i - 1]);
        }
        assertEquals(1, GdsStreamReader.partStarts(ByteBuffer.wrap(bytes), StreamEquivalence.sequential()).length);
    }

    static LongStream seeds() {
        return LongStream.rangeClosed(1, 12);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    void manyStructuresReadIdenticallyAndLikeTheEmfReader(long seed, @TempDir Path dir) throws IOException {
        byte[] bytes = manyStructures(new Random(seed), 150 + (int) seed * 20, false);
        assertNotNull(StreamEquivalence.readBoth(bytes, "many" + seed + ".gds", BOUNDED), "generated files are valid");
        StreamLayout sequential = GdsStreamReader.read(bytes, "many.gds", StreamEquivalence.sequential());
        assertTrue(GdsStreamReader.partStarts(ByteBuffer.wrap(bytes), StreamEquivalence.forcedParts(8)).length >= 6,
                "a file of many structures is cut into nearly as many parts as asked");
        for (int threads : MORE_THREADS) {
            StreamEquivalence.assertIdentical(sequential,
                    GdsStreamReader.read(bytes, "many.gds", StreamEquivalence.forcedParts(threads)), threads + " threads");
        }
        Path file = dir.resolve("many.gds");
        Files.write(file, bytes);
        StreamLayout mapped = GdsStreamReader.read(file,
                StreamEquivalence.forcedParts(3).withWindowBytes(GdsStreamReader.MIN_WINDOW));
        assertEquals(sequential.cells().size(), mapped.cells().size());
        StreamEquivalence.assertIdentical(GdsStreamReader.read(file, StreamEquivalence.sequential()), mapped, "mapped");
    }

    @Test
    void structureStartBytesInsideCoordinatesDoNotChangeTheResult() throws IOException {
        // every structure ends with a boundary whose XY values spell ENDSTR, BGNSTR, STRNAME 'FAKE',
        // ENDSTR: a scan from a cut finds those bytes before the next real structure
        byte[] bytes = manyStructures(new Random(99), 200, true);
        long[] starts = GdsStreamReader.partStarts(ByteBuffer.wrap(bytes), StreamEquivalence.forcedParts(8));
        StreamLayout sequential = StreamEquivalence.readEveryWay(bytes, "fake.gds");
        Set<Long> structureStarts = new HashSet<>();
        for (StreamCell c : sequential.cells()) {
            structureStarts.add(c.offset());
        }
        long falseStarts = Arrays.stream(starts).skip(1).filter(s -> !structureStarts.contains(s)).count();
        assertTrue(falseStarts > 0, "some parts start at a false structure start: " + Arrays.toString(starts));
        for (int threads : MORE_THREADS) {
            StreamEquivalence.assertIdentical(sequential,
                    GdsStreamReader.read(bytes, "fake.gds", StreamEquivalence.forcedParts(threads)), threads + " threads");
        }
        assertNotNull(StreamEquivalence.readBoth(bytes, "fake.gds", BOUNDED));
    }

    /**
     * Two bad structures, {@code first} before {@code second} in the file, each with an error of
     * the given kind: LOCAL (a LAYER record with data type 3 instead of 2 in its first element) or
     * DUPLICATE (its STRNAME repeats the name of the structure at half its index). Whatever the
     * thread count, the error reported lies in the first bad structure, and it is the error the EMF
     * reader reports. {@code apart}: whether a cut into 8 parts falls between the two (after the
     * first's start, at or before the second's), so that they are parsed by different threads.
     */
    @ParameterizedTest(name = "{1} in structure {0}, {3} in structure {2}, apart {4}")
    @CsvSource({
        "10, LOCAL, 100, LOCAL, true",
        "100, LOCAL, 110, LOCAL, true",
        "10, LOCAL, 100, DUPLICATE, true",
        "70, DUPLICATE, 100, LOCAL, true",
        "70, LOCAL, 74, DUPLICATE, true",
        "70, DUPLICATE, 74, LOCAL, true",
        "50, DUPLICATE, 110, DUPLICATE, true",
        "60, DUPLICATE, 62, LOCAL, false",
        "3, LOCAL, 4, LOCAL, false",
        "118, LOCAL, 119, DUPLICATE, false"})
    void theFirstErrorInFileOrderIsReported(int first, String firstKind, int second, String secondKind, boolean apart)
            throws IOException {
        byte[] good = manyStructures(new Random(5), 120, false);
        StreamLayout layout = GdsStreamReader.read(good, "good.gds", StreamEquivalence.sequential());
        byte[] bad = good.clone();
        spoil(bad, layout, second, secondKind);
        spoil(bad, layout, first, firstKind);
        GdsFormatException e = StreamEquivalence.bothFail(bad, "bad.gds");
        long from = layout.cells().get(first).offset();
        long to = layout.cells().get(first + 1).offset();
        assertTrue(e.offset() >= from && e.offset() < to, "error at " + e.offset() + " lies in structure " + first
                + " (" + from + " to " + to + "): " + e.getMessage());
        if (firstKind.equals("DUPLICATE")) {
            assertEquals("structure 'S" + pad(first / 2) + "' defined twice (first at byte "
                    + layout.cells().get(first / 2).offset() + ")", e.problem());
        } else {
            assertEquals("LAYER record has data type 3, expected 2 (INT16)", e.problem());
        }
        long secondStart = layout.cells().get(second).offset();
        long[] starts = GdsStreamReader.partStarts(ByteBuffer.wrap(bad), StreamEquivalence.forcedParts(8));
        assertEquals(apart, Arrays.stream(starts).anyMatch(s -> s > from && s <= secondStart), Arrays.toString(starts));
        for (int threads : MORE_THREADS) {
            GdsFormatException parallel = assertThrows(GdsFormatException.class,
                    () -> GdsStreamReader.read(bad, "bad.gds", StreamEquivalence.forcedParts(threads)));
            StreamEquivalence.assertSameFailure(e, parallel);
        }
    }

    @Test
    void mutantsReadIdenticallyInParts() {
        // random byte changes, cuts, deleted and repeated ranges of a file of many structures: every
        // thread count gives the same layout or the same format exception, and nothing else
        byte[] original = manyStructures(new Random(11), 160, true);
        Random random = new Random(12);
        int rejected = 0;
        for (int i = 0; i < 150; i++) {
            byte[] mutant = GdsBytes.mutate(original, random);
            try {
                StreamEquivalence.readEveryWay(mutant, "mutant.gds");
            } catch (GdsFormatException e) {
                rejected++;
            }
        }
        assertTrue(rejected > 0 && rejected < 150, "rejected " + rejected + " of 150");
    }

    @Test
    void largeAndSmallPartsStoreTheSameShapes(@TempDir Path dir) throws IOException {
        // read as one part of about 9 MB, shapes go to chunks; cut in parts below 4 MiB (the reader's
        // bound for staging), they are gathered in a staging array and copied out, and the first
        // structure, 50,000 rectangles (more than a staging array holds), makes the staging array
        // grow: the layouts must be identical
        Random random = new Random(5);
        GdsBytes g = new GdsBytes().libraryStart("BIG").structure("HUGE");
        for (int e = 0; e < 50_000; e++) {
            int x = random.nextInt(1_000_000);
            g.boundary(4, 1, x, 0, x, 7, x + 3, 7, x + 3, 0, x, 0);
        }
        g.endStructure();
        for (int s = 0; s < 90; s++) {
            g.structure("C" + pad(s));
            for (int e = 0; e < 1000; e++) {
                int x = random.nextInt(1_000_000);
                int y = random.nextInt(1_000_000);
                int w = 1 + random.nextInt(100);
                if (e % 10 == 9) {
                    g.boundary(2, 0, x, y, x + w, y, x + w, y + w, x + 1, y + w, x, y); // not a rectangle
                } else if (e % 10 == 8) {
                    g.empty(0x09).int16(0x0D, 2, 3).int16(0x0E, 2, 0).int32(0x0F, 4)
                            .int32(0x10, x, y, x + w, y, x + w, y + w).empty(0x11);
                } else {
                    g.boundary(1, 0, x, y, x + w, y, x + w, y + w, x, y + w, x, y);
                }
            }
            g.endStructure();
        }
        byte[] bytes = g.endLibrary().bytes();
        assertTrue(bytes.length > 8 << 20, bytes.length + " bytes");
        long[] starts = GdsStreamReader.partStarts(ByteBuffer.wrap(bytes), StreamEquivalence.forcedParts(8));
        for (int i = 0; i < starts.length; i++) {
            long end = i + 1 < starts.length ? starts[i + 1] : bytes.length;
            assertTrue(end - starts[i] < 4 << 20, "part " + i + " of " + Arrays.toString(starts));
        }
        assertTrue(starts[1] > 50_000 * 64, "the first part holds the whole first structure");
        StreamLayout oneLargePart = GdsStreamReader.read(bytes, "big.gds", StreamEquivalence.sequential());
        StreamLayout smallParts = GdsStreamReader.read(bytes, "big.gds", StreamEquivalence.forcedParts(8));
        StreamEquivalence.assertIdentical(oneLargePart, smallParts, "8 parts");
        StreamCell huge = oneLargePart.cells().get(0);
        assertEquals(50_000, huge.shapeCount());
        assertEquals(50_000 * 6, huge.shapeEnd() - huge.shapeStart(), "rectangles take six values each");
        Path file = dir.resolve("big.gds");
        Files.write(file, bytes);
        StreamEquivalence.assertIdentical(oneLargePart, GdsStreamReader.read(file), "mapped, default options");
        StreamEquivalence.assertSameLayout(GdsReader.read(file), smallParts, BOUNDED);
    }

    @Test
    void optionsAreChecked() {
        assertThrows(IllegalArgumentException.class, () -> StreamReadOptions.DEFAULTS.withThreads(-1));
        assertThrows(IllegalArgumentException.class, () -> StreamReadOptions.DEFAULTS.withMinBytesPerThread(-1));
        assertThrows(IllegalArgumentException.class, () -> StreamReadOptions.DEFAULTS.withWindowBytes(1000));
        assertEquals(1, StreamReadOptions.DEFAULTS.withThreads(1).threads());
    }

    private static String pad(int index) {
        return String.format("%04d", index);
    }

    /** Puts an error of the kind into the structure with that index (names are all 5 characters). */
    private static void spoil(byte[] bytes, StreamLayout layout, int index, String kind) {
        int at = (int) layout.cells().get(index).offset();
        // BGNSTR is 28 bytes, STRNAME 'Snnnn' 10 bytes (padded to 6 characters)
        if (kind.equals("DUPLICATE")) {
            byte[] name = ("S" + pad(index / 2)).getBytes(StandardCharsets.US_ASCII);
            System.arraycopy(name, 0, bytes, at + 28 + 4, name.length);
        } else {
            int layerRecord = at + 28 + 10 + 4; // after the first element's BOUNDARY record
            assertEquals(0x0D, bytes[layerRecord + 2], "LAYER record");
            bytes[layerRecord + 3] = 3;
        }
    }

    /**
     * A library of {@code count} structures S0000, S0001, ... Each starts with a boundary, then up
     * to 30 random elements: boundaries, boxes, texts, paths of types 0, 1, 2 and 4 (some with
     * extensions, some without width); the last 8 structures also hold references and arrays (some
     * with rounded pitches, reflections, magnifications, angles) to the others, so the hierarchy is
     * two deep. Skipped records appear between structures (GENERATIONS), inside structures
     * (STRTYPE) and inside elements (ELFLAGS); one LIBNAME is repeated between structures.
     */
    static byte[] manyStructures(Random random, int count, boolean fakeStarts) {
        GdsBytes g = new GdsBytes().libraryStart("MANY");
        int leaves = count - 8;
        for (int s = 0; s < count; s++) {
            if (random.nextInt(12) == 0) {
                g.int16(0x22, 2, 3); // GENERATIONS outside a structure: skipped
            }
            if (s == count / 2) {
                g.ascii(0x02, "MANY2"); // a second LIBNAME between structures: the last one counts
            }
            g.structure("S" + pad(s));
            int x0 = random.nextInt(10_000);
            g.boundary(1, 0, x0, 0, x0 + 10, 0, x0 + 10, 10, x0, 10, x0, 0);
            if (random.nextInt(15) == 0) {
                g.int16(0x25, 2, 0); // STRTYPE inside a structure: skipped
            }
            int elements = random.nextInt(30);
            for (int e = 0; e < elements; e++) {
                int kind = random.nextInt(s >= leaves ? 9 : 6);
                int layer = 1 + random.nextInt(6);
                int x = random.nextInt(100_000) - 50_000;
                int y = random.nextInt(100_000) - 50_000;
                switch (kind) {
                    case 0, 1 -> {
                        int w = 1 + random.nextInt(300);
                        int h = 1 + random.nextInt(300);
                        g.boundary(layer, random.nextInt(3), x, y, x + w, y, x + w, y + h, x, y + h, x, y);
                    }
                    case 2 -> {
                        g.empty(0x2D).int16(0x0D, 2, layer).int16(0x2E, 2, random.nextInt(2));
                        if (random.nextInt(10) == 0) {
                            g.int16(0x26, 1, 0); // ELFLAGS: skipped inside the element
                        }
                        g.int32(0x10, x, y, x + 8, y, x + 8, y + 6, x, y + 6, x, y).empty(0x11);
                    }
                    case 3 -> g.empty(0x0C).int16(0x0D, 2, layer).int16(0x16, 2, 0).int32(0x10, x, y)
                            .ascii(0x19, "T" + e).empty(0x11);
                    case 4, 5 -> {
                        int type = new int[] {0, 1, 2, 4}[random.nextInt(4)];
                        g.empty(0x09).int16(0x0D, 2, layer).int16(0x0E, 2, 0);
                        if (type != 0 || random.nextBoolean()) {
                            g.int16(0x21, 2, type);
                        }
                        if (random.nextInt(4) != 0) {
                            g.int32(0x0F, 2 * random.nextInt(20));
                        }
                        if (type == 4) {
                            g.int32(0x30, random.nextInt(5)).int32(0x31, random.nextInt(5));
                        }
                        g.int32(0x10, x, y, x + 100, y, x + 100, y + random.nextInt(200)).empty(0x11);
                    }
                    default -> {
                        int child = random.nextInt(leaves);
                        boolean array = kind == 8;
                        g.empty(array ? 0x0B : 0x0A).ascii(0x12, "S" + pad(child));
                        if (random.nextBoolean()) {
                            g.int16(0x1A, 1, random.nextBoolean() ? 0x8000 : 0);
                            if (random.nextInt(3) == 0) {
                                g.record(0x1B, 5, GdsBytes.real8(new double[] {2, 0.5}[random.nextInt(2)]));
                            }
                            if (random.nextInt(3) == 0) {
                                g.record(0x1C, 5, GdsBytes.real8(new double[] {90, 180, 45}[random.nextInt(3)]));
                            }
                        }
                        if (array) {
                            int cols = 1 + random.nextInt(3);
                            int rows = 1 + random.nextInt(3);
                            g.int16(0x13, 2, cols, rows);
                            int pitch = 1000 + random.nextInt(1000);
                            g.int32(0x10, x, y, x + cols * pitch + random.nextInt(2), y, x, y + rows * pitch);
                        } else {
                            g.int32(0x10, x, y);
                        }
                        g.empty(0x11);
                    }
                }
            }
            if (fakeStarts) {
                // ENDSTR, BGNSTR (28 bytes), STRNAME 'FAKE', ENDSTR, as 32-bit values of a boundary
                g.empty(0x08).int16(0x0D, 2, 9).int16(0x0E, 2, 0).int32(0x10, 0x0004_0700, 0x001C_0502, 0, 0, 0, 0, 0, 0,
                        0x0008_0606, 0x4641_4B45, 0x0004_0700, 0x0004_0700).empty(0x11);
            }
            g.endStructure();
        }
        return g.endLibrary().bytes();
    }
}
