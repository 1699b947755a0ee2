/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

/**
 * The data type byte of a GDSII stream record (Calma, "GDS II Stream Format Manual", Release 6.0,
 * February 1987): how the payload after the 4-byte header is to be decoded.
 */
public enum GdsDataType {
    /** No data: the record is only its header. */
    NONE(0, 0),
    /** A 16-bit word of flags. */
    BIT_ARRAY(1, 2),
    /** Big-endian two's complement 16-bit integers. */
    INT16(2, 2),
    /** Big-endian two's complement 32-bit integers. */
    INT32(3, 4),
    /** 4-byte reals: defined by the manual but not used by any record. */
    REAL4(4, 4),
    /** 8-byte excess-64 base-16 reals, see {@link Real8}. */
    REAL8(5, 8),
    /** ASCII characters, padded with a NUL to an even length. */
    ASCII(6, 1);

    private static final GdsDataType[] BY_CODE = values();

    private final int code;
    private final int itemSize;

    GdsDataType(int code, int itemSize) {
        this.code = code;
        this.itemSize = itemSize;
    }

    /** The data type byte as it appears in the stream. */
    public int code() {
        return code;
    }

    /** Size in bytes of one item of this type (0 for {@link #NONE}). */
    public int itemSize() {
        return itemSize;
    }

    /** The type for a data type byte, or null if the byte is not one of the seven defined types. */
    public static GdsDataType ofCode(int code) {
        return code >= 0 && code < BY_CODE.length ? BY_CODE[code] : null;
    }
}
