/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.math.BigDecimal;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * A deck with every option's inheritance and every expression evaluated: a map (option, layer, rule
 * kind) to database units.
 *
 * @param technology            the technology's title from the root deck's header
 * @param databaseUnitNanometres the size of one database unit in nanometres (exact decimal)
 * @param manufacturingGrid     the manufacturing grid in database units (at least 1)
 * @param layers                every layer of the deck and its imports, in declaration order
 * @param options               every lithography option, in declaration order
 * @param rules                 the rules of every (option, layer) pair, options outer, layers inner,
 *                              both in declaration order; a layer without any rule under an option
 *                              still has an entry (single exposure, no values)
 */
public record ResolvedDeck(String technology, BigDecimal databaseUnitNanometres, long manufacturingGrid,
		List<Layer> layers, List<LithographyOption> options, List<LayerRules> rules) {

	/** Copies the lists so the record stays immutable. */
	public ResolvedDeck {
		Objects.requireNonNull(technology, "technology");
		Objects.requireNonNull(databaseUnitNanometres, "databaseUnitNanometres");
		layers = List.copyOf(layers);
		options = List.copyOf(options);
		rules = List.copyOf(rules);
	}

	/** The database unit in metres (1e-9 for a 1 nm unit). */
	public double databaseUnitMetres() {
		return databaseUnitNanometres.doubleValue() * 1e-9;
	}

	/** Converts database units to nanometres. */
	public double toNanometres(long databaseUnits) {
		return databaseUnits * databaseUnitNanometres.doubleValue();
	}

	/** A layer by name. */
	public Optional<Layer> layer(String name) {
		return layers.stream().filter(l -> l.name().equals(name)).findFirst();
	}

	/** An option by name. */
	public Optional<LithographyOption> option(String name) {
		return options.stream().filter(o -> o.name().equals(name)).findFirst();
	}

	/** Layers by name, in declaration order. */
	public Map<String, Layer> layersByName() {
		return layers.stream().collect(Collectors.toMap(Layer::name, Function.identity(), (a, b) -> a,
				java.util.LinkedHashMap::new));
	}

	/**
	 * The rules of one layer under one option.
	 *
	 * @throws NoSuchElementException if the deck has no such option or layer
	 */
	public LayerRules rules(String option, String layer) {
		for (LayerRules r : rules) {
			if (r.option().equals(option) && r.layer().equals(layer)) {
				return r;
			}
		}
		throw new NoSuchElementException("no layer '" + layer + "' under option '" + option + "'");
	}

	/** The value of one rule, if the layer has it under the option (unknown names give empty). */
	public Optional<RuleValue> value(String option, String layer, RuleKind kind) {
		return rules.stream().filter(r -> r.option().equals(option) && r.layer().equals(layer)).findFirst()
				.flatMap(r -> r.value(kind));
	}

	/**
	 * The k1 of a line layer's pitch under an option, k1 = (pitch x split / 2) x NA / lambda, with the
	 * pitch taken along the layer's pitch axis (the smaller axis value if it has no direction).
	 *
	 * @return empty if the layer has no pitch under the option, or the names are unknown
	 */
	public OptionalDouble pitchK1(String option, String layer) {
		Optional<LithographyOption> o = option(option);
		Optional<Layer> l = layer(layer);
		Optional<RuleValue> pitch = value(option, layer, RuleKind.PITCH);
		if (o.isEmpty() || l.isEmpty() || pitch.isEmpty()) {
			return OptionalDouble.empty();
		}
		long p = l.get().direction() == Direction.NONE ? pitch.get().min()
				: pitch.get().along(l.get().direction().pitchAxis());
		return OptionalDouble.of(o.get().k1(toNanometres(p), rules(option, layer).patterning().pitchSplit()));
	}
}
