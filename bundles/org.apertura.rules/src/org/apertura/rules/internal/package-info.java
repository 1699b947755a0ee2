/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Resolution of parsed decks (internal): the import closure, option inheritance, expression
 * evaluation in exact decimals, conversion to database units and the semantic checks. Used by the
 * validator and by {@link org.apertura.rules.resolved.DeckLoader}; not API.
 */
package org.apertura.rules.internal;
