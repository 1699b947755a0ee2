/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;

/**
 * The records of one GDSII element, from the record after its element record up to ENDEL, read
 * with the checks and messages that {@link GdsReader} and the streaming reader share: the two must
 * accept, reject and count exactly alike. A reader supplies the records (per Calma, "GDS II Stream
 * Format Manual", Release 6.0) and keeps what it needs of the XY, SNAME, STRING and PROPVALUE
 * records; every other value is left for it to read after {@link #read}, through the accessors.
 * <p>
 * Also the record checks both readers apply outside elements: {@link #check} and {@link #skipOrFail}.
 */
public abstract class GdsElementRecords {

    private int kind;
    private long start;
    private int layer;
    private int datatype;
    private int pathType;
    private int width;
    private int beginExtension;
    private int endExtension;
    private int xyValues;
    private boolean snameSeen;
    private long snameOffset;
    private int columns;
    private int rows;
    private boolean colrowSeen;
    private int strans;
    private double magnification;
    private double angle;
    private int presentation;
    private boolean stringSeen;
    private boolean attributePending;
    private int attribute;

    // ---- what the records of the last element said ----

    /** The element record's type: BOUNDARY 0x08, PATH 0x09, SREF 0x0A, AREF 0x0B, TEXT 0x0C, BOX 0x2D. */
    public final int kind() {
        return kind;
    }

    /** LAYER. */
    public final int layer() {
        return layer;
    }

    /** DATATYPE, TEXTTYPE or BOXTYPE, whichever the element kind has (0 without one). */
    public final int datatype() {
        return datatype;
    }

    /** PATHTYPE (0 without one). */
    public final int pathType() {
        return pathType;
    }

    /** WIDTH (0 without one). */
    public final int width() {
        return width;
    }

    /** BGNEXTN (0 without one). */
    public final int beginExtension() {
        return beginExtension;
    }

    /** ENDEXTN (0 without one). */
    public final int endExtension() {
        return endExtension;
    }

    /** Number of 32-bit values in the XY record. */
    public final int xyValues() {
        return xyValues;
    }

    /** Byte offset of the SNAME record. */
    public final long snameOffset() {
        return snameOffset;
    }

    /** COLROW columns. */
    public final int columns() {
        return columns;
    }

    /** COLROW rows. */
    public final int rows() {
        return rows;
    }

    /** STRANS bits as an unsigned 16-bit value (0 without one). */
    public final int strans() {
        return strans;
    }

    /** MAG (1 without one). */
    public final double magnification() {
        return magnification;
    }

    /** ANGLE in degrees (0 without one). */
    public final double angle() {
        return angle;
    }

    /** PRESENTATION bits as an unsigned 16-bit value (0 without one). */
    public final int presentation() {
        return presentation;
    }

    // ---- the records, as the reader has them ----

    /**
     * Advances to the next record.
     *
     * @return false at the end of the input when it falls exactly between records
     */
    protected abstract boolean next() throws IOException;

    protected abstract int recordType();

    protected abstract int recordDataType();

    /** Payload bytes of the current record. */
    protected abstract int payloadLength();

    /** Byte offset of the current record in the file. */
    protected abstract long recordOffset();

    protected abstract int int16(int index);

    protected abstract int int32(int index);

    protected abstract double real8(int index);

    /** The file name used in error messages. */
    protected abstract String file();

    /** Counts one skipped record or element under the given description. */
    protected abstract void count(String what);

    // ---- what the reader keeps ----

    /** On a checked XY record of {@code values} 32-bit values (a whole number of points). */
    protected abstract void xy(int values) throws IOException;

    /** On a checked SNAME record of a reference. */
    protected abstract void sname() throws IOException;

    /** On a checked STRING record of a text. */
    protected abstract void string() throws IOException;

    /** On a checked PROPVALUE record following a PROPATTR with the given attribute number. */
    protected abstract void propertyValue(int attributeNumber) throws IOException;

    /**
     * Reads the records of the element whose element record is the current one, up to its ENDEL,
     * and checks that the element is complete: a layer, the points its kind needs, a STRING for a
     * text, an SNAME for a reference, a COLROW for an array.
     *
     * @return false for an element kind the model does not hold (NODE, TEXTNODE), counted and skipped
     */
    public final boolean read() throws IOException {
        kind = recordType();
        start = recordOffset();
        String kindName = GdsRecordType.nameOf(kind);
        check(GdsRecordType.ofCode(kind), 0);
        boolean modelled = kind != 0x15 && kind != 0x14;
        if (!modelled) {
            count(kindName + " element");
        }
        reset();
        while (true) {
            if (!next()) {
                throw error("file ends inside " + kindName + " element started at byte " + start);
            }
            int type = recordType();
            if (type == 0x11) { // ENDEL
                break;
            }
            if (!modelled) {
                if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05) {
                    throw error(GdsRecordType.nameOf(type) + " before ENDEL of the " + kindName
                            + " element started at byte " + start);
                }
                continue;
            }
            record(type, kindName);
        }
        if (!modelled) {
            return false;
        }
        checkComplete(kindName);
        return true;
    }

    private void reset() {
        layer = Integer.MIN_VALUE;
        datatype = 0;
        pathType = 0;
        width = 0;
        beginExtension = 0;
        endExtension = 0;
        xyValues = -1;
        snameSeen = false;
        snameOffset = -1;
        columns = 0;
        rows = 0;
        colrowSeen = false;
        strans = 0;
        magnification = 1.0;
        angle = 0.0;
        presentation = 0;
        stringSeen = false;
        attributePending = false;
    }

    private void record(int type, String kindName) throws IOException {
        switch (type) {
            case 0x0D -> { // LAYER
                check(GdsRecordType.LAYER, 2);
                layer = int16(0);
            }
            case 0x0E, 0x16, 0x2E -> { // DATATYPE, TEXTTYPE, BOXTYPE
                GdsRecordType t = GdsRecordType.ofCode(type);
                if (t != GdsRecordType.typeRecordOf(kind)) {
                    misplaced(t, kindName);
                } else {
                    check(t, 2);
                    datatype = int16(0);
                }
            }
            case 0x10 -> { // XY
                check(GdsRecordType.XY, 0);
                int length = payloadLength();
                if (length % 8 != 0) {
                    throw error("XY record has " + length + " data bytes, not a multiple of 8 (record length "
                            + (length + 4) + ")");
                }
                xyValues = length >> 2;
                xy(xyValues);
            }
            case 0x21 -> { // PATHTYPE
                if (kind != 0x09 && kind != 0x0C) {
                    misplaced(GdsRecordType.PATHTYPE, kindName);
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
                    misplaced(GdsRecordType.WIDTH, kindName);
                } else {
                    check(GdsRecordType.WIDTH, 4);
                    width = int32(0);
                }
            }
            case 0x30, 0x31 -> { // BGNEXTN, ENDEXTN
                GdsRecordType t = GdsRecordType.ofCode(type);
                if (kind != 0x09) {
                    misplaced(t, kindName);
                } else {
                    check(t, 4);
                    if (type == 0x30) {
                        beginExtension = int32(0);
                    } else {
                        endExtension = int32(0);
                    }
                }
            }
            case 0x12 -> { // SNAME
                if (kind != 0x0A && kind != 0x0B) {
                    misplaced(GdsRecordType.SNAME, kindName);
                } else {
                    check(GdsRecordType.SNAME, 1);
                    snameSeen = true;
                    snameOffset = recordOffset();
                    sname();
                }
            }
            case 0x13 -> { // COLROW
                if (kind != 0x0B) {
                    misplaced(GdsRecordType.COLROW, kindName);
                } else {
                    check(GdsRecordType.COLROW, 4);
                    columns = int16(0);
                    rows = int16(1);
                    colrowSeen = true;
                    if (columns < 1 || rows < 1) {
                        throw error("AREF with " + columns + " columns and " + rows + " rows (each must be 1 to 32767)");
                    }
                }
            }
            case 0x1A -> { // STRANS
                if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                    misplaced(GdsRecordType.STRANS, kindName);
                } else {
                    check(GdsRecordType.STRANS, 2);
                    strans = int16(0) & 0xFFFF;
                }
            }
            case 0x1B, 0x1C -> { // MAG, ANGLE
                GdsRecordType t = GdsRecordType.ofCode(type);
                if (kind != 0x0A && kind != 0x0B && kind != 0x0C) {
                    misplaced(t, kindName);
                } else {
                    check(t, 8);
                    double v = real8(0);
                    if (type == 0x1B) {
                        if (!(v > 0)) {
                            throw error("MAG " + v + " is not positive");
                        }
                        magnification = v;
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
                    presentation = int16(0) & 0xFFFF;
                    if (((presentation >> 2) & 3) == 3 || (presentation & 3) == 3) {
                        throw error("PRESENTATION justification value 3 is undefined");
                    }
                }
            }
            case 0x19 -> { // STRING
                if (kind != 0x0C) {
                    misplaced(GdsRecordType.STRING, kindName);
                } else {
                    check(GdsRecordType.STRING, 0);
                    stringSeen = true;
                    string();
                }
            }
            case 0x2B -> { // PROPATTR
                check(GdsRecordType.PROPATTR, 2);
                attribute = int16(0);
                attributePending = true;
            }
            case 0x2C -> { // PROPVALUE
                check(GdsRecordType.PROPVALUE, 0);
                if (!attributePending) {
                    throw error("PROPVALUE without a preceding PROPATTR");
                }
                propertyValue(attribute);
                attributePending = false;
            }
            default -> {
                if (GdsRecordType.isElementStart(type) || type == 0x07 || type == 0x04 || type == 0x05 || type == 0x06) {
                    throw error(GdsRecordType.nameOf(type) + " before ENDEL of the " + kindName
                            + " element started at byte " + start);
                }
                skipOrFail("inside a " + kindName + " element");
            }
        }
    }

    private void checkComplete(String kindName) throws GdsFormatException {
        String file = file();
        if (attributePending) {
            throw new GdsFormatException(file, start, kindName + " element has a PROPATTR without PROPVALUE");
        }
        if (xyValues < 0) {
            throw new GdsFormatException(file, start, kindName + " element without XY");
        }
        int points = xyValues / 2;
        switch (kind) {
            case 0x08, 0x09 -> {
                GdsReadChecks.requireLayer(file, layer, start, kindName);
                GdsReadChecks.requirePoints(file, points >= 1, start, kindName, points, "at least 1");
            }
            case 0x2D -> {
                GdsReadChecks.requireLayer(file, layer, start, kindName);
                GdsReadChecks.requirePoints(file, points == 5, start, kindName, points, "5");
            }
            case 0x0C -> {
                GdsReadChecks.requireLayer(file, layer, start, kindName);
                GdsReadChecks.requirePoints(file, points == 1, start, kindName, points, "1");
                if (!stringSeen) {
                    throw new GdsFormatException(file, start, "TEXT element without STRING");
                }
            }
            case 0x0A -> {
                GdsReadChecks.requireName(file, snameSeen, start, kindName);
                GdsReadChecks.requirePoints(file, points == 1, start, kindName, points, "1");
            }
            case 0x0B -> {
                GdsReadChecks.requireName(file, snameSeen, start, kindName);
                if (!colrowSeen) {
                    throw new GdsFormatException(file, start, "AREF element without COLROW");
                }
                GdsReadChecks.requirePoints(file, points == 3, start, kindName, points, "3");
            }
            default -> throw new IllegalStateException("element kind " + kindName);
        }
    }

    /** An exception naming the file, the current record's offset and the problem. */
    public final GdsFormatException error(String problem) {
        return new GdsFormatException(file(), recordOffset(), problem);
    }

    /** Fails unless the current record has the data type of {@code type} and at least {@code minBytes} of payload. */
    public final void check(GdsRecordType type, int minBytes) throws GdsFormatException {
        if (recordDataType() != type.dataType().code()) {
            throw error(type + " record has data type " + recordDataType() + ", expected " + type.dataType().code()
                    + " (" + type.dataType() + ")");
        }
        if (payloadLength() < minBytes) {
            throw error(type + " record has " + payloadLength() + " data bytes, expected at least " + minBytes);
        }
    }

    /** Skips and counts a record the model does not hold; fails for a modelled record in the wrong place. */
    public final void skipOrFail(String where) throws GdsFormatException {
        GdsRecordType t = GdsRecordType.ofCode(recordType());
        if (t != null && t.isModelled()) {
            throw error(t + " record " + where);
        }
        count(GdsRecordType.nameOf(recordType()));
    }

    private void misplaced(GdsRecordType t, String kindName) {
        count(t + " in " + kindName);
    }
}
