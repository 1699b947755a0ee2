/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;
import java.util.OptionalLong;

/**
 * One row of a width- and parallel-run-length-dependent spacing table: the spacing applies between a
 * shape wider than {@code width} and a neighbour whose parallel run exceeds {@code runLength}.
 *
 * @param spacing            the required spacing (database units, per axis)
 * @param metric             how it is measured
 * @param width              the width threshold, if the row has one
 * @param widthInclusive     whether a width equal to the threshold qualifies ({@code >=} rather than
 *                           {@code >})
 * @param runLength          the parallel-run-length threshold, if the row has one
 * @param runLengthInclusive whether a run equal to the threshold qualifies
 */
public record ConditionalSpacing(RuleValue spacing, SpacingMetric metric, OptionalLong width, boolean widthInclusive,
		OptionalLong runLength, boolean runLengthInclusive) {

	/** Checks the components are present. */
	public ConditionalSpacing {
		Objects.requireNonNull(spacing, "spacing");
		Objects.requireNonNull(metric, "metric");
		Objects.requireNonNull(width, "width");
		Objects.requireNonNull(runLength, "runLength");
	}

	/** Whether a shape of this width with this parallel run length (database units) triggers the row. */
	public boolean applies(long shapeWidth, long parallelRun) {
		boolean w = width.isEmpty() || (widthInclusive ? shapeWidth >= width.getAsLong() : shapeWidth > width.getAsLong());
		boolean r = runLength.isEmpty()
				|| (runLengthInclusive ? parallelRun >= runLength.getAsLong() : parallelRun > runLength.getAsLong());
		return w && r;
	}
}
