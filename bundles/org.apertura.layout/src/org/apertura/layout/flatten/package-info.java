/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Flattening of the cell hierarchy into per-layer integer polygons
 * ({@link org.apertura.engine.geom.Polygon}) in database units of the top cell, and the conversion of
 * paths to outline polygons.
 */
package org.apertura.layout.flatten;
