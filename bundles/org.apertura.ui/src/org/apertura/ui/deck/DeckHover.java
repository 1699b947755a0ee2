/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.deck;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;

/**
 * The text of the deck editor's hover: for the layer whose rule block the pointer is in (or whose
 * name is under the pointer), its pitch and the k1 that pitch implies under every option of the
 * deck, {@code k1 = (pitch·split/2)·NA/λ}, with the physical limit 0.25 and the option's floor.
 */
public final class DeckHover {

    /** A rule block header: {@code on M1 {}. */
    private static final Pattern BLOCK = Pattern.compile("\\bon\\s+([A-Za-z_][A-Za-z0-9_]*)\\s*\\{");

    private DeckHover() {
    }

    /** The layer of the rule block that contains the offset, if any. */
    public static Optional<String> layerAt(String text, int offset) {
        Matcher m = BLOCK.matcher(text);
        String layer = null;
        while (m.find() && m.start() <= offset) {
            int close = closingBrace(text, m.end());
            if (offset <= close) {
                layer = m.group(1);
            }
        }
        return Optional.ofNullable(layer);
    }

    private static int closingBrace(String text, int from) {
        int depth = 1;
        for (int i = from; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '{') {
                depth++;
            } else if (c == '}' && --depth == 0) {
                return i;
            }
        }
        return text.length();
    }

    /**
     * The hover text for a layer of the deck held in {@code text}, or empty when the deck does not
     * resolve or has no such layer.
     */
    public static Optional<String> describe(Path file, String text, String layer) {
        DeckLoadResult r = new DeckLoader().load(file, text);
        if (r.deck().isEmpty()) {
            return Optional.empty();
        }
        ResolvedDeck deck = r.deck().get();
        if (deck.layer(layer).isEmpty()) {
            return Optional.empty();
        }
        StringBuilder sb = new StringBuilder(layer).append(": pitch and k1 under every option\n");
        for (LithographyOption o : deck.options()) {
            Optional<RuleValue> pitch = deck.value(o.name(), layer, RuleKind.PITCH);
            OptionalDouble k1 = deck.pitchK1(o.name(), layer);
            sb.append(String.format(Locale.ROOT, "  %-14s ", o.name()));
            if (pitch.isEmpty() || k1.isEmpty()) {
                sb.append("no pitch rule\n");
                continue;
            }
            double k = k1.getAsDouble();
            String verdict = k < LithographyOption.PHYSICAL_K1_LIMIT ? "below the physical limit 0.25"
                    : k < o.k1Floor() ? String.format(Locale.ROOT, "below the floor %.2f", o.k1Floor())
                            : "printable";
            sb.append(String.format(Locale.ROOT, "pitch %s nm  k1 %.3f  %s%n",
                    trim(deck.toNanometres(Math.max(pitch.get().x(), pitch.get().y()))), k, verdict));
        }
        return Optional.of(sb.toString().stripTrailing());
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : String.format(Locale.ROOT, "%.2f", v);
    }
}
