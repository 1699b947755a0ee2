/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.time.Duration;
import java.util.Random;
import java.util.stream.Stream;

import org.apertura.layout.flatten.FlattenOptions;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.gds.GdsWriter;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.Library;
import org.apertura.layout.stream.GdsStreamReader;
import org.apertura.layout.tests.TestData;
import org.apertura.layout.tests.stream.StreamEquivalence;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Mutates real and hand-built GDSII files at random (fixed seeds, so failures reproduce) and expects
 * for each mutant, within a time bound that only guards against hangs: either a model, or a
 * {@link GdsFormatException}. Models are then flattened (bounded; a {@link LayoutHierarchyException}
 * is an accepted outcome) and written and read back, which must give an equal model unless the
 * writer refuses content the format cannot hold (IllegalArgumentException). Any other exception, a
 * stack overflow or an out-of-memory fails the test. Each mutant also goes through the streaming
 * reader and flattener, which must agree: the same exception (file, byte offset, problem), or the
 * same cells, warnings and flattened polygons.
 */
class FuzzTest {

    /** Mutants per file; raise with -Dapertura.fuzz.mutants=N for a longer local run. */
    private static final int MUTANTS_PER_FILE = Integer.getInteger("apertura.fuzz.mutants", 400);
    private static final FlattenOptions BOUNDED = FlattenOptions.DEFAULTS.withMaxVertices(2_000_000);

    static Stream<Arguments> seeds() throws IOException {
        return Stream.of(
                Arguments.of("sky130 inv_1", Files.readAllBytes(TestData.file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds")), 1L),
                Arguments.of("gf180 nand2_1",
                        Files.readAllBytes(TestData.file("gf180mcu_fd_sc_mcu7t5v0/gf180mcu_fd_sc_mcu7t5v0__nand2_1.gds")), 2L),
                Arguments.of("openmpl sim_c1", Files.readAllBytes(TestData.file("openmpl/sim_c1.gds")), 3L),
                Arguments.of("hand-built hierarchy", HandBuiltFiles.hierarchy(), 4L));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("seeds")
    void mutantsGiveAModelOrAFormatException(String name, byte[] original, long seed) {
        Random random = new Random(seed * 7919 + Long.getLong("apertura.fuzz.seed", 0L));
        int models = 0;
        int rejected = 0;
        for (int i = 0; i < MUTANTS_PER_FILE; i++) {
            byte[] mutant = GdsBytes.mutate(original, random);
            String label = name + " mutant " + i + " (seed " + seed + ")";
            boolean[] ok = new boolean[1];
            assertTimeoutPreemptively(Duration.ofSeconds(20), () -> ok[0] = exercise(mutant, label), label);
            if (ok[0]) {
                models++;
            } else {
                rejected++;
            }
        }
        // both outcomes occur: the mutations are neither all harmless nor all fatal
        assertTrue(models > 0 && rejected > 0, "models " + models + ", rejected " + rejected);
    }

    /** @return true when a model was read, false for a format exception */
    private static boolean exercise(byte[] mutant, String label) {
        GdsReadResult result;
        try {
            result = GdsReader.read(new ByteArrayInputStream(mutant), "mutant.gds");
        } catch (GdsFormatException e) {
            assertTrue(e.getMessage().startsWith("mutant.gds: "), e.getMessage());
            // the streaming reader rejects the mutant with the same file, offset and problem
            GdsFormatException s = assertThrows(GdsFormatException.class, () -> GdsStreamReader.read(mutant, "mutant.gds"),
                    label + ": the streaming reader accepts what GdsReader rejects: " + e.getMessage());
            StreamEquivalence.assertSameFailure(e, s);
            return false;
        } catch (IOException | RuntimeException | StackOverflowError e) {
            throw new AssertionError(label + ": unexpected " + e, e);
        }
        // the streaming reader accepts it too, with the same cells, warnings and flattened polygons
        try {
            StreamEquivalence.assertSameLayout(result, GdsStreamReader.read(mutant, "mutant.gds"), BOUNDED);
        } catch (IOException | RuntimeException | StackOverflowError e) {
            throw new AssertionError(label + ": streaming path failed with " + e, e);
        }
        for (Cell top : result.topCells()) {
            try {
                Flattener.flatten(top, BOUNDED);
            } catch (LayoutHierarchyException e) {
                // bounded expansion refused: accepted
            } catch (RuntimeException | StackOverflowError e) {
                throw new AssertionError(label + ": flattening " + top.getName() + " failed with " + e, e);
            }
        }
        Library lib = result.library();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            GdsWriter.write(lib, out);
        } catch (IllegalArgumentException e) {
            return true; // content the stream cannot hold (for example a rounded array corner beyond 32 bits)
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        try {
            Library back = GdsReader.read(new ByteArrayInputStream(out.toByteArray()), "rewritten.gds").library();
            if (!EcoreUtil.equals(lib, back)) {
                fail(label + ": read(write(x)) differs from x");
            }
        } catch (IOException e) {
            throw new AssertionError(label + ": rewritten file unreadable: " + e.getMessage(), e);
        }
        return true;
    }
}
