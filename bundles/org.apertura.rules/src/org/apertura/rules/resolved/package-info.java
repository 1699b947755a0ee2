/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * A resolved rule deck in plain Java: no EMF, Xtext or OSGi types appear in this package's public
 * signatures, so the check engine and the migration analysis can use it from any Java program.
 *
 * <p>{@link org.apertura.rules.resolved.DeckLoader} parses a deck file and the decks it imports,
 * validates them and returns either a {@link org.apertura.rules.resolved.ResolvedDeck} or the
 * diagnostics. In a resolved deck every option's inheritance and every expression are evaluated:
 * lengths are whole database units, areas whole square database units, densities fractions in [0, 1],
 * optics (wavelength, NA, k1, demagnification, field) plain doubles in the units their accessor names.
 *
 * <p>Axes: a value written per axis ({@code x 20 nm y 24 nm}) applies its x part where the quantity is
 * measured along the x axis, so the width of a vertical line is measured along x and the pitch of
 * horizontal lines along y.
 */
package org.apertura.rules.resolved;
