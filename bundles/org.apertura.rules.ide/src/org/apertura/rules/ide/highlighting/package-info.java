/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Semantic highlighting of decks for editors (style identifiers, no colours). */
package org.apertura.rules.ide.highlighting;
