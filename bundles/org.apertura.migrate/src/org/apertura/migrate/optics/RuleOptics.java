/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.optics;

import java.util.Objects;

/**
 * The k1 one rule of a layer implies under one option.
 *
 * @param option        the option
 * @param layer         the deck layer
 * @param rule          {@code pitch}, {@code width+spacing} or {@code same-mask-pitch} (see
 *                      {@link OpticsAnalysis})
 * @param patterning    the layer's patterning label under the option (SE, LE2, SADP, ...)
 * @param pitchSplit    the patterning's pitch split
 * @param valueNm       the pitch in nm the rule implies
 * @param k1            the k1 per exposure, {@code (p·split/2)·NA/λ} (split 1 for the same-mask pitch)
 * @param verdict       printable in one exposure, printable thanks to the split, below the practical
 *                      floor, or below the physical limit 0.25
 * @param minimumSplit  the least split that lifts k1 to the option's practical floor (1 when a
 *                      single exposure suffices)
 */
public record RuleOptics(String option, String layer, String rule, String patterning, int pitchSplit, double valueNm,
        double k1, Printability verdict, int minimumSplit) {

    /** Checks the components are present. */
    public RuleOptics {
        Objects.requireNonNull(option, "option");
        Objects.requireNonNull(layer, "layer");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(patterning, "patterning");
        Objects.requireNonNull(verdict, "verdict");
    }
}
