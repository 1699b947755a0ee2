/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Multiple-patterning consequences of a migration: colouring conflicts that vanish for layers leaving
 * multi-mask patterning, and the decomposition of layers entering it.
 */
package org.apertura.migrate.colour;
