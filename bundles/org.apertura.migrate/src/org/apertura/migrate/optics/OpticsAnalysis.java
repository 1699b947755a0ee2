/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.optics;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.LayerRules;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;

/**
 * Rayleigh figures of options and the k1 that the resolution-limited rules of layers imply: the pitch
 * (line layers), the densest line/space the width and spacing rules allow together, {@code w + s}
 * ({@code width+spacing}, every layer with both), and for multi-mask layers the densest pattern on
 * one mask, {@code w + same-mask spacing} ({@code same-mask-pitch}, printed by one exposure, so
 * without split). A pitch p with split n gives {@code k1 = (p·n/2)·NA/λ}; lengths along the axis a
 * pitch is measured along, or the smaller axis value.
 */
public final class OpticsAnalysis {

    private OpticsAnalysis() {
    }

    /** The Rayleigh figures of an option. */
    public static OptionOptics of(LithographyOption o) {
        return new OptionOptics(o.name(), o.wavelengthNm(), o.numericalAperture(), o.k1Floor(), o.k2(),
                Rayleigh.resolution(o.k1Floor(), o.wavelengthNm(), o.numericalAperture()),
                Rayleigh.resolution(Rayleigh.PHYSICAL_K1_LIMIT, o.wavelengthNm(), o.numericalAperture()),
                Rayleigh.depthOfFocus(o.k2(), o.wavelengthNm(), o.numericalAperture()), o.demagnificationX(),
                o.demagnificationY(), o.fieldXMm(), o.fieldYMm(), o.throughput());
    }

    /** The k1 of the pitch-like rules of {@code layers} under {@code option}, layer by layer. */
    public static List<RuleOptics> rules(ResolvedDeck deck, String option, Collection<String> layers) {
        LithographyOption o = deck.option(option).orElseThrow(() -> new IllegalArgumentException(
                "deck '" + deck.technology() + "' has no option '" + option + "'"));
        List<RuleOptics> out = new ArrayList<>();
        for (String name : layers) {
            Layer layer = deck.layer(name).orElseThrow(() -> new IllegalArgumentException(
                    "deck '" + deck.technology() + "' has no layer '" + name + "'"));
            LayerRules lr = deck.rules(option, name);
            Patterning p = lr.patterning();
            int split = p.pitchSplit();
            if (lr.has(RuleKind.PITCH)) {
                out.add(row(deck, o, lr, "pitch", along(layer, lr.value(RuleKind.PITCH).orElseThrow()), split));
            }
            if (lr.has(RuleKind.WIDTH) && lr.has(RuleKind.SPACING)) {
                long w = along(layer, lr.value(RuleKind.WIDTH).orElseThrow());
                long s = along(layer, lr.value(RuleKind.SPACING).orElseThrow());
                out.add(row(deck, o, lr, "width+spacing", w + s, split));
            }
            if (p.isMultiMask() && lr.has(RuleKind.WIDTH) && lr.has(RuleKind.SAME_MASK_SPACING)) {
                long w = along(layer, lr.value(RuleKind.WIDTH).orElseThrow());
                long s = along(layer, lr.value(RuleKind.SAME_MASK_SPACING).orElseThrow());
                out.add(row(deck, o, lr, "same-mask-pitch", w + s, 1));
            }
        }
        return out;
    }

    private static long along(Layer layer, RuleValue v) {
        return layer.direction() == Direction.NONE ? v.min() : v.along(layer.direction().pitchAxis());
    }

    private static RuleOptics row(ResolvedDeck deck, LithographyOption o, LayerRules lr, String rule, long pitchDbu,
            int split) {
        double nm = deck.toNanometres(pitchDbu);
        double k1 = Rayleigh.k1OfPitch(nm, split, o.wavelengthNm(), o.numericalAperture());
        Printability verdict = Rayleigh.printability(nm, split, o.k1Floor(), o.wavelengthNm(), o.numericalAperture());
        int minSplit = Rayleigh.minimumPitchSplit(nm, Math.max(o.k1Floor(), Rayleigh.PHYSICAL_K1_LIMIT),
                o.wavelengthNm(), o.numericalAperture());
        return new RuleOptics(o.name(), lr.layer(), rule, lr.patterning().label(), split, nm, k1, verdict, minSplit);
    }
}
