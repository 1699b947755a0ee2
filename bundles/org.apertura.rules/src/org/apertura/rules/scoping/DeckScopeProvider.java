/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.scoping;

/**
 * Scoping of the deck language. Layer and option names are simple, deck-wide names; they are visible
 * in the deck that declares them and in every deck that imports it (directly or through other
 * imports), which the runtime module arranges by binding Xtext's import-URI global scope. No local
 * rules are needed beyond the defaults.
 */
public class DeckScopeProvider extends AbstractDeckScopeProvider {
}
