/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests;

import org.apertura.layout.PointList;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.HorizontalJustification;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Library;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.PathType;
import org.apertura.layout.model.Property;
import org.apertura.layout.model.Text;
import org.apertura.layout.model.VerticalJustification;

/** Layouts built in memory for tests. */
public final class LayoutSamples {

    private static final LayoutFactory F = LayoutFactory.eINSTANCE;

    private LayoutSamples() {
    }

    /**
     * A library with every element kind and every optional attribute set to a non-default value
     * somewhere: boundary, box, paths of each path type (custom extensions, absolute width), text
     * with presentation and transform, references with reflection, absolute magnification and
     * angle, an array with skewed pitches, properties, dates.
     */
    public static Library everyElementKind() {
        Library lib = F.createLibrary();
        lib.setName("ALLKINDS");
        lib.setUserUnitsPerDatabaseUnit(0.00025);
        lib.setMetresPerDatabaseUnit(2.5e-10);
        lib.setModified("2026-12-01 09:30:00");
        lib.setAccessed("126-01-02 03:04:05");

        Cell leaf = F.createCell();
        leaf.setName("LEAF");
        leaf.setModified("2026-11-30 23:59:59");
        Boundary b = F.createBoundary();
        b.setLayer(68);
        b.setDatatype(20);
        b.setPoints(PointList.of(0, 0, 170, 0, 170, 340, 0, 340, 0, 0));
        Property prop = F.createProperty();
        prop.setAttribute(126);
        prop.setValue("net VDD");
        b.getProperties().add(prop);
        leaf.getElements().add(b);
        Box box = F.createBox();
        box.setLayer(1);
        box.setBoxType(3);
        box.setPoints(PointList.of(-5, -5, 5, -5, 5, 5, -5, 5, -5, -5));
        leaf.getElements().add(box);
        PathType[] types = {PathType.FLUSH, PathType.ROUND, PathType.HALF_WIDTH, PathType.CUSTOM};
        for (int i = 0; i < types.length; i++) {
            Path p = F.createPath();
            p.setLayer(67);
            p.setDatatype(20 + i);
            p.setPathType(types[i]);
            p.setWidth(i == 3 ? -170 : 170);
            if (types[i] == PathType.CUSTOM) {
                p.setBeginExtension(40);
                p.setEndExtension(-20);
            }
            p.setPoints(PointList.of(0, 1000 * i, 500, 1000 * i, 500, 1000 * i + 700));
            leaf.getElements().add(p);
        }
        Text t = F.createText();
        t.setLayer(68);
        t.setTextType(5);
        t.setString("VGND");
        t.setFont(3);
        t.setVerticalJustification(VerticalJustification.BOTTOM);
        t.setHorizontalJustification(HorizontalJustification.CENTER);
        t.setPathType(PathType.ROUND);
        t.setWidth(12);
        t.setX(85);
        t.setY(-170);
        t.setReflected(true);
        t.setMagnification(0.1);
        t.setAngle(33.5);
        leaf.getElements().add(t);

        Cell top = F.createCell();
        top.setName("TOP");
        CellReference s = F.createCellReference();
        s.setCell(leaf);
        s.setX(-2147483648);
        s.setY(2147483647);
        s.setReflected(true);
        s.setMagnification(2.5);
        s.setAbsoluteMagnification(true);
        s.setAngle(-90);
        s.setAbsoluteAngle(true);
        top.getElements().add(s);
        ArrayReference a = F.createArrayReference();
        a.setCell(leaf);
        a.setX(100);
        a.setY(200);
        a.setColumns(32767);
        a.setRows(3);
        a.setColumnPitchX(460);
        a.setColumnPitchY(1);
        a.setRowPitchX(-2);
        a.setRowPitchY(2720);
        a.setAngle(180);
        top.getElements().add(a);
        lib.getCells().add(top);
        lib.getCells().add(leaf);
        return lib;
    }
}
