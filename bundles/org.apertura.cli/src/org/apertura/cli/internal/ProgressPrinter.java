/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.cli.internal;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.function.LongSupplier;

/**
 * Prints the progress of one long step on one terminal line of standard error: its name, the
 * percentage done and an estimate of the time left, redrawn at most every {@link #MIN_INTERVAL_NANOS}.
 * Silent in quiet mode. Thread-safe: engines report from worker threads. Closing it ends an open line.
 */
public final class ProgressPrinter implements AutoCloseable {

    /** Redraw at most five times a second so that progress never costs more than it shows. */
    static final long MIN_INTERVAL_NANOS = 200_000_000L;

    private final PrintWriter err;
    private final boolean quiet;
    private final LongSupplier clock;
    private String step = "";
    private long stepStart;
    private long lastDraw;
    private boolean lineOpen;
    private int pass;
    private long lastDone;
    private boolean drawnFinished;

    public ProgressPrinter(PrintWriter err, boolean quiet) {
        this(err, quiet, System::nanoTime);
    }

    ProgressPrinter(PrintWriter err, boolean quiet, LongSupplier clock) {
        this.err = err;
        this.quiet = quiet;
        this.clock = clock;
    }

    /** Starts a named step; ends the line of the previous one. */
    public synchronized void begin(String stepName) {
        finishLine();
        step = stepName;
        stepStart = clock.getAsLong();
        lastDraw = Long.MIN_VALUE;
        pass = 1;
        lastDone = 0;
        drawnFinished = false;
        if (!quiet) {
            err.print(stepName + " ...");
            err.flush();
            lineOpen = true;
        }
    }

    /**
     * Reports {@code done} of {@code total} work units of the current step. A step may run the engine several
     * times (a migration checks under two options, then measures): when {@code done} falls back, a new pass has
     * begun, and the line names the pass and estimates the time left of that pass.
     */
    public synchronized void progress(long done, long total) {
        if (quiet || total <= 0) {
            return;
        }
        long now = clock.getAsLong();
        if (done < lastDone) {
            pass++;
            stepStart = now;
            drawnFinished = false;
        }
        lastDone = done;
        boolean finished = done >= total;
        if (finished && drawnFinished) {
            return; // the engine may report completion more than once
        }
        if (lastDraw != Long.MIN_VALUE && now - lastDraw < MIN_INTERVAL_NANOS && !finished) {
            return;
        }
        drawnFinished = finished;
        lastDraw = now;
        String name = pass > 1 ? step + " (pass " + pass + ")" : step;
        err.print("\r" + line(name, done, total, now - stepStart));
        err.flush();
        lineOpen = true;
    }

    /** Ends the current step's line. */
    public synchronized void end() {
        finishLine();
    }

    /** Ends an open line, so that an error printed next starts on a line of its own. */
    @Override
    public void close() {
        end();
    }

    private void finishLine() {
        if (lineOpen) {
            err.println();
            err.flush();
            lineOpen = false;
        }
    }

    /** The text of a progress line, e.g. {@code "checking  42%  about 12 s left"}. */
    static String line(String step, long done, long total, long elapsedNanos) {
        double fraction = Math.min(1.0, Math.max(0.0, (double) done / total));
        String text = String.format(Locale.ROOT, "%s %3d%%", step, (int) Math.floor(fraction * 100));
        if (fraction > 0 && fraction < 1) {
            double leftSeconds = elapsedNanos / 1e9 * (1 - fraction) / fraction;
            text += "  about " + duration(leftSeconds) + " left";
        }
        return text + "    ";
    }

    static String duration(double seconds) {
        if (seconds < 60) {
            return Math.max(1, Math.round(seconds)) + " s";
        }
        long s = Math.round(seconds);
        return s / 60 + " min " + s % 60 + " s";
    }
}
