/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.util.List;

import org.apertura.layout.PointList;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.Library;
import org.apertura.layout.model.Path;
import org.apertura.layout.model.PathType;
import org.apertura.layout.model.Placement;
import org.apertura.layout.model.Property;
import org.apertura.layout.model.Text;

/**
 * Writes the layout model as a GDSII stream (Calma, "GDS II Stream Format Manual", Release 6.0,
 * February 1987), so that {@link GdsReader} reads back a model equal to the one written.
 * <p>
 * Optional records are written only when they carry information: STRANS when a flag is set, MAG
 * when not 1, ANGLE when not 0, PATHTYPE when not flush, BGNEXTN/ENDEXTN for custom paths, and
 * element properties. Null times are written as zeros (which read back as null); a null library
 * name as an empty LIBNAME.
 * <p>
 * Content the format cannot hold throws {@link IllegalArgumentException} naming the cell: a cell
 * without a name, a reference without a cell, a value beyond 16 bits where the format has 16 bits,
 * more points than one XY record holds (8,191), an array corner outside 32 bits, a
 * non-ISO-8859-1 character.
 */
public final class GdsWriter {

    private final GdsRecordOutput out;

    private GdsWriter(OutputStream stream) {
        this.out = new GdsRecordOutput(stream);
    }

    /** Writes a library to a file, replacing it. */
    public static void write(Library library, java.nio.file.Path file) throws IOException {
        try (OutputStream stream = Files.newOutputStream(file)) {
            write(library, stream);
        }
    }

    /** Writes a library to a stream (flushed, not closed). */
    public static void write(Library library, OutputStream stream) throws IOException {
        GdsWriter w = new GdsWriter(stream);
        w.writeLibrary(library);
        w.out.flush();
        stream.flush();
    }

    private void writeLibrary(Library library) throws IOException {
        out.int16(GdsRecordType.HEADER, library.getStreamVersion());
        out.int16(GdsRecordType.BGNLIB, times(library.getModified(), library.getAccessed()));
        out.string(GdsRecordType.LIBNAME, library.getName() == null ? "" : library.getName());
        out.real8(GdsRecordType.UNITS, library.getUserUnitsPerDatabaseUnit(), library.getMetresPerDatabaseUnit());
        for (Cell cell : library.getCells()) {
            writeCell(cell);
        }
        out.empty(GdsRecordType.ENDLIB);
    }

    private void writeCell(Cell cell) throws IOException {
        if (cell.getName() == null || cell.getName().isEmpty()) {
            throw new IllegalArgumentException("a cell without a name cannot be written");
        }
        try {
            out.int16(GdsRecordType.BGNSTR, times(cell.getModified(), cell.getAccessed()));
            out.string(GdsRecordType.STRNAME, cell.getName());
            for (Element e : cell.getElements()) {
                writeElement(e);
            }
            out.empty(GdsRecordType.ENDSTR);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("cell '" + cell.getName() + "': " + e.getMessage(), e);
        }
    }

    private void writeElement(Element e) throws IOException {
        if (e instanceof Boundary b) {
            out.empty(GdsRecordType.BOUNDARY);
            out.int16(GdsRecordType.LAYER, b.getLayer());
            out.int16(GdsRecordType.DATATYPE, b.getDatatype());
            xy(b.getPoints());
        } else if (e instanceof Path p) {
            out.empty(GdsRecordType.PATH);
            out.int16(GdsRecordType.LAYER, p.getLayer());
            out.int16(GdsRecordType.DATATYPE, p.getDatatype());
            if (p.getPathType() != PathType.FLUSH) {
                out.int16(GdsRecordType.PATHTYPE, p.getPathType().getValue());
            }
            out.int32(GdsRecordType.WIDTH, p.getWidth());
            if (p.getPathType() == PathType.CUSTOM) {
                out.int32(GdsRecordType.BGNEXTN, p.getBeginExtension());
                out.int32(GdsRecordType.ENDEXTN, p.getEndExtension());
            }
            xy(p.getPoints());
        } else if (e instanceof Box b) {
            out.empty(GdsRecordType.BOX);
            out.int16(GdsRecordType.LAYER, b.getLayer());
            out.int16(GdsRecordType.BOXTYPE, b.getBoxType());
            xy(b.getPoints());
        } else if (e instanceof Text t) {
            out.empty(GdsRecordType.TEXT);
            out.int16(GdsRecordType.LAYER, t.getLayer());
            out.int16(GdsRecordType.TEXTTYPE, t.getTextType());
            if (t.getFont() < 0 || t.getFont() > 3) {
                throw new IllegalArgumentException("text font " + t.getFont() + " is not 0 to 3");
            }
            out.int16(GdsRecordType.PRESENTATION, (t.getFont() << 4) | (t.getVerticalJustification().getValue() << 2)
                    | t.getHorizontalJustification().getValue());
            if (t.getPathType() != PathType.FLUSH) {
                out.int16(GdsRecordType.PATHTYPE, t.getPathType().getValue());
            }
            if (t.getWidth() != 0) {
                out.int32(GdsRecordType.WIDTH, t.getWidth());
            }
            transform(t);
            out.int32(GdsRecordType.XY, t.getX(), t.getY());
            out.string(GdsRecordType.STRING, t.getString() == null ? "" : t.getString());
        } else if (e instanceof ArrayReference a) {
            out.empty(GdsRecordType.AREF);
            out.string(GdsRecordType.SNAME, cellName(a));
            transform(a);
            out.int16(GdsRecordType.COLROW, a.getColumns(), a.getRows());
            if (a.getColumns() < 1 || a.getRows() < 1 || a.getColumns() > Short.MAX_VALUE || a.getRows() > Short.MAX_VALUE) {
                throw new IllegalArgumentException("array of " + a.getColumns() + " x " + a.getRows()
                        + " (columns and rows must be 1 to 32767)");
            }
            out.int32(GdsRecordType.XY, a.getX(), a.getY(),
                    corner(a.getX(), a.getColumnPitchX(), a.getColumns()), corner(a.getY(), a.getColumnPitchY(), a.getColumns()),
                    corner(a.getX(), a.getRowPitchX(), a.getRows()), corner(a.getY(), a.getRowPitchY(), a.getRows()));
        } else if (e instanceof CellReference r) {
            out.empty(GdsRecordType.SREF);
            out.string(GdsRecordType.SNAME, cellName(r));
            transform(r);
            out.int32(GdsRecordType.XY, r.getX(), r.getY());
        } else {
            throw new IllegalArgumentException("unknown element kind " + e.eClass().getName());
        }
        List<Property> properties = e.getProperties();
        for (Property p : properties) {
            out.int16(GdsRecordType.PROPATTR, p.getAttribute());
            out.string(GdsRecordType.PROPVALUE, p.getValue() == null ? "" : p.getValue());
        }
        out.empty(GdsRecordType.ENDEL);
    }

    private static String cellName(CellReference r) {
        if (r.getCell() == null || r.getCell().eIsProxy() || r.getCell().getName() == null) {
            throw new IllegalArgumentException("reference to a missing cell");
        }
        return r.getCell().getName();
    }

    private static int corner(int origin, int pitch, int count) {
        long v = origin + (long) pitch * count;
        if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("array corner " + v + " does not fit 32 bits");
        }
        return (int) v;
    }

    private void transform(Placement p) throws IOException {
        int flags = (p.isReflected() ? 0x8000 : 0) | (p.isAbsoluteMagnification() ? 0x0004 : 0)
                | (p.isAbsoluteAngle() ? 0x0002 : 0);
        boolean mag = p.getMagnification() != 1.0;
        boolean angle = p.getAngle() != 0.0;
        if (flags != 0 || mag || angle) {
            out.int16(GdsRecordType.STRANS, flags);
            if (mag) {
                out.real8(GdsRecordType.MAG, p.getMagnification());
            }
            if (angle) {
                out.real8(GdsRecordType.ANGLE, p.getAngle());
            }
        }
    }

    private void xy(PointList points) throws IOException {
        if (points == null || points.size() == 0) {
            throw new IllegalArgumentException("element without points");
        }
        out.int32(GdsRecordType.XY, points.toArray());
    }

    private static int[] times(String modified, String accessed) {
        int[] m = GdsTimes.parse(modified);
        int[] a = GdsTimes.parse(accessed);
        int[] all = new int[12];
        System.arraycopy(m, 0, all, 0, 6);
        System.arraycopy(a, 0, all, 6, 6);
        return all;
    }
}
