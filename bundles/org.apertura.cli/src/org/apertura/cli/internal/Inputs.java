/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apertura.layout.gds.GdsFormatException;
import org.apertura.migrate.layout.LayoutLayers;
import org.apertura.report.model.InputFile;
import org.apertura.report.model.Waiver;
import org.apertura.report.waiver.WaiverFile;
import org.apertura.report.waiver.WaiverFileException;
import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * Reads the inputs of a command and turns every problem with them into an {@link InputException} with a
 * one-line message naming the file and, where the reader knows it, the position: {@code file:line:column}
 * for decks and waiver files, {@code file: byte N} for GDSII streams.
 */
public final class Inputs {

    private Inputs() {
    }

    /** Checks that {@code file} exists and is a readable regular file. */
    public static void requireFile(Path file, String what) throws InputException {
        if (!Files.exists(file)) {
            throw new InputException(file + ": no such " + what + " file");
        }
        if (!Files.isRegularFile(file)) {
            throw new InputException(file + ": not a file (a " + what + " file is expected)");
        }
        if (!Files.isReadable(file)) {
            throw new InputException(file + ": cannot read the " + what + " file (permission denied)");
        }
    }

    /**
     * Loads a deck; the first error ends the command, naming its file, line and column (and how many more
     * errors there are). Warnings are printed on {@code err}.
     */
    public static ResolvedDeck deck(Path file, PrintWriter err) throws InputException {
        requireFile(file, "deck");
        DeckLoadResult r = new DeckLoader().load(file);
        for (DeckDiagnostic d : r.diagnostics()) {
            if (d.severity() == DeckDiagnostic.Severity.WARNING) {
                err.println("apertura: warning: " + place(d) + d.message());
            }
        }
        if (r.hasErrors() || r.deck().isEmpty()) {
            List<DeckDiagnostic> errors = r.errors();
            if (errors.isEmpty()) {
                throw new InputException(file + ": the deck could not be resolved");
            }
            DeckDiagnostic first = errors.get(0);
            String more = errors.size() > 1 ? " (and " + (errors.size() - 1) + " more error"
                    + (errors.size() > 2 ? "s" : "") + ")" : "";
            throw new InputException(place(first) + oneLine(first.message()) + more);
        }
        return r.deck().get();
    }

    private static String place(DeckDiagnostic d) {
        return d.line() > 0 ? d.file() + ":" + d.line() + ":" + Math.max(1, d.column()) + ": " : d.file() + ": ";
    }

    /**
     * Reads a GDSII layout for {@code deck}: format errors name the byte offset, other read errors the file.
     */
    public static LayoutLayers layout(Path file, ResolvedDeck deck, Optional<String> cell) throws InputException {
        requireFile(file, "layout");
        try {
            return LayoutLayers.read(file, deck, cell);
        } catch (GdsFormatException e) {
            throw new InputException(oneLine(e.getMessage()), e);
        } catch (NoSuchFileException e) {
            throw new InputException(file + ": no such layout file", e);
        } catch (AccessDeniedException e) {
            throw new InputException(file + ": cannot read the layout file (permission denied)", e);
        } catch (IOException e) {
            String m = e.getMessage() == null ? e.toString() : e.getMessage();
            throw new InputException(oneLine(m.startsWith(file.toString()) ? m : file + ": " + m), e);
        } catch (IllegalArgumentException e) {
            String m = e.getMessage() == null ? e.toString() : e.getMessage();
            throw new InputException(oneLine(m.startsWith(file.toString()) ? m : file + ": " + m), e);
        }
    }

    /** Checks the deck has the option, or names the valid ones. */
    public static LithographyOption option(Path deckFile, ResolvedDeck deck, String name) throws InputException {
        Optional<LithographyOption> o = deck.option(name);
        if (o.isEmpty()) {
            throw new InputException(deckFile + ": no option '" + name + "' in deck '" + deck.technology()
                    + "' (options: " + String.join(", ", deck.options().stream().map(LithographyOption::name).toList())
                    + ")");
        }
        return o.get();
    }

    /** The named layers in deck order, or names the valid ones; every layer when {@code names} is empty. */
    public static List<String> layers(Path deckFile, ResolvedDeck deck, List<String> names) throws InputException {
        if (names.isEmpty()) {
            return deck.layers().stream().map(Layer::name).toList();
        }
        Set<String> wanted = new LinkedHashSet<>(names);
        for (String n : wanted) {
            if (deck.layer(n).isEmpty()) {
                throw new InputException(deckFile + ": no layer '" + n + "' in deck '" + deck.technology()
                        + "' (layers: " + String.join(", ", deck.layers().stream().map(Layer::name).toList()) + ")");
            }
        }
        return deck.layers().stream().map(Layer::name).filter(wanted::contains).toList();
    }

    /**
     * The waivers to apply: the file given, which must exist; else the file beside the deck
     * ({@code <deck>.waivers.json}) when it exists; none when {@code disabled}.
     */
    public static WaiverInput waivers(Optional<Path> given, Path deckFile, boolean disabled) throws InputException {
        if (disabled) {
            return new WaiverInput(Optional.empty(), List.of());
        }
        Path file = given.orElse(WaiverFile.besideDeck(deckFile));
        if (given.isPresent()) {
            requireFile(file, "waiver");
        } else if (!Files.exists(file)) {
            return new WaiverInput(Optional.empty(), List.of());
        }
        try {
            return new WaiverInput(Optional.of(file), WaiverFile.read(file));
        } catch (WaiverFileException e) {
            throw new InputException(oneLine(e.getMessage()), e);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read the waiver file: " + oneLine(String.valueOf(e.getMessage())), e);
        }
    }

    /**
     * The waivers of a run.
     *
     * @param file    where they were read from, empty when there is no waiver file
     * @param waivers the waivers, in file order
     */
    public record WaiverInput(Optional<Path> file, List<Waiver> waivers) {
        /** Copies the list. */
        public WaiverInput {
            waivers = List.copyOf(waivers);
        }
    }

    /** Hashes an input for the provenance record. */
    public static InputFile hash(String role, Path file) throws InputException {
        try {
            return InputFile.hash(role, file);
        } catch (IOException e) {
            throw new InputException(file + ": cannot read the " + role + " file to hash it: " + e.getMessage(), e);
        }
    }

    /** The inputs of a run with their hashes; waivers are added when a file was read. */
    public static List<InputFile> hashes(WaiverInput waivers, Object... roleAndPath) throws InputException {
        List<InputFile> out = new ArrayList<>();
        for (int i = 0; i < roleAndPath.length; i += 2) {
            String role = (String) roleAndPath[i];
            Path file = (Path) roleAndPath[i + 1];
            out.add(hash(role, file));
            if (role.equals("deck")) {
                for (Path imported : deckImports(file)) {
                    out.add(hash("deck import", imported));
                }
            }
        }
        if (waivers.file().isPresent()) {
            out.add(hash("waivers", waivers.file().get()));
        }
        return out;
    }

    private static final Pattern IMPORT = Pattern.compile("(?m)^\\s*import\\s+\"([^\"]+)\"");

    /**
     * The files a deck imports, directly or through other imports, in the order first met; each path
     * resolved against the importing file's folder, as the deck loader does. A deck that loaded has
     * every import in place, so unreadable files are left to the loader's own error.
     */
    static List<Path> deckImports(Path deck) {
        Set<Path> seen = new LinkedHashSet<>();
        java.util.ArrayDeque<Path> todo = new java.util.ArrayDeque<>();
        Path start = deck.toAbsolutePath().normalize();
        todo.add(start);
        while (!todo.isEmpty()) {
            Path file = todo.poll();
            String text;
            try {
                text = Files.readString(file);
            } catch (IOException e) {
                continue;
            }
            Matcher m = IMPORT.matcher(text);
            while (m.find()) {
                Path parent = file.getParent();
                Path imported = (parent == null ? Path.of(m.group(1)) : parent.resolve(m.group(1))).normalize();
                if (!imported.equals(start) && Files.isRegularFile(imported) && seen.add(imported)) {
                    todo.add(imported);
                }
            }
        }
        return List.copyOf(seen);
    }

    /** The first line of a message, so that every error stays one line. */
    static String oneLine(String s) {
        int nl = s.indexOf('\n');
        return (nl < 0 ? s : s.substring(0, nl)).strip();
    }
}
