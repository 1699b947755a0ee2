/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of the check engine: hand-computed cases, JTS and JGraphT cross-checks on seeded random
 * layouts, and real cells of open design kits checked with their published rules.
 */
package org.apertura.engine.tests;
