/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.findings;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;

import org.apertura.report.model.Finding;
import org.apertura.report.model.Waiver;
import org.apertura.report.waiver.WaiverFile;
import org.apertura.report.waiver.Waivers;

/**
 * The workbench's current review, one per workbench. Views listen to it; checks and migrations
 * publish to it. Listeners are called on the thread that publishes; the UI parts hop to the UI
 * thread themselves.
 */
public final class ReviewSession {

    private static final ReviewSession INSTANCE = new ReviewSession();

    private final List<Consumer<Review>> listeners = new CopyOnWriteArrayList<>();
    private volatile Review current;

    private ReviewSession() {
    }

    /** The workbench's session. */
    public static ReviewSession get() {
        return INSTANCE;
    }

    /** The review shown now, if any. */
    public Optional<Review> current() {
        return Optional.ofNullable(current);
    }

    /**
     * Shows a review. When it names a deck with a waiver file beside it, the file's waivers are
     * applied first (a waiver file that cannot be read is reported through the exception).
     */
    public void publish(Review review) throws IOException {
        Review applied = review;
        if (review.deck().isPresent()) {
            List<Waiver> waivers = WaiverFile.readIfPresent(WaiverFile.besideDeck(review.deck().get()));
            if (!waivers.isEmpty()) {
                List<Finding> out = new ArrayList<>();
                for (Finding f : review.findings()) {
                    Optional<Waiver> w = waivers.stream().filter(x -> Waivers.matches(x, f)).findFirst();
                    out.add(w.isPresent() ? f.withWaiver(w) : f);
                }
                applied = review.withFindings(out);
            }
        }
        current = applied;
        for (Consumer<Review> l : listeners) {
            l.accept(applied);
        }
    }

    /** Forgets the current review. */
    public void clear() {
        current = null;
        for (Consumer<Review> l : listeners) {
            l.accept(null);
        }
    }

    /**
     * Waives a finding of the current review: writes the waiver into the waiver file beside the
     * review's deck (created when missing) and shows the finding as waived.
     *
     * @throws IllegalStateException when the current review has no deck (nowhere to keep waivers)
     *                               or does not hold the finding
     * @throws IllegalArgumentException when reason or author is blank
     */
    public Waiver waive(Finding finding, String reason, String author) throws IOException {
        Review r = current;
        if (r == null || !r.findings().contains(finding)) {
            throw new IllegalStateException("the finding is not part of the current review");
        }
        Path deck = r.deck().orElseThrow(() -> new IllegalStateException(
                "the review of " + r.layout().getFileName() + " has no deck, so there is no waiver file to write"));
        Waiver w = WaiverFile.add(WaiverFile.besideDeck(deck), finding, reason, author, LocalDate.now());
        List<Finding> out = new ArrayList<>();
        for (Finding f : r.findings()) {
            out.add(f.equals(finding) ? f.withWaiver(Optional.of(w)) : f);
        }
        Review updated = r.withFindings(out);
        current = updated;
        for (Consumer<Review> l : listeners) {
            l.accept(updated);
        }
        return w;
    }

    /** Called with every new review (null when cleared). */
    public void addListener(Consumer<Review> listener) {
        listeners.add(listener);
    }

    public void removeListener(Consumer<Review> listener) {
        listeners.remove(listener);
    }
}
