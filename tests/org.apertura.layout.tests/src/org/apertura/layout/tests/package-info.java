/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of the layout bundle and their shared helpers ({@link org.apertura.layout.tests.TestData} finds
 * ../shared/data from the repository root).
 */
package org.apertura.layout.tests;
