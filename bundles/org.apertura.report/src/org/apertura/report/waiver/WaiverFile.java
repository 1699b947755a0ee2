/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.waiver;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.apertura.report.io.AtomicFiles;
import org.apertura.report.json.JsonReader;
import org.apertura.report.json.JsonSyntaxException;
import org.apertura.report.json.JsonValue;
import org.apertura.report.json.JsonWriter;
import org.apertura.report.model.Finding;
import org.apertura.report.model.NmBox;
import org.apertura.report.model.Waiver;

/** Reads and extends waiver files; the format is described in the {@linkplain org.apertura.report.waiver package}. */
public final class WaiverFile {

    /** The value of the {@code format} member. */
    public static final String FORMAT = "apertura-waivers";

    /** The file-name suffix appended to the deck's name. */
    public static final String SUFFIX = ".waivers.json";

    private static final Set<String> TOP = Set.of("format", "version", "waivers");
    private static final Set<String> MEMBERS = Set.of("rule", "layer", "box", "fingerprint", "reason", "author", "date",
            "note");

    private WaiverFile() {
    }

    /** The waiver file of a deck: the deck's path with {@value #SUFFIX} appended. */
    public static Path besideDeck(Path deck) {
        return deck.resolveSibling(deck.getFileName() + SUFFIX);
    }

    /**
     * Reads all waivers of {@code file}, in file order.
     *
     * @throws NoSuchFileException when the file does not exist
     * @throws WaiverFileException when the file is not valid UTF-8, not JSON or not a waiver file, naming the
     *                             line and column of the problem
     */
    public static List<Waiver> read(Path file) throws IOException {
        return parse(file, readText(file)).waivers;
    }

    /** Reads {@code file} when it exists; no file means no waivers. */
    public static List<Waiver> readIfPresent(Path file) throws IOException {
        return Files.exists(file) ? read(file) : List.of();
    }

    /**
     * Adds a waiver for {@code finding} to {@code file} (created if missing) and returns it. When a waiver in
     * the file already matches the finding, that waiver is returned and nothing is written. The file is written
     * atomically; all other text in it is kept as it was.
     *
     * @throws WaiverFileException when the existing file cannot be read (it is then left untouched)
     * @throws IllegalArgumentException when reason or author is blank
     */
    public static Waiver add(Path file, Finding finding, String reason, String author, LocalDate date)
            throws IOException {
        Waiver w = Waiver.forFinding(finding, reason, author, date);
        if (!Files.exists(file)) {
            String nl = System.lineSeparator().equals("\r\n") ? "\r\n" : "\n";
            String text = "{" + nl + "  \"format\": \"" + FORMAT + "\"," + nl + "  \"version\": 1," + nl
                    + "  \"waivers\": [" + nl + entry(w, nl) + nl + "  ]" + nl + "}" + nl;
            return verifyAndWrite(file, text, 1);
        }
        String text = readText(file);
        Parsed p = parse(file, text);
        for (Waiver existing : p.waivers) {
            if (Waivers.matches(existing, finding)) {
                return existing;
            }
        }
        String nl = text.contains("\r\n") ? "\r\n" : "\n";
        String updated;
        if (p.array.items().isEmpty()) {
            int at = p.array.position().offset() + 1;
            updated = text.substring(0, at) + nl + entry(w, nl) + nl + "  " + text.substring(at);
        } else {
            JsonValue last = p.array.items().get(p.array.items().size() - 1);
            int at = ((JsonValue.Obj) last).end().offset() + 1;
            updated = text.substring(0, at) + "," + nl + entry(w, nl) + text.substring(at);
        }
        return verifyAndWrite(file, updated, p.waivers.size() + 1);
    }

    /** Writes {@code text} after checking it reads back with {@code expected} waivers; returns the last one. */
    private static Waiver verifyAndWrite(Path file, String text, int expected) throws IOException {
        // the text we are about to write must read back whole; anything else is our bug, not the user's
        Parsed check = parse(file, text);
        if (check.waivers.size() != expected) {
            throw new IllegalStateException("waiver insertion produced " + check.waivers.size() + " waivers, expected "
                    + expected);
        }
        AtomicFiles.writeString(file, text);
        return check.waivers.get(expected - 1);
    }

    private static String entry(Waiver w, String nl) {
        StringBuilder sb = new StringBuilder();
        String i = "      ";
        sb.append("    {").append(nl);
        sb.append(i).append("\"rule\": ").append(JsonWriter.quote(w.rule())).append(',').append(nl);
        sb.append(i).append("\"layer\": ").append(JsonWriter.quote(w.layer())).append(',').append(nl);
        w.box().ifPresent(b -> sb.append(i).append("\"box\": [").append(JsonWriter.number(b.x1())).append(", ")
                .append(JsonWriter.number(b.y1())).append(", ").append(JsonWriter.number(b.x2())).append(", ")
                .append(JsonWriter.number(b.y2())).append("],").append(nl));
        w.fingerprint().ifPresent(f -> sb.append(i).append("\"fingerprint\": ").append(JsonWriter.quote(f)).append(',')
                .append(nl));
        sb.append(i).append("\"reason\": ").append(JsonWriter.quote(w.reason())).append(',').append(nl);
        sb.append(i).append("\"author\": ").append(JsonWriter.quote(w.author())).append(',').append(nl);
        sb.append(i).append("\"date\": ").append(JsonWriter.quote(w.date().toString())).append(nl);
        sb.append("    }");
        return sb.toString();
    }

    private record Parsed(List<Waiver> waivers, JsonValue.Arr array) {
    }

    private static String readText(Path file) throws IOException {
        byte[] bytes = Files.readAllBytes(file);
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = dec.decode(in, out, true);
        if (!r.isError()) {
            r = dec.flush(out);
        }
        if (r.isError()) {
            int bad = in.position();
            int line = 1;
            int lineStart = 0;
            for (int k = 0; k < bad; k++) {
                if (bytes[k] == '\n') {
                    line++;
                    lineStart = k + 1;
                }
            }
            throw new WaiverFileException(file, line, bad - lineStart + 1,
                    "not valid UTF-8 at byte offset " + bad);
        }
        out.flip();
        return out.toString();
    }

    private static Parsed parse(Path file, String text) throws WaiverFileException {
        JsonValue root;
        try {
            root = JsonReader.parse(text);
        } catch (JsonSyntaxException e) {
            throw new WaiverFileException(file, e.position().line(), e.position().column(), e.problem());
        }
        JsonValue.Obj top = object(file, root, "the waiver file");
        for (String name : top.members().keySet()) {
            if (!TOP.contains(name)) {
                throw err(file, top.names().get(name), "unknown member \"" + name + "\" (expected format, version, waivers)");
            }
        }
        JsonValue fmt = required(file, top, "format");
        if (!(fmt instanceof JsonValue.Str s) || !s.value().equals(FORMAT)) {
            throw err(file, fmt.position(), "\"format\" must be \"" + FORMAT + "\"");
        }
        JsonValue ver = required(file, top, "version");
        if (!(ver instanceof JsonValue.Num n) || n.value().compareTo(BigDecimal.ONE) != 0) {
            throw err(file, ver.position(), "unsupported \"version\" (this Apertura reads version 1)");
        }
        JsonValue arr = required(file, top, "waivers");
        if (!(arr instanceof JsonValue.Arr a)) {
            throw err(file, arr.position(), "\"waivers\" must be an array, found " + arr.typeName());
        }
        List<Waiver> out = new ArrayList<>();
        for (JsonValue item : a.items()) {
            out.add(waiver(file, object(file, item, "a waiver")));
        }
        return new Parsed(List.copyOf(out), a);
    }

    private static Waiver waiver(Path file, JsonValue.Obj o) throws WaiverFileException {
        for (String name : o.members().keySet()) {
            if (!MEMBERS.contains(name)) {
                throw err(file, o.names().get(name), "unknown member \"" + name
                        + "\" in a waiver (expected rule, layer, box, fingerprint, reason, author, date, note)");
            }
        }
        String rule = text(file, o, "rule");
        String layer = text(file, o, "layer");
        String reason = text(file, o, "reason");
        String author = text(file, o, "author");
        JsonValue dv = required(file, o, "date");
        LocalDate date;
        try {
            if (!(dv instanceof JsonValue.Str ds) || !ds.value().matches("\\d{4}-\\d{2}-\\d{2}")) {
                throw new DateTimeParseException("", "", 0);
            }
            date = LocalDate.parse(ds.value());
        } catch (DateTimeParseException e) {
            throw err(file, dv.position(), "\"date\" must be a date written YYYY-MM-DD");
        }
        Optional<NmBox> box = Optional.empty();
        Optional<JsonValue> bv = o.get("box");
        if (bv.isPresent()) {
            if (!(bv.get() instanceof JsonValue.Arr ba) || ba.items().size() != 4
                    || !ba.items().stream().allMatch(x -> x instanceof JsonValue.Num)) {
                throw err(file, bv.get().position(), "\"box\" must be an array of 4 numbers [x1, y1, x2, y2] in nm");
            }
            double[] c = ba.items().stream().mapToDouble(x -> ((JsonValue.Num) x).value().doubleValue()).toArray();
            for (double v : c) {
                if (!Double.isFinite(v)) {
                    throw err(file, bv.get().position(), "\"box\" coordinate out of range");
                }
            }
            box = Optional.of(new NmBox(c[0], c[1], c[2], c[3]));
        }
        Optional<String> fp = Optional.empty();
        Optional<JsonValue> fv = o.get("fingerprint");
        if (fv.isPresent()) {
            if (!(fv.get() instanceof JsonValue.Str fs) || !fs.value().matches("[0-9a-f]{16}")) {
                throw err(file, fv.get().position(), "\"fingerprint\" must be 16 lower-case hex digits");
            }
            fp = Optional.of(fs.value());
        }
        if (box.isEmpty() && fp.isEmpty()) {
            throw err(file, o.position(), "a waiver needs \"box\" or \"fingerprint\" to say which finding it covers");
        }
        Optional<JsonValue> note = o.get("note");
        if (note.isPresent() && !(note.get() instanceof JsonValue.Str)) {
            throw err(file, note.get().position(), "\"note\" must be a string");
        }
        return new Waiver(rule, layer, box, fp, reason, author, date,
                Optional.of(file.getFileName() + ":" + o.position().line()));
    }

    private static JsonValue.Obj object(Path file, JsonValue v, String what) throws WaiverFileException {
        if (!(v instanceof JsonValue.Obj o)) {
            throw err(file, v.position(), what + " must be a JSON object, found " + v.typeName());
        }
        return o;
    }

    private static JsonValue required(Path file, JsonValue.Obj o, String name) throws WaiverFileException {
        JsonValue v = o.members().get(name);
        if (v == null) {
            throw err(file, o.position(), "missing \"" + name + "\"");
        }
        return v;
    }

    private static String text(Path file, JsonValue.Obj o, String name) throws WaiverFileException {
        JsonValue v = required(file, o, name);
        if (!(v instanceof JsonValue.Str s)) {
            throw err(file, v.position(), "\"" + name + "\" must be a string, found " + v.typeName());
        }
        if (s.value().isBlank()) {
            throw err(file, v.position(), "\"" + name + "\" must not be blank");
        }
        return s.value();
    }

    private static WaiverFileException err(Path file, JsonValue.Position p, String problem) {
        return new WaiverFileException(file, p.line(), p.column(), problem);
    }
}
