/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Shrink headroom: the largest linear shrink, uniform or per axis, that a layout takes under an option
 * without a new violation, and the place that limits it.
 */
package org.apertura.migrate.shrink;
