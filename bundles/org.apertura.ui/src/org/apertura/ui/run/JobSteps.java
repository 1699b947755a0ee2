/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.io.IOException;
import java.nio.file.Path;

import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.ui.layout.LayerNames;
import org.eclipse.core.runtime.SubMonitor;

/** Steps the check and migration jobs share. */
final class JobSteps {

    /** Monitor units of {@link #loadDeck}. */
    static final int DECK_TICKS = 10;

    private JobSteps() {
    }

    /**
     * A job's first step: loads the deck, makes its layer names the ones the views show, and reports
     * {@value #DECK_TICKS} units on the monitor.
     */
    static ResolvedDeck loadDeck(Path deck, SubMonitor sub) throws IOException {
        sub.subTask("Loading " + deck.getFileName());
        ResolvedDeck resolved = LayoutCheck.loadDeck(deck);
        LayerNames.useDeck(resolved);
        sub.worked(DECK_TICKS);
        return resolved;
    }
}
