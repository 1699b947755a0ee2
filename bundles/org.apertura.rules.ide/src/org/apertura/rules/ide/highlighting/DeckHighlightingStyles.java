/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide.highlighting;

import java.util.List;

/**
 * The style identifiers the semantic highlighter reports. An editor maps each to its own colour and
 * font; the identifiers carry meaning, not appearance.
 */
public final class DeckHighlightingStyles {

	/** A layer name, where declared and where referred to. */
	public static final String LAYER = "apertura.deck.layer";
	/** An option name, where declared and where extended. */
	public static final String OPTION = "apertura.deck.option";
	/** A unit after a number (nm, um, µm, mm, nm2, %). */
	public static final String UNIT = "apertura.deck.unit";
	/** A number. */
	public static final String NUMBER = "apertura.deck.number";
	/** An optics symbol in an expression (lambda, λ, NA, k1, k2). */
	public static final String OPTICS_SYMBOL = "apertura.deck.opticsSymbol";
	/** A reference to another rule of the same layer in an expression (width, pitch, ...). */
	public static final String RULE_REFERENCE = "apertura.deck.ruleReference";
	/** A function in an expression (min, max, ceil, floor, round). */
	public static final String FUNCTION = "apertura.deck.function";

	/** Every style, for editors that register them up front. */
	public static final List<String> ALL = List.of(LAYER, OPTION, UNIT, NUMBER, OPTICS_SYMBOL, RULE_REFERENCE,
			FUNCTION);

	private DeckHighlightingStyles() {
	}
}
