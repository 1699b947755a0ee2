/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Reads a layout for the migration: GDSII read and flattened by the layout bundle, polygons grouped
 * by the deck's layer names in the deck's database units.
 */
package org.apertura.migrate.layout;
