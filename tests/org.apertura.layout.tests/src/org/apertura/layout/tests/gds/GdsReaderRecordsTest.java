/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;
import java.util.Map;

import org.apertura.layout.PointList;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.HorizontalJustification;
import org.apertura.layout.model.Library;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.PathType;
import org.apertura.layout.model.Text;
import org.apertura.layout.model.VerticalJustification;
import org.junit.jupiter.api.Test;

/**
 * Records assembled by hand per Calma, "GDS II Stream Format Manual", Release 6.0, February 1987
 * (record and data type numbers as tabulated in docs/references.md section 4), decoded as the manual
 * says. Every record of that table is exercised here.
 */
class GdsReaderRecordsTest {

    static GdsReadResult read(byte[] bytes) throws IOException {
        return GdsReader.read(new ByteArrayInputStream(bytes), "hand.gds");
    }

    @Test
    void libraryRecordsHeaderBgnlibLibnameUnitsEndlib() throws IOException {
        byte[] file = new GdsBytes()
                .hex("00 06 00 02 02 58")                       // HEADER, int16 600
                .hex("00 1C 01 02 07 E6 00 01 00 16 00 0F 00 1E 00 31"
                        + " 07 E6 00 01 00 16 00 0F 00 1E 00 31") // BGNLIB 2022-01-22 15:30:49 twice
                .hex("00 0A 02 06 4D 59 4C 49 42 00")           // LIBNAME "MYLIB" + NUL pad
                .hex("00 14 03 05 3E 41 89 37 4B C6 A7 F0 39 44 B8 2F A0 9B 5A 54") // UNITS 0.001, 1e-9
                .hex("00 04 04 00")                             // ENDLIB
                .bytes();
        Library lib = read(file).library();
        assertEquals(600, lib.getStreamVersion());
        assertEquals("MYLIB", lib.getName());
        assertEquals(0.001, lib.getUserUnitsPerDatabaseUnit());
        assertEquals(1e-9, lib.getMetresPerDatabaseUnit());
        assertEquals("2022-01-22 15:30:49", lib.getModified());
        assertEquals("2022-01-22 15:30:49", lib.getAccessed());
        assertTrue(lib.getCells().isEmpty());
    }

    @Test
    void structureWithBoundaryLayerDatatypeXyEndel() throws IOException {
        byte[] file = new GdsBytes().libraryStart("L")
                .hex("00 1C 05 02" + " 00 00".repeat(12))      // BGNSTR, zero dates
                .hex("00 08 06 06 54 4F 50 00")                 // STRNAME "TOP"
                .hex("00 04 08 00")                             // BOUNDARY
                .hex("00 06 0D 02 00 44")                       // LAYER 68
                .hex("00 06 0E 02 00 14")                       // DATATYPE 20
                .hex("00 2C 10 03"                              // XY, 5 points, 40 bytes
                        + " 00 00 00 00 00 00 00 00"
                        + " 00 00 00 64 00 00 00 00"
                        + " 00 00 00 64 FF FF FF 38"            // (100, -200)
                        + " 00 00 00 00 FF FF FF 38"
                        + " 00 00 00 00 00 00 00 00")
                .hex("00 04 11 00")                             // ENDEL
                .hex("00 04 07 00")                             // ENDSTR
                .endLibrary().bytes();
        GdsReadResult r = read(file);
        Cell top = r.library().getCells().get(0);
        assertEquals("TOP", top.getName());
        assertNull(top.getModified(), "all-zero dates read as unknown");
        Boundary b = assertInstanceOf(Boundary.class, top.getElements().get(0));
        assertEquals(68, b.getLayer());
        assertEquals(20, b.getDatatype());
        assertEquals(PointList.of(0, 0, 100, 0, 100, -200, 0, -200, 0, 0), b.getPoints());
        assertEquals(List.of(top), r.topCells());
        assertTrue(r.warnings().isEmpty());
    }

    @Test
    void pathRecordsPathtypeWidthBgnextnEndextn() throws IOException {
        byte[] file = new GdsBytes().libraryStart("L").structure("P")
                .hex("00 04 09 00")                             // PATH
                .hex("00 06 0D 02 00 01")                       // LAYER 1
                .hex("00 06 0E 02 00 02")                       // DATATYPE 2
                .hex("00 06 21 02 00 04")                       // PATHTYPE 4 (custom)
                .hex("00 08 0F 03 FF FF FF F6")                 // WIDTH -10 (absolute)
                .hex("00 08 30 03 00 00 00 03")                 // BGNEXTN 3
                .hex("00 08 31 03 FF FF FF FE")                 // ENDEXTN -2
                .hex("00 14 10 03 00 00 00 00 00 00 00 00 00 00 00 32 00 00 00 00") // XY (0,0) (50,0)
                .hex("00 04 11 00")
                .endStructure().endLibrary().bytes();
        Path p = assertInstanceOf(Path.class, read(file).library().getCells().get(0).getElements().get(0));
        assertEquals(1, p.getLayer());
        assertEquals(2, p.getDatatype());
        assertEquals(PathType.CUSTOM, p.getPathType());
        assertEquals(-10, p.getWidth());
        assertEquals(3, p.getBeginExtension());
        assertEquals(-2, p.getEndExtension());
        assertEquals(PointList.of(0, 0, 50, 0), p.getPoints());
    }

    @Test
    void textRecordsTexttypePresentationStringStransMagAngle() throws IOException {
        byte[] file = new GdsBytes().libraryStart("L").structure("T")
                .hex("00 04 0C 00")                             // TEXT
                .hex("00 06 0D 02 00 43")                       // LAYER 67
                .hex("00 06 16 02 00 05")                       // TEXTTYPE 5
                .hex("00 06 17 01 00 26")                       // PRESENTATION font 2, middle, right: 10 01 10
                .hex("00 06 1A 01 80 06")                       // STRANS reflect + abs mag + abs angle
                .hex("00 0C 1B 05 40 80 00 00 00 00 00 00")     // MAG 0.5
                .hex("00 0C 1C 05 42 5A 00 00 00 00 00 00")     // ANGLE 90
                .hex("00 0C 10 03 00 00 00 0A FF FF FF EC")     // XY (10, -20)
                .hex("00 08 19 06 56 44 44 00")                 // STRING "VDD"
                .hex("00 04 11 00")
                .endStructure().endLibrary().bytes();
        Text t = assertInstanceOf(Text.class, read(file).library().getCells().get(0).getElements().get(0));
        assertEquals(67, t.getLayer());
        assertEquals(5, t.getTextType());
        assertEquals("VDD", t.getString());
        assertEquals(2, t.getFont());
        assertEquals(VerticalJustification.MIDDLE, t.getVerticalJustification());
        assertEquals(HorizontalJustification.RIGHT, t.getHorizontalJustification());
        assertTrue(t.isReflected());
        assertTrue(t.isAbsoluteMagnification());
        assertTrue(t.isAbsoluteAngle());
        assertEquals(0.5, t.getMagnification());
        assertEquals(90.0, t.getAngle());
        assertEquals(10, t.getX());
        assertEquals(-20, t.getY());
    }

    @Test
    void srefArefSnameColrowBoxBoxtypeAndProperties() throws IOException {
        byte[] file = new GdsBytes().libraryStart("L")
                .structure("TOP")
                .hex("00 04 0A 00")                             // SREF
                .hex("00 08 12 06 4C 45 41 46")                 // SNAME "LEAF" (forward reference)
                .hex("00 0C 10 03 00 00 03 E8 00 00 07 D0")     // XY (1000, 2000)
                .hex("00 06 2B 02 00 01")                       // PROPATTR 1
                .hex("00 08 2C 06 69 6E 73 74")                 // PROPVALUE "inst"
                .hex("00 04 11 00")
                .hex("00 04 0B 00")                             // AREF
                .hex("00 08 12 06 4C 45 41 46")                 // SNAME "LEAF"
                .hex("00 08 13 02 00 03 00 02")                 // COLROW 3 columns, 2 rows
                .hex("00 1C 10 03"                              // XY origin, column corner, row corner
                        + " 00 00 00 00 00 00 00 00"
                        + " 00 00 00 1E 00 00 00 00"            // (30, 0) = 3 x pitch 10
                        + " 00 00 00 00 00 00 00 28")           // (0, 40) = 2 x pitch 20
                .hex("00 04 11 00")
                .endStructure()
                .structure("LEAF")
                .hex("00 04 2D 00")                             // BOX
                .hex("00 06 0D 02 00 01")                       // LAYER 1
                .hex("00 06 2E 02 00 07")                       // BOXTYPE 7
                .int32(0x10, 0, 0, 5, 0, 5, 5, 0, 5, 0, 0)
                .hex("00 04 11 00")
                .endStructure().endLibrary().bytes();
        GdsReadResult r = read(file);
        Cell top = r.library().getCells().get(0);
        Cell leaf = r.library().getCells().get(1);
        CellReference s = assertInstanceOf(CellReference.class, top.getElements().get(0));
        assertSame(leaf, s.getCell());
        assertEquals(1000, s.getX());
        assertEquals(2000, s.getY());
        assertFalse(s.isReflected());
        assertEquals(1.0, s.getMagnification());
        assertEquals(1, s.getProperties().get(0).getAttribute());
        assertEquals("inst", s.getProperties().get(0).getValue());
        ArrayReference a = assertInstanceOf(ArrayReference.class, top.getElements().get(1));
        assertSame(leaf, a.getCell());
        assertEquals(3, a.getColumns());
        assertEquals(2, a.getRows());
        assertEquals(10, a.getColumnPitchX());
        assertEquals(0, a.getColumnPitchY());
        assertEquals(0, a.getRowPitchX());
        assertEquals(20, a.getRowPitchY());
        Box box = assertInstanceOf(Box.class, leaf.getElements().get(0));
        assertEquals(1, box.getLayer());
        assertEquals(7, box.getBoxType());
        assertEquals(List.of(top), r.topCells(), "LEAF is referenced, TOP is not");
    }

    @Test
    void unknownAndUnmodelledRecordsAreSkippedAndCounted() throws IOException {
        byte[] file = new GdsBytes().libraryStart("L")
                .hex("00 06 22 02 00 03")                       // GENERATIONS 3 (not modelled)
                .hex("00 08 7F 02 00 01 00 02")                 // type 0x7F: not defined by the manual
                .structure("S")
                .hex("00 04 08 00")
                .hex("00 06 26 01 00 00")                       // ELFLAGS inside an element
                .hex("00 06 0D 02 00 01")
                .hex("00 06 0E 02 00 00")
                .int32(0x10, 0, 0, 1, 0, 1, 1, 0, 0)
                .hex("00 04 11 00")
                .hex("00 04 15 00")                             // NODE element: skipped as a whole
                .hex("00 06 0D 02 00 01")
                .hex("00 06 2A 02 00 00")                       // NODETYPE
                .int32(0x10, 0, 0)
                .hex("00 04 11 00")
                .endStructure().endLibrary().bytes();
        GdsReadResult r = read(file);
        assertEquals(Map.of("GENERATIONS", 1, "0x7F", 1, "ELFLAGS", 1, "NODE element", 1), r.skippedRecords());
        assertEquals(1, r.library().getCells().get(0).getElements().size());
        assertTrue(r.warnings().get(0).startsWith("4 records skipped"), r.warnings().toString());
    }

    @Test
    void zeroPaddingAfterEndlibIsAccepted() throws IOException {
        // tape-era writers pad to a 2048-byte block (see shared/data/README.md, openmpl)
        GdsBytes g = new GdsBytes().libraryStart("L").structure("S").boundary(1, 0, 0, 0, 1, 0, 1, 1, 0, 0)
                .endStructure().endLibrary();
        g.hex("00".repeat(2048 - g.size()));
        GdsReadResult r = read(g.bytes());
        assertEquals(1, r.library().getCells().size());
        assertTrue(r.warnings().isEmpty());
    }

    @Test
    void nonZeroBytesAfterEndlibGiveAWarning() throws IOException {
        GdsBytes g = new GdsBytes().libraryStart("L").endLibrary().hex("00 00 12 34");
        GdsReadResult r = read(g.bytes());
        assertEquals(List.of("2 non-zero bytes after ENDLIB ignored"), r.warnings());
    }
}
