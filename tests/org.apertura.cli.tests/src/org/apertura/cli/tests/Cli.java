/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.tests;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apertura.cli.AperturaCommand;
import org.apertura.report.json.JsonReader;
import org.apertura.report.json.JsonValue;

/** Runs the command in-process and reads what it wrote; finds the repository and its samples. */
final class Cli {

    /** The version the tests pass to the command. */
    static final String VERSION = "9.8.7-test";

    /** What one run printed and returned. */
    record Result(int exit, String out, String err) {
        @Override
        public String toString() {
            return "exit " + exit + "\n--- stdout\n" + out + "--- stderr\n" + err;
        }
    }

    private Cli() {
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = AperturaCommand.execute(VERSION, new PrintWriter(out), new PrintWriter(err), args);
        return new Result(code, out.toString(), err.toString());
    }

    /**
     * The repository root: the system property {@code apertura.root} set by the build, else the first folder
     * up from the working directory that holds both {@code bundles/} and {@code tests/}.
     */
    static Path root() {
        String p = System.getProperty("apertura.root");
        if (p != null && !p.isBlank()) {
            return Path.of(p).toAbsolutePath().normalize();
        }
        for (Path d = Path.of("").toAbsolutePath(); d != null; d = d.getParent()) {
            if (Files.isDirectory(d.resolve("bundles")) && Files.isDirectory(d.resolve("tests"))) {
                return d;
            }
        }
        throw new IllegalStateException("repository root not found: set -Dapertura.root");
    }

    static Path deck() {
        return root().resolve("samples/decks/meridian-mx3.apdeck");
    }

    static Path layout() {
        return root().resolve("samples/layouts/meridian-block.gds");
    }

    /** Copies the sample decks into {@code dir} (so that a waiver file can sit beside them) and returns the main one. */
    static Path copyDecks(Path dir) throws IOException {
        for (String n : List.of("meridian-mx3.apdeck", "meridian-layers.apdeck")) {
            Files.copy(root().resolve("samples/decks").resolve(n), dir.resolve(n));
        }
        return dir.resolve("meridian-mx3.apdeck");
    }

    static JsonValue.Obj json(Path file) throws IOException {
        return (JsonValue.Obj) JsonReader.parse(Files.readString(file, StandardCharsets.UTF_8));
    }

    static JsonValue get(JsonValue v, String... path) {
        JsonValue x = v;
        for (String name : path) {
            x = ((JsonValue.Obj) x).get(name).orElseThrow(() -> new AssertionError("no member " + name));
        }
        return x;
    }

    static List<JsonValue> items(JsonValue v, String... path) {
        return ((JsonValue.Arr) get(v, path)).items();
    }

    static String str(JsonValue v, String... path) {
        return ((JsonValue.Str) get(v, path)).value();
    }

    static BigDecimal num(JsonValue v, String... path) {
        return ((JsonValue.Num) get(v, path)).value();
    }
}
