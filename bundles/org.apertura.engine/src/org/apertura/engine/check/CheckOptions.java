/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.check;

import java.util.Objects;
import java.util.function.BooleanSupplier;

/**
 * How the engine runs: {@code threads} worker threads, a progress listener receiving (done, total)
 * work units from any thread, a cancellation flag polled between tiles (when it turns true the running
 * call throws {@link java.util.concurrent.CancellationException}), and the tile size as the number of
 * edges per tile. A tile is one unit of parallel work: a run of that many edges in sorted order for the
 * pair searches (each reads the shared edge index as far as the rule reaches, across tile borders), a
 * square region holding about that many edges for the enclosure check. Results depend on none of these.
 */
public record CheckOptions(int threads, ProgressListener progress, BooleanSupplier cancelled, int edgesPerTile) {

    /** Default tile size in edges. */
    public static final int DEFAULT_EDGES_PER_TILE = 4096;

    /** Receives progress as (done, total) work units; total may grow while a check runs. */
    @FunctionalInterface
    public interface ProgressListener {
        void progress(long done, long total);
    }

    public CheckOptions {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, got " + threads);
        }
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(cancelled, "cancelled");
        if (edgesPerTile < 1) {
            throw new IllegalArgumentException("edgesPerTile must be at least 1, got " + edgesPerTile);
        }
    }

    public CheckOptions(int threads, ProgressListener progress, BooleanSupplier cancelled) {
        this(threads, progress, cancelled, DEFAULT_EDGES_PER_TILE);
    }

    /** These options with another tile size. */
    public CheckOptions withEdgesPerTile(int edges) {
        return new CheckOptions(threads, progress, cancelled, edges);
    }

    /** All available processors, no progress, never cancelled. */
    public static CheckOptions defaults() {
        return threads(Runtime.getRuntime().availableProcessors());
    }

    public static CheckOptions threads(int threads) {
        return new CheckOptions(threads, (d, t) -> {
        }, () -> false);
    }
}
