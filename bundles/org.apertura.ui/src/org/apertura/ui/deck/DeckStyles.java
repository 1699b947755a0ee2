/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.deck;

import java.util.Map;
import java.util.Optional;

import org.apertura.rules.ide.highlighting.DeckHighlightingStyles;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.RGB;

/**
 * The deck editor's colours for the semantic highlighting styles of the ide module
 * ({@link DeckHighlightingStyles}); they are drawn over the keyword colours of the lexical scanner.
 * Apertura's own choices: layers in plum, options in rose, numbers and units in amber-brown, optics
 * symbols in cobalt, rule references in moss green, functions in ochre.
 */
public final class DeckStyles {

    /**
     * Colour and SWT font style of one highlighting style.
     *
     * @param colour    foreground colour
     * @param fontStyle {@link SWT#NORMAL}, {@link SWT#BOLD} or {@link SWT#ITALIC} (or both)
     */
    public record Style(RGB colour, int fontStyle) {
    }

    private static final Map<String, Style> STYLES = Map.of(
            DeckHighlightingStyles.LAYER, new Style(new RGB(0x7B, 0x3F, 0x8C), SWT.BOLD),
            DeckHighlightingStyles.OPTION, new Style(new RGB(0xA8, 0x3C, 0x5E), SWT.BOLD),
            DeckHighlightingStyles.NUMBER, new Style(new RGB(0x9A, 0x5B, 0x13), SWT.NORMAL),
            DeckHighlightingStyles.UNIT, new Style(new RGB(0x9A, 0x5B, 0x13), SWT.ITALIC),
            DeckHighlightingStyles.OPTICS_SYMBOL, new Style(new RGB(0x2A, 0x5D, 0xB0), SWT.BOLD),
            DeckHighlightingStyles.RULE_REFERENCE, new Style(new RGB(0x3C, 0x7A, 0x3A), SWT.ITALIC),
            DeckHighlightingStyles.FUNCTION, new Style(new RGB(0x8A, 0x6A, 0x08), SWT.NORMAL));

    private DeckStyles() {
    }

    /** The style drawn for a highlighting style identifier; empty for identifiers this editor does not colour. */
    public static Optional<Style> of(String id) {
        return Optional.ofNullable(STYLES.get(id));
    }
}
