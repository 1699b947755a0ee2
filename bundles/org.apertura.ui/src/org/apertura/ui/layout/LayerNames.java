/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.layout;

import java.util.Map;
import java.util.TreeMap;

import org.apertura.layout.LayerKey;
import org.apertura.rules.resolved.Layer;
import org.apertura.rules.resolved.ResolvedDeck;

/**
 * Names for GDSII layers, taken from the deck the workbench used last (a check, a migration or an
 * opened deck), so that the layer list says {@code M1 (31/0)} instead of {@code 31/0}.
 */
public final class LayerNames {

    private static volatile LayerNames current = new LayerNames(Map.of());

    private final Map<LayerKey, String> names;

    private LayerNames(Map<LayerKey, String> names) {
        this.names = names;
    }

    /** The names in use now. */
    public static LayerNames current() {
        return current;
    }

    /** Uses the layers of a deck from now on. */
    public static void useDeck(ResolvedDeck deck) {
        Map<LayerKey, String> m = new TreeMap<>();
        for (Layer l : deck.layersByName().values()) {
            m.put(new LayerKey(l.gdsLayer(), l.gdsDatatype()), l.name());
        }
        current = new LayerNames(Map.copyOf(m));
    }

    /** The deck's name of a GDSII layer, or null when the deck does not declare it. */
    public String nameOf(LayerKey key) {
        return names.get(key);
    }
}
