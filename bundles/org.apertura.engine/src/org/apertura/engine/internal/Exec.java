/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.BooleanSupplier;
import java.util.function.IntFunction;
import java.util.stream.IntStream;

/**
 * Runs independent tasks on a fixed number of threads and concatenates their results in task order,
 * so the outcome never depends on the thread count. Reports progress and honours cancellation
 * between tasks.
 */
public final class Exec {

    /** Receives (done, total) work units; may be called from worker threads. */
    @FunctionalInterface
    public interface Progress {
        void report(long done, long total);
    }

    private final int threads;
    private final Progress progress;
    private final BooleanSupplier cancelled;
    private final AtomicLong done = new AtomicLong();
    private volatile long total;

    private final int edgesPerTile;

    public Exec(int threads, Progress progress, BooleanSupplier cancelled, int edgesPerTile) {
        this.edgesPerTile = Math.max(1, edgesPerTile);
        this.threads = Math.max(1, threads);
        this.progress = progress;
        this.cancelled = cancelled;
    }

    /** Tile size in edges for tiled work. */
    public int edgesPerTile() {
        return edgesPerTile;
    }

    public int threads() {
        return threads;
    }

    /** Adds work units to the expected total (for progress reports). */
    public void expect(long units) {
        total += units;
    }

    /** Throws {@link CancellationException} when cancellation was requested. */
    public void checkCancelled() {
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("check cancelled");
        }
    }

    private void step(long units) {
        long d = done.addAndGet(units);
        progress.report(d, Math.max(d, total));
    }

    /** Runs {@code task} for 0..count-1 and concatenates the lists in index order. */
    public <T> List<T> map(int count, IntFunction<List<T>> task) {
        @SuppressWarnings("unchecked")
        List<T>[] parts = new List[count];
        IntFunction<List<T>> wrapped = i -> {
            checkCancelled();
            List<T> r = task.apply(i);
            step(1);
            return r;
        };
        if (threads == 1 || count <= 1) {
            for (int i = 0; i < count; i++) {
                parts[i] = wrapped.apply(i);
            }
        } else {
            ForkJoinPool pool = new ForkJoinPool(threads);
            try {
                pool.submit(() -> IntStream.range(0, count).parallel().forEach(i -> parts[i] = wrapped.apply(i))).get();
            } catch (InterruptedException ex) {
                Thread.currentThread().interrupt();
                throw new CancellationException("interrupted");
            } catch (ExecutionException ex) {
                Throwable c = ex.getCause();
                if (c instanceof RuntimeException re) {
                    throw re;
                }
                if (c instanceof Error er) {
                    throw er;
                }
                throw new IllegalStateException(c);
            } finally {
                pool.shutdownNow();
            }
        }
        int size = 0;
        for (List<T> p : parts) {
            size += p.size();
        }
        List<T> out = new ArrayList<>(size);
        for (List<T> p : parts) {
            out.addAll(p);
        }
        return out;
    }
}
