/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.tests.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.Random;

import org.apertura.report.json.JsonReader;
import org.apertura.report.json.JsonSyntaxException;
import org.apertura.report.json.JsonValue;
import org.apertura.report.json.JsonWriter;
import org.apertura.report.tests.Schemas;
import org.junit.jupiter.api.Test;

class JsonTest {

    @Test
    void stringsAreEscapedAsRfc8259Requires() throws Exception {
        // RFC 8259 section 7: quotation mark, reverse solidus and U+0000..U+001F must be escaped
        assertEquals("\"a\\\"b\\\\c\"", JsonWriter.quote("a\"b\\c"));
        assertEquals("\"\\n\\t\\u0001\\u001f\"", JsonWriter.quote("\n\t\u0001\u001f"));
        String nasty = "x\u0000y\u2028z \u00e9 \uD83D\uDE00 </script>";
        // an independent parser (Jackson) reads our text back to the same string
        assertEquals(nasty, Schemas.tree(JsonWriter.quote(nasty)).asText());
        JsonValue v = JsonReader.parse(JsonWriter.quote(nasty));
        assertEquals(nasty, ((JsonValue.Str) v).value());
    }

    @Test
    void numbersRoundTripExactly() throws Exception {
        Random r = new Random(7);
        for (int i = 0; i < 2000; i++) {
            double d = switch (i % 4) {
            case 0 -> r.nextDouble() * 1e6;
            case 1 -> r.nextGaussian() * 1e-7;
            case 2 -> Math.rint(r.nextGaussian() * 1e9);
            default -> Double.longBitsToDouble(r.nextLong()) % 1e300;
            };
            if (!Double.isFinite(d)) {
                continue;
            }
            String s = JsonWriter.number(d);
            assertEquals(d, Schemas.tree(s).doubleValue(), s);
            assertEquals(d, ((JsonValue.Num) JsonReader.parse(s)).value().doubleValue(), s);
        }
        assertEquals("36", JsonWriter.number(36.0));
        assertEquals("0.44", JsonWriter.number(0.44));
        assertThrows(IllegalArgumentException.class, () -> JsonWriter.number(Double.NaN));
    }

    @Test
    void writerRefusesAnIncompleteOrMisnestedDocument() {
        StringWriter sw = new StringWriter();
        JsonWriter w = new JsonWriter(sw);
        w.beginObject();
        assertThrows(IllegalStateException.class, () -> w.value("no name"));
        assertThrows(IllegalStateException.class, w::endArray);
        assertThrows(IllegalStateException.class, w::finish);
        w.member("a", 1).endObject().finish();
        assertEquals("{\n  \"a\": 1\n}\n", sw.toString());
    }

    @Test
    void readerNamesLineAndColumnOfTheProblem() {
        JsonSyntaxException e = assertThrows(JsonSyntaxException.class,
                () -> JsonReader.parse("{\n  \"a\": 1,\n  \"b\": tru\n}"));
        assertEquals(3, e.position().line());
        assertEquals(8, e.position().column());
        e = assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("{\"a\":1,\"a\":2}"));
        assertTrue(e.getMessage().contains("duplicate"), e.getMessage());
        assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("[1,]"));
        assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("01"));
        assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("\"tab\there\""));
        assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("[1] 2"));
        assertThrows(JsonSyntaxException.class, () -> JsonReader.parse("[".repeat(JsonReader.MAX_DEPTH + 2)));
    }

    @Test
    void readerKeepsPositionsOfValues() throws Exception {
        JsonValue.Obj o = (JsonValue.Obj) JsonReader.parse("{\n  \"list\": [\n    {\"k\": \"v\"}\n  ]\n}");
        JsonValue.Arr a = (JsonValue.Arr) o.get("list").orElseThrow();
        assertEquals(2, a.position().line());
        assertEquals(4, a.end().line());
        assertEquals(3, a.items().get(0).position().line());
        assertEquals(5, a.items().get(0).position().column());
    }
}
