/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;

/**
 * A declared layer.
 *
 * @param name        the deck's name of the layer
 * @param gdsLayer    GDSII layer number (0..65535)
 * @param gdsDatatype GDSII datatype (0..65535)
 * @param kind        what the layer carries
 * @param direction   preferred direction; {@link Direction#NONE} for cut and other layers
 * @param description free text from the deck, empty if none
 */
public record Layer(String name, int gdsLayer, int gdsDatatype, LayerKind kind, Direction direction,
		String description) {

	/** Checks the components are present. */
	public Layer {
		Objects.requireNonNull(name, "name");
		Objects.requireNonNull(kind, "kind");
		Objects.requireNonNull(direction, "direction");
		Objects.requireNonNull(description, "description");
	}
}
