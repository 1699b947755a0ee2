/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of GDSII stream reading and writing against the GDS II Stream Format Manual 6.0 and real files.
 */
package org.apertura.layout.tests.gds;
