/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.Arrays;
import java.util.List;

import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.Text;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamCell;
import org.apertura.layout.stream.StreamFlattener;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.stream.StreamReadOptions;

/**
 * Checks that the streaming path ({@link GdsStreamReader}, {@link StreamFlattener}) and the EMF path
 * ({@link GdsReader}, {@link Flattener}) agree: the same cells, top cells, warnings and flattened
 * polygons, or the same exception (file, byte offset, problem). Every streaming read is also done
 * with the input cut into several parts parsed by several threads ({@link #PARALLEL_THREADS}, parts
 * forced even for tiny inputs), which must give an identical layout or the identical first error.
 */
public final class StreamEquivalence {

    /** Thread counts of the parallel reads compared with the sequential one. */
    public static final int[] PARALLEL_THREADS = {2, 3, 5};

    private StreamEquivalence() {
    }

    /** Read with {@code threads} threads and the input cut into that many parts however small it is. */
    public static StreamReadOptions forcedParts(int threads) {
        return StreamReadOptions.DEFAULTS.withThreads(threads).withMinBytesPerThread(0);
    }

    /** Read sequentially on the calling thread. */
    public static StreamReadOptions sequential() {
        return StreamReadOptions.DEFAULTS.withThreads(1);
    }

    /** Both readers reject the bytes with the same file, offset and problem; returns the EMF reader's exception. */
    public static GdsFormatException bothFail(byte[] bytes, String fileName) {
        GdsFormatException emf = assertThrows(GdsFormatException.class,
                () -> GdsReader.read(new ByteArrayInputStream(bytes), fileName));
        GdsFormatException stream = assertThrows(GdsFormatException.class,
                () -> GdsStreamReader.read(bytes, fileName, sequential()),
                "the streaming reader accepts what GdsReader rejects: " + emf.getMessage());
        assertSameFailure(emf, stream);
        for (int threads : PARALLEL_THREADS) {
            GdsFormatException parallel = assertThrows(GdsFormatException.class,
                    () -> GdsStreamReader.read(bytes, fileName, forcedParts(threads)),
                    threads + " threads accept what GdsReader rejects: " + emf.getMessage());
            assertSameFailure(emf, parallel);
        }
        return emf;
    }

    /**
     * Reads the bytes sequentially and with every count of {@link #PARALLEL_THREADS}: all fail with
     * the same exception (which is thrown) or all give identical layouts (the sequential one is returned).
     */
    public static StreamLayout readEveryWay(byte[] bytes, String fileName) throws GdsFormatException {
        StreamLayout expected;
        try {
            expected = GdsStreamReader.read(bytes, fileName, sequential());
        } catch (GdsFormatException e) {
            for (int threads : PARALLEL_THREADS) {
                GdsFormatException parallel = assertThrows(GdsFormatException.class,
                        () -> GdsStreamReader.read(bytes, fileName, forcedParts(threads)),
                        threads + " threads accept what one thread rejects: " + e.getMessage());
                assertSameFailure(e, parallel);
            }
            throw e;
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        for (int threads : PARALLEL_THREADS) {
            StreamLayout parallel;
            try {
                parallel = GdsStreamReader.read(bytes, fileName, forcedParts(threads));
            } catch (IOException e) {
                throw new AssertionError(threads + " threads reject what one thread accepts: " + e.getMessage(), e);
            }
            assertIdentical(expected, parallel, threads + " threads");
        }
        return expected;
    }

    /**
     * Identical streaming layouts: name, units, warnings, skipped records, and per cell in order the
     * name, offset, counts, packed shape values, references and transforms; the same top cells.
     */
    public static void assertIdentical(StreamLayout expected, StreamLayout actual, String label) {
        assertEquals(expected.name(), actual.name(), label);
        assertEquals(expected.userUnitsPerDatabaseUnit(), actual.userUnitsPerDatabaseUnit(), label);
        assertEquals(expected.metresPerDatabaseUnit(), actual.metresPerDatabaseUnit(), label);
        assertEquals(expected.warnings(), actual.warnings(), label);
        assertEquals(expected.skippedRecords(), actual.skippedRecords(), label);
        assertEquals(expected.cells().size(), actual.cells().size(), label + ": structures");
        for (int i = 0; i < expected.cells().size(); i++) {
            StreamCell e = expected.cells().get(i);
            StreamCell a = actual.cells().get(i);
            String where = label + ": cell " + i + " " + e.name();
            assertEquals(e.name(), a.name(), where);
            assertEquals(e.offset(), a.offset(), where);
            assertEquals(e.shapeCount(), a.shapeCount(), where);
            assertEquals(e.textCount(), a.textCount(), where);
            assertArrayEquals(Arrays.copyOfRange(e.shapeData(), e.shapeStart(), e.shapeEnd()),
                    Arrays.copyOfRange(a.shapeData(), a.shapeStart(), a.shapeEnd()), where + " shapes");
            assertArrayEquals(e.referenceData(), a.referenceData(), where + " references");
            assertArrayEquals(e.referenceTransforms(), a.referenceTransforms(), where + " transforms");
        }
        assertEquals(expected.topCells().stream().map(StreamCell::offset).toList(),
                actual.topCells().stream().map(StreamCell::offset).toList(), label + ": top cells");
    }

    /** Same file, offset, problem and message. */
    public static void assertSameFailure(GdsFormatException expected, GdsFormatException actual) {
        assertEquals(expected.file(), actual.file());
        assertEquals(expected.problem(), actual.problem());
        assertEquals(expected.offset(), actual.offset(), expected.problem());
        assertEquals(expected.getMessage(), actual.getMessage());
    }

    /**
     * Reads the bytes with both readers (both succeed or both fail alike) and compares the results;
     * returns the EMF result, or null when both rejected the bytes.
     */
    public static GdsReadResult readBoth(byte[] bytes, String fileName, FlattenOptions options) {
        GdsReadResult emf;
        try {
            emf = GdsReader.read(new ByteArrayInputStream(bytes), fileName);
        } catch (GdsFormatException e) {
            GdsFormatException s = assertThrows(GdsFormatException.class, () -> readEveryWay(bytes, fileName),
                    "the streaming reader accepts what GdsReader rejects: " + e.getMessage());
            assertSameFailure(e, s);
            return null;
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        StreamLayout stream;
        try {
            stream = readEveryWay(bytes, fileName);
        } catch (IOException e) {
            throw new AssertionError("the streaming reader rejects what GdsReader accepts: " + e.getMessage(), e);
        }
        assertSameLayout(emf, stream, options);
        return emf;
    }

    /** Same structure names, units, top cells, warnings, element counts, and flattening of every top cell. */
    public static void assertSameLayout(GdsReadResult emf, StreamLayout stream, FlattenOptions options) {
        assertEquals(emf.library().getName(), stream.name());
        assertEquals(emf.library().getUserUnitsPerDatabaseUnit(), stream.userUnitsPerDatabaseUnit());
        assertEquals(emf.library().getMetresPerDatabaseUnit(), stream.metresPerDatabaseUnit());
        assertEquals(emf.warnings(), stream.warnings());
        assertEquals(emf.skippedRecords(), stream.skippedRecords());
        List<Cell> cells = emf.library().getCells();
        assertEquals(cells.size(), stream.cells().size(), "structures");
        for (int i = 0; i < cells.size(); i++) {
            Cell c = cells.get(i);
            StreamCell s = stream.cells().get(i);
            assertEquals(c.getName(), s.name());
            int shapes = 0;
            int refs = 0;
            int texts = 0;
            for (Element e : c.getElements()) {
                if (e instanceof Boundary || e instanceof Box || e instanceof Path) {
                    shapes++;
                } else if (e instanceof CellReference) {
                    refs++;
                } else if (e instanceof Text) {
                    texts++;
                }
            }
            assertEquals(shapes, s.shapeCount(), c.getName() + " shapes");
            assertEquals(refs, s.referenceCount(), c.getName() + " references");
            assertEquals(texts, s.textCount(), c.getName() + " texts");
        }
        assertEquals(emf.topCells().stream().map(Cell::getName).toList(),
                stream.topCells().stream().map(StreamCell::name).toList(), "top cells");
        for (int i = 0; i < emf.topCells().size(); i++) {
            assertSameFlattening(emf.topCells().get(i), stream, stream.topCells().get(i), options);
        }
    }

    /** Both flatteners give equal results, or the same {@link LayoutHierarchyException} message. */
    public static void assertSameFlattening(Cell emfCell, StreamLayout layout, StreamCell streamCell,
            FlattenOptions options) {
        FlattenResult expected;
        try {
            expected = Flattener.flatten(emfCell, options);
        } catch (LayoutHierarchyException e) {
            LayoutHierarchyException s = assertThrows(LayoutHierarchyException.class,
                    () -> StreamFlattener.flatten(layout, streamCell, options));
            assertEquals(e.getMessage(), s.getMessage());
            return;
        }
        FlattenResult actual;
        try {
            actual = StreamFlattener.flatten(layout, streamCell, options);
        } catch (LayoutHierarchyException e) {
            fail("stream flattening of " + streamCell.name() + " failed where the EMF flattening did not: " + e.getMessage());
            return;
        }
        assertEquals(expected.polygons().keySet(), actual.polygons().keySet(), emfCell.getName() + " layers");
        expected.polygons().forEach((k, v) -> assertEquals(v, actual.polygons(k), emfCell.getName() + " layer " + k));
        assertEquals(expected, actual);
    }
}
