/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Validation of decks: {@link org.apertura.rules.validation.DeckValidator} reports every problem at its
 * line and column with a code from {@link org.apertura.rules.validation.DeckIssueCodes}.
 */
package org.apertura.rules.validation;
