/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Tests of the deck language's editor services (content assist, semantic highlighting). */
package org.apertura.rules.ide.tests;
