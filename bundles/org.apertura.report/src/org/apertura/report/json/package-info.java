/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * A small JSON writer and reader of our own (RFC 8259), so the report bundle needs no JSON library.
 *
 * <p>{@link org.apertura.report.json.JsonWriter} streams pretty-printed JSON: strings escape {@code "},
 * {@code \\} and every control character below U+0020 (as RFC 8259 &sect;7 requires) and also U+2028/U+2029
 * so the text can be embedded in a script; non-finite numbers are refused. {@link
 * org.apertura.report.json.JsonReader} parses a whole document into {@link org.apertura.report.json.JsonValue}
 * nodes that remember their position (offset, line, column), so callers can name the place of a problem;
 * malformed text raises {@link org.apertura.report.json.JsonSyntaxException} with that place. Duplicate
 * object keys are rejected.
 */
package org.apertura.report.json;
