/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.apertura.migrate.MigrationResult;

/**
 * The migration study the workbench shows, one per workbench; the migration view listens to it.
 * Listeners are called on the publishing thread.
 */
public final class StudySession {

    /**
     * A finished study and where its inputs came from.
     *
     * @param result the study
     * @param deck   the deck file; empty for a study read back from a saved file (which does not
     *               record its deck)
     * @param layout the layout file (as recorded in a saved study: it may no longer exist)
     * @param saved  the {@code *.apstudy} file the study was read from; empty for a fresh run
     */
    public record Study(MigrationResult result, Optional<Path> deck, Path layout, Optional<Path> saved) {
        public Study {
            Objects.requireNonNull(result, "result");
            Objects.requireNonNull(deck, "deck");
            Objects.requireNonNull(layout, "layout");
            Objects.requireNonNull(saved, "saved");
        }

        /** A fresh run of the deck over the layout. */
        public Study(MigrationResult result, Path deck, Path layout) {
            this(result, Optional.of(deck), layout, Optional.empty());
        }
    }

    private static final StudySession INSTANCE = new StudySession();

    private final List<Consumer<Study>> listeners = new CopyOnWriteArrayList<>();
    private volatile Study current;

    private StudySession() {
    }

    public static StudySession get() {
        return INSTANCE;
    }

    public Optional<Study> current() {
        return Optional.ofNullable(current);
    }

    public void publish(Study study) {
        current = study;
        for (Consumer<Study> l : listeners) {
            l.accept(study);
        }
    }

    public void addListener(Consumer<Study> l) {
        listeners.add(l);
    }

    public void removeListener(Consumer<Study> l) {
        listeners.remove(l);
    }
}
