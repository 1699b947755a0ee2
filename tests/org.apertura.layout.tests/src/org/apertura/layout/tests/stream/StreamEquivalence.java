/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
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

/**
 * Checks that the streaming path ({@link GdsStreamReader}, {@link StreamFlattener}) and the EMF path
 * ({@link GdsReader}, {@link Flattener}) agree: the same cells, top cells, warnings and flattened
 * polygons, or the same exception (file, byte offset, problem).
 */
public final class StreamEquivalence {

    private StreamEquivalence() {
    }

    /** Both readers reject the bytes with the same file, offset and problem; returns the EMF reader's exception. */
    public static GdsFormatException bothFail(byte[] bytes, String fileName) {
        GdsFormatException emf = assertThrows(GdsFormatException.class,
                () -> GdsReader.read(new ByteArrayInputStream(bytes), fileName));
        GdsFormatException stream = assertThrows(GdsFormatException.class, () -> GdsStreamReader.read(bytes, fileName),
                "the streaming reader accepts what GdsReader rejects: " + emf.getMessage());
        assertSameFailure(emf, stream);
        return emf;
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
            GdsFormatException s = assertThrows(GdsFormatException.class, () -> GdsStreamReader.read(bytes, fileName),
                    "the streaming reader accepts what GdsReader rejects: " + e.getMessage());
            assertSameFailure(e, s);
            return null;
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        StreamLayout stream;
        try {
            stream = GdsStreamReader.read(bytes, fileName);
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
