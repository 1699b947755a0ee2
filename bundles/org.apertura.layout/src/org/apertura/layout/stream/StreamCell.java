/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import java.util.Arrays;

import org.apertura.layout.LayerKey;

/**
 * One structure of a {@link StreamLayout} in packed form: its boundaries, boxes and paths in one
 * {@code int} array and its references in another, in file order; coordinates in database units
 * exactly as stored in the file (a closed ring keeps its repeated last point). Texts are counted,
 * not kept (flattening leaves them out).
 * <p>
 * Shape records, one after the other in {@link #shapeData()} from {@link #shapeStart()} to
 * {@link #shapeEnd()}, each {@link #recordSize} values long:
 * <pre>
 *   kind &lt;&lt; 28 | pointCount      kind: {@link #BOUNDARY}, {@link #BOX}, {@link #PATH} or {@link #RECTANGLE}
 *   layer &lt;&lt; 16 | (datatype &amp; 0xFFFF)   (box type for boxes; both read as signed 16-bit)
 *   only for paths: pathType, width, beginExtension, endExtension
 *   x0, y0, x1, y1, ...             2 * pointCount values; for a rectangle only x0, y0, x2, y2
 * </pre>
 * Most boundaries in real layouts are rectangles: keeping two of their five points halves the
 * memory they take. {@link #points} gives any shape's points as the file stores them.
 * Reference records, {@link #REF_STRIDE} values each in {@link #referenceData()}: child cell index in
 * {@link StreamLayout#cells()}, origin x, origin y, flags ({@link #REFLECTED}, {@link #ABSOLUTE_MAG},
 * {@link #ABSOLUTE_ANGLE}, {@link #ARRAY}), columns, rows, column pitch x and y, row pitch x and y
 * (1, 1 and zero pitches for a single reference); magnification and angle in degrees are pairs in
 * {@link #referenceTransforms()}. The arrays are shared, not copied: callers must not change them.
 */
public final class StreamCell {

    /** Shape kind of a BOUNDARY element. */
    public static final int BOUNDARY = 1;
    /** Shape kind of a BOX element. */
    public static final int BOX = 2;
    /** Shape kind of a PATH element. */
    public static final int PATH = 3;
    /**
     * Shape kind of a BOUNDARY element whose five points close an axis-parallel rectangle, stored
     * as its first and third point only; {@link #VERTICAL_FIRST} tells which way the ring turns.
     */
    public static final int RECTANGLE = 4;
    /** In a {@link #RECTANGLE} record's first value: the ring's first edge is vertical, not horizontal. */
    public static final int VERTICAL_FIRST = 1 << 27;

    /** Values per reference in {@link #referenceData()}. */
    public static final int REF_STRIDE = 10;
    /** Reference flag: reflected about the x axis before rotation. */
    public static final int REFLECTED = 1;
    /** Reference flag: the magnification replaces the accumulated one. */
    public static final int ABSOLUTE_MAG = 2;
    /** Reference flag: the angle replaces the accumulated one. */
    public static final int ABSOLUTE_ANGLE = 4;
    /** Reference flag: an array reference (AREF). */
    public static final int ARRAY = 8;

    private final String name;
    private final long offset;
    private final int[] shapeData;
    private final int shapeStart;
    private final int shapeEnd;
    private final int shapeCount;
    private final int[] referenceData;
    private final double[] referenceTransforms;
    private final int textCount;

    StreamCell(String name, long offset, int[] shapeData, int shapeStart, int shapeEnd, int shapeCount,
            int[] referenceData, double[] referenceTransforms, int textCount) {
        this.name = name;
        this.offset = offset;
        this.shapeData = shapeData;
        this.shapeStart = shapeStart;
        this.shapeEnd = shapeEnd;
        this.shapeCount = shapeCount;
        this.referenceData = referenceData;
        this.referenceTransforms = referenceTransforms;
        this.textCount = textCount;
    }

    /** The structure name. */
    public String name() {
        return name;
    }

    /** Byte offset of the structure's BGNSTR record in the file. */
    public long offset() {
        return offset;
    }

    /**
     * The array holding this cell's packed boundaries, boxes and paths (layout in the class comment)
     * from {@link #shapeStart()} to {@link #shapeEnd()}; consecutive cells share one array.
     */
    public int[] shapeData() {
        return shapeData;
    }

    /** Index of this cell's first shape record in {@link #shapeData()}. */
    public int shapeStart() {
        return shapeStart;
    }

    /** Index after this cell's last shape record in {@link #shapeData()}. */
    public int shapeEnd() {
        return shapeEnd;
    }

    /** Number of boundaries, boxes and paths. */
    public int shapeCount() {
        return shapeCount;
    }

    /** Number of references (SREF and AREF). */
    public int referenceCount() {
        return referenceData.length / REF_STRIDE;
    }

    /** Packed references, {@link #REF_STRIDE} values each. */
    public int[] referenceData() {
        return referenceData;
    }

    /** Magnification and angle (degrees) of each reference, two values each. */
    public double[] referenceTransforms() {
        return referenceTransforms;
    }

    /** Number of TEXT elements (not kept). */
    public int textCount() {
        return textCount;
    }

    /** Kind in a shape record's first value. */
    public static int kind(int header) {
        return header >>> 28;
    }

    /** Point count in a shape record's first value (five for a rectangle, as the file stores it). */
    public static int pointCount(int header) {
        return header & 0x07FF_FFFF;
    }

    /** Number of values of the shape record whose first value is given. */
    public static int recordSize(int header) {
        int kind = kind(header);
        return kind == RECTANGLE ? 6 : headerSize(kind) + 2 * pointCount(header);
    }

    /**
     * The points of the shape record at {@code at} ({@code 2 * pointCount} values, closing point
     * included), as the file stores them: a rectangle's five are rebuilt from its two corners.
     */
    public static int[] points(int[] data, int at) {
        int header = data[at];
        int kind = kind(header);
        int from = at + headerSize(kind);
        if (kind != RECTANGLE) {
            return Arrays.copyOfRange(data, from, from + 2 * pointCount(header));
        }
        int x0 = data[from];
        int y0 = data[from + 1];
        int x2 = data[from + 2];
        int y2 = data[from + 3];
        return (header & VERTICAL_FIRST) != 0 ? new int[] {x0, y0, x0, y2, x2, y2, x2, y0, x0, y0}
                : new int[] {x0, y0, x2, y0, x2, y2, x0, y2, x0, y0};
    }

    /**
     * For five points packed as (x &lt;&lt; 32 | y &amp; 0xFFFFFFFF): 0 if they close an axis-parallel
     * ring whose first edge is horizontal, {@link #VERTICAL_FIRST} if vertical, -1 otherwise. (Both
     * hold only when all five points coincide; either rebuilds them.)
     */
    static int rectangleTurn(long p0, long p1, long p2, long p3, long p4) {
        if (p4 != p0) {
            return -1;
        }
        long x = 0xFFFF_FFFF_0000_0000L;
        long y = 0x0000_0000_FFFF_FFFFL;
        if (((p1 ^ p0) & y) == 0 && ((p2 ^ p1) & x) == 0 && ((p3 ^ p2) & y) == 0 && ((p3 ^ p0) & x) == 0) {
            return 0;
        }
        if (((p1 ^ p0) & x) == 0 && ((p2 ^ p1) & y) == 0 && ((p3 ^ p2) & x) == 0 && ((p3 ^ p0) & y) == 0) {
            return VERTICAL_FIRST;
        }
        return -1;
    }

    /**
     * Rewrites the BOUNDARY record of five points at {@code at} as a {@link #RECTANGLE} record when
     * the points close an axis-parallel rectangle; returns the index after the record.
     */
    static int packRectangle(int[] data, int at) {
        int xy = at + 2;
        int turn = rectangleTurn(pack(data, xy), pack(data, xy + 2), pack(data, xy + 4), pack(data, xy + 6),
                pack(data, xy + 8));
        if (turn < 0) {
            return xy + 10;
        }
        data[at] = RECTANGLE << 28 | turn | 5;
        data[xy + 2] = data[xy + 4];
        data[xy + 3] = data[xy + 5];
        return xy + 4;
    }

    private static long pack(int[] data, int i) {
        return (long) data[i] << 32 | data[i + 1] & 0xFFFF_FFFFL;
    }

    /** Layer and datatype of a shape record's second value. */
    public static LayerKey layerKey(int packed) {
        return new LayerKey(packed >> 16, (short) packed);
    }

    /** Values before the coordinates in a shape record of the given kind. */
    public static int headerSize(int kind) {
        return kind == PATH ? 6 : 2;
    }

    @Override
    public String toString() {
        return "StreamCell " + name + " (" + shapeCount + " shapes, " + referenceCount() + " references, " + textCount
                + " texts)";
    }
}
