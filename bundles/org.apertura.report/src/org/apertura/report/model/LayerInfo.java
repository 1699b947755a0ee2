/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

import java.util.Objects;
import java.util.OptionalInt;

/**
 * A layer of the deck as shown in reports.
 *
 * @param name      the deck layer name
 * @param gdsLayer  the GDSII layer number, if mapped
 * @param gdsDatatype the GDSII datatype, if mapped
 * @param moved     true when the run moves this layer to the target option (false for plain checks)
 */
public record LayerInfo(String name, OptionalInt gdsLayer, OptionalInt gdsDatatype, boolean moved) {

    /** Checks the components are present. */
    public LayerInfo {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(gdsLayer, "gdsLayer");
        Objects.requireNonNull(gdsDatatype, "gdsDatatype");
    }
}
