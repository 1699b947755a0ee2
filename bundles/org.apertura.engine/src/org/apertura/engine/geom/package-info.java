/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Geometric value types of the check engine: integer polygons in database units.
 */
package org.apertura.engine.geom;
