/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The deck editor: a JFace text editor for rule decks driven by the Xtext runtime (parse, validate,
 * format) and the Xtext ide services of {@code org.apertura.rules.ide} (content assist, semantic
 * highlighting), since Xtext's own Eclipse editor bundles are not available to us.
 */
package org.apertura.ui.deck;
