/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.apertura.layout.LayerKey;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Library;
import org.apertura.layout.model.Text;
import org.apertura.layout.tests.TestData;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every GDSII file of ../shared/data read with its expected structure count, units and layers.
 * Expected values: shared/data/README.md (structure counts, units, element kinds), docs/references.md
 * section 1 (layer numbers: SKY130 gds_layers.csv li1 67/20, met1 68/20; GF180MCU Metal1 34/0; ASAP7
 * M1 19, M2 20 drawing datatype 0), and an independent raw record count ({@link RawRecordScan}).
 */
class RealDataTest {

    static Stream<Path> allFiles() {
        return TestData.allGdsFiles().stream();
    }

    static Stream<Path> sky130Files() {
        return allFiles().filter(p -> p.getFileName().toString().startsWith("sky130_fd_sc_hd__"));
    }

    static Stream<Path> gf180Files() {
        return allFiles().filter(p -> p.getFileName().toString().startsWith("gf180mcu_fd_sc_mcu7t5v0__"));
    }

    @Test
    void dataFolderHoldsTheFilesTheReadmeLists() {
        // shared/data/README.md: 14 SKY130 cells, 5 GF180MCU cells, 1 ASAP7 library, 1 OpenMPL benchmark
        assertEquals(14, sky130Files().count());
        assertEquals(5, gf180Files().count());
        assertEquals(21, allFiles().count());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("allFiles")
    void elementCountsMatchAnIndependentRecordCount(Path file) throws IOException {
        GdsReadResult r = GdsReader.read(file);
        Map<Integer, Integer> raw = RawRecordScan.countByType(file);
        Library lib = r.library();
        assertEquals(raw.getOrDefault(0x05, 0), lib.getCells().size(), "structures (BGNSTR)");
        long boundaries = 0, paths = 0, texts = 0, boxes = 0, refs = 0;
        for (Cell c : lib.getCells()) {
            for (Element e : c.getElements()) {
                switch (e.eClass().getName()) {
                    case "Boundary" -> boundaries++;
                    case "Path" -> paths++;
                    case "Text" -> texts++;
                    case "Box" -> boxes++;
                    default -> refs++;
                }
            }
        }
        assertEquals((long) raw.getOrDefault(0x08, 0), boundaries, "BOUNDARY");
        assertEquals((long) raw.getOrDefault(0x09, 0), paths, "PATH");
        assertEquals((long) raw.getOrDefault(0x0C, 0), texts, "TEXT");
        assertEquals((long) raw.getOrDefault(0x2D, 0), boxes, "BOX");
        // shared/data/README.md: none of these files holds SREF or AREF
        assertEquals(0, refs);
        assertEquals(lib.getCells(), r.topCells(), "without references every cell is a top cell");
        assertTrue(r.warnings().isEmpty(), r.warnings().toString());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("sky130Files")
    void sky130CellsHaveOneStructureNanometreUnitsAndLi1Met1(Path file) throws IOException {
        Library lib = GdsReader.read(file).library();
        String name = file.getFileName().toString().replace(".gds", "");
        // shared/data/README.md: one flat structure each; UNITS 0.001 user unit / 1e-9 m
        assertEquals(1, lib.getCells().size());
        assertEquals(name, lib.getCells().get(0).getName());
        assertEquals(0.001, lib.getUserUnitsPerDatabaseUnit());
        assertEquals(1e-9, lib.getMetresPerDatabaseUnit());
        Set<LayerKey> layers = drawnLayers(lib);
        // references.md section 1, SKY130 gds_layers.csv: li1 drawing 67/20 and met1 drawing 68/20
        // (the power rails) in every cell
        assertTrue(layers.contains(new LayerKey(67, 20)), layers.toString());
        assertTrue(layers.contains(new LayerKey(68, 20)), layers.toString());
    }

    @Test
    void sky130Inv1FlattensToLi1AndMet1Polygons() throws IOException {
        Library lib = GdsReader.read(TestData.file("sky130_fd_sc_hd/sky130_fd_sc_hd__inv_1.gds")).library();
        FlattenResult flat = Flattener.flatten(lib.getCells().get(0));
        // references.md section 1: li1 67/20, met1 68/20
        assertFalse(flat.polygons(new LayerKey(67, 20)).isEmpty());
        assertFalse(flat.polygons(new LayerKey(68, 20)).isEmpty());
        long shapes = lib.getCells().get(0).getElements().stream().filter(e -> !(e instanceof Text)).count();
        assertEquals(shapes, flat.polygonCount() + flat.skippedShapes());
        assertEquals(0, flat.rotatedShapes());
        assertTrue(flat.polygons().values().stream().flatMap(List::stream).allMatch(p -> p.isManhattan()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("gf180Files")
    void gf180CellsUseVersion600NanometreUnitsAndMetal1(Path file) throws IOException {
        Library lib = GdsReader.read(file).library();
        // shared/data/README.md: GDS version 600, 1 nm database unit
        assertEquals(600, lib.getStreamVersion());
        assertEquals(1, lib.getCells().size());
        assertEquals(0.001, lib.getUserUnitsPerDatabaseUnit());
        assertEquals(1e-9, lib.getMetresPerDatabaseUnit());
        // references.md section 1: GF180MCU Metal1 34/0
        assertTrue(drawnLayers(lib).contains(new LayerKey(34, 0)));
    }

    @Test
    void asap7LibraryHas212StructuresQuarterNanometreUnitsAndMetalLayers() throws IOException {
        GdsReadResult r = GdsReader.read(TestData.file("asap7sc7p5t_28/asap7sc7p5t_28_R_220121a.gds"));
        Library lib = r.library();
        // shared/data/README.md: 212 structures; UNITS 0.00025 user unit / 2.5e-10 m (0.25 nm)
        assertEquals(212, lib.getCells().size());
        assertEquals(0.00025, lib.getUserUnitsPerDatabaseUnit());
        assertEquals(2.5e-10, lib.getMetresPerDatabaseUnit());
        Set<LayerKey> layers = drawnLayers(lib);
        // references.md section 1, ASAP7: M1 19, M2 20, drawing datatype 0
        assertTrue(layers.contains(new LayerKey(19, 0)), layers.toString());
        assertTrue(layers.contains(new LayerKey(20, 0)), layers.toString());
        assertEquals(212, r.topCells().size());
    }

    @Test
    void openMplBenchmarkHas2034BoxesOnLayer1() throws IOException {
        GdsReadResult r = GdsReader.read(TestData.file("openmpl/sim_c1.gds"));
        Library lib = r.library();
        // shared/data/README.md: 2,034 BOX elements on layer 1, 1 nm database unit, zero-padded after ENDLIB
        assertEquals(1e-9, lib.getMetresPerDatabaseUnit());
        List<Element> elements = lib.getCells().stream().flatMap(c -> c.getElements().stream()).toList();
        assertEquals(2034, elements.size());
        assertTrue(elements.stream().allMatch(e -> e instanceof Box b && b.getLayer() == 1));
        assertTrue(r.warnings().isEmpty());
        FlattenResult flat = Flattener.flatten(r.topCells().get(0));
        assertEquals(2034, flat.polygonCount());
    }

    private static Set<LayerKey> drawnLayers(Library lib) {
        Set<LayerKey> layers = new TreeSet<>();
        for (Cell c : lib.getCells()) {
            for (Element e : c.getElements()) {
                if (e instanceof Boundary b) {
                    layers.add(new LayerKey(b.getLayer(), b.getDatatype()));
                } else if (e instanceof org.apertura.layout.model.Path p) {
                    layers.add(new LayerKey(p.getLayer(), p.getDatatype()));
                } else if (e instanceof Box b) {
                    layers.add(new LayerKey(b.getLayer(), b.getBoxType()));
                }
            }
        }
        return layers;
    }
}
