/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The Apertura rule-deck language ({@code .apdeck} files): grammar {@code Deck.xtext}, its runtime
 * module and standalone setup. The generated model lives in {@code org.apertura.rules.deck}; plain
 * Java consumers should use {@link org.apertura.rules.resolved.DeckLoader} instead.
 */
package org.apertura.rules;
