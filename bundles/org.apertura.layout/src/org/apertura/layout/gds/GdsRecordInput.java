/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;
import java.io.InputStream;
import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;

/**
 * Streams the records of a GDSII file: one record at a time through a fixed buffer (256 KiB, enough
 * for the largest record of 65,534 bytes), never the whole file. Tracks the byte offset of each
 * record for error messages. Record layout per Calma, "GDS II Stream Format Manual", Release 6.0:
 * a 2-byte big-endian length that includes the 4-byte header, a record type byte, a data type byte,
 * then the payload.
 */
final class GdsRecordInput {

    private static final VarHandle INT16 = MethodHandles.byteArrayViewVarHandle(short[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle INT32 = MethodHandles.byteArrayViewVarHandle(int[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle INT64 = MethodHandles.byteArrayViewVarHandle(long[].class, ByteOrder.BIG_ENDIAN);

    private final InputStream in;
    private final String file;
    private final byte[] buf = new byte[1 << 18];
    private int pos;
    private int limit;
    private long bufferOffset;
    private boolean eof;

    private long recordOffset = -1;
    private int recordType;
    private int dataType;
    private int payloadStart;
    private int payloadLength;

    GdsRecordInput(InputStream in, String file) {
        this.in = in;
        this.file = file;
    }

    String file() {
        return file;
    }

    /**
     * Advances to the next record.
     *
     * @return false at the end of the input when it falls exactly between records
     * @throws GdsFormatException when the input ends inside a record or the length is invalid
     */
    boolean next() throws IOException {
        pos = payloadStart + payloadLength;
        if (!ensure(4)) {
            if (limit - pos == 0) {
                recordOffset = bufferOffset + pos;
                return false;
            }
            throw new GdsFormatException(file, bufferOffset + pos,
                    "file ends inside a record header (" + (limit - pos) + " of 4 bytes present)");
        }
        recordOffset = bufferOffset + pos;
        int length = ((buf[pos] & 0xFF) << 8) | (buf[pos + 1] & 0xFF);
        recordType = buf[pos + 2] & 0xFF;
        dataType = buf[pos + 3] & 0xFF;
        if (length < 4) {
            throw error("record length " + length + " is below the 4-byte header (record type "
                    + GdsRecordType.nameOf(recordType) + ")");
        }
        if ((length & 1) != 0) {
            throw error("record length " + length + " is odd (record type " + GdsRecordType.nameOf(recordType) + ")");
        }
        if (!ensure(length)) {
            throw error("file ends inside " + GdsRecordType.nameOf(recordType) + " record: length " + length
                    + ", only " + (limit - pos) + " bytes left");
        }
        payloadStart = pos + 4;
        payloadLength = length - 4;
        return true;
    }

    /** Makes at least n bytes available from pos; false when the input ends first. */
    private boolean ensure(int n) throws IOException {
        if (limit - pos >= n) {
            return true;
        }
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, limit - pos);
            bufferOffset += pos;
            limit -= pos;
            payloadStart -= pos;
            pos = 0;
        }
        while (limit < n && !eof) {
            int r = in.read(buf, limit, buf.length - limit);
            if (r < 0) {
                eof = true;
            } else {
                limit += r;
            }
        }
        return limit - pos >= n;
    }

    long offset() {
        return recordOffset;
    }

    int type() {
        return recordType;
    }

    int dataType() {
        return dataType;
    }

    int length() {
        return payloadLength;
    }

    int int16(int index) {
        return (short) INT16.get(buf, payloadStart + 2 * index);
    }

    int int32(int index) {
        return (int) INT32.get(buf, payloadStart + 4 * index);
    }

    long int64(int index) {
        return (long) INT64.get(buf, payloadStart + 8 * index);
    }

    double real8(int index) {
        return Real8.decode(int64(index));
    }

    /** Reads all 32-bit values of the payload into a fresh array. */
    int[] int32Array() {
        int n = payloadLength / 4;
        int[] values = new int[n];
        int p = payloadStart;
        for (int i = 0; i < n; i++, p += 4) {
            values[i] = (int) INT32.get(buf, p);
        }
        return values;
    }

    /** The payload as a string: ISO-8859-1, trailing NUL padding removed. */
    String string() {
        int end = payloadStart + payloadLength;
        while (end > payloadStart && buf[end - 1] == 0) {
            end--;
        }
        return new String(buf, payloadStart, end - payloadStart, StandardCharsets.ISO_8859_1);
    }

    /**
     * Consumes the rest of the input after the current record.
     *
     * @return number of non-zero bytes found
     */
    long drainCountingNonZero() throws IOException {
        pos = payloadStart + payloadLength;
        long nonZero = 0;
        while (true) {
            for (int i = pos; i < limit; i++) {
                if (buf[i] != 0) {
                    nonZero++;
                }
            }
            bufferOffset += limit;
            pos = 0;
            limit = 0;
            payloadStart = 0;
            payloadLength = 0;
            if (eof) {
                return nonZero;
            }
            int r = in.read(buf, 0, buf.length);
            if (r < 0) {
                eof = true;
            } else {
                limit = r;
            }
        }
    }

    GdsFormatException error(String problem) {
        return new GdsFormatException(file, recordOffset, problem);
    }
}
