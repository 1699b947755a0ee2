/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Design rules as immutable records, all distances in database units and areas in square database
 * units. A rule names the layer(s) it applies to by the caller's layer name and carries an id that
 * is copied into every violation it produces.
 */
package org.apertura.engine.rule;
