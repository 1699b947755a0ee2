/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.tests.gds;

import java.io.DataInputStream;
import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;

/**
 * An independent, minimal record counter used to cross-check the reader on real files: walks the
 * records (2-byte length, type byte, data type byte per the GDS II Stream Format Manual 6.0) up to
 * ENDLIB and counts them by type byte. Shares no code with the reader.
 */
final class RawRecordScan {

    private RawRecordScan() {
    }

    /** Record counts by type byte. */
    static Map<Integer, Integer> countByType(Path file) throws IOException {
        Map<Integer, Integer> counts = new TreeMap<>();
        try (InputStream in = Files.newInputStream(file); DataInputStream data = new DataInputStream(in)) {
            while (true) {
                int length;
                try {
                    length = data.readUnsignedShort();
                } catch (EOFException e) {
                    break;
                }
                int type = data.readUnsignedByte();
                data.readUnsignedByte();
                data.skipNBytes(length - 4);
                counts.merge(type, 1, Integer::sum);
                if (type == 0x04) {
                    break;
                }
            }
        }
        return counts;
    }
}
