/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.Arrays;

import org.apertura.layout.PointList;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.gds.GdsWriter;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Library;
import org.apertura.layout.tests.LayoutSamples;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;

/**
 * The writer emits records laid out as in the GDS II Stream Format Manual 6.0 and refuses content
 * the format cannot hold.
 */
class WriterTest {

    private static final LayoutFactory F = LayoutFactory.eINSTANCE;

    private static byte[] write(Library lib) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GdsWriter.write(lib, out);
        return out.toByteArray();
    }

    @Test
    void minimalLibraryBytesAreExactlyTheManualsLayout() throws IOException {
        Library lib = F.createLibrary();
        lib.setName("AB");
        Cell c = F.createCell();
        c.setName("TOP");
        Boundary b = F.createBoundary();
        b.setLayer(68);
        b.setDatatype(20);
        b.setPoints(PointList.of(0, 0, 1, 0, 1, 1, 0, 0));
        c.getElements().add(b);
        lib.getCells().add(c);
        byte[] expected = new GdsBytes()
                .hex("00 06 00 02 02 58")                                   // HEADER 600
                .hex("00 1C 01 02" + " 00 00".repeat(12))                   // BGNLIB, unknown dates
                .hex("00 06 02 06 41 42")                                   // LIBNAME "AB"
                .hex("00 14 03 05 3E 41 89 37 4B C6 A7 F0 39 44 B8 2F A0 9B 5A 54") // UNITS defaults
                .hex("00 1C 05 02" + " 00 00".repeat(12))                   // BGNSTR
                .hex("00 08 06 06 54 4F 50 00")                             // STRNAME "TOP"
                .hex("00 04 08 00 00 06 0D 02 00 44 00 06 0E 02 00 14")     // BOUNDARY LAYER 68 DATATYPE 20
                .hex("00 24 10 03 00000000 00000000 00000001 00000000 00000001 00000001 00000000 00000000")
                .hex("00 04 11 00 00 04 07 00 00 04 04 00")                 // ENDEL ENDSTR ENDLIB
                .bytes();
        assertArrayEquals(expected, write(lib));
    }

    @Test
    void refusesWhatTheFormatCannotHold() {
        Library lib = LayoutSamples.everyElementKind();
        ArrayReference a = (ArrayReference) lib.getCells().get(0).getElements().get(1);
        a.setColumns(0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> write(lib));
        assertEquals("cell 'TOP': array of 0 x 3 (columns and rows must be 1 to 32767)", e.getMessage());

        Library lib2 = LayoutSamples.everyElementKind();
        ((Boundary) lib2.getCells().get(1).getElements().get(0)).setLayer(70000);
        assertThrows(IllegalArgumentException.class, () -> write(lib2));

        Library lib3 = LayoutSamples.everyElementKind();
        int[] many = new int[2 * 8200];
        ((Boundary) lib3.getCells().get(1).getElements().get(0)).setPoints(PointList.of(many));
        IllegalArgumentException e3 = assertThrows(IllegalArgumentException.class, () -> write(lib3));
        assertEquals("cell 'LEAF': XY record needs 65600 data bytes, more than the 65530 a record can hold",
                e3.getMessage());
    }

    @Test
    void equalityCheckOfTheRoundTripCanFail() throws IOException {
        // guards the round-trip tests: a one-unit change in an array pitch is seen
        Library lib = LayoutSamples.everyElementKind();
        Library back = GdsReader.read(new java.io.ByteArrayInputStream(write(lib)), "x.gds").library();
        ((ArrayReference) back.getCells().get(0).getElements().get(1)).setRowPitchX(-1);
        assertFalse(EcoreUtil.equals(lib, back));
        assertFalse(Arrays.equals(write(lib), write(back)));
    }
}
