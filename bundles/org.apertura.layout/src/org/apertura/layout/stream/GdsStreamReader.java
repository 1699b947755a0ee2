/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.apertura.layout.gds.GdsFormatException;
import org.apertura.layout.gds.GdsReader;
import org.apertura.layout.gds.GdsRecordType;
import org.apertura.layout.gds.Real8;

/**
 * Reads a GDSII stream (Calma, "GDS II Stream Format Manual", Release 6.0, February 1987) straight
 * from a byte buffer into a {@link StreamLayout}, without building the EMF model: no object per
 * record or element, coordinates copied from the buffer into one growing {@code int} array per cell.
 * Files are memory-mapped in windows of up to 1 GiB, so any size works.
 * <p>
 * It accepts and rejects exactly what {@link GdsReader} accepts and rejects: every
 * {@link GdsFormatException} has the same file name, byte offset and problem text, and the skipped
 * record counts and warnings are the same. Text elements, properties and dates are checked as
 * GdsReader checks them but not kept. Memory is about 4 bytes per coordinate plus 8 bytes per
 * shape (24 for paths) and 56 per reference, in chunks of up to 16 MB shared by consecutive cells.
 */
public final class GdsStreamReader {

    /** Default size of the mapped window: 1 GiB. */
    public static final long DEFAULT_WINDOW = 1L << 30;
    /** Smallest window: the largest record (65,535 bytes) must fit. */
    public static final long MIN_WINDOW = 1L << 16;
    private static final int NO_LAYER = Integer.MIN_VALUE;

    private final String file;
    private final FileChannel channel;
    private final long fileSize;
    private final long window;
    private ByteBuffer buf;
    private long base;
    private int limit;

    private long recordOffset = -1;
    private int recordType;
    private int dataType;
    private int payloadStart;
    private int payloadLength;

    private final NameTable names = new NameTable();
    private final Map<String, Integer> skipped = new TreeMap<>();
    private final List<String> warnings = new ArrayList<>();
    private int roundedPitches;

    // shape data of all cells, in chunks shared by consecutive cells: large chunks go straight to
    // the old generation, so collections do not copy them (per-cell arrays would be copied)
    // (16 MB less the array header, so that a chunk fills whole heap regions of G1)
    private static final int CHUNK = (1 << 22) - 16;
    private int[] data;
    private int dataLength;
    private int cellStart;
    private int shapeCount;
    private int textCount;
    private int[] refs = new int[StreamCell.REF_STRIDE * 64];
    private double[] refTransforms = new double[2 * 64];
    private int refCount;
    private int[] scratchXy = new int[16];

    private GdsStreamReader(String file, FileChannel channel, ByteBuffer buffer, long fileSize, long window) {
        this.file = file;
        this.channel = channel;
        this.fileSize = fileSize;
        this.window = window;
        this.buf = buffer;
        this.limit = buffer == null ? 0 : buffer.capacity();
        this.data = new int[firstChunk()];
    }

    /** A first chunk for the whole file when small: shapes take about as many bytes as in the file. */
    private int firstChunk() {
        return (int) Math.min(CHUNK, fileSize / 4 + 64);
    }

    /** Reads a file through a read-only memory mapping; the path as given appears in error messages. */
    public static StreamLayout read(Path path) throws IOException {
        return read(path, DEFAULT_WINDOW);
    }

    /**
     * Reads a file mapping at most {@code windowBytes} of it at a time (a record crossing the end of
     * a window is read from a new window starting at that record).
     *
     * @throws IllegalArgumentException if the window is below {@link #MIN_WINDOW} or above 2^31 - 1
     */
    public static StreamLayout read(Path path, long windowBytes) throws IOException {
        if (windowBytes < MIN_WINDOW || windowBytes > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("window of " + windowBytes + " bytes; must be " + MIN_WINDOW + " to "
                    + Integer.MAX_VALUE);
        }
        try (FileChannel ch = FileChannel.open(path, StandardOpenOption.READ)) {
            long size = ch.size();
            GdsStreamReader r = new GdsStreamReader(path.toString(), ch, null, size, windowBytes);
            r.map(0);
            return r.readLibrary();
        }
    }

    /**
     * Reads the bytes from the buffer's position to its limit (the buffer's position is not moved).
     *
     * @param fileName the name used in error messages
     */
    public static StreamLayout read(ByteBuffer buffer, String fileName) throws IOException {
        ByteBuffer b = buffer.slice().order(ByteOrder.BIG_ENDIAN);
        return new GdsStreamReader(fileName, null, b, b.capacity(), b.capacity()).readLibrary();
    }

    /** Reads a byte array; {@code fileName} is used in error messages. */
    public static StreamLayout read(byte[] bytes, String fileName) throws IOException {
        return read(ByteBuffer.wrap(bytes), fileName);
    }

    private void map(long at) throws IOException {
        long length = Math.min(window, fileSize - at);
        buf = channel.map(FileChannel.MapMode.READ_ONLY, at, length).order(ByteOrder.BIG_ENDIAN);
        base = at;
        limit = (int) length;
    }

    // ---- records, with exactly the checks and messages of GdsRecordInput ----

    private boolean next() throws IOException {
        int pos = payloadStart + payloadLength;
        long at = base + pos;
        long remaining = fileSize - at;
        if (remaining < 4) {
            if (remaining == 0) {
                recordOffset = at;
                payloadStart = pos;
                payloadLength = 0;
                return false;
            }
            throw new GdsFormatException(file, at, "file ends inside a record header (" + remaining + " of 4 bytes present)");
        }
        if (pos + 4 > limit) {
            map(at);
            pos = 0;
        }
        recordOffset = at;
        ByteBuffer b = buf;
        int length = b.getShort(pos) & 0xFFFF;
        recordType = b.get(pos + 2) & 0xFF;
        dataType = b.get(pos + 3) & 0xFF;
        if (length < 4) {
            throw error("record length " + length + " is below the 4-byte header (record type "
                    + GdsRecordType.nameOf(recordType) + ")");
        }
        if ((length & 1) != 0) {
            throw error("record length " + length + " is odd (record type " + GdsRecordType.nameOf(recordType) + ")");
        }
        if (length > remaining) {
            throw error("file ends inside " + GdsRecordType.nameOf(recordType) + " record: length " + length
                    + ", only " + remaining + " bytes left");
        }
        if (pos + length > limit) {
            map(at);
            pos = 0;
        }
        payloadStart = pos + 4;
        payloadLength = length - 4;
        return true;
    }

    private int int16(int index) {
        return buf.getShort(payloadStart + 2 * index);
    }

    private int int32(int index) {
        return buf.getInt(payloadStart + 4 * index);
    }

    private double real8(int index) {
        return Real8.decode(buf.getLong(payloadStart + 8 * index));
    }

    /** Payload length without trailing NUL padding (the string's length in ISO-8859-1). */
    private int stringLength() {
        int end = payloadStart + payloadLength;
        while (end > payloadStart && buf.get(end - 1) == 0) {
            end--;
        }
        return end - payloadStart;
    }

    private String string() {
        int n = stringLength();
        byte[] bytes = new byte[n];
        buf.get(payloadStart, bytes);
        return new String(bytes, StandardCharsets.ISO_8859_1);
    }

    private long drainCountingNonZero() throws IOException {
        long nonZero = 0;
        long at = base + payloadStart + payloadLength;
        while (at < fileSize) {
            int pos = (int) (at - base);
            if (pos >= limit) {
                map(at);
                pos = 0;
            }
            for (int i = pos; i < limit; i++) {
                if (buf.get(i) != 0) {
                    nonZero++;
                }
            }
            at = base + limit;
        }
        return nonZero;
    }

    private GdsFormatException error(String problem) {
        return new GdsFormatException(file, recordOffset, problem);
    }

    // ---- library and structures, following GdsReader step by step ----

    private StreamLayout readLibrary() throws IOException {
        if (!next()) {
            throw error("empty file: no HEADER record");
        }
        if (recordType != GdsRecordType.HEADER.code()) {
            throw error("file does not start with a HEADER record (found " + GdsRecordType.nameOf(recordType) + ")");
        }
        check(GdsRecordType.HEADER, 2);
        boolean begun = false;
        boolean units = false;
        String libName = null;
        double user = 0;
        double metres = 0;
        List<StreamCell> cells = new ArrayList<>();
        List<Integer> cellIds = new ArrayList<>();
        while (true) {
            if (!next()) {
                throw error("file ends before ENDLIB");
            }
            int type = recordType;
            if (type == 0x01) { // BGNLIB
                check(GdsRecordType.BGNLIB, 24);
                begun = true;
            } else if (type == 0x02) { // LIBNAME
                check(GdsRecordType.LIBNAME, 0);
                String n = string();
                libName = n.isEmpty() ? null : n;
            } else if (type == 0x03) { // UNITS
                check(GdsRecordType.UNITS, 16);
                double u = real8(0);
                double m = real8(1);
                if (!(u > 0) || !(m > 0)) {
                    throw error("UNITS must be positive, found " + u + " user units and " + m + " m per database unit");
                }
                user = u;
                metres = m;
                units = true;
            } else if (type == 0x05) { // BGNSTR
                if (!begun || !units) {
                    throw error("BGNSTR before " + (begun ? "UNITS" : "BGNLIB"));
                }
                readStructure(cells, cellIds);
            } else if (type == 0x04) { // ENDLIB
                break;
            } else {
                skipOrFail("outside a structure");
            }
        }
        long trailing = drainCountingNonZero();
        if (trailing > 0) {
            warnings.add(trailing + " non-zero bytes after ENDLIB ignored");
        }
        List<StreamCell> resolved = resolveReferences(cells, cellIds);
        List<StreamCell> cycle = findCycle(resolved);
        if (!cycle.isEmpty()) {
            StringBuilder path = new StringBuilder();
            for (StreamCell c : cycle) {
                if (path.length() > 0) {
                    path.append('/');
                }
                path.append(c.name());
            }
            throw new GdsFormatException(file, cycle.get(0).offset(), "cyclic cell references: " + path);
        }
        if (!skipped.isEmpty()) {
            int total = skipped.values().stream().mapToInt(Integer::intValue).sum();
            warnings.add(0, total + " records skipped: " + skipped);
        }
        if (roundedPitches > 0) {
            warnings.add(roundedPitches + " array references whose span is not a multiple of the count: pitch rounded");
        }
        boolean[] referenced = new boolean[resolved.size()];
        for (StreamCell c : resolved) {
            int[] r = c.referenceData();
            for (int i = 0; i < r.length; i += StreamCell.REF_STRIDE) {
                referenced[r[i]] = true;
            }
        }
        List<StreamCell> tops = new ArrayList<>();
        for (int i = 0; i < resolved.size(); i++) {
            if (!referenced[i]) {
                tops.add(resolved.get(i));
            }
        }
        return new StreamLayout(libName, user, metres, resolved, tops, skipped, warnings);
    }

    private void readStructure(List<StreamCell> cells, List<Integer> cellIds) throws IOException {
        long start = recordOffset;
        check(GdsRecordType.BGNSTR, 24);
        cellStart = dataLength;
        shapeCount = 0;
        textCount = 0;
        refCount = 0;
        int id = -1;
        while (true) {
            if (!next()) {
                throw error("file ends inside structure " + (id < 0 ? "(unnamed)" : "'" + names.name(id) + "'"));
            }
            int type = recordType;
            if (type == 0x06) { // STRNAME
                check(GdsRecordType.STRNAME, 1);
                int n = stringLength();
                if (n == 0) {
                    throw error("empty STRNAME");
                }
                if (id >= 0) {
                    throw error("second STRNAME '" + string() + "' in structure '" + names.name(id) + "'");
                }
                int found = names.find(buf, payloadStart, n);
                if (found >= 0 && names.defined(found)) {
                    throw error("structure '" + names.name(found) + "' defined twice (first at byte "
                            + names.definedAt(found) + ")");
                }
                id = found >= 0 ? found : names.add(buf, payloadStart, n);
                names.define(id, start);
            } else if (type == 0x07) { // ENDSTR
                break;
            } else if (GdsRecordType.isElementStart(type)) {
                if (id < 0) {
                    throw error(GdsRecordType.nameOf(type) + " element in a structure without STRNAME");
                }
                if (!(type == 0x08 ? plainBoundary() : type == 0x09 && plainPath())) {
                    readElement(id, type);
                }
            } else {
                skipOrFail("outside an element in structure " + (id < 0 ? "(unnamed)" : "'" + names.name(id) + "'"));
            }
        }
        if (id < 0) {
            throw new GdsFormatException(file, start, "structure without STRNAME");
        }
        cells.add(new StreamCell(names.name(id), start, data, cellStart, dataLength, shapeCount,
                Arrays.copyOf(refs, refCount * StreamCell.REF_STRIDE), Arrays.copyOf(refTransforms, refCount * 2),
                textCount));
        cellIds.add(id);
    }

    /**
     * Reads one element. Boundary, box and path coordinates go straight into {@link #data} after a
     * reserved header, committed only at ENDEL; reference and text points go to a scratch array.
     */
    private void readElement(int owner, int kind) throws IOException {
        long start = recordOffset;
        check(GdsRecordType.ofCode(kind), 0);
        boolean modelled = kind != 0x15 && kind != 0x14;
        if (!modelled) {
            count(GdsRecordType.nameOf(kind) + " element");
        }
        boolean shape = kind == 0x08 || kind == 0x09 || kind == 0x2D;
        int header = kind == 0x09 ? 6 : 2;
        int layer = NO_LAYER;
        int datatype = 0;
        int pathType = 0;
        int width = 0;
        int bgnExtn = 0;
        int endExtn = 0;
        int xyValues = -1;
        int snameId = -1;
        long snameOffset = -1;
        int columns = 0;
        int rows = 0;
        boolean colrow = false;
        int strans = 0;
        double mag = 1.0;
        double angle = 0.0;
        boolean string = false;
        boolean pendingAttr = false;
        while (true) {
            if (!next()) {
                throw error("file ends inside " + GdsRecordType.nameOf(kind) + " element started at byte " + start);
            }
            int type = recordType;
            if (type == 0x11) { // ENDEL
                break;
            }
            if (!modelled) {
                if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05) {
                    throw error(GdsRecordType.nameOf(type) + " before ENDEL of the " + GdsRecordType.nameOf(kind)
                            + " element started at byte " + start);
                }
                continue;
            }
            switch (type) {
                case 0x0D -> { // LAYER
                    check(GdsRecordType.LAYER, 2);
                    layer = int16(0);
                }
                case 0x0E, 0x16, 0x2E -> { // DATATYPE, TEXTTYPE, BOXTYPE
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (t != GdsRecordType.typeRecordOf(kind)) {
                        misplaced(t, kind);
                    } else {
                        check(t, 2);
                        datatype = int16(0);
                    }
                }
                case 0x10 -> { // XY
                    check(GdsRecordType.XY, 0);
                    int len = payloadLength;
                    if (len % 8 != 0) {
                        throw error("XY record has " + len + " data bytes, not a multiple of 8 (record length "
                                + (len + 4) + ")");
                    }
                    xyValues = len >> 2;
                    copyXy(shape, header, xyValues);
                }
                case 0x21 -> { // PATHTYPE
                    if (kind != 0x09 && kind != 0x0C) {
                        misplaced(GdsRecordType.PATHTYPE, kind);
                    } else {
                        check(GdsRecordType.PATHTYPE, 2);
                        pathType = int16(0);
                        if (pathType != 0 && pathType != 1 && pathType != 2 && pathType != 4) {
                            throw error("PATHTYPE " + pathType + " is undefined (0, 1, 2 or 4)");
                        }
                    }
                }
                case 0x0F -> { // WIDTH
                    if (kind != 0x09 && kind != 0x0C) {
                        misplaced(GdsRecordType.WIDTH, kind);
                    } else {
                        check(GdsRecordType.WIDTH, 4);
                        width = int32(0);
                    }
                }
                case 0x30, 0x31 -> { // BGNEXTN, ENDEXTN
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (kind != 0x09) {
                        misplaced(t, kind);
                    } else {
                        check(t, 4);
                        if (type == 0x30) {
                            bgnExtn = int32(0);
                        } else {
                            endExtn = int32(0);
                        }
                    }
                }
                case 0x12 -> { // SNAME
                    if (kind != 0x0A && kind != 0x0B) {
                        misplaced(GdsRecordType.SNAME, kind);
                    } else {
                        check(GdsRecordType.SNAME, 1);
                        int n = stringLength();
                        int found = names.find(buf, payloadStart, n);
                        snameId = found >= 0 ? found : names.add(buf, payloadStart, n);
                        snameOffset = recordOffset;
                    }
                }
                case 0x13 -> { // COLROW
                    if (kind != 0x0B) {
                        misplaced(GdsRecordType.COLROW, kind);
                    } else {
                        check(GdsRecordType.COLROW, 4);
                        columns = int16(0);
                        rows = int16(1);
                        colrow = true;
                        if (columns < 1 || rows < 1) {
                            throw error("AREF with " + columns + " columns and " + rows + " rows (each must be 1 to 32767)");
                        }
                    }
                }
                case 0x1A -> { // STRANS
                    if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                        misplaced(GdsRecordType.STRANS, kind);
                    } else {
                        check(GdsRecordType.STRANS, 2);
                        strans = int16(0) & 0xFFFF;
                    }
                }
                case 0x1B, 0x1C -> { // MAG, ANGLE
                    GdsRecordType t = GdsRecordType.ofCode(type);
                    if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                        misplaced(t, kind);
                    } else {
                        check(t, 8);
                        double v = real8(0);
                        if (type == 0x1B) {
                            if (!(v > 0)) {
                                throw error("MAG " + v + " is not positive");
                            }
                            mag = v;
                        } else {
                            angle = v;
                        }
                    }
                }
                case 0x17 -> { // PRESENTATION
                    if (kind != 0x0C) {
                        misplaced(GdsRecordType.PRESENTATION, kind);
                    } else {
                        check(GdsRecordType.PRESENTATION, 2);
                        int presentation = int16(0) & 0xFFFF;
                        if (((presentation >> 2) & 3) == 3 || (presentation & 3) == 3) {
                            throw error("PRESENTATION justification value 3 is undefined");
                        }
                    }
                }
                case 0x19 -> { // STRING
                    if (kind != 0x0C) {
                        misplaced(GdsRecordType.STRING, kind);
                    } else {
                        check(GdsRecordType.STRING, 0);
                        string = true;
                    }
                }
                case 0x2B -> { // PROPATTR
                    check(GdsRecordType.PROPATTR, 2);
                    pendingAttr = true;
                }
                case 0x2C -> { // PROPVALUE
                    check(GdsRecordType.PROPVALUE, 0);
                    if (!pendingAttr) {
                        throw error("PROPVALUE without a preceding PROPATTR");
                    }
                    pendingAttr = false;
                }
                default -> {
                    if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05 || type == 0x06) {
                        throw error(GdsRecordType.nameOf(type) + " before ENDEL of the " + GdsRecordType.nameOf(kind)
                                + " element started at byte " + start);
                    }
                    skipOrFail("inside a " + GdsRecordType.nameOf(kind) + " element");
                }
            }
        }
        if (!modelled) {
            return;
        }
        String kindName = GdsRecordType.nameOf(kind);
        if (pendingAttr) {
            throw new GdsFormatException(file, start, kindName + " element has a PROPATTR without PROPVALUE");
        }
        if (xyValues < 0) {
            throw new GdsFormatException(file, start, kindName + " element without XY");
        }
        int points = xyValues / 2;
        switch (kind) {
            case 0x08, 0x09, 0x2D -> {
                requireLayer(layer, start, kindName);
                if (kind == 0x2D) {
                    requirePoints(points == 5, start, kindName, points, "5");
                } else {
                    requirePoints(points >= 1, start, kindName, points, "at least 1");
                }
                int at = dataLength;
                int k = kind == 0x08 ? StreamCell.BOUNDARY : kind == 0x2D ? StreamCell.BOX : StreamCell.PATH;
                data[at] = k << 28 | points;
                data[at + 1] = layer << 16 | (datatype & 0xFFFF);
                if (k == StreamCell.PATH) {
                    data[at + 2] = pathType;
                    data[at + 3] = width;
                    data[at + 4] = bgnExtn;
                    data[at + 5] = endExtn;
                }
                dataLength = at + header + xyValues;
                shapeCount++;
            }
            case 0x0C -> {
                requireLayer(layer, start, kindName);
                requirePoints(points == 1, start, kindName, points, "1");
                if (!string) {
                    throw new GdsFormatException(file, start, "TEXT element without STRING");
                }
                textCount++;
            }
            case 0x0A, 0x0B -> {
                if (snameId < 0) {
                    throw new GdsFormatException(file, start, kindName + " element without SNAME");
                }
                int[] xy = scratchXy;
                int columnPitchX = 0;
                int columnPitchY = 0;
                int rowPitchX = 0;
                int rowPitchY = 0;
                if (kind == 0x0A) {
                    requirePoints(points == 1, start, kindName, points, "1");
                    columns = 1;
                    rows = 1;
                } else {
                    if (!colrow) {
                        throw new GdsFormatException(file, start, "AREF element without COLROW");
                    }
                    requirePoints(points == 3, start, kindName, points, "3");
                    columnPitchX = pitch((long) xy[2] - xy[0], columns);
                    columnPitchY = pitch((long) xy[3] - xy[1], columns);
                    rowPitchX = pitch((long) xy[4] - xy[0], rows);
                    rowPitchY = pitch((long) xy[5] - xy[1], rows);
                }
                if ((refCount + 1) * StreamCell.REF_STRIDE > refs.length) {
                    refs = Arrays.copyOf(refs, refs.length * 2);
                    refTransforms = Arrays.copyOf(refTransforms, refTransforms.length * 2);
                }
                int r = refCount * StreamCell.REF_STRIDE;
                refs[r] = snameId; // a name id until resolved
                refs[r + 1] = xy[0];
                refs[r + 2] = xy[1];
                refs[r + 3] = ((strans & 0x8000) != 0 ? StreamCell.REFLECTED : 0)
                        | ((strans & 0x0004) != 0 ? StreamCell.ABSOLUTE_MAG : 0)
                        | ((strans & 0x0002) != 0 ? StreamCell.ABSOLUTE_ANGLE : 0)
                        | (kind == 0x0B ? StreamCell.ARRAY : 0);
                refs[r + 4] = columns;
                refs[r + 5] = rows;
                refs[r + 6] = columnPitchX;
                refs[r + 7] = columnPitchY;
                refs[r + 8] = rowPitchX;
                refs[r + 9] = rowPitchY;
                refTransforms[2 * refCount] = mag;
                refTransforms[2 * refCount + 1] = angle;
                refCount++;
                names.referenced(snameId, snameOffset, owner);
            }
            default -> throw new IllegalStateException("element kind " + kindName);
        }
    }

    /**
     * The common case, taken only when it cannot fail: a BOUNDARY record without payload followed in
     * this window by exactly LAYER, DATATYPE, XY (at least one point) and ENDEL with their prescribed
     * data types and lengths. Then the element is stored and the reader stands on its ENDEL, as
     * {@link #readElement} would leave it; otherwise nothing changes and false is returned.
     */
    private boolean plainBoundary() {
        ByteBuffer b = buf;
        int p = payloadStart;
        if (payloadLength != 0 || p + 16 > limit || dataType != 0) {
            return false;
        }
        if (b.getInt(p) != 0x0006_0D02 || b.getInt(p + 6) != 0x0006_0E02) {
            return false;
        }
        int xyHeader = b.getInt(p + 12);
        int xyLength = xyHeader >>> 16;
        if ((xyHeader & 0xFFFF) != 0x1003 || xyLength < 12 || ((xyLength - 4) & 7) != 0) {
            return false;
        }
        int endel = p + 12 + xyLength;
        if (endel + 4 > limit || b.getInt(endel) != 0x0004_1100) {
            return false;
        }
        int layer = b.getShort(p + 4);
        int datatype = b.getShort(p + 10);
        int values = (xyLength - 4) >> 2;
        payloadStart = p + 16;
        payloadLength = xyLength - 4;
        copyXy(true, 2, values);
        int at = dataLength;
        data[at] = StreamCell.BOUNDARY << 28 | values >> 1;
        data[at + 1] = layer << 16 | (datatype & 0xFFFF);
        dataLength = at + 2 + values;
        shapeCount++;
        recordOffset = base + endel;
        recordType = 0x11;
        dataType = 0;
        payloadStart = endel + 4;
        payloadLength = 0;
        return true;
    }

    /**
     * Like {@link #plainBoundary()} for a PATH: LAYER, DATATYPE, optional PATHTYPE (0, 1, 2 or 4),
     * optional WIDTH, XY (at least one point), ENDEL.
     */
    private boolean plainPath() {
        ByteBuffer b = buf;
        int p = payloadStart;
        if (payloadLength != 0 || p + 16 > limit || dataType != 0) {
            return false;
        }
        if (b.getInt(p) != 0x0006_0D02 || b.getInt(p + 6) != 0x0006_0E02) {
            return false;
        }
        int q = p + 12;
        int pathType = 0;
        int width = 0;
        if (q + 6 <= limit && b.getInt(q) == 0x0006_2102) {
            pathType = b.getShort(q + 4);
            if (pathType != 0 && pathType != 1 && pathType != 2 && pathType != 4) {
                return false;
            }
            q += 6;
        }
        if (q + 8 <= limit && b.getInt(q) == 0x0008_0F03) {
            width = b.getInt(q + 4);
            q += 8;
        }
        if (q + 4 > limit) {
            return false;
        }
        int xyHeader = b.getInt(q);
        int xyLength = xyHeader >>> 16;
        if ((xyHeader & 0xFFFF) != 0x1003 || xyLength < 12 || ((xyLength - 4) & 7) != 0) {
            return false;
        }
        int endel = q + xyLength;
        if (endel + 4 > limit || b.getInt(endel) != 0x0004_1100) {
            return false;
        }
        int layer = b.getShort(p + 4);
        int datatype = b.getShort(p + 10);
        int values = (xyLength - 4) >> 2;
        payloadStart = q + 4;
        payloadLength = xyLength - 4;
        copyXy(true, 6, values);
        int at = dataLength;
        data[at] = StreamCell.PATH << 28 | values >> 1;
        data[at + 1] = layer << 16 | (datatype & 0xFFFF);
        data[at + 2] = pathType;
        data[at + 3] = width;
        data[at + 4] = 0;
        data[at + 5] = 0;
        dataLength = at + 6 + values;
        shapeCount++;
        recordOffset = base + endel;
        recordType = 0x11;
        dataType = 0;
        payloadStart = endel + 4;
        payloadLength = 0;
        return true;
    }

    /** Copies the XY payload: for shapes into {@link #data} after the header, else to the scratch array. */
    private void copyXy(boolean shape, int header, int values) {
        int[] target;
        int at;
        if (shape) {
            int need = dataLength + header + values;
            if (need > data.length) {
                int cellSoFar = dataLength - cellStart;
                int size = Math.max(firstChunk(), 2 * (cellSoFar + header + values));
                int[] chunk = new int[size];
                System.arraycopy(data, cellStart, chunk, 0, cellSoFar);
                data = chunk;
                cellStart = 0;
                dataLength = cellSoFar;
            }
            target = data;
            at = dataLength + header;
        } else {
            if (values > scratchXy.length) {
                scratchXy = new int[Math.max(values, 2 * scratchXy.length)];
            }
            target = scratchXy;
            at = 0;
        }
        ByteBuffer b = buf;
        int p = payloadStart;
        for (int i = 0; i < values; i++, p += 4) {
            target[at + i] = b.getInt(p);
        }
    }

    private int pitch(long span, int count) {
        if (span % count != 0) {
            roundedPitches++;
        }
        return (int) Math.round((double) span / count);
    }

    private void requireLayer(int layer, long start, String kind) throws GdsFormatException {
        if (layer == NO_LAYER) {
            throw new GdsFormatException(file, start, kind + " element without LAYER");
        }
    }

    private void requirePoints(boolean ok, long start, String kind, int points, String expected)
            throws GdsFormatException {
        if (!ok) {
            throw new GdsFormatException(file, start, kind + " element has " + points + " points in XY, expected "
                    + expected);
        }
    }

    /**
     * Replaces name ids by indexes into the cell list; a reference to a name no structure defines
     * fails at its first SNAME in file order, as GdsReader reports it.
     */
    private List<StreamCell> resolveReferences(List<StreamCell> cells, List<Integer> cellIds) throws GdsFormatException {
        int[] indexOfName = new int[names.size()];
        Arrays.fill(indexOfName, -1);
        for (int i = 0; i < cellIds.size(); i++) {
            indexOfName[cellIds.get(i)] = i;
        }
        int missing = -1;
        for (int id = 0; id < names.size(); id++) {
            if (indexOfName[id] < 0 && names.referencedAt(id) >= 0
                    && (missing < 0 || names.referencedAt(id) < names.referencedAt(missing))) {
                missing = id;
            }
        }
        if (missing >= 0) {
            throw new GdsFormatException(file, names.referencedAt(missing), "cell '" + names.name(names.referencedBy(missing))
                    + "' references missing cell '" + names.name(missing) + "'");
        }
        for (StreamCell c : cells) {
            int[] r = c.referenceData();
            for (int i = 0; i < r.length; i += StreamCell.REF_STRIDE) {
                r[i] = indexOfName[r[i]];
            }
        }
        return cells;
    }

    /**
     * A cycle, as GdsReader finds it: depth-first from each cell in file order over the children in
     * reference order (repeats of the previous child dropped); the cycle as cells A, B, ..., A.
     */
    static List<StreamCell> findCycle(List<StreamCell> cells) {
        int n = cells.size();
        int[][] children = new int[n][];
        boolean any = false;
        for (int i = 0; i < n; i++) {
            int[] r = cells.get(i).referenceData();
            int[] kids = new int[r.length / StreamCell.REF_STRIDE];
            int k = 0;
            for (int j = 0; j < r.length; j += StreamCell.REF_STRIDE) {
                if (k == 0 || kids[k - 1] != r[j]) {
                    kids[k++] = r[j];
                }
            }
            children[i] = k == 0 ? null : Arrays.copyOf(kids, k);
            any |= k > 0;
        }
        if (!any) {
            return List.of();
        }
        byte[] state = new byte[n]; // 0 unseen, 1 on the stack, 2 finished
        int[] stack = new int[n];
        int[] next = new int[n];
        for (int root = 0; root < n; root++) {
            if (state[root] != 0 || children[root] == null) {
                continue;
            }
            stack[0] = root;
            next[0] = 0;
            state[root] = 1;
            int depth = 1;
            while (depth > 0) {
                int top = stack[depth - 1];
                int[] kids = children[top];
                int i = next[depth - 1];
                if (kids != null && i < kids.length) {
                    next[depth - 1] = i + 1;
                    int child = kids[i];
                    if (state[child] == 0) {
                        state[child] = 1;
                        stack[depth] = child;
                        next[depth] = 0;
                        depth++;
                    } else if (state[child] == 1) {
                        List<StreamCell> cycle = new ArrayList<>();
                        cycle.add(cells.get(child));
                        for (int d = depth - 1; d >= 0; d--) {
                            cycle.add(cells.get(stack[d]));
                            if (stack[d] == child) {
                                break;
                            }
                        }
                        Collections.reverse(cycle);
                        return cycle;
                    }
                } else {
                    state[top] = 2;
                    depth--;
                }
            }
        }
        return List.of();
    }

    private void check(GdsRecordType type, int minBytes) throws GdsFormatException {
        if (dataType != type.dataType().code()) {
            throw error(type + " record has data type " + dataType + ", expected " + type.dataType().code() + " ("
                    + type.dataType() + ")");
        }
        if (payloadLength < minBytes) {
            throw error(type + " record has " + payloadLength + " data bytes, expected at least " + minBytes);
        }
    }

    private void skipOrFail(String where) throws GdsFormatException {
        GdsRecordType t = GdsRecordType.ofCode(recordType);
        if (t != null && t.isModelled()) {
            throw error(t + " record " + where);
        }
        count(GdsRecordType.nameOf(recordType));
    }

    private void misplaced(GdsRecordType t, int kind) {
        count(t + " in " + GdsRecordType.nameOf(kind));
    }

    private void count(String what) {
        skipped.merge(what, 1, Integer::sum);
    }

    /**
     * Structure names, found by their bytes in the buffer without building a string (open
     * addressing); per name: where it was defined and its first reference.
     */
    private static final class NameTable {
        private byte[][] bytes = new byte[64][];
        private String[] strings = new String[64];
        private long[] definedAt = new long[64];
        private long[] referencedAt = new long[64];
        private int[] referencedBy = new int[64];
        private int size;
        private int[] slots = new int[256]; // id + 1, 0 empty

        int size() {
            return size;
        }

        String name(int id) {
            return strings[id];
        }

        boolean defined(int id) {
            return definedAt[id] >= 0;
        }

        long definedAt(int id) {
            return definedAt[id];
        }

        void define(int id, long offset) {
            definedAt[id] = offset;
        }

        long referencedAt(int id) {
            return referencedAt[id];
        }

        int referencedBy(int id) {
            return referencedBy[id];
        }

        void referenced(int id, long offset, int owner) {
            if (referencedAt[id] < 0) {
                referencedAt[id] = offset;
                referencedBy[id] = owner;
            }
        }

        private static int hash(ByteBuffer b, int from, int length) {
            int h = 1;
            for (int i = 0; i < length; i++) {
                h = 31 * h + b.get(from + i);
            }
            return h ^ (h >>> 16);
        }

        int find(ByteBuffer b, int from, int length) {
            int mask = slots.length - 1;
            for (int s = hash(b, from, length) & mask;; s = (s + 1) & mask) {
                int v = slots[s];
                if (v == 0) {
                    return -1;
                }
                byte[] name = bytes[v - 1];
                if (name.length == length && equal(name, b, from)) {
                    return v - 1;
                }
            }
        }

        private static boolean equal(byte[] name, ByteBuffer b, int from) {
            for (int i = 0; i < name.length; i++) {
                if (name[i] != b.get(from + i)) {
                    return false;
                }
            }
            return true;
        }

        int add(ByteBuffer b, int from, int length) {
            if (size == bytes.length) {
                int cap = size * 2;
                bytes = Arrays.copyOf(bytes, cap);
                strings = Arrays.copyOf(strings, cap);
                definedAt = Arrays.copyOf(definedAt, cap);
                referencedAt = Arrays.copyOf(referencedAt, cap);
                referencedBy = Arrays.copyOf(referencedBy, cap);
            }
            byte[] name = new byte[length];
            b.get(from, name);
            int id = size++;
            bytes[id] = name;
            strings[id] = new String(name, StandardCharsets.ISO_8859_1);
            definedAt[id] = -1;
            referencedAt[id] = -1;
            if (size * 2 > slots.length) {
                rehash(slots.length * 2);
            } else {
                insert(id);
            }
            return id;
        }

        private void insert(int id) {
            int mask = slots.length - 1;
            byte[] name = bytes[id];
            int s = hash(ByteBuffer.wrap(name), 0, name.length) & mask;
            while (slots[s] != 0) {
                s = (s + 1) & mask;
            }
            slots[s] = id + 1;
        }

        private void rehash(int capacity) {
            slots = new int[capacity];
            for (int id = 0; id < size; id++) {
                insert(id);
            }
        }
    }
}
