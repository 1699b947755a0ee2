/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What {@link DeckLoader} returns: the resolved deck when the deck has no errors, and every
 * diagnostic (warnings come with a resolved deck too).
 *
 * @param deck        the resolved deck, empty if there is any error
 * @param diagnostics all problems, in file then position order
 */
public record DeckLoadResult(Optional<ResolvedDeck> deck, List<DeckDiagnostic> diagnostics) {

	/** Copies the list. */
	public DeckLoadResult {
		Objects.requireNonNull(deck, "deck");
		diagnostics = List.copyOf(diagnostics);
	}

	/** Whether any diagnostic is an error. */
	public boolean hasErrors() {
		return diagnostics.stream().anyMatch(d -> d.severity() == DeckDiagnostic.Severity.ERROR);
	}

	/** Only the errors. */
	public List<DeckDiagnostic> errors() {
		return diagnostics.stream().filter(d -> d.severity() == DeckDiagnostic.Severity.ERROR).toList();
	}

	/**
	 * The resolved deck.
	 *
	 * @throws IllegalStateException listing the errors if the deck has any
	 */
	public ResolvedDeck orElseThrow() {
		return deck.orElseThrow(() -> new IllegalStateException("deck has errors:\n"
				+ String.join("\n", errors().stream().map(DeckDiagnostic::toString).toList())));
	}
}
