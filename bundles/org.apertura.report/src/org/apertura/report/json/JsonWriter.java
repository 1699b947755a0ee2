/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.json;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Streams JSON text with two-space indentation. Calls must form a valid document: {@link #name(String)}
 * before each value inside an object, values directly inside arrays; misuse throws
 * {@link IllegalStateException}. I/O errors are rethrown as {@link UncheckedIOException}.
 */
public final class JsonWriter {

    private enum Ctx { OBJECT, ARRAY }

    private final Writer out;
    private final Deque<Ctx> stack = new ArrayDeque<>();
    private final Deque<Boolean> empty = new ArrayDeque<>();
    private boolean nameWritten;
    private boolean done;

    /** Writes to {@code out}; the caller closes it. */
    public JsonWriter(Writer out) {
        this.out = out;
    }

    public JsonWriter beginObject() {
        beforeValue();
        raw("{");
        stack.push(Ctx.OBJECT);
        empty.push(true);
        return this;
    }

    public JsonWriter endObject() {
        return end(Ctx.OBJECT, "}");
    }

    public JsonWriter beginArray() {
        beforeValue();
        raw("[");
        stack.push(Ctx.ARRAY);
        empty.push(true);
        return this;
    }

    public JsonWriter endArray() {
        return end(Ctx.ARRAY, "]");
    }

    /** The member name of the next value; only inside an object. */
    public JsonWriter name(String name) {
        if (stack.peek() != Ctx.OBJECT || nameWritten) {
            throw new IllegalStateException("a name belongs directly inside an object, before its value");
        }
        separator();
        raw(quote(name));
        raw(": ");
        nameWritten = true;
        return this;
    }

    public JsonWriter value(String s) {
        if (s == null) {
            return nullValue();
        }
        return scalar(quote(s));
    }

    public JsonWriter value(boolean b) {
        return scalar(b ? "true" : "false");
    }

    public JsonWriter value(long v) {
        return scalar(Long.toString(v));
    }

    /** A finite number in its shortest round-trip form; integral values are written without a fraction. */
    public JsonWriter value(double v) {
        return scalar(number(v));
    }

    public JsonWriter nullValue() {
        return scalar("null");
    }

    /** Shortcut for {@code name(n).value(s)}. */
    public JsonWriter member(String n, String s) {
        return name(n).value(s);
    }

    /** Shortcut for {@code name(n).value(v)}. */
    public JsonWriter member(String n, double v) {
        return name(n).value(v);
    }

    /** Shortcut for {@code name(n).value(v)}. */
    public JsonWriter member(String n, long v) {
        return name(n).value(v);
    }

    /** Shortcut for {@code name(n).value(b)}. */
    public JsonWriter member(String n, boolean b) {
        return name(n).value(b);
    }

    /** Writes the final newline; the document must be complete. */
    public void finish() {
        if (!stack.isEmpty() || !done) {
            throw new IllegalStateException("JSON document is incomplete");
        }
        raw("\n");
    }

    /** A JSON number for a finite double: integral values up to 2^53 without fraction, others shortest form. */
    public static String number(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("JSON has no representation for " + v);
        }
        if (v == Math.rint(v) && Math.abs(v) < 9.007199254740992E15) {
            return Long.toString((long) v);
        }
        String s = BigDecimal.valueOf(v).toString();
        return s.replace("E+", "E");
    }

    /** {@code s} as a JSON string literal, escaped per RFC 8259 section 7. */
    public static String quote(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
            case '"' -> sb.append("\\\"");
            case '\\' -> sb.append("\\\\");
            case '\n' -> sb.append("\\n");
            case '\r' -> sb.append("\\r");
            case '\t' -> sb.append("\\t");
            case '\b' -> sb.append("\\b");
            case '\f' -> sb.append("\\f");
            default -> {
                if (c < 0x20 || c == '\u2028' || c == '\u2029') {
                    sb.append(String.format("\\u%04x", (int) c));
                } else {
                    sb.append(c);
                }
            }
            }
        }
        return sb.append('"').toString();
    }

    private JsonWriter end(Ctx ctx, String close) {
        if (stack.peek() != ctx || nameWritten) {
            throw new IllegalStateException("unbalanced " + close);
        }
        stack.pop();
        boolean wasEmpty = empty.pop();
        if (!wasEmpty) {
            newline();
        }
        raw(close);
        if (stack.isEmpty()) {
            done = true;
        }
        return this;
    }

    private void beforeValue() {
        if (done) {
            throw new IllegalStateException("JSON document already complete");
        }
        Ctx c = stack.peek();
        if (c == Ctx.OBJECT) {
            if (!nameWritten) {
                throw new IllegalStateException("value inside an object needs a name first");
            }
            nameWritten = false;
        } else if (c == Ctx.ARRAY) {
            separator();
        }
    }

    private JsonWriter scalar(String text) {
        beforeValue();
        raw(text);
        if (stack.isEmpty()) {
            done = true;
        }
        return this;
    }

    private void separator() {
        if (!empty.peek()) {
            raw(",");
        }
        empty.pop();
        empty.push(false);
        newline();
    }

    private void newline() {
        raw("\n");
        raw("  ".repeat(stack.size()));
    }

    private void raw(String s) {
        try {
            out.write(s);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
