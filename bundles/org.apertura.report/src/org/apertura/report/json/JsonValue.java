/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.json;

import java.math.BigDecimal;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** A parsed JSON value that remembers where it starts in the text. */
public sealed interface JsonValue permits JsonValue.Obj, JsonValue.Arr, JsonValue.Str, JsonValue.Num,
        JsonValue.Bool, JsonValue.Null {

    /** Where the value starts. */
    Position position();

    /** A name for messages: object, array, string, number, boolean or null. */
    String typeName();

    /**
     * A place in the text.
     *
     * @param offset 0-based offset in characters (UTF-16 units)
     * @param line   1-based line
     * @param column 1-based column in characters
     */
    record Position(int offset, int line, int column) {
        @Override
        public String toString() {
            return "line " + line + ", column " + column;
        }
    }

    /**
     * An object; members in text order.
     *
     * @param members       name to value
     * @param names         name to the position of the name
     * @param position      position of the opening brace
     * @param end           position of the closing brace
     */
    record Obj(Map<String, JsonValue> members, Map<String, Position> names, Position position, Position end)
            implements JsonValue {
        public Obj {
            members = Collections.unmodifiableMap(members);
            names = Collections.unmodifiableMap(names);
        }

        public Optional<JsonValue> get(String name) {
            return Optional.ofNullable(members.get(name));
        }

        @Override
        public String typeName() {
            return "object";
        }
    }

    /**
     * An array.
     *
     * @param items    the elements
     * @param position position of the opening bracket
     * @param end      position of the closing bracket
     */
    record Arr(List<JsonValue> items, Position position, Position end) implements JsonValue {
        public Arr {
            items = List.copyOf(items);
        }

        @Override
        public String typeName() {
            return "array";
        }
    }

    /** A string. */
    record Str(String value, Position position) implements JsonValue {
        @Override
        public String typeName() {
            return "string";
        }
    }

    /** A number, exactly as written. */
    record Num(BigDecimal value, Position position) implements JsonValue {
        @Override
        public String typeName() {
            return "number";
        }
    }

    /** true or false. */
    record Bool(boolean value, Position position) implements JsonValue {
        @Override
        public String typeName() {
            return "boolean";
        }
    }

    /** null. */
    record Null(Position position) implements JsonValue {
        @Override
        public String typeName() {
            return "null";
        }
    }
}
