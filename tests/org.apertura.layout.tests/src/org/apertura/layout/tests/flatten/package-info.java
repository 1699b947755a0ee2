/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of flattening, path outlines and hierarchy queries with hand-computed coordinates.
 */
package org.apertura.layout.tests.flatten;
