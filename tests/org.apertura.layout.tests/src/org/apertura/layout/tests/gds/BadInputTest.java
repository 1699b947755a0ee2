/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.util.Arrays;

import org.apertura.layout.PointList;
import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamFlattener;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.tests.TestData;
import org.apertura.layout.tests.stream.StreamEquivalence;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Bad input gives a clear exception naming the byte offset or the cell and the problem, never a
 * hang, a stack overflow or an out-of-memory. Record layout per the GDS II Stream Format Manual 6.0.
 * Every rejected file is also given to the streaming reader, which must throw the same exception
 * (file, byte offset, problem); hierarchy errors are checked on the streaming flattener too.
 */
class BadInputTest {

    /** Both the EMF reader and the streaming reader reject the bytes with the same file, offset and problem. */
    private static GdsFormatException readFails(byte[] bytes) {
        return StreamEquivalence.bothFail(bytes, "bad.gds");
    }

    private static GdsReadResult read(byte[] bytes) throws IOException {
        return GdsReader.read(new ByteArrayInputStream(bytes), "bad.gds");
    }

    /** The streaming path flattens the top cell of the bytes with the same exception as the EMF path. */
    private static void streamFlattenFailsAlike(byte[] bytes, LayoutHierarchyException expected) throws IOException {
        StreamLayout layout = GdsStreamReader.read(bytes, "bad.gds");
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class,
                () -> StreamFlattener.flatten(layout, layout.topCells().get(0)));
        assertEquals(expected.getMessage(), e.getMessage());
    }

    @ParameterizedTest(name = "cut after {0} bytes")
    @ValueSource(ints = {0, 1, 3, 5, 100, 1001, 2000, 3631})
    void truncatedFile(int length) throws IOException {
        byte[] whole = Files.readAllBytes(TestData.file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds"));
        GdsFormatException e = readFails(Arrays.copyOf(whole, length));
        assertTrue(e.getMessage().startsWith("bad.gds: byte "), e.getMessage());
        assertTrue(e.offset() <= length);
        assertTrue(e.problem().contains("ends") || e.problem().contains("empty"), e.problem());
    }

    @Test
    void recordLengthBelowFour() {
        GdsBytes g = new GdsBytes().libraryStart("L");
        int at = g.size();
        g.hex("00 02 05 02");
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset());
        assertEquals("bad.gds: byte " + at + ": record length 2 is below the 4-byte header (record type BGNSTR)",
                e.getMessage());
    }

    @Test
    void oddRecordLength() {
        GdsBytes g = new GdsBytes().libraryStart("L");
        int at = g.size();
        g.hex("00 07 02 06 41 42 43 00");
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset());
        assertTrue(e.problem().contains("record length 7 is odd"), e.problem());
    }

    @Test
    void xyLengthNotAMultipleOfEight() {
        GdsBytes g = new GdsBytes().libraryStart("L").structure("S").empty(0x08).int16(0x0D, 2, 1).int16(0x0E, 2, 0);
        int at = g.size();
        g.int32(0x10, 0, 0, 5).empty(0x11).endStructure().endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset());
        assertEquals("XY record has 12 data bytes, not a multiple of 8 (record length 16)", e.problem());
    }

    @Test
    void referenceToAMissingCell() {
        GdsBytes g = new GdsBytes().libraryStart("L").structure("TOP").empty(0x0A);
        int at = g.size();
        g.ascii(0x12, "NOPE").int32(0x10, 0, 0).empty(0x11).endStructure().endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset(), "offset of the SNAME record");
        assertEquals("cell 'TOP' references missing cell 'NOPE'", e.problem());
    }

    @Test
    void cyclicReferencesInAFile() {
        GdsBytes g = new GdsBytes().libraryStart("L");
        g.structure("A").empty(0x0A).ascii(0x12, "B").int32(0x10, 0, 0).empty(0x11).endStructure();
        g.structure("B").empty(0x0A).ascii(0x12, "A").int32(0x10, 0, 0).empty(0x11).endStructure();
        g.endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals("cyclic cell references: A/B/A", e.problem());
    }

    @Test
    void cyclicReferencesInAModel() {
        LayoutFactory f = LayoutFactory.eINSTANCE;
        Cell a = f.createCell();
        a.setName("A");
        Cell b = f.createCell();
        b.setName("B");
        CellReference ab = f.createCellReference();
        ab.setCell(b);
        a.getElements().add(ab);
        CellReference ba = f.createCellReference();
        ba.setCell(a);
        b.getElements().add(ba);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(a));
        assertEquals("A/B/A: cyclic cell references", e.getMessage());
    }

    @Test
    void hierarchyDeeperThanTheBound() throws IOException {
        // a chain C0 -> C1 -> ... -> C9; bound 5
        Cell top = chain(10);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class,
                () -> Flattener.flatten(top, FlattenOptions.DEFAULTS.withMaxDepth(5)));
        assertEquals("C0/C1/C2/C3/C4/C5/...: hierarchy is 10 levels deep, more than the bound of 5", e.getMessage());
        // exactly at the bound is fine
        assertEquals(1, Flattener.flatten(top, FlattenOptions.DEFAULTS.withMaxDepth(10)).polygonCount());
    }

    @Test
    void veryLongChainInASmallFileNeitherOverflowsTheStackNorPasses() throws IOException {
        // 20,000 nested cells, about 1 MB: reading and the checks are iterative
        GdsBytes g = new GdsBytes().libraryStart("L");
        int n = 20_000;
        for (int i = 0; i < n - 1; i++) {
            g.structure("C" + i).empty(0x0A).ascii(0x12, "C" + (i + 1)).int32(0x10, 1, 0).empty(0x11).endStructure();
        }
        g.structure("C" + (n - 1)).boundary(1, 0, 0, 0, 1, 0, 1, 1, 0, 0).endStructure().endLibrary();
        GdsReadResult r = read(g.bytes());
        assertEquals(1, r.topCells().size());
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class,
                () -> Flattener.flatten(r.topCells().get(0)));
        assertTrue(e.getMessage().contains("hierarchy is 20000 levels deep, more than the bound of 64"), e.getMessage());
        streamFlattenFailsAlike(g.bytes(), e);
    }

    @ParameterizedTest(name = "COLROW {0} x {1}")
    @org.junit.jupiter.params.provider.CsvSource({"0, 1", "1, 0", "-1, 2", "3, -32768"})
    void arrayCountsOfZeroOrNegative(int columns, int rows) {
        GdsBytes g = new GdsBytes().libraryStart("L").structure("LEAF").boundary(1, 0, 0, 0, 1, 0, 1, 1, 0, 0)
                .endStructure().structure("TOP").empty(0x0B).ascii(0x12, "LEAF");
        int at = g.size();
        g.int16(0x13, 2, columns, rows).int32(0x10, 0, 0, 10, 0, 0, 10).empty(0x11).endStructure().endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset());
        assertEquals("AREF with " + columns + " columns and " + rows + " rows (each must be 1 to 32767)", e.problem());
    }

    @Test
    void coordinatesOverflowing32BitsAfterTransform() throws IOException {
        // LEAF reaches x = 2,000,000,000; magnified by 2 it leaves the 32-bit range
        GdsBytes g = new GdsBytes().libraryStart("L")
                .structure("LEAF").boundary(1, 0, 0, 0, 2_000_000_000, 0, 2_000_000_000, 1, 0, 1, 0, 0).endStructure()
                .structure("TOP").empty(0x0A).ascii(0x12, "LEAF").int16(0x1A, 1, 0)
                .real8(0x1B, "41 20 00 00 00 00 00 00").int32(0x10, 0, 0).empty(0x11).endStructure().endLibrary();
        Cell top = read(g.bytes()).topCells().get(0);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(top));
        assertEquals("TOP/LEAF: coordinate 4000000000 outside the 32-bit range after transformation", e.getMessage());
        streamFlattenFailsAlike(g.bytes(), e);
    }

    @Test
    void arrayOriginsOverflowing32Bits() throws IOException {
        GdsBytes g = new GdsBytes().libraryStart("L")
                .structure("LEAF").boundary(1, 0, 0, 0, 1, 0, 1, 1, 0, 0).endStructure()
                .structure("TOP").empty(0x0B).ascii(0x12, "LEAF").int16(0x13, 2, 3, 1)
                // 3 columns with pitch 3e8 from x = 1e9: columns at 1.0e9, 1.3e9, 1.6e9 (corner 1.9e9)
                .int32(0x10, 1_000_000_000, 0, 1_900_000_000, 0, 1_000_000_000, 10)
                .empty(0x11).endStructure().endLibrary();
        Cell top = read(g.bytes()).topCells().get(0);
        // on its own it fits; placed at x = 6e8 the third column starts at 2.2e9
        assertEquals(3, Flattener.flatten(top).polygonCount());
        Cell outer = LayoutFactory.eINSTANCE.createCell();
        outer.setName("OUTER");
        CellReference r = LayoutFactory.eINSTANCE.createCellReference();
        r.setCell(top);
        r.setX(600_000_000);
        outer.getElements().add(r);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(outer));
        assertEquals("OUTER/TOP/LEAF: coordinate 2200000000 outside the 32-bit range after transformation",
                e.getMessage());
    }

    @Test
    void nestedHugeArraysFromASmallFileAreRejectedBeforeExpansion() throws IOException {
        // four levels of 32767 x 32767 arrays: about 1.3e36 placements from a file of a few hundred bytes
        GdsBytes g = new GdsBytes().libraryStart("L").structure("L0").boundary(1, 0, 0, 0, 1, 0, 1, 1, 0, 0).endStructure();
        for (int i = 1; i <= 4; i++) {
            g.structure("L" + i).empty(0x0B).ascii(0x12, "L" + (i - 1)).int16(0x13, 2, 32767, 32767)
                    .int32(0x10, 0, 0, 32767, 0, 0, 32767).empty(0x11).endStructure();
        }
        g.endLibrary();
        Cell top = read(g.bytes()).topCells().get(0);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(top));
        assertEquals("L4: flattening would give more than 2^63 vertices and placements, more than the bound of 100000000",
                e.getMessage());
        streamFlattenFailsAlike(g.bytes(), e);
    }

    @Test
    void bigPolygonsArrayedFromASmallFileAreRejectedByVertexCount() throws IOException {
        // one 8,000-vertex boundary (64 kB) placed 1000 x 1000 times: 8e9 vertices from a 64 kB file
        int[] ring = new int[2 * 8000];
        for (int i = 0; i < 8000; i++) {
            ring[2 * i] = i;
            ring[2 * i + 1] = (i & 1) * 10;
        }
        ring[ring.length - 2] = 0;
        ring[ring.length - 1] = 0;
        GdsBytes g = new GdsBytes().libraryStart("L").structure("BIG").empty(0x08).int16(0x0D, 2, 1).int16(0x0E, 2, 0)
                .int32(0x10, ring).empty(0x11).endStructure()
                .structure("TOP").empty(0x0B).ascii(0x12, "BIG").int16(0x13, 2, 1000, 1000)
                .int32(0x10, 0, 0, 10_000_000, 0, 0, 20_000).empty(0x11).endStructure().endLibrary();
        Cell top = read(g.bytes()).topCells().get(0);
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(top));
        // (8000 vertices + 1 placement) x 1,000,000 instances
        assertEquals("TOP: flattening would give 8001000000 vertices and placements, more than the bound of 100000000",
                e.getMessage());
        streamFlattenFailsAlike(g.bytes(), e);
    }

    @Test
    void arraysOfEmptyCellsCountTowardsTheBound() throws IOException {
        LayoutFactory f = LayoutFactory.eINSTANCE;
        Cell empty = f.createCell();
        empty.setName("EMPTY");
        Cell top = f.createCell();
        top.setName("TOP");
        var a = f.createArrayReference();
        a.setCell(empty);
        a.setColumns(32767);
        a.setRows(32767);
        top.getElements().add(a);
        assertThrows(LayoutHierarchyException.class, () -> Flattener.flatten(top));
    }

    @Test
    void duplicateStructureName() {
        GdsBytes g = new GdsBytes().libraryStart("L");
        int first = g.size();
        g.structure("S").endStructure();
        int second = g.size();
        g.structure("S").endStructure().endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals(second + 28, e.offset(), "offset of the second STRNAME, after the 28-byte BGNSTR");
        assertEquals("structure 'S' defined twice (first at byte " + first + ")", e.problem());
    }

    @Test
    void missingEndelAndWrongDataType() {
        GdsBytes g = new GdsBytes().libraryStart("L").structure("S").empty(0x08).int16(0x0D, 2, 1);
        int at = g.size();
        g.endStructure().endLibrary();
        GdsFormatException e = readFails(g.bytes());
        assertEquals(at, e.offset());
        assertEquals("ENDSTR before ENDEL of the BOUNDARY element started at byte " + (at - 10), e.problem());

        GdsBytes h = new GdsBytes().libraryStart("L").structure("S").empty(0x08);
        int at2 = h.size();
        h.int32(0x0D, 1).empty(0x11).endStructure().endLibrary();
        GdsFormatException e2 = readFails(h.bytes());
        assertEquals(at2, e2.offset());
        assertEquals("LAYER record has data type 3, expected 2 (INT16)", e2.problem());
    }

    @Test
    void notAGdsFileAtAll() {
        GdsFormatException e = readFails("%PDF-1.7 this is not a stream file".getBytes());
        assertEquals(0, e.offset());
    }

    @Test
    void degenerateShapesAreSkippedAndCounted() {
        LayoutFactory f = LayoutFactory.eINSTANCE;
        Cell c = f.createCell();
        c.setName("C");
        Boundary b = f.createBoundary();
        b.setPoints(PointList.of(0, 0, 5, 5, 0, 0));
        c.getElements().add(b);
        var result = Flattener.flatten(c);
        assertEquals(0, result.polygonCount());
        assertEquals(1, result.skippedShapes());
    }

    private static Cell chain(int n) {
        LayoutFactory f = LayoutFactory.eINSTANCE;
        Cell[] cells = new Cell[n];
        for (int i = n - 1; i >= 0; i--) {
            cells[i] = f.createCell();
            cells[i].setName("C" + i);
            if (i == n - 1) {
                Boundary b = f.createBoundary();
                b.setPoints(PointList.of(0, 0, 1, 0, 1, 1, 0, 0));
                cells[i].getElements().add(b);
            } else {
                CellReference r = f.createCellReference();
                r.setCell(cells[i + 1]);
                cells[i].getElements().add(r);
            }
        }
        return cells[0];
    }
}
