/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.apertura.layout.PointList;
import org.apertura.layout.hierarchy.CellHierarchy;
import org.apertura.layout.model.ArrayReference;
import org.apertura.layout.model.Boundary;
import org.apertura.layout.model.Box;
import org.apertura.layout.model.Cell;
import org.apertura.layout.model.CellReference;
import org.apertura.layout.model.Element;
import org.apertura.layout.model.HorizontalJustification;
import org.apertura.layout.model.LayoutFactory;
import org.apertura.layout.model.Library;

import org.apertura.layout.model.PathType;
import org.apertura.layout.model.Placement;
import org.apertura.layout.model.Property;
import org.apertura.layout.model.Text;
import org.apertura.layout.model.VerticalJustification;
import org.eclipse.emf.ecore.util.InternalEList;

/**
 * Reads a GDSII stream file into the layout model, following the record layout of Calma, "GDS II
 * Stream Format Manual", Release 6.0, February 1987.
 * <p>
 * The input is streamed record by record through a fixed buffer; the file is never held whole.
 * Records the model does not hold (REFLIBS, FONTS, ELFLAGS, PLEX, NODE elements, undefined types,
 * ...) are skipped and counted in {@link GdsReadResult#skippedRecords()} and a warning. Bytes after
 * ENDLIB are ignored (zero padding is normal; non-zero data gives a warning). Cell references are
 * resolved by name after the whole file is read, so they may point forward. Strings are decoded as
 * ISO-8859-1 with trailing NUL padding removed; an empty or missing LIBNAME reads as a null name,
 * all-zero dates as null.
 * <p>
 * Errors throw {@link GdsFormatException} naming the file, the byte offset of the offending record
 * and the problem: a truncated file, a record length below 4 or odd, a data type or payload length
 * that does not fit the record, an XY length that is not a multiple of 8, a wrong point count,
 * array counts below 1, a missing or duplicate cell name, a reference to a missing cell, cyclic
 * references. Reading takes time linear in the file size; memory is linear in the number of
 * elements.
 */
public final class GdsReader {

    private final GdsRecordInput in;
    private final LayoutFactory factory = LayoutFactory.eINSTANCE;
    private final Map<String, Cell> cellsByName = new HashMap<>();
    private final Map<Cell, Long> cellOffsets = new IdentityHashMap<>();
    private final List<PendingReference> pending = new ArrayList<>();
    private final Map<String, Integer> skipped = new TreeMap<>();
    private final List<String> warnings = new ArrayList<>();
    private int roundedPitches;

    private GdsReader(GdsRecordInput in) {
        this.in = in;
    }

    /** Reads a file; the file's path as given appears in error messages. */
    public static GdsReadResult read(Path file) throws IOException {
        try (InputStream stream = Files.newInputStream(file)) {
            return read(stream, file.toString());
        }
    }

    /**
     * Reads a stream (not closed here); it is read in large blocks, so it need not be buffered.
     *
     * @param fileName the name used in error messages
     */
    public static GdsReadResult read(InputStream stream, String fileName) throws IOException {
        return new GdsReader(new GdsRecordInput(stream, fileName)).readLibrary();
    }

    private GdsReadResult readLibrary() throws IOException {
        Library library = factory.createLibrary();
        if (!in.next()) {
            throw in.error("empty file: no HEADER record");
        }
        if (in.type() != GdsRecordType.HEADER.code()) {
            throw in.error("file does not start with a HEADER record (found " + GdsRecordType.nameOf(in.type()) + ")");
        }
        check(GdsRecordType.HEADER, 2);
        library.setStreamVersion(in.int16(0));
        boolean begun = false;
        boolean units = false;
        List<Cell> cells = new ArrayList<>();
        while (true) {
            if (!in.next()) {
                throw in.error("file ends before ENDLIB");
            }
            int type = in.type();
            if (type == GdsRecordType.BGNLIB.code()) {
                check(GdsRecordType.BGNLIB, 24);
                library.setModified(time(0));
                library.setAccessed(time(6));
                begun = true;
            } else if (type == GdsRecordType.LIBNAME.code()) {
                check(GdsRecordType.LIBNAME, 0);
                String name = in.string();
                library.setName(name.isEmpty() ? null : name);
            } else if (type == GdsRecordType.UNITS.code()) {
                check(GdsRecordType.UNITS, 16);
                double user = in.real8(0);
                double metres = in.real8(1);
                if (!(user > 0) || !(metres > 0)) {
                    throw in.error("UNITS must be positive, found " + user + " user units and " + metres + " m per database unit");
                }
                library.setUserUnitsPerDatabaseUnit(user);
                library.setMetresPerDatabaseUnit(metres);
                units = true;
            } else if (type == GdsRecordType.BGNSTR.code()) {
                if (!begun || !units) {
                    throw in.error("BGNSTR before " + (begun ? "UNITS" : "BGNLIB"));
                }
                cells.add(readStructure());
            } else if (type == GdsRecordType.ENDLIB.code()) {
                break;
            } else {
                skipOrFail("outside a structure");
            }
        }
        String trailing = GdsReadChecks.trailingBytesWarning(in.drainCountingNonZero());
        if (trailing != null) {
            warnings.add(trailing);
        }
        ((InternalEList<Cell>) library.getCells()).addAllUnique(cells);
        resolveReferences();
        List<Cell> cycle = findCycle(cells);
        if (!cycle.isEmpty()) {
            throw new GdsFormatException(in.file(), cellOffsets.get(cycle.get(0)),
                    "cyclic cell references: " + CellHierarchy.path(cycle));
        }
        GdsReadChecks.addEndWarnings(warnings, skipped, roundedPitches);
        return new GdsReadResult(library, topCells(cells), skipped, warnings);
    }

    private Cell readStructure() throws IOException {
        long start = in.offset();
        check(GdsRecordType.BGNSTR, 24);
        Cell cell = factory.createCell();
        cell.setModified(time(0));
        cell.setAccessed(time(6));
        List<Element> elements = new ArrayList<>();
        while (true) {
            if (!in.next()) {
                throw in.error("file ends inside structure " + describe(cell));
            }
            int type = in.type();
            if (type == GdsRecordType.STRNAME.code()) {
                check(GdsRecordType.STRNAME, 1);
                String name = in.string();
                if (name.isEmpty()) {
                    throw in.error("empty STRNAME");
                }
                if (cell.getName() != null) {
                    throw in.error("second STRNAME '" + name + "' in structure '" + cell.getName() + "'");
                }
                if (cellsByName.containsKey(name)) {
                    throw in.error("structure '" + name + "' defined twice (first at byte "
                            + cellOffsets.get(cellsByName.get(name)) + ")");
                }
                cell.setName(name);
                cellsByName.put(name, cell);
                cellOffsets.put(cell, start);
            } else if (type == GdsRecordType.ENDSTR.code()) {
                break;
            } else if (GdsRecordType.isElementStart(type)) {
                if (cell.getName() == null) {
                    throw in.error(GdsRecordType.nameOf(type) + " element in a structure without STRNAME");
                }
                Element e = readElement(cell, type);
                if (e != null) {
                    elements.add(e);
                }
            } else {
                skipOrFail("outside an element in structure " + describe(cell));
            }
        }
        if (cell.getName() == null) {
            throw new GdsFormatException(in.file(), start, "structure without STRNAME");
        }
        ((InternalEList<Element>) cell.getElements()).addAllUnique(elements);
        return cell;
    }

    /** Reads one element; returns null for element kinds the model does not hold (NODE, TEXTNODE). */
    private Element readElement(Cell cell, int kind) throws IOException {
        long start = in.offset();
        String kindName = GdsRecordType.nameOf(kind);
        check(GdsRecordType.ofCode(kind), 0);
        boolean modelled = kind != 0x15 && kind != 0x14;
        if (!modelled) {
            count(kindName + " element");
        }
        int layer = Integer.MIN_VALUE;
        int datatype = 0;
        int pathType = 0;
        int width = 0;
        int bgnExtn = 0;
        int endExtn = 0;
        int[] xy = null;
        String sname = null;
        long snameOffset = -1;
        int columns = 0;
        int rows = 0;
        boolean colrow = false;
        int strans = 0;
        double mag = 1.0;
        double angle = 0.0;
        int presentation = 0;
        String string = null;
        List<Property> properties = null;
        int pendingAttr = Integer.MIN_VALUE;
        while (true) {
            if (!in.next()) {
                throw in.error("file ends inside " + kindName + " element started at byte " + start);
            }
            int type = in.type();
            if (type == 0x11) { // ENDEL
                break;
            }
            if (!modelled) {
                if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05) {
                    throw in.error(GdsRecordType.nameOf(type) + " before ENDEL of the " + kindName
                            + " element started at byte " + start);
                }
                continue;
            }
            switch (type) {
                case 0x0D -> { // LAYER
                    check(GdsRecordType.LAYER, 2);
                    layer = in.int16(0);
                }
                case 0x0E, 0x16, 0x2E -> { // DATATYPE, TEXTTYPE, BOXTYPE
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (t != GdsRecordType.typeRecordOf(kind)) {
                        misplaced(t, kindName);
                    } else {
                        check(t, 2);
                        datatype = in.int16(0);
                    }
                }
                case 0x10 -> { // XY
                    check(GdsRecordType.XY, 0);
                    if (in.length() % 8 != 0) {
                        throw in.error("XY record has " + in.length() + " data bytes, not a multiple of 8 (record length "
                                + (in.length() + 4) + ")");
                    }
                    xy = in.int32Array();
                }
                case 0x21 -> { // PATHTYPE
                    if (kind != 0x09 && kind != 0x0C) {
                        misplaced(GdsRecordType.PATHTYPE, kindName);
                    } else {
                        check(GdsRecordType.PATHTYPE, 2);
                        pathType = in.int16(0);
                        if (PathType.get(pathType) == null) {
                            throw in.error("PATHTYPE " + pathType + " is undefined (0, 1, 2 or 4)");
                        }
                    }
                }
                case 0x0F -> { // WIDTH
                    if (kind != 0x09 && kind != 0x0C) {
                        misplaced(GdsRecordType.WIDTH, kindName);
                    } else {
                        check(GdsRecordType.WIDTH, 4);
                        width = in.int32(0);
                    }
                }
                case 0x30, 0x31 -> { // BGNEXTN, ENDEXTN
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (kind != 0x09) {
                        misplaced(t, kindName);
                    } else {
                        check(t, 4);
                        if (type == 0x30) {
                            bgnExtn = in.int32(0);
                        } else {
                            endExtn = in.int32(0);
                        }
                    }
                }
                case 0x12 -> { // SNAME
                    if (kind != 0x0A && kind != 0x0B) {
                        misplaced(GdsRecordType.SNAME, kindName);
                    } else {
                        check(GdsRecordType.SNAME, 1);
                        sname = in.string();
                        snameOffset = in.offset();
                    }
                }
                case 0x13 -> { // COLROW
                    if (kind != 0x0B) {
                        misplaced(GdsRecordType.COLROW, kindName);
                    } else {
                        check(GdsRecordType.COLROW, 4);
                        columns = in.int16(0);
                        rows = in.int16(1);
                        colrow = true;
                        if (columns < 1 || rows < 1) {
                            throw in.error("AREF with " + columns + " columns and " + rows + " rows (each must be 1 to 32767)");
                        }
                    }
                }
                case 0x1A -> { // STRANS
                    if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                        misplaced(GdsRecordType.STRANS, kindName);
                    } else {
                        check(GdsRecordType.STRANS, 2);
                        strans = in.int16(0) & 0xFFFF;
                    }
                }
                case 0x1B, 0x1C -> { // MAG, ANGLE
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                        misplaced(t, kindName);
                    } else {
                        check(t, 8);
                        double v = in.real8(0);
                        if (type == 0x1B) {
                            if (!(v > 0)) {
                                throw in.error("MAG " + v + " is not positive");
                            }
                            mag = v;
                        } else {
                            angle = v;
                        }
                    }
                }
                case 0x17 -> { // PRESENTATION
                    if (kind != 0x0C) {
                        misplaced(GdsRecordType.PRESENTATION, kindName);
                    } else {
                        check(GdsRecordType.PRESENTATION, 2);
                        presentation = in.int16(0) & 0xFFFF;
                        if (((presentation >> 2) & 3) == 3 || (presentation & 3) == 3) {
                            throw in.error("PRESENTATION justification value 3 is undefined");
                        }
                    }
                }
                case 0x19 -> { // STRING
                    if (kind != 0x0C) {
                        misplaced(GdsRecordType.STRING, kindName);
                    } else {
                        check(GdsRecordType.STRING, 0);
                        string = in.string();
                    }
                }
                case 0x2B -> { // PROPATTR
                    check(GdsRecordType.PROPATTR, 2);
                    pendingAttr = in.int16(0);
                }
                case 0x2C -> { // PROPVALUE
                    check(GdsRecordType.PROPVALUE, 0);
                    if (pendingAttr == Integer.MIN_VALUE) {
                        throw in.error("PROPVALUE without a preceding PROPATTR");
                    }
                    Property p = factory.createProperty();
                    p.setAttribute(pendingAttr);
                    p.setValue(in.string());
                    if (properties == null) {
                        properties = new ArrayList<>(2);
                    }
                    properties.add(p);
                    pendingAttr = Integer.MIN_VALUE;
                }
                default -> {
                    if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05 || type == 0x06) {
                        throw in.error(GdsRecordType.nameOf(type) + " before ENDEL of the " + kindName
                                + " element started at byte " + start);
                    }
                    skipOrFail("inside a " + kindName + " element");
                }
            }
        }
        if (!modelled) {
            return null;
        }
        if (pendingAttr != Integer.MIN_VALUE) {
            throw new GdsFormatException(in.file(), start, kindName + " element has a PROPATTR without PROPVALUE");
        }
        if (xy == null) {
            throw new GdsFormatException(in.file(), start, kindName + " element without XY");
        }
        int points = xy.length / 2;
        Element element;
        switch (kind) {
            case 0x08 -> {
                requireLayer(layer, start, kindName);
                requirePoints(points >= 1, start, kindName, points, "at least 1");
                Boundary b = factory.createBoundary();
                b.setLayer(layer);
                b.setDatatype(datatype);
                b.setPoints(PointList.wrap(xy));
                element = b;
            }
            case 0x09 -> {
                requireLayer(layer, start, kindName);
                requirePoints(points >= 1, start, kindName, points, "at least 1");
                org.apertura.layout.model.Path p = factory.createPath();
                p.setLayer(layer);
                p.setDatatype(datatype);
                p.setPathType(PathType.get(pathType));
                p.setWidth(width);
                p.setBeginExtension(bgnExtn);
                p.setEndExtension(endExtn);
                p.setPoints(PointList.wrap(xy));
                element = p;
            }
            case 0x2D -> {
                requireLayer(layer, start, kindName);
                requirePoints(points == 5, start, kindName, points, "5");
                Box b = factory.createBox();
                b.setLayer(layer);
                b.setBoxType(datatype);
                b.setPoints(PointList.wrap(xy));
                element = b;
            }
            case 0x0C -> {
                requireLayer(layer, start, kindName);
                requirePoints(points == 1, start, kindName, points, "1");
                if (string == null) {
                    throw new GdsFormatException(in.file(), start, "TEXT element without STRING");
                }
                Text t = factory.createText();
                t.setLayer(layer);
                t.setTextType(datatype);
                t.setString(string);
                t.setFont((presentation >> 4) & 3);
                t.setVerticalJustification(VerticalJustification.get((presentation >> 2) & 3));
                t.setHorizontalJustification(HorizontalJustification.get(presentation & 3));
                t.setPathType(PathType.get(pathType));
                t.setWidth(width);
                place(t, xy, strans, mag, angle);
                element = t;
            }
            case 0x0A -> {
                requireName(sname, start, kindName);
                requirePoints(points == 1, start, kindName, points, "1");
                CellReference r = factory.createCellReference();
                place(r, xy, strans, mag, angle);
                pending.add(new PendingReference(r, sname, snameOffset, cell));
                element = r;
            }
            case 0x0B -> {
                requireName(sname, start, kindName);
                if (!colrow) {
                    throw new GdsFormatException(in.file(), start, "AREF element without COLROW");
                }
                requirePoints(points == 3, start, kindName, points, "3");
                ArrayReference a = factory.createArrayReference();
                place(a, xy, strans, mag, angle);
                a.setColumns(columns);
                a.setRows(rows);
                a.setColumnPitchX(pitch((long) xy[2] - xy[0], columns));
                a.setColumnPitchY(pitch((long) xy[3] - xy[1], columns));
                a.setRowPitchX(pitch((long) xy[4] - xy[0], rows));
                a.setRowPitchY(pitch((long) xy[5] - xy[1], rows));
                pending.add(new PendingReference(a, sname, snameOffset, cell));
                element = a;
            }
            default -> throw new IllegalStateException("element kind " + kindName);
        }
        if (properties != null) {
            ((InternalEList<Property>) element.getProperties()).addAllUnique(properties);
        }
        return element;
    }

    private int pitch(long span, int count) {
        if (GdsReadChecks.isPitchRounded(span, count)) {
            roundedPitches++;
        }
        return GdsReadChecks.pitch(span, count);
    }

    private static void place(Placement p, int[] xy, int strans, double mag, double angle) {
        p.setX(xy[0]);
        p.setY(xy[1]);
        p.setReflected((strans & 0x8000) != 0);
        p.setAbsoluteMagnification((strans & 0x0004) != 0);
        p.setAbsoluteAngle((strans & 0x0002) != 0);
        p.setMagnification(mag);
        p.setAngle(angle);
    }

    private void requireLayer(int layer, long start, String kind) throws GdsFormatException {
        GdsReadChecks.requireLayer(in.file(), layer, start, kind);
    }

    private void requireName(String sname, long start, String kind) throws GdsFormatException {
        GdsReadChecks.requireName(in.file(), sname != null, start, kind);
    }

    private void requirePoints(boolean ok, long start, String kind, int points, String expected)
            throws GdsFormatException {
        GdsReadChecks.requirePoints(in.file(), ok, start, kind, points, expected);
    }

    /** Cells no reference points to, from the references collected while reading (no second pass). */
    private List<Cell> topCells(List<Cell> cells) {
        Set<Cell> referenced = Collections.newSetFromMap(new IdentityHashMap<>());
        for (PendingReference p : pending) {
            referenced.add(p.reference.getCell());
        }
        List<Cell> tops = new ArrayList<>();
        for (Cell c : cells) {
            if (!referenced.contains(c)) {
                tops.add(c);
            }
        }
        return tops;
    }

    /**
     * A cycle among the references collected while reading, as cell list A, B, ..., A, or empty.
     * Iterative depth-first search over the distinct child cells of each cell.
     */
    private List<Cell> findCycle(List<Cell> cells) {
        if (pending.isEmpty()) {
            return List.of();
        }
        Map<Cell, List<Cell>> children = new IdentityHashMap<>();
        for (PendingReference p : pending) {
            List<Cell> list = children.computeIfAbsent(p.owner, k -> new ArrayList<>());
            Cell child = p.reference.getCell();
            if (list.isEmpty() || list.get(list.size() - 1) != child) {
                list.add(child);
            }
        }
        Map<Cell, Boolean> state = new IdentityHashMap<>(); // TRUE on the stack, FALSE finished
        for (Cell root : cells) {
            if (state.containsKey(root) || !children.containsKey(root)) {
                continue;
            }
            ArrayDeque<Cell> stack = new ArrayDeque<>();
            ArrayDeque<Integer> next = new ArrayDeque<>();
            stack.push(root);
            next.push(0);
            state.put(root, Boolean.TRUE);
            while (!stack.isEmpty()) {
                Cell top = stack.peek();
                List<Cell> kids = children.getOrDefault(top, List.of());
                int i = next.pop();
                if (i < kids.size()) {
                    next.push(i + 1);
                    Cell child = kids.get(i);
                    Boolean s = state.get(child);
                    if (s == null) {
                        state.put(child, Boolean.TRUE);
                        stack.push(child);
                        next.push(0);
                    } else if (s) {
                        List<Cell> cycle = new ArrayList<>();
                        cycle.add(child);
                        for (Cell c : stack) {
                            cycle.add(c);
                            if (c == child) {
                                break;
                            }
                        }
                        Collections.reverse(cycle);
                        return cycle;
                    }
                } else {
                    state.put(top, Boolean.FALSE);
                    stack.pop();
                }
            }
        }
        return List.of();
    }

    private void resolveReferences() throws GdsFormatException {
        for (PendingReference p : pending) {
            Cell target = cellsByName.get(p.name);
            if (target == null) {
                throw new GdsFormatException(in.file(), p.offset,
                        "cell '" + p.owner.getName() + "' references missing cell '" + p.name + "'");
            }
            p.reference.setCell(target);
        }
    }

    /** Checks the data type and minimum payload of the current record. */
    private void check(GdsRecordType type, int minBytes) throws GdsFormatException {
        if (in.dataType() != type.dataType().code()) {
            throw in.error(type + " record has data type " + in.dataType() + ", expected " + type.dataType().code()
                    + " (" + type.dataType() + ")");
        }
        if (in.length() < minBytes) {
            throw in.error(type + " record has " + in.length() + " data bytes, expected at least " + minBytes);
        }
    }

    /** Skips a record the model does not hold; fails for a modelled record in the wrong place. */
    private void skipOrFail(String where) throws GdsFormatException {
        GdsRecordType t = GdsRecordType.ofCode(in.type());
        if (t != null && t.isModelled()) {
            throw in.error(t + " record " + where);
        }
        count(GdsRecordType.nameOf(in.type()));
    }

    private void misplaced(GdsRecordType t, String kindName) {
        count(t + " in " + kindName);
    }

    private void count(String what) {
        skipped.merge(what, 1, Integer::sum);
    }

    /** Six 16-bit date fields from word index i, or null when all are zero. */
    private String time(int i) {
        int y = in.int16(i), mo = in.int16(i + 1), d = in.int16(i + 2);
        int h = in.int16(i + 3), mi = in.int16(i + 4), s = in.int16(i + 5);
        if ((y | mo | d | h | mi | s) == 0) {
            return null;
        }
        return GdsTimes.format(y, mo, d, h, mi, s);
    }

    private static String describe(Cell cell) {
        return cell.getName() == null ? "(unnamed)" : "'" + cell.getName() + "'";
    }

    private record PendingReference(CellReference reference, String name, long offset, Cell owner) {
    }
}
