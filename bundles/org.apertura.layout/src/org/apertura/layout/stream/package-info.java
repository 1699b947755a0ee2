/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Fast GDSII reading without the EMF model, for large files: {@link org.apertura.layout.stream.GdsStreamReader}
 * reads records straight from a (memory-mapped) byte buffer into packed per-cell {@code int} arrays
 * ({@link org.apertura.layout.stream.StreamLayout}, {@link org.apertura.layout.stream.StreamCell}), with
 * the same checks, byte offsets and messages as {@link org.apertura.layout.gds.GdsReader}, parsing
 * structures on several threads ({@link org.apertura.layout.stream.StreamReadOptions}) with a result
 * that does not depend on the thread count;
 * {@link org.apertura.layout.stream.StreamFlattener} expands it into the same polygons as
 * {@link org.apertura.layout.flatten.Flattener}. Coordinates are in database units.
 */
package org.apertura.layout.stream;
