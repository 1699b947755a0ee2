/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of the deck language: parsing, validation codes, optics checks on published values,
 * resolution to database units, formatting round-trips, reference decks and bad input.
 */
package org.apertura.rules.tests;
