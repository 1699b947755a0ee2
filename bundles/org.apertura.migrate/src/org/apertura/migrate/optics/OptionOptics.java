/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.optics;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The optics of one lithography option, with the derived Rayleigh figures. Lengths in nm, fields in
 * mm (wafer side), throughput in wafers per hour.
 *
 * @param option           the option's name
 * @param wavelengthNm     exposure wavelength
 * @param numericalAperture NA
 * @param k1Floor          the option's practical k1 floor
 * @param k2               the depth-of-focus factor
 * @param resolutionNm     half-pitch at the practical floor, {@code k1Floor·λ/NA}
 * @param physicalLimitNm  half-pitch at the physical limit, {@code 0.25·λ/NA}
 * @param depthOfFocusNm   {@code k2·λ/NA²}
 * @param demagnificationX reduction along x
 * @param demagnificationY reduction along y
 * @param fieldXMm         exposure field width
 * @param fieldYMm         exposure field height
 * @param throughput       wafers per hour if the deck states it
 */
public record OptionOptics(String option, double wavelengthNm, double numericalAperture, double k1Floor, double k2,
        double resolutionNm, double physicalLimitNm, double depthOfFocusNm, double demagnificationX,
        double demagnificationY, double fieldXMm, double fieldYMm, OptionalDouble throughput) {

    /** Checks the components are present. */
    public OptionOptics {
        Objects.requireNonNull(option, "option");
        Objects.requireNonNull(throughput, "throughput");
    }

    /** Whether x and y are demagnified differently. */
    public boolean anamorphic() {
        return demagnificationX != demagnificationY;
    }
}
