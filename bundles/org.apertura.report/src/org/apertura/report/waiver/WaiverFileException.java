/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.waiver;

import java.io.IOException;
import java.nio.file.Path;

/** A waiver file that cannot be read: names the file, the line and column, and the problem. */
public final class WaiverFileException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final int column;
    private final String problem;

    public WaiverFileException(Path file, int line, int column, String problem) {
        super(file + ":" + line + ":" + column + ": " + problem);
        this.file = file;
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /** The file. */
    public Path file() {
        return file;
    }

    /** 1-based line of the problem. */
    public int line() {
        return line;
    }

    /** 1-based column of the problem. */
    public int column() {
        return column;
    }

    /** The problem, without the place. */
    public String problem() {
        return problem;
    }
}
