/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

import org.apertura.layout.LayerKey;

/**
 * One structure of a {@link StreamLayout} in packed form: its boundaries, boxes and paths in one
 * {@code int} array and its references in another, in file order; coordinates in database units
 * exactly as stored in the file (a closed ring keeps its repeated last point). Texts are counted,
 * not kept (flattening leaves them out).
 * <p>
 * Shape records, one after the other in {@link #shapeData()} from {@link #shapeStart()} to
 * {@link #shapeEnd()}:
 * <pre>
 *   kind &lt;&lt; 28 | pointCount      kind: {@link #BOUNDARY}, {@link #BOX} or {@link #PATH}
 *   layer &lt;&lt; 16 | (datatype &amp; 0xFFFF)   (box type for boxes; both read as signed 16-bit)
 *   only for paths: pathType, width, beginExtension, endExtension
 *   x0, y0, x1, y1, ...             2 * pointCount values
 * </pre>
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

    /** Point count in a shape record's first value. */
    public static int pointCount(int header) {
        return header & 0x0FFF_FFFF;
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
