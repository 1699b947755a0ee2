/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.gds;

import java.io.IOException;

/**
 * A GDSII stream that does not follow the format, or describes a layout that cannot be
 * represented (for example a reference to a cell that is not in the file). It is a checked
 * {@link IOException} because it arises while reading input, like the I/O failures it travels
 * with.
 * <p>
 * The message reads {@code "<file>: byte <offset>: <problem>"}, the offset being the position of
 * the first byte of the offending record counted from the start of the file; without an offset it
 * reads {@code "<file>: <problem>"}.
 */
public class GdsFormatException extends IOException {

    private static final long serialVersionUID = 1L;

    private final String file;
    private final long offset;
    private final String problem;

    /**
     * @param file    the file name as the caller knows it (used only in the message)
     * @param offset  byte offset of the offending record, or -1 when the problem has no position
     * @param problem what is wrong, as a sentence fragment without the file and offset
     */
    public GdsFormatException(String file, long offset, String problem) {
        super(offset >= 0 ? file + ": byte " + offset + ": " + problem : file + ": " + problem);
        this.file = file;
        this.offset = offset;
        this.problem = problem;
    }

    /** The file name given to the reader. */
    public String file() {
        return file;
    }

    /** Byte offset of the offending record from the start of the file, or -1. */
    public long offset() {
        return offset;
    }

    /** The problem without file name and offset. */
    public String problem() {
        return problem;
    }
}
