/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout;

/**
 * A drawn layer as GDSII numbers it: layer number and data type (for BOX elements the box type,
 * for TEXT the text type), each 0 to 32767 in valid streams. Ordered by layer, then data type.
 * Example: SKY130 met1 drawing is {@code LayerKey(68, 20)}.
 *
 * @param layer    layer number
 * @param datatype data type number
 */
public record LayerKey(int layer, int datatype) implements Comparable<LayerKey> {

    @Override
    public int compareTo(LayerKey o) {
        int c = Integer.compare(layer, o.layer);
        return c != 0 ? c : Integer.compare(datatype, o.datatype);
    }

    /** {@code layer/datatype}, e.g. {@code 68/20}. */
    @Override
    public String toString() {
        return layer + "/" + datatype;
    }
}
