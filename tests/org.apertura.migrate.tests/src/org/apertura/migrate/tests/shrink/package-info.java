/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Tests of shrink headroom from the engine's measure mode. */
package org.apertura.migrate.tests.shrink;
