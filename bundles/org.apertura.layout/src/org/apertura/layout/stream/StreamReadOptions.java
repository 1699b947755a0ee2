/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.stream;

/**
 * How {@link GdsStreamReader} reads: the size of the mapped window and how many threads parse
 * structures at the same time. The result does not depend on these options: the same layout,
 * warnings and, for bad input, the same first error in file order.
 *
 * @param windowBytes        largest part of a file mapped at once, {@link GdsStreamReader#MIN_WINDOW}
 *                           to 2^31 - 1 bytes (a record crossing a window's end is read from a new
 *                           window starting at that record)
 * @param threads            threads parsing at once, the calling thread included; 0 for one per
 *                           available processor, 1 to read sequentially on the calling thread
 * @param minBytesPerThread  an input is split into at most size / minBytesPerThread parts (0 splits
 *                           even tiny inputs, as tests do); below two parts it is read sequentially
 */
public record StreamReadOptions(long windowBytes, int threads, long minBytesPerThread) {

    /**
     * A 1 GiB window, one thread per available processor, parts of at least 8 MiB. A smaller input
     * reads in about a millisecond, and on the 2-core machine bench/layout runs on, two threads read
     * the 2 MB ASAP7 library no faster than one when the read follows an idle moment, as a user's
     * read does (waking the idle thread and faulting in the mapped pages from two threads cost what
     * the second thread saves); read back to back, two threads were about 1.2 times as fast.
     */
    public static final StreamReadOptions DEFAULTS = new StreamReadOptions(GdsStreamReader.DEFAULT_WINDOW, 0, 1 << 23);

    /** @throws IllegalArgumentException for a window out of range, negative threads or part size */
    public StreamReadOptions {
        if (windowBytes < GdsStreamReader.MIN_WINDOW || windowBytes > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("window of " + windowBytes + " bytes; must be " + GdsStreamReader.MIN_WINDOW
                    + " to " + Integer.MAX_VALUE);
        }
        if (threads < 0) {
            throw new IllegalArgumentException("threads " + threads + "; must be 0 (one per processor) or more");
        }
        if (minBytesPerThread < 0) {
            throw new IllegalArgumentException("minBytesPerThread " + minBytesPerThread + "; must be 0 or more");
        }
    }

    /** These options with another window size. */
    public StreamReadOptions withWindowBytes(long bytes) {
        return new StreamReadOptions(bytes, threads, minBytesPerThread);
    }

    /** These options with another thread count (0: one per available processor). */
    public StreamReadOptions withThreads(int count) {
        return new StreamReadOptions(windowBytes, count, minBytesPerThread);
    }

    /** These options with another smallest part size. */
    public StreamReadOptions withMinBytesPerThread(long bytes) {
        return new StreamReadOptions(windowBytes, threads, bytes);
    }

    /** Number of parts for an input of the given size: at most the thread count, at least 1. */
    int parts(long inputBytes) {
        int t = threads == 0 ? Runtime.getRuntime().availableProcessors() : threads;
        if (t <= 1) {
            return 1;
        }
        long bySize = minBytesPerThread == 0 ? t : inputBytes / minBytesPerThread;
        return (int) Math.max(1, Math.min(t, bySize));
    }
}
