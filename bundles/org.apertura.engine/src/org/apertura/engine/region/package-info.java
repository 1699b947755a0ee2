/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Merged regions of a layer: the union of all its polygons as shapes with holes, with every boundary
 * edge directed so that the material lies on its left.
 * <p>
 * Manhattan layers (every edge horizontal or vertical) are merged exactly by an own scanline over the
 * integer coordinates, run separately on each group of polygons whose bounding boxes meet (a lone
 * rectangle needs no sweep at all). Layers with 45° or any-angle edges are merged with JTS (OverlayNG union with a
 * fixed precision model of scale 1, i.e. the database-unit grid): JTS is a maintained, widely used
 * library whose snap-rounding overlay is robust for any-angle input, and the fixed precision model
 * keeps every output vertex on the integer grid the checks work in. Intersection points of
 * non-Manhattan edges that do not fall on the grid are rounded to it (by at most half a database unit).
 * <p>
 * Shapes that touch only at a corner point are separate shapes.
 */
package org.apertura.engine.region;
