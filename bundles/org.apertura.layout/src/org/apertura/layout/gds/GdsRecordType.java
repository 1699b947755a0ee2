/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

/**
 * Record types of the GDSII stream format, numbered as in Calma, "GDS II Stream Format Manual",
 * Release 6.0, February 1987. Each carries the data type the manual prescribes for it.
 * <p>
 * The reader decodes the records that make up the layout model (library, structures, BOUNDARY,
 * PATH, SREF, AREF, TEXT, BOX and their attribute records, properties); the others (for example
 * REFLIBS, FONTS, ELFLAGS, PLEX, NODE) are recognised by name and skipped, see {@link #isModelled()}.
 */
public enum GdsRecordType {
    HEADER(0x00, GdsDataType.INT16, true),
    BGNLIB(0x01, GdsDataType.INT16, true),
    LIBNAME(0x02, GdsDataType.ASCII, true),
    UNITS(0x03, GdsDataType.REAL8, true),
    ENDLIB(0x04, GdsDataType.NONE, true),
    BGNSTR(0x05, GdsDataType.INT16, true),
    STRNAME(0x06, GdsDataType.ASCII, true),
    ENDSTR(0x07, GdsDataType.NONE, true),
    BOUNDARY(0x08, GdsDataType.NONE, true),
    PATH(0x09, GdsDataType.NONE, true),
    SREF(0x0A, GdsDataType.NONE, true),
    AREF(0x0B, GdsDataType.NONE, true),
    TEXT(0x0C, GdsDataType.NONE, true),
    LAYER(0x0D, GdsDataType.INT16, true),
    DATATYPE(0x0E, GdsDataType.INT16, true),
    WIDTH(0x0F, GdsDataType.INT32, true),
    XY(0x10, GdsDataType.INT32, true),
    ENDEL(0x11, GdsDataType.NONE, true),
    SNAME(0x12, GdsDataType.ASCII, true),
    COLROW(0x13, GdsDataType.INT16, true),
    TEXTNODE(0x14, GdsDataType.NONE, false),
    NODE(0x15, GdsDataType.NONE, false),
    TEXTTYPE(0x16, GdsDataType.INT16, true),
    PRESENTATION(0x17, GdsDataType.BIT_ARRAY, true),
    SPACING(0x18, GdsDataType.NONE, false),
    STRING(0x19, GdsDataType.ASCII, true),
    STRANS(0x1A, GdsDataType.BIT_ARRAY, true),
    MAG(0x1B, GdsDataType.REAL8, true),
    ANGLE(0x1C, GdsDataType.REAL8, true),
    UINTEGER(0x1D, GdsDataType.NONE, false),
    USTRING(0x1E, GdsDataType.NONE, false),
    REFLIBS(0x1F, GdsDataType.ASCII, false),
    FONTS(0x20, GdsDataType.ASCII, false),
    PATHTYPE(0x21, GdsDataType.INT16, true),
    GENERATIONS(0x22, GdsDataType.INT16, false),
    ATTRTABLE(0x23, GdsDataType.ASCII, false),
    STYPTABLE(0x24, GdsDataType.ASCII, false),
    STRTYPE(0x25, GdsDataType.INT16, false),
    ELFLAGS(0x26, GdsDataType.BIT_ARRAY, false),
    ELKEY(0x27, GdsDataType.INT32, false),
    LINKTYPE(0x28, GdsDataType.INT16, false),
    LINKKEYS(0x29, GdsDataType.INT32, false),
    NODETYPE(0x2A, GdsDataType.INT16, false),
    PROPATTR(0x2B, GdsDataType.INT16, true),
    PROPVALUE(0x2C, GdsDataType.ASCII, true),
    BOX(0x2D, GdsDataType.NONE, true),
    BOXTYPE(0x2E, GdsDataType.INT16, true),
    PLEX(0x2F, GdsDataType.INT32, false),
    BGNEXTN(0x30, GdsDataType.INT32, true),
    ENDEXTN(0x31, GdsDataType.INT32, true),
    TAPENUM(0x32, GdsDataType.INT16, false),
    TAPECODE(0x33, GdsDataType.INT16, false),
    STRCLASS(0x34, GdsDataType.BIT_ARRAY, false),
    RESERVED(0x35, GdsDataType.INT32, false),
    FORMAT(0x36, GdsDataType.INT16, false),
    MASK(0x37, GdsDataType.ASCII, false),
    ENDMASKS(0x38, GdsDataType.NONE, false),
    LIBDIRSIZE(0x39, GdsDataType.INT16, false),
    SRFNAME(0x3A, GdsDataType.ASCII, false),
    LIBSECUR(0x3B, GdsDataType.INT16, false);

    private static final GdsRecordType[] BY_CODE = new GdsRecordType[256];

    static {
        for (GdsRecordType t : values()) {
            BY_CODE[t.code] = t;
        }
    }

    private final int code;
    private final GdsDataType dataType;
    private final boolean modelled;

    GdsRecordType(int code, GdsDataType dataType, boolean modelled) {
        this.code = code;
        this.dataType = dataType;
        this.modelled = modelled;
    }

    /** The record type byte. */
    public int code() {
        return code;
    }

    /** The data type the manual prescribes for this record. */
    public GdsDataType dataType() {
        return dataType;
    }

    /** True when the reader turns this record into model content; false when it skips it. */
    public boolean isModelled() {
        return modelled;
    }

    /** The record type for a type byte (0-255), or null for a byte the manual does not define. */
    public static GdsRecordType ofCode(int code) {
        return BY_CODE[code & 0xFF];
    }

    /** A readable name for any type byte: the record name, or {@code 0xNN} when undefined. */
    public static String nameOf(int code) {
        GdsRecordType t = ofCode(code);
        return t != null ? t.name() : String.format("0x%02X", code & 0xFF);
    }

    /**
     * Whether a record type opens an element: BOUNDARY, PATH, SREF, AREF, TEXT, BOX, or the
     * tape-era NODE (0x15) and TEXTNODE (0x14) elements, which readers skip whole.
     */
    public static boolean isElementStart(int code) {
        return code == 0x08 || code == 0x09 || code == 0x0A || code == 0x0B || code == 0x0C || code == 0x2D
                || code == 0x15 || code == 0x14;
    }

    /**
     * The record that carries the second half of an element's layer key: DATATYPE for boundaries and
     * paths, TEXTTYPE for texts, BOXTYPE for boxes; null for elements without one.
     */
    public static GdsRecordType typeRecordOf(int elementCode) {
        return switch (elementCode) {
            case 0x08, 0x09 -> DATATYPE;
            case 0x0C -> TEXTTYPE;
            case 0x2D -> BOXTYPE;
            default -> null;
        };
    }
}
