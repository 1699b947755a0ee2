/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The optics of one lithography option, inheritance resolved.
 *
 * @param name              the option's name in the deck
 * @param description       free text from the deck, empty if none
 * @param parent            the option it extends, if any
 * @param wavelengthNm      exposure wavelength in nanometres (193 for ArF immersion, 13.5 for EUV)
 * @param numericalAperture NA of the projection optics
 * @param k1Floor           the practical k1 floor below which a pitch is warned about; the physical
 *                          single-exposure limit {@value #PHYSICAL_K1_LIMIT} is enforced regardless
 * @param k2                the depth-of-focus factor in DOF = k2 x lambda / NA^2
 * @param demagnificationX  reduction of the projection optics along x (4 isotropic; 4 of an
 *                          anamorphic 4/8 system)
 * @param demagnificationY  reduction along y (8 in an anamorphic 4/8 system)
 * @param fieldXMm          exposure field width in millimetres (wafer side)
 * @param fieldYMm          exposure field height in millimetres (wafer side)
 * @param throughput        wafers per hour, if the deck states it
 * @param stitchKeepOutNm   the keep-out band on each side of a stitching line, in nanometres (wafer side),
 *                          if the deck states it ({@code stitch keep-out 2 um}); a positive value on the
 *                          manufacturing grid
 */
public record LithographyOption(String name, String description, Optional<String> parent, double wavelengthNm,
		double numericalAperture, double k1Floor, double k2, double demagnificationX, double demagnificationY,
		double fieldXMm, double fieldYMm, OptionalDouble throughput, OptionalDouble stitchKeepOutNm) {

	/** The physical k1 limit of a single exposure (half-pitch k1; textbook, e.g. Mack 2007). */
	public static final double PHYSICAL_K1_LIMIT = 0.25;

	/** Checks the components are present. */
	public LithographyOption {
		Objects.requireNonNull(name, "name");
		Objects.requireNonNull(description, "description");
		Objects.requireNonNull(parent, "parent");
		Objects.requireNonNull(throughput, "throughput");
		Objects.requireNonNull(stitchKeepOutNm, "stitchKeepOutNm");
	}

	/** An option without a stitch keep-out band. */
	public LithographyOption(String name, String description, Optional<String> parent, double wavelengthNm,
			double numericalAperture, double k1Floor, double k2, double demagnificationX, double demagnificationY,
			double fieldXMm, double fieldYMm, OptionalDouble throughput) {
		this(name, description, parent, wavelengthNm, numericalAperture, k1Floor, k2, demagnificationX,
				demagnificationY, fieldXMm, fieldYMm, throughput, OptionalDouble.empty());
	}

	/**
	 * The k1 factor of a pitch printed with this option: k1 = (pitch x split / 2) x NA / lambda, where
	 * split is the pitch split of the patterning (1 single exposure, n for n litho-etch steps, 2 or 4
	 * for spacer division): each exposure prints a pitch {@code split} times the drawn one.
	 *
	 * @param pitchNm    the drawn pitch in nanometres
	 * @param pitchSplit the patterning's pitch split, at least 1
	 */
	public double k1(double pitchNm, int pitchSplit) {
		return pitchNm * pitchSplit / 2.0 * numericalAperture / wavelengthNm;
	}

	/** Rayleigh half-pitch resolution at the k1 floor, k1Floor x lambda / NA, in nanometres. */
	public double resolutionNm() {
		return k1Floor * wavelengthNm / numericalAperture;
	}

	/** Depth of focus k2 x lambda / NA^2 in nanometres. */
	public double depthOfFocusNm() {
		return k2 * wavelengthNm / (numericalAperture * numericalAperture);
	}

	/** The demagnification along one axis. */
	public double demagnification(Axis axis) {
		return axis == Axis.X ? demagnificationX : demagnificationY;
	}

	/** Whether the optics demagnify x and y differently (anamorphic, such as 4/8). */
	public boolean isAnamorphic() {
		return demagnificationX != demagnificationY;
	}
}
