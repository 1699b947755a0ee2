/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

/** GDSII files assembled by hand for several tests. */
public final class HandBuiltFiles {

    private HandBuiltFiles() {
    }

    /**
     * Cells LEAF, MID, TOP: references with reflection, rotation by 90, 180, 45 and 270 degrees,
     * magnification 2, a 2 x 3 array, a box and a path. The expected flattened coordinates are worked
     * out in HierarchyFlattenTest.
     */
    public static byte[] hierarchy() {
        GdsBytes g = new GdsBytes().libraryStart("H");
        // LEAF: rectangle (0,0) (10,0) (10,5) (0,5) on 1/0
        g.structure("LEAF").boundary(1, 0, 0, 0, 10, 0, 10, 5, 0, 5, 0, 0).endStructure();
        // MID: box (0,0)-(4,2) on 2/0, then LEAF rotated by 90 degrees at (100, 0)
        g.structure("MID");
        g.empty(0x2D).int16(0x0D, 2, 2).int16(0x2E, 2, 0).int32(0x10, 0, 0, 4, 0, 4, 2, 0, 2, 0, 0).empty(0x11);
        g.empty(0x0A).ascii(0x12, "LEAF").int16(0x1A, 1, 0x0000)
                .real8(0x1C, "42 5A 00 00 00 00 00 00")                 // ANGLE 90
                .int32(0x10, 100, 0).empty(0x11);
        g.endStructure();
        g.structure("TOP");
        // 1. MID reflected about x and magnified 2 at (1000, 2000)
        g.empty(0x0A).ascii(0x12, "MID").int16(0x1A, 1, 0x8000)
                .real8(0x1B, "41 20 00 00 00 00 00 00")                 // MAG 2
                .int32(0x10, 1000, 2000).empty(0x11);
        // 2. LEAF array, 2 columns pitch (20, 0), 3 rows pitch (0, 30), rotated by 180 degrees
        g.empty(0x0B).ascii(0x12, "LEAF").int16(0x1A, 1, 0x0000)
                .real8(0x1C, "42 B4 00 00 00 00 00 00")                 // ANGLE 180
                .int16(0x13, 2, 2, 3)                                   // COLROW 2, 3
                .int32(0x10, 0, 0, 40, 0, 0, 90).empty(0x11);
        // 3. LEAF rotated by 45 degrees at the origin (off-grid: rounded and counted)
        g.empty(0x0A).ascii(0x12, "LEAF").int16(0x1A, 1, 0x0000)
                .real8(0x1C, "42 2D 00 00 00 00 00 00")                 // ANGLE 45
                .int32(0x10, 0, 0).empty(0x11);
        // 4. a flush path of width 4 on 3/0 turning left at (10, 0)
        g.empty(0x09).int16(0x0D, 2, 3).int16(0x0E, 2, 0).int32(0x0F, 4).int32(0x10, 0, 0, 10, 0, 10, 10).empty(0x11);
        // 5. LEAF reflected and rotated by 270 degrees at (-50, -50)
        g.empty(0x0A).ascii(0x12, "LEAF").int16(0x1A, 1, 0x8000)
                .real8(0x1C, "43 10 E0 00 00 00 00 00")                 // ANGLE 270 = (0x10E0 / 16^4) * 16^3
                .int32(0x10, -50, -50).empty(0x11);
        return g.endStructure().endLibrary().bytes();
    }
}
