/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Editor services of the deck language (no UI dependencies): {@link org.apertura.rules.ide.DeckIdeSetup}
 * creates an injector with content assist and semantic highlighting bound.
 */
package org.apertura.rules.ide;
