/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The effective rules of one layer under one option, after inheritance (option, its parents, then the
 * deck-level blocks) and expression evaluation.
 *
 * @param option           the option's name
 * @param layer            the layer's name
 * @param patterning       how the layer is printed under the option (single exposure if the deck says
 *                         nothing)
 * @param values           every scalar rule present, in database units (square database units for
 *                         {@link RuleKind#AREA}); absent kinds are not in the map; iterated in
 *                         {@link RuleKind} order
 * @param spacingMetric    how {@link RuleKind#SPACING} is measured
 * @param spacingTable     width/run-length dependent spacing rows, in deck order
 * @param enclosures       enclosures of inner layers by this layer
 * @param endOfLine        the end-of-line rule, if any
 * @param density          the density rule, if any
 */
public record LayerRules(String option, String layer, Patterning patterning, Map<RuleKind, RuleValue> values,
		SpacingMetric spacingMetric, List<ConditionalSpacing> spacingTable, List<Enclosure> enclosures,
		Optional<EndOfLine> endOfLine, Optional<Density> density) {

	/** Copies the collections so the record stays immutable. */
	public LayerRules {
		Objects.requireNonNull(option, "option");
		Objects.requireNonNull(layer, "layer");
		Objects.requireNonNull(patterning, "patterning");
		Objects.requireNonNull(spacingMetric, "spacingMetric");
		EnumMap<RuleKind, RuleValue> copy = new EnumMap<>(RuleKind.class);
		copy.putAll(values);
		values = Collections.unmodifiableMap(copy);
		spacingTable = List.copyOf(spacingTable);
		enclosures = List.copyOf(enclosures);
		Objects.requireNonNull(endOfLine, "endOfLine");
		Objects.requireNonNull(density, "density");
	}

	/** The value of one rule kind, if the layer has it under this option. */
	public Optional<RuleValue> value(RuleKind kind) {
		return Optional.ofNullable(values.get(kind));
	}

	/** Whether the layer has a rule of this kind under this option. */
	public boolean has(RuleKind kind) {
		return values.containsKey(kind);
	}

	/** The enclosure of one inner layer, if this layer has one. */
	public Optional<Enclosure> enclosureOf(String innerLayer) {
		return enclosures.stream().filter(e -> e.innerLayer().equals(innerLayer)).findFirst();
	}
}
