/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.gds.GdsWriter;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Library;
import org.apertura.layout.tests.LayoutSamples;
import org.apertura.layout.tests.TestData;
import org.apertura.layout.xmi.LayoutResources;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * read(write(x)) equals x, compared with EMF's structural equality (EcoreUtil.equals: every
 * attribute, containment and cell reference), for every element kind and for every real file.
 */
class RoundTripTest {

    static byte[] write(Library lib) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        GdsWriter.write(lib, out);
        return out.toByteArray();
    }

    static Library read(byte[] bytes) throws IOException {
        return GdsReader.read(new ByteArrayInputStream(bytes), "memory.gds").library();
    }

    @Test
    void everyElementKindSurvivesWriteAndRead() throws IOException {
        Library original = LayoutSamples.everyElementKind();
        Library back = read(write(original));
        assertTrue(EcoreUtil.equals(original, back), () -> "differs: " + describe(back));
        // the same holds element by element, so a failure above names the kind
        for (int c = 0; c < original.getCells().size(); c++) {
            for (int i = 0; i < original.getCells().get(c).getElements().size(); i++) {
                Element e = original.getCells().get(c).getElements().get(i);
                Element f = back.getCells().get(c).getElements().get(i);
                assertTrue(new EcoreUtil.EqualityHelper().equals(e, f), e.eClass().getName() + " " + i);
            }
        }
    }

    @Test
    void writerIsDeterministic() throws IOException {
        Library original = LayoutSamples.everyElementKind();
        assertArrayEquals(write(original), write(read(write(original))));
    }

    static Stream<Path> allFiles() {
        return TestData.allGdsFiles().stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("allFiles")
    void realFilesSurviveWriteAndRead(Path file) throws IOException {
        Library original = GdsReader.read(file).library();
        Library back = read(write(original));
        assertTrue(EcoreUtil.equals(original, back));
    }

    @Test
    void xmiIsTheNativeFormatAndRoundTripsToo(@TempDir Path dir) throws IOException {
        Library original = LayoutSamples.everyElementKind();
        Path file = dir.resolve("sample." + LayoutResources.FILE_EXTENSION);
        LayoutResources.save(EcoreUtil.copy(original), file);
        assertTrue(Files.readString(file).contains("http://apertura.org/layout/1.0"));
        Library back = LayoutResources.load(file);
        assertTrue(EcoreUtil.equals(original, back));
        // and the XMI copy writes the same GDSII bytes
        assertArrayEquals(write(original), write(back));
    }

    @Test
    void realLibraryThroughXmi(@TempDir Path dir) throws IOException {
        Library original = GdsReader.read(TestData.file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds")).library();
        Path file = dir.resolve("inv_1.aplayout");
        LayoutResources.save(EcoreUtil.copy(original), file);
        assertTrue(EcoreUtil.equals(original, LayoutResources.load(file)));
        assertEquals(1, LayoutResources.load(file).getCells().size());
    }

    private static String describe(Library lib) {
        StringBuilder sb = new StringBuilder();
        lib.getCells().forEach(c -> c.getElements().forEach(e -> sb.append(e).append('\n')));
        return sb.toString();
    }
}
