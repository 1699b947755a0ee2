/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Test support: a minimal GDSII reader for the flat cells in the shared test data, JTS oracles and
 * seeded layout generators. Test code only; the project's real GDSII reader lives in the layout bundle.
 */
package org.apertura.engine.tests.support;
