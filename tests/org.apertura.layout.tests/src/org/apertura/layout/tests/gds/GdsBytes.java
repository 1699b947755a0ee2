/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.HexFormat;

/**
 * Assembles GDSII records by hand, byte by byte, as laid out in Calma, "GDS II Stream Format
 * Manual", Release 6.0, February 1987: 2-byte big-endian record length (header included), record
 * type byte, data type byte, payload. Deliberately independent of the code under test (no use of its
 * encoder); 8-byte reals are given as hex bytes.
 */
public final class GdsBytes {

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();

    /** Raw bytes written as hex pairs, spaces ignored: {@code hex("00 06 0D 02 00 2A")}. */
    public GdsBytes hex(String hex) {
        byte[] b = HexFormat.of().parseHex(hex.replace(" ", ""));
        out.write(b, 0, b.length);
        return this;
    }

    /** A record with the given payload bytes. */
    public GdsBytes record(int type, int dataType, byte[] payload) {
        int length = payload.length + 4;
        out.write(length >> 8);
        out.write(length);
        out.write(type);
        out.write(dataType);
        out.write(payload, 0, payload.length);
        return this;
    }

    /** A record without data (data type 0). */
    public GdsBytes empty(int type) {
        return record(type, 0, new byte[0]);
    }

    /** A record of 16-bit integers (data type 2), or a bit array (data type 1) when asked. */
    public GdsBytes int16(int type, int dataType, int... values) {
        byte[] p = new byte[values.length * 2];
        for (int i = 0; i < values.length; i++) {
            p[2 * i] = (byte) (values[i] >> 8);
            p[2 * i + 1] = (byte) values[i];
        }
        return record(type, dataType, p);
    }

    /** A record of 32-bit integers (data type 3). */
    public GdsBytes int32(int type, int... values) {
        byte[] p = new byte[values.length * 4];
        for (int i = 0; i < values.length; i++) {
            p[4 * i] = (byte) (values[i] >> 24);
            p[4 * i + 1] = (byte) (values[i] >> 16);
            p[4 * i + 2] = (byte) (values[i] >> 8);
            p[4 * i + 3] = (byte) values[i];
        }
        return record(type, 3, p);
    }

    /** An 8-byte real record (data type 5) from the hex of its values. */
    public GdsBytes real8(int type, String hex) {
        return record(type, 5, HexFormat.of().parseHex(hex.replace(" ", "")));
    }

    /** An ASCII record (data type 6), NUL-padded to an even length. */
    public GdsBytes ascii(int type, String s) {
        byte[] b = s.getBytes(StandardCharsets.US_ASCII);
        byte[] p = new byte[b.length + (b.length & 1)];
        System.arraycopy(b, 0, p, 0, b.length);
        return record(type, 6, p);
    }

    /** HEADER 600, BGNLIB with zero dates, LIBNAME, UNITS 0.001 / 1e-9 (hex from references.md). */
    public GdsBytes libraryStart(String name) {
        int16(0x00, 2, 600);
        int16(0x01, 2, new int[12]);
        ascii(0x02, name);
        return real8(0x03, "3E 41 89 37 4B C6 A7 F0  39 44 B8 2F A0 9B 5A 54");
    }

    /** BGNSTR with zero dates and STRNAME. */
    public GdsBytes structure(String name) {
        int16(0x05, 2, new int[12]);
        return ascii(0x06, name);
    }

    public GdsBytes endStructure() {
        return empty(0x07);
    }

    public GdsBytes endLibrary() {
        return empty(0x04);
    }

    /** BOUNDARY, LAYER, DATATYPE, XY (points as given), ENDEL. */
    public GdsBytes boundary(int layer, int datatype, int... xy) {
        empty(0x08);
        int16(0x0D, 2, layer);
        int16(0x0E, 2, datatype);
        int32(0x10, xy);
        return empty(0x11);
    }

    /** Current size in bytes (the offset of the next record). */
    public int size() {
        return out.size();
    }

    public byte[] bytes() {
        return out.toByteArray();
    }

    /**
     * A random mutant of a stream file: a few random bytes, one byte set to 0x00 or 0xFF, a
     * truncation, or a range of up to 64 bytes deleted or duplicated.
     */
    public static byte[] mutate(byte[] original, java.util.Random random) {
        byte[] b = original.clone();
        switch (random.nextInt(5)) {
            case 0 -> { // a few random bytes
                int n = 1 + random.nextInt(4);
                for (int k = 0; k < n; k++) {
                    b[random.nextInt(b.length)] = (byte) random.nextInt(256);
                }
            }
            case 1 -> { // one byte of a record header region set to an extreme value
                b[random.nextInt(b.length)] = (byte) (random.nextBoolean() ? 0x00 : 0xFF);
            }
            case 2 -> b = java.util.Arrays.copyOf(b, random.nextInt(b.length)); // truncation
            case 3 -> { // delete a range
                int from = random.nextInt(b.length);
                int len = 1 + random.nextInt(Math.min(64, b.length - from));
                byte[] c = new byte[b.length - len];
                System.arraycopy(b, 0, c, 0, from);
                System.arraycopy(b, from + len, c, from, b.length - from - len);
                b = c;
            }
            default -> { // duplicate a range
                int from = random.nextInt(b.length);
                int len = 1 + random.nextInt(Math.min(64, b.length - from));
                byte[] c = new byte[b.length + len];
                System.arraycopy(b, 0, c, 0, from + len);
                System.arraycopy(b, from, c, from + len, b.length - from);
                b = c;
            }
        }
        return b;
    }

    /** The eight bytes of a GDSII 8-byte real (excess-64 base-16) for v. */
    public static byte[] real8(double v) {
        long bits = org.apertura.layout.gds.Real8.encode(v);
        byte[] b = new byte[8];
        for (int i = 0; i < 8; i++) {
            b[i] = (byte) (bits >>> (56 - 8 * i));
        }
        return b;
    }
}
