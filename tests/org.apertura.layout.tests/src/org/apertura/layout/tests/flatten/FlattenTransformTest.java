/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.flatten;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.apertura.engine.geom.Polygon;
import org.apertura.layout.LayerKey;
import org.apertura.layout.PointList;
import org.apertura.layout.flatten.FlattenResult;
import org.apertura.layout.flatten.Flattener;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.PathType;
import org.junit.jupiter.api.Test;

/**
 * Placement details computed by hand: non-integer magnification (rounded and counted), the STRANS
 * absolute magnification and absolute angle bits of the GDS II Stream Format Manual 6.0 (the child's
 * value replaces the accumulated one), absolute path widths, skewed array pitches.
 */
class FlattenTransformTest {

    private static final LayoutFactory F = LayoutFactory.eINSTANCE;
    private static final LayerKey L1 = new LayerKey(1, 0);

    private static Cell cell(String name) {
        Cell c = F.createCell();
        c.setName(name);
        return c;
    }

    private static Cell unitSquareCell(int size) {
        Cell c = cell("SQ" + size);
        Boundary b = F.createBoundary();
        b.setLayer(1);
        b.setPoints(PointList.of(0, 0, size, 0, size, size, 0, size, 0, 0));
        c.getElements().add(b);
        return c;
    }

    private static CellReference place(Cell parent, Cell child, int x, int y) {
        CellReference r = F.createCellReference();
        r.setCell(child);
        r.setX(x);
        r.setY(y);
        parent.getElements().add(r);
        return r;
    }

    @Test
    void halfMagnificationRoundsAndCounts() {
        Cell top = cell("TOP");
        place(top, unitSquareCell(3), 0, 0).setMagnification(0.5);
        FlattenResult r = Flattener.flatten(top);
        // 3 * 0.5 = 1.5 rounds to 2 (Math.round: halves up)
        assertEquals(List.of(Polygon.of(0, 0, 2, 0, 2, 2, 0, 2)), r.polygons(L1));
        assertEquals(1, r.roundedShapes());
        assertEquals(0, r.rotatedShapes());
    }

    @Test
    void evenCoordinatesAtHalfMagnificationNeedNoRounding() {
        Cell top = cell("TOP");
        place(top, unitSquareCell(4), 0, 0).setMagnification(0.5);
        FlattenResult r = Flattener.flatten(top);
        assertEquals(List.of(Polygon.of(0, 0, 2, 0, 2, 2, 0, 2)), r.polygons(L1));
        assertEquals(0, r.roundedShapes());
    }

    @Test
    void absoluteMagnificationReplacesTheAccumulatedOne() {
        Cell top = cell("TOP");
        Cell mid = cell("MID");
        place(top, mid, 0, 0).setMagnification(2);
        CellReference leaf = place(mid, unitSquareCell(1), 10, 0);
        leaf.setMagnification(3);
        leaf.setAbsoluteMagnification(true);
        // origin (10, 0) is magnified by the parent: (20, 0); the square by 3 only, not 6
        assertEquals(List.of(Polygon.of(20, 0, 23, 0, 23, 3, 20, 3)), Flattener.flatten(top).polygons(L1));
    }

    @Test
    void absoluteAngleReplacesTheAccumulatedOne() {
        Cell top = cell("TOP");
        Cell mid = cell("MID");
        place(top, mid, 0, 0).setAngle(90);
        CellReference leaf = place(mid, unitSquareCell(1), 10, 0);
        leaf.setAbsoluteAngle(true);
        // origin (10, 0) rotated by the parent: (0, 10); the square keeps angle 0
        assertEquals(List.of(Polygon.of(0, 10, 1, 10, 1, 11, 0, 11)), Flattener.flatten(top).polygons(L1));
    }

    @Test
    void absolutePathWidthIsNotMagnified() {
        Cell leaf = cell("LEAF");
        Path p = F.createPath();
        p.setLayer(1);
        p.setWidth(-10);
        p.setPathType(PathType.FLUSH);
        p.setPoints(PointList.of(0, 0, 10, 0));
        leaf.getElements().add(p);
        Cell top = cell("TOP");
        place(top, leaf, 0, 0).setMagnification(2);
        // centre line (0,0)-(20,0), width stays 10
        assertEquals(List.of(Polygon.of(0, -5, 20, -5, 20, 5, 0, 5)), Flattener.flatten(top).polygons(L1));
        // a relative width of 10 is magnified to 20
        p.setWidth(10);
        assertEquals(List.of(Polygon.of(0, -10, 20, -10, 20, 10, 0, 10)), Flattener.flatten(top).polygons(L1));
    }

    @Test
    void skewedArrayPitches() {
        Cell top = cell("TOP");
        ArrayReference a = F.createArrayReference();
        a.setCell(unitSquareCell(1));
        a.setX(5);
        a.setY(7);
        a.setColumns(2);
        a.setRows(2);
        a.setColumnPitchX(10);
        a.setColumnPitchY(1);
        a.setRowPitchX(-2);
        a.setRowPitchY(20);
        top.getElements().add(a);
        // instance (c, r) at (5 + 10c - 2r, 7 + c + 20r), rows outer
        assertEquals(List.of(
                Polygon.of(5, 7, 6, 7, 6, 8, 5, 8),
                Polygon.of(15, 8, 16, 8, 16, 9, 15, 9),
                Polygon.of(3, 27, 4, 27, 4, 28, 3, 28),
                Polygon.of(13, 28, 14, 28, 14, 29, 13, 29)), Flattener.flatten(top).polygons(L1));
    }

    @Test
    void reflectionThenRotationOrderFollowsTheManual() {
        // reflect about x first, then rotate by 90: (x, y) -> (x, -y) -> (y, x)
        Cell top = cell("TOP");
        Cell leaf = cell("LEAF");
        Boundary b = F.createBoundary();
        b.setLayer(1);
        b.setPoints(PointList.of(0, 0, 4, 0, 4, 1, 0, 1));
        leaf.getElements().add(b);
        CellReference r = place(top, leaf, 0, 0);
        r.setReflected(true);
        r.setAngle(90);
        assertEquals(List.of(Polygon.of(0, 0, 0, 4, 1, 4, 1, 0)), Flattener.flatten(top).polygons(L1));
    }
}
