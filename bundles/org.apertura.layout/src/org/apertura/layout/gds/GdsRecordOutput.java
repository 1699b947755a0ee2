/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;
import java.io.OutputStream;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Writes GDSII records (Calma, "GDS II Stream Format Manual", Release 6.0) through a fixed buffer:
 * 2-byte big-endian length including the header, record type, data type, payload.
 */
final class GdsRecordOutput {

    /** Largest payload of one record: the length field is 16 bits and must be even. */
    static final int MAX_PAYLOAD = 65534 - 4;

    private static final VarHandle INT16 = MethodHandles.byteArrayViewVarHandle(short[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle INT32 = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle INT64 = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.BIG_ENDIAN);

    private final OutputStream out;
    private final byte[] buf = new byte[1 << 18];
    private int pos;

    GdsRecordOutput(OutputStream out) {
        this.out = out;
    }

    private void header(GdsRecordType type, int payload) throws IOException {
        if (payload > MAX_PAYLOAD) {
            throw new IllegalArgumentException(type + " record needs " + payload + " data bytes, more than the "
                    + MAX_PAYLOAD + " a record can hold");
        }
        if (buf.length - pos < payload + 4) {
            flush();
        }
        INT16.set(buf, pos, (short) (payload + 4));
        buf[pos + 2] = (byte) type.code();
        buf[pos + 3] = (byte) type.dataType().code();
        pos += 4;
    }

    void empty(GdsRecordType type) throws IOException {
        header(type, 0);
    }

    void int16(GdsRecordType type, int... values) throws IOException {
        header(type, 2 * values.length);
        for (int v : values) {
            if (v < Short.MIN_VALUE || v > 0xFFFF) {
                throw new IllegalArgumentException(type + " value " + v + " does not fit 16 bits");
            }
            INT16.set(buf, pos, (short) v);
            pos += 2;
        }
    }

    void int32(GdsRecordType type, int... values) throws IOException {
        header(type, 4 * values.length);
        for (int v : values) {
            INT32.set(buf, pos, v);
            pos += 4;
        }
    }

    void real8(GdsRecordType type, double... values) throws IOException {
        header(type, 8 * values.length);
        for (double v : values) {
            INT64.set(buf, pos, Real8.encode(v));
            pos += 8;
        }
    }

    /** An ASCII record, padded with one NUL to an even length when needed. */
    void string(GdsRecordType type, String value) throws IOException {
        byte[] bytes = value.getBytes(StandardCharsets.ISO_8859_1);
        for (int i = 0; i < value.length(); i++) {
            if (value.charAt(i) > 0xFF) {
                throw new IllegalArgumentException(type + " '" + value + "' has a character outside ISO-8859-1");
            }
        }
        if (value.endsWith("\0")) {
            throw new IllegalArgumentException(type + " '" + value + "' ends with NUL, which reads back as padding");
        }
        int padded = bytes.length + (bytes.length & 1);
        header(type, padded);
        System.arraycopy(bytes, 0, buf, pos, bytes.length);
        if (padded > bytes.length) {
            buf[pos + bytes.length] = 0;
        }
        pos += padded;
    }

    void flush() throws IOException {
        out.write(buf, 0, pos);
        pos = 0;
    }
}
