/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.flatten;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.List;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.gds.GdsReadResult;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.model.Cell;
import org.apertura.layout.tests.gds.HandBuiltFiles;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * A hierarchical file assembled by hand ({@link HandBuiltFiles#hierarchy()}) (records per Calma, "GDS II Stream Format Manual", Release
 * 6.0: SREF/AREF with STRANS, MAG, ANGLE, COLROW) whose flattened coordinates are computed by hand
 * in the comments. The placement rule is the manual's: reflect about x first, then magnify, then
 * rotate counter-clockwise, then translate to the reference point; AREF instance (c, r) sits at
 * origin + c * (column corner - origin) / columns + r * (row corner - origin) / rows.
 */
class HierarchyFlattenTest {

    private static FlattenResult flat;

    @BeforeAll
    static void buildAndFlatten() throws IOException {
        byte[] file = HandBuiltFiles.hierarchy();
        GdsReadResult r = GdsReader.read(new ByteArrayInputStream(file), "hierarchy.gds");
        Cell top = r.topCells().get(0);
        assertEquals("TOP", top.getName());
        flat = Flattener.flatten(top);
    }

    @Test
    void layer1HoldsEveryLeafPlacementComputedByHand() {
        List<Polygon> expected = List.of(
                // via MID: LEAF p -> (100 - y, x) in MID; then TOP: (x, -y) * 2 + (1000, 2000)
                // (0,0)->(100,0)->(1200,2000); (10,0)->(100,10)->(1200,1980); (10,5)->(95,10)->(1190,1980)
                Polygon.of(1200, 2000, 1200, 1980, 1190, 1980, 1190, 2000),
                // array, rotation 180: p -> (-x, -y) + (20c, 30r); rows outer, columns inner
                Polygon.of(0, 0, -10, 0, -10, -5, 0, -5),
                Polygon.of(20, 0, 10, 0, 10, -5, 20, -5),
                Polygon.of(0, 30, -10, 30, -10, 25, 0, 25),
                Polygon.of(20, 30, 10, 30, 10, 25, 20, 25),
                Polygon.of(0, 60, -10, 60, -10, 55, 0, 55),
                Polygon.of(20, 60, 10, 60, 10, 55, 20, 55),
                // 45 degrees: (10,0)->(7.07,7.07)->(7,7); (10,5)->(3.54,10.61)->(4,11); (0,5)->(-3.54,3.54)->(-4,4)
                Polygon.of(0, 0, 7, 7, 4, 11, -4, 4),
                // reflect then 270: (x, y) -> (x, -y) -> (-y, -x), + (-50, -50)
                Polygon.of(-50, -50, -50, -60, -55, -60, -55, -50));
        assertEquals(expected, flat.polygons(new LayerKey(1, 0)));
    }

    @Test
    void boxOfMidIsReflectedAndMagnified() {
        // (0,0) (4,0) (4,2) (0,2) -> (x, -y) * 2 + (1000, 2000)
        assertEquals(List.of(Polygon.of(1000, 2000, 1008, 2000, 1008, 1996, 1000, 1996)),
                flat.polygons(new LayerKey(2, 0)));
    }

    @Test
    void pathBecomesItsMitredOutline() {
        // half width 2; right side (0,-2) (12,-2) (12,10), left side back (8,10) (8,2) (0,2)
        assertEquals(List.of(Polygon.of(0, -2, 12, -2, 12, 10, 8, 10, 8, 2, 0, 2)), flat.polygons(new LayerKey(3, 0)));
    }

    @Test
    void onlyTheFortyFiveDegreePlacementIsCountedAsRounded() {
        assertEquals(1, flat.rotatedShapes());
        assertEquals(0, flat.roundedShapes());
        assertEquals(0, flat.skippedShapes());
        assertEquals(11, flat.polygonCount());
        assertEquals(1, flat.warnings().size());
    }
}
