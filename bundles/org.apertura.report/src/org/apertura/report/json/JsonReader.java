/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.json;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Parses one JSON document (RFC 8259) into {@link JsonValue}s with positions. A leading byte-order mark is
 * skipped; nesting deeper than {@value #MAX_DEPTH} is refused rather than risking the stack.
 */
public final class JsonReader {

    /** The deepest nesting accepted. */
    public static final int MAX_DEPTH = 256;

    private final String text;
    private int pos;
    private int line = 1;
    private int lineStart;

    private JsonReader(String text) {
        this.text = text;
        if (text.startsWith("\uFEFF")) {
            pos = 1;
            lineStart = 1;
        }
    }

    /** Parses {@code text}, which must hold exactly one value (whitespace around it is allowed). */
    public static JsonValue parse(String text) throws JsonSyntaxException {
        JsonReader r = new JsonReader(text);
        r.skipWs();
        JsonValue v = r.value(0);
        r.skipWs();
        if (r.pos < text.length()) {
            throw r.error("unexpected text after the JSON value");
        }
        return v;
    }

    private JsonValue value(int depth) throws JsonSyntaxException {
        if (depth > MAX_DEPTH) {
            throw error("nesting deeper than " + MAX_DEPTH);
        }
        if (pos >= text.length()) {
            throw error("unexpected end of text, expected a value");
        }
        char c = text.charAt(pos);
        return switch (c) {
        case '{' -> object(depth);
        case '[' -> array(depth);
        case '"' -> {
            JsonValue.Position at = here(pos);
            yield new JsonValue.Str(string(), at);
        }
        case 't' -> literal("true", new JsonValue.Bool(true, here(pos)));
        case 'f' -> literal("false", new JsonValue.Bool(false, here(pos)));
        case 'n' -> literal("null", new JsonValue.Null(here(pos)));
        default -> {
            if (c == '-' || (c >= '0' && c <= '9')) {
                yield number();
            }
            throw error("unexpected character " + describe(c) + ", expected a value");
        }
        };
    }

    private JsonValue object(int depth) throws JsonSyntaxException {
        JsonValue.Position start = here(pos);
        pos++;
        Map<String, JsonValue> members = new LinkedHashMap<>();
        Map<String, JsonValue.Position> names = new LinkedHashMap<>();
        skipWs();
        if (peek() == '}') {
            JsonValue.Position end = here(pos);
            pos++;
            return new JsonValue.Obj(members, names, start, end);
        }
        while (true) {
            skipWs();
            if (peek() != '"') {
                throw error("expected a member name in double quotes");
            }
            JsonValue.Position namePos = here(pos);
            String name = string();
            if (members.containsKey(name)) {
                throw new JsonSyntaxException(namePos, "duplicate member name \"" + name + "\"");
            }
            skipWs();
            expect(':');
            skipWs();
            members.put(name, value(depth + 1));
            names.put(name, namePos);
            skipWs();
            char c = peek();
            if (c == ',') {
                pos++;
            } else if (c == '}') {
                JsonValue.Position end = here(pos);
                pos++;
                return new JsonValue.Obj(members, names, start, end);
            } else {
                throw error("expected ',' or '}' after an object member");
            }
        }
    }

    private JsonValue array(int depth) throws JsonSyntaxException {
        JsonValue.Position start = here(pos);
        pos++;
        List<JsonValue> items = new ArrayList<>();
        skipWs();
        if (peek() == ']') {
            JsonValue.Position end = here(pos);
            pos++;
            return new JsonValue.Arr(items, start, end);
        }
        while (true) {
            skipWs();
            items.add(value(depth + 1));
            skipWs();
            char c = peek();
            if (c == ',') {
                pos++;
            } else if (c == ']') {
                JsonValue.Position end = here(pos);
                pos++;
                return new JsonValue.Arr(items, start, end);
            } else {
                throw error("expected ',' or ']' after an array element");
            }
        }
    }

    private String string() throws JsonSyntaxException {
        pos++; // opening quote
        StringBuilder sb = new StringBuilder();
        while (true) {
            if (pos >= text.length()) {
                throw error("unterminated string");
            }
            char c = text.charAt(pos);
            if (c == '"') {
                pos++;
                return sb.toString();
            }
            if (c < 0x20) {
                throw error("control character " + describe(c) + " must be escaped inside a string");
            }
            if (c == '\\') {
                if (pos + 1 >= text.length()) {
                    throw error("unterminated escape");
                }
                char e = text.charAt(pos + 1);
                switch (e) {
                case '"', '\\', '/' -> sb.append(e);
                case 'b' -> sb.append('\b');
                case 'f' -> sb.append('\f');
                case 'n' -> sb.append('\n');
                case 'r' -> sb.append('\r');
                case 't' -> sb.append('\t');
                case 'u' -> {
                    if (pos + 6 > text.length()) {
                        throw error("incomplete \\u escape");
                    }
                    String hex = text.substring(pos + 2, pos + 6);
                    if (!hex.matches("[0-9a-fA-F]{4}")) {
                        throw error("bad \\u escape '" + hex + "'");
                    }
                    sb.append((char) Integer.parseInt(hex, 16));
                    pos += 4;
                }
                default -> throw error("unknown escape \\" + e);
                }
                pos += 2;
            } else {
                sb.append(c);
                pos++;
            }
        }
    }

    private JsonValue number() throws JsonSyntaxException {
        JsonValue.Position start = here(pos);
        int s = pos;
        if (peek() == '-') {
            pos++;
        }
        if (peek() == '0') {
            pos++;
        } else if (isDigit(peek())) {
            while (isDigit(peek())) {
                pos++;
            }
        } else {
            throw error("expected a digit");
        }
        if (peek() == '.') {
            pos++;
            if (!isDigit(peek())) {
                throw error("expected a digit after the decimal point");
            }
            while (isDigit(peek())) {
                pos++;
            }
        }
        if (peek() == 'e' || peek() == 'E') {
            pos++;
            if (peek() == '+' || peek() == '-') {
                pos++;
            }
            if (!isDigit(peek())) {
                throw error("expected a digit in the exponent");
            }
            while (isDigit(peek())) {
                pos++;
            }
        }
        return new JsonValue.Num(new BigDecimal(text.substring(s, pos)), start);
    }

    private JsonValue literal(String word, JsonValue v) throws JsonSyntaxException {
        if (!text.startsWith(word, pos)) {
            throw error("unexpected text, expected a value");
        }
        pos += word.length();
        return v;
    }

    private void expect(char c) throws JsonSyntaxException {
        if (peek() != c) {
            throw error("expected '" + c + "'");
        }
        pos++;
    }

    private char peek() {
        return pos < text.length() ? text.charAt(pos) : '\u0000';
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private void skipWs() {
        while (pos < text.length()) {
            char c = text.charAt(pos);
            if (c == '\n') {
                line++;
                lineStart = pos + 1;
            } else if (c != ' ' && c != '\t' && c != '\r') {
                return;
            }
            pos++;
        }
    }

    private JsonValue.Position here(int p) {
        return new JsonValue.Position(p, line, p - lineStart + 1);
    }

    private JsonSyntaxException error(String problem) {
        return new JsonSyntaxException(here(Math.min(pos, text.length())), problem);
    }

    private static String describe(char c) {
        return c < 0x20 || c > 0x7e ? String.format("U+%04X", (int) c) : "'" + c + "'";
    }
}
