/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The public entry point: {@link org.apertura.engine.check.CheckEngine} merges per-layer polygons
 * (database units) and checks {@link org.apertura.engine.rule.Rule}s, giving sorted
 * {@link org.apertura.engine.check.Violation}s, or measures distributions of widths, spacings and
 * pitches ({@link org.apertura.engine.check.MeasureReport}).
 * <p>
 * Pairs are not shadowed: two facing edges closer than a rule are reported even when other material
 * lies between them. All results are sorted by a total order and are the same for every thread count.
 */
package org.apertura.engine.check;
