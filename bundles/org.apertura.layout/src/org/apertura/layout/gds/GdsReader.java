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
    private final ElementRecords records = new ElementRecords();

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
                Element e = readElement(cell);
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

    /** An element's records through {@link #in}; XY, SNAME, STRING and properties kept for the model. */
    private final class ElementRecords extends GdsElementRecords {
        int[] xy;
        String sname;
        String string;
        List<Property> properties;

        @Override
        protected boolean next() throws IOException {
            return in.next();
        }

        @Override
        protected int recordType() {
            return in.type();
        }

        @Override
        protected int recordDataType() {
            return in.dataType();
        }

        @Override
        protected int payloadLength() {
            return in.length();
        }

        @Override
        protected long recordOffset() {
            return in.offset();
        }

        @Override
        protected int int16(int index) {
            return in.int16(index);
        }

        @Override
        protected int int32(int index) {
            return in.int32(index);
        }

        @Override
        protected double real8(int index) {
            return in.real8(index);
        }

        @Override
        protected String file() {
            return in.file();
        }

        @Override
        protected void count(String what) {
            GdsReader.this.count(what);
        }

        @Override
        protected void xy(int values) {
            xy = in.int32Array();
        }

        @Override
        protected void sname() {
            sname = in.string();
        }

        @Override
        protected void string() {
            string = in.string();
        }

        @Override
        protected void propertyValue(int attributeNumber) {
            Property p = factory.createProperty();
            p.setAttribute(attributeNumber);
            p.setValue(in.string());
            if (properties == null) {
                properties = new ArrayList<>(2);
            }
            properties.add(p);
        }
    }

    /** Reads the element at the current record; returns null for kinds the model does not hold (NODE, TEXTNODE). */
    private Element readElement(Cell cell) throws IOException {
        ElementRecords r = records;
        r.xy = null;
        r.sname = null;
        r.string = null;
        r.properties = null;
        if (!r.read()) {
            return null;
        }
        int[] xy = r.xy;
        Element element;
        switch (r.kind()) {
            case 0x08 -> {
                Boundary b = factory.createBoundary();
                b.setLayer(r.layer());
                b.setDatatype(r.datatype());
                b.setPoints(PointList.wrap(xy));
                element = b;
            }
            case 0x09 -> {
                org.apertura.layout.model.Path p = factory.createPath();
                p.setLayer(r.layer());
                p.setDatatype(r.datatype());
                p.setPathType(PathType.get(r.pathType()));
                p.setWidth(r.width());
                p.setBeginExtension(r.beginExtension());
                p.setEndExtension(r.endExtension());
                p.setPoints(PointList.wrap(xy));
                element = p;
            }
            case 0x2D -> {
                Box b = factory.createBox();
                b.setLayer(r.layer());
                b.setBoxType(r.datatype());
                b.setPoints(PointList.wrap(xy));
                element = b;
            }
            case 0x0C -> {
                Text t = factory.createText();
                t.setLayer(r.layer());
                t.setTextType(r.datatype());
                t.setString(r.string);
                t.setFont((r.presentation() >> 4) & 3);
                t.setVerticalJustification(VerticalJustification.get((r.presentation() >> 2) & 3));
                t.setHorizontalJustification(HorizontalJustification.get(r.presentation() & 3));
                t.setPathType(PathType.get(r.pathType()));
                t.setWidth(r.width());
                place(t, xy, r.strans(), r.magnification(), r.angle());
                element = t;
            }
            case 0x0A -> {
                CellReference ref = factory.createCellReference();
                place(ref, xy, r.strans(), r.magnification(), r.angle());
                pending.add(new PendingReference(ref, r.sname, r.snameOffset(), cell));
                element = ref;
            }
            case 0x0B -> {
                ArrayReference a = factory.createArrayReference();
                place(a, xy, r.strans(), r.magnification(), r.angle());
                a.setColumns(r.columns());
                a.setRows(r.rows());
                a.setColumnPitchX(pitch((long) xy[2] - xy[0], r.columns()));
                a.setColumnPitchY(pitch((long) xy[3] - xy[1], r.columns()));
                a.setRowPitchX(pitch((long) xy[4] - xy[0], r.rows()));
                a.setRowPitchY(pitch((long) xy[5] - xy[1], r.rows()));
                pending.add(new PendingReference(a, r.sname, r.snameOffset(), cell));
                element = a;
            }
            default -> throw new IllegalStateException("element kind " + r.kind());
        }
        if (r.properties != null) {
            ((InternalEList<Property>) element.getProperties()).addAllUnique(r.properties);
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
        records.check(type, minBytes);
    }

    private void skipOrFail(String where) throws GdsFormatException {
        records.skipOrFail(where);
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
