/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.stream;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.function.Consumer;
import java.util.stream.Stream;

import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.stream.StreamLayout;
import org.apertura.layout.tests.gds.GdsBytes;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streaming reader takes a quick path for BOUNDARY, PATH and TEXT elements whose records come
 * in the usual order with the prescribed data types and lengths, and the general path otherwise.
 * Each element below (valid or not, as the manual and GdsReader have it) sits between plain boundaries (so the quick path meets it in the middle of a
 * run) and must be read as the EMF reader reads it: the same counts and polygons, or the same error
 * (file, byte offset, problem). Records per Calma, "GDS II Stream Format Manual", Release 6.0:
 * TEXT = TEXT, LAYER, TEXTTYPE, [PRESENTATION], [STRANS [MAG] [ANGLE]], XY, STRING, ENDEL.
 */
class PlainElementTest {

    static Stream<Arguments> elements() {
        return Stream.of(
                element("text, plain", true, g -> text(g).int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("text with presentation", true, g -> text(g).int16(0x17, 1, 0b01_01_10).int32(0x10, 5, 5)
                        .ascii(0x19, "AB").empty(0x11)),
                element("text with vertical justification 3", false, g -> text(g).int16(0x17, 1, 0b11_00).int32(0x10, 5, 5)
                        .ascii(0x19, "A").empty(0x11)),
                element("text with horizontal justification 3", false, g -> text(g).int16(0x17, 1, 0b11).int32(0x10, 5, 5)
                        .ascii(0x19, "A").empty(0x11)),
                element("text with strans", true, g -> text(g).int16(0x1A, 1, 0x8000).int32(0x10, 5, 5).ascii(0x19, "A")
                        .empty(0x11)),
                element("text with strans and mag", true, g -> text(g).int16(0x1A, 1, 0).record(0x1B, 5,
                        new byte[] {0x41, 0x20, 0, 0, 0, 0, 0, 0}).int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("text with presentation, strans, mag and angle", true, g -> text(g).int16(0x17, 1, 0b0101)
                        .int16(0x1A, 1, 0x8006).record(0x1B, 5, new byte[] {0x41, 0x20, 0, 0, 0, 0, 0, 0})
                        .record(0x1C, 5, new byte[] {0x42, 0x5A, 0, 0, 0, 0, 0, 0}).int32(0x10, 5, 5).ascii(0x19, "A")
                        .empty(0x11)),
                element("text with mag 0", false, g -> text(g).int16(0x1A, 1, 0).record(0x1B, 5, new byte[8])
                        .int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("text with angle only", true, g -> text(g).record(0x1C, 5,
                        new byte[] {0x42, 0x5A, 0, 0, 0, 0, 0, 0}).int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("text with empty string", true, g -> text(g).int32(0x10, 5, 5).record(0x19, 6, new byte[0])
                        .empty(0x11)),
                element("text without string", false, g -> text(g).int32(0x10, 5, 5).empty(0x11)),
                element("text with two points", false, g -> text(g).int32(0x10, 5, 5, 6, 6).ascii(0x19, "A").empty(0x11)),
                element("text with texttype as int32", false, g -> g.empty(0x0C).int16(0x0D, 2, 3).int16(0x16, 3, 0)
                        .int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("text with a property", true, g -> text(g).int32(0x10, 5, 5).ascii(0x19, "A").int16(0x2B, 2, 1)
                        .ascii(0x2C, "v").empty(0x11)),
                element("text with datatype instead of texttype", true, g -> g.empty(0x0C).int16(0x0D, 2, 3)
                        .int16(0x0E, 2, 0).int32(0x10, 5, 5).ascii(0x19, "A").empty(0x11)),
                element("boundary without points", false, g -> g.empty(0x08).int16(0x0D, 2, 1).int16(0x0E, 2, 0)
                        .record(0x10, 3, new byte[0]).empty(0x11)),
                element("boundary with layer as bit array", false, g -> g.empty(0x08).int16(0x0D, 1, 1).int16(0x0E, 2, 0)
                        .int32(0x10, 0, 0, 1, 1).empty(0x11)),
                element("boundary with elflags", true, g -> g.empty(0x08).int16(0x26, 1, 0).int16(0x0D, 2, 1)
                        .int16(0x0E, 2, 0).int32(0x10, 0, 0, 4, 0, 4, 4, 0, 0).empty(0x11)),
                element("path of type 3", false, g -> g.empty(0x09).int16(0x0D, 2, 1).int16(0x0E, 2, 0).int16(0x21, 2, 3)
                        .int32(0x10, 0, 0, 10, 0).empty(0x11)),
                element("path of type 4 with extensions", true, g -> g.empty(0x09).int16(0x0D, 2, 1).int16(0x0E, 2, 0)
                        .int16(0x21, 2, 4).int32(0x0F, 4).int32(0x30, 1).int32(0x31, 2).int32(0x10, 0, 0, 10, 0)
                        .empty(0x11)),
                element("path with width before pathtype", true, g -> g.empty(0x09).int16(0x0D, 2, 1).int16(0x0E, 2, 0)
                        .int32(0x0F, 4).int16(0x21, 2, 2).int32(0x10, 0, 0, 10, 0).empty(0x11)),
                element("path with negative width", true, g -> g.empty(0x09).int16(0x0D, 2, 1).int16(0x0E, 2, 0)
                        .int16(0x21, 2, 1).int32(0x0F, -6).int32(0x10, 0, 0, 10, 0, 10, 10).empty(0x11)),
                element("boundary of nine points", true, g -> g.boundary(2, 7, 0, 0, 10, 0, 10, 5, 6, 5, 6, 12, 2, 12, 2, 5,
                        0, 5, 0, 0)));
    }

    private static Arguments element(String name, boolean valid, Consumer<GdsBytes> writer) {
        GdsBytes g = new GdsBytes().libraryStart("Q").structure("S");
        for (int i = 0; i < 3; i++) {
            g.boundary(1, 0, i, 0, i + 4, 0, i + 4, 4, i, 4, i, 0);
        }
        writer.accept(g);
        for (int i = 0; i < 3; i++) {
            g.boundary(1, 0, i, 0, i + 4, 0, i + 4, 4, i, 4, i, 0);
        }
        return Arguments.of(name, valid, g.endStructure().endLibrary().bytes());
    }

    private static GdsBytes text(GdsBytes g) {
        return g.empty(0x0C).int16(0x0D, 2, 3).int16(0x16, 2, 0);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("elements")
    void readAsTheEmfReaderReadsIt(String name, boolean valid, byte[] bytes) throws IOException {
        if (valid) {
            GdsReader.read(new ByteArrayInputStream(bytes), "q.gds");
            assertNotNull(StreamEquivalence.readBoth(bytes, "q.gds", FlattenOptions.DEFAULTS));
            StreamLayout layout = GdsStreamReader.read(bytes, "q.gds");
            assertEquals(6 + (name.startsWith("text") ? 0 : 1), layout.cells().get(0).shapeCount(), name);
            assertEquals(name.startsWith("text") ? 1 : 0, layout.cells().get(0).textCount(), name);
        } else {
            StreamEquivalence.bothFail(bytes, "q.gds");
        }
    }
}
