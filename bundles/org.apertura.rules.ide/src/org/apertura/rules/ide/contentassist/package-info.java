/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Content assist for decks: keywords and described layer and option names. */
package org.apertura.rules.ide.contentassist;
