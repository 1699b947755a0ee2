/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.masks;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.OptionalDouble;

import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * Masks and exposures per layer under two options, and their totals.
 *
 * @param layers one entry per moved layer, in the order given
 */
public record MaskBudget(List<LayerMasks> layers) {

    /** Copies the list. */
    public MaskBudget {
        layers = List.copyOf(layers);
    }

    /** Counts the masks and exposures of {@code layers} under {@code from} and {@code to}. */
    public static MaskBudget of(ResolvedDeck deck, String from, String to, Collection<String> layers) {
        LithographyOption src = deck.option(from).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + from + "'"));
        LithographyOption tgt = deck.option(to).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + to + "'"));
        List<LayerMasks> out = new ArrayList<>();
        for (String layer : layers) {
            Patterning a = deck.rules(from, layer).patterning();
            Patterning b = deck.rules(to, layer).patterning();
            out.add(new LayerMasks(layer, a.label(), b.label(), a.masks(), b.masks(), exposures(a), exposures(b),
                    seconds(exposures(a), src), seconds(exposures(b), tgt)));
        }
        return new MaskBudget(out);
    }

    /** Exposures of a patterning: one per mask. */
    public static int exposures(Patterning p) {
        return p.masks();
    }

    private static OptionalDouble seconds(int exposures, LithographyOption o) {
        return o.throughput().isPresent() && o.throughput().getAsDouble() > 0
                ? OptionalDouble.of(exposures * 3600.0 / o.throughput().getAsDouble()) : OptionalDouble.empty();
    }

    /** Masks of all layers under the source option. */
    public int sourceMasks() {
        return layers.stream().mapToInt(LayerMasks::sourceMasks).sum();
    }

    /** Masks of all layers under the target option. */
    public int targetMasks() {
        return layers.stream().mapToInt(LayerMasks::targetMasks).sum();
    }

    /** Masks saved in total (negative when added). */
    public int masksSaved() {
        return sourceMasks() - targetMasks();
    }

    /** Exposures saved in total (negative when added). */
    public int exposuresSaved() {
        return layers.stream().mapToInt(LayerMasks::exposuresSaved).sum();
    }

    /** Scanner seconds per wafer over all layers under the source option, if every layer has a figure. */
    public OptionalDouble sourceSeconds() {
        return sum(layers.stream().map(LayerMasks::sourceSeconds).toList());
    }

    /** Scanner seconds per wafer over all layers under the target option, if every layer has a figure. */
    public OptionalDouble targetSeconds() {
        return sum(layers.stream().map(LayerMasks::targetSeconds).toList());
    }

    private static OptionalDouble sum(List<OptionalDouble> v) {
        if (v.isEmpty() || v.stream().anyMatch(OptionalDouble::isEmpty)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(v.stream().mapToDouble(OptionalDouble::getAsDouble).sum());
    }
}
