/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.validation;

import org.apertura.rules.deck.Deck;
import org.apertura.rules.internal.DeckResolver;
import org.apertura.rules.internal.Problem;
import org.eclipse.emf.ecore.resource.Resource;

import com.google.inject.Inject;
import org.eclipse.xtext.util.IResourceScopeCache;
import org.eclipse.xtext.validation.Check;
import org.eclipse.xtext.validation.ValidationMessageAcceptor;

/**
 * Validates a deck by resolving it (with its imports) under every option: one pass finds unit
 * errors, duplicates, cycles, grid and positivity errors, and the optics checks (k1 of every pitch
 * against 0.25 and the option's floor). Only problems located in the file being validated are
 * reported here; those of imported decks are reported when those files are validated.
 */
public class DeckValidator extends AbstractDeckValidator {

	@Inject
	private IResourceScopeCache cache;

	/**
	 * The resolution of a deck, computed once per state of its resource (the loader asks for it again
	 * after validating and gets the same result).
	 */
	public static DeckResolver.Resolution resolution(IResourceScopeCache cache, Deck deck) {
		Resource resource = deck.eResource();
		if (resource == null) {
			return DeckResolver.resolve(deck, false);
		}
		return cache.get(DeckResolver.class, resource, () -> DeckResolver.resolve(deck, false));
	}

	/** Resolves the deck and reports what the resolver found. */
	@Check
	public void checkDeck(Deck deck) {
		Resource resource = deck.eResource();
		DeckResolver.Resolution resolution = resolution(cache, deck);
		for (Problem p : resolution.problems()) {
			if (p.object().eResource() != resource) {
				continue;
			}
			int index = ValidationMessageAcceptor.INSIGNIFICANT_INDEX;
			switch (p.severity()) {
				case ERROR -> error(p.message(), p.object(), p.feature(), index, p.code());
				case WARNING -> warning(p.message(), p.object(), p.feature(), index, p.code());
				default -> info(p.message(), p.object(), p.feature(), index, p.code());
			}
		}
	}
}
