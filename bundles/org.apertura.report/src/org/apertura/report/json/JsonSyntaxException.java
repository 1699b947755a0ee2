/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.json;

import java.io.IOException;

/** Malformed JSON text, with the place of the problem. */
public final class JsonSyntaxException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient JsonValue.Position position;
    private final String problem;

    public JsonSyntaxException(JsonValue.Position position, String problem) {
        super(position + ": " + problem);
        this.position = position;
        this.problem = problem;
    }

    /** Where the problem is. */
    public JsonValue.Position position() {
        return position;
    }

    /** What the problem is, without the place. */
    public String problem() {
        return problem;
    }
}
