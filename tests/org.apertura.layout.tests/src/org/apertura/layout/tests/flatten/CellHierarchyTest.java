/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.flatten;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;

import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.hierarchy.CellHierarchy;
import org.apertura.layout.hierarchy.LayoutHierarchyException;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Library;
import org.apertura.layout.tests.gds.HandBuiltFiles;
import org.junit.jupiter.api.Test;

/** Hierarchy queries on the hand-built file (TOP -> MID -> LEAF, TOP -> LEAF) and small models. */
class CellHierarchyTest {

    @Test
    void topCellsChildrenAndDepthOfTheHandBuiltFile() throws IOException {
        Library lib = GdsReader.read(new ByteArrayInputStream(HandBuiltFiles.hierarchy()), "h.gds").library();
        Cell leaf = lib.getCells().get(0);
        Cell mid = lib.getCells().get(1);
        Cell top = lib.getCells().get(2);
        assertEquals(List.of(top), CellHierarchy.topCells(lib));
        assertEquals(List.of(mid, leaf), CellHierarchy.children(top), "distinct, in order of first reference");
        assertEquals(3, CellHierarchy.checkedDepth(top, 3));
        assertEquals(1, CellHierarchy.checkedDepth(leaf, 1));
        assertTrue(CellHierarchy.findCycle(lib.getCells()).isEmpty());
    }

    @Test
    void selfReferenceIsACycle() {
        Cell a = LayoutFactory.eINSTANCE.createCell();
        a.setName("SELF");
        CellReference r = LayoutFactory.eINSTANCE.createCellReference();
        r.setCell(a);
        a.getElements().add(r);
        assertEquals(List.of(a, a), CellHierarchy.findCycle(List.of(a)));
        assertThrows(LayoutHierarchyException.class, () -> CellHierarchy.checkedDepth(a, 10));
    }

    @Test
    void referenceWithoutCellIsReported() {
        Cell a = LayoutFactory.eINSTANCE.createCell();
        a.setName("A");
        a.getElements().add(LayoutFactory.eINSTANCE.createCellReference());
        LayoutHierarchyException e = assertThrows(LayoutHierarchyException.class, () -> CellHierarchy.children(a));
        assertEquals("A: reference to a missing cell", e.getMessage());
    }
}
