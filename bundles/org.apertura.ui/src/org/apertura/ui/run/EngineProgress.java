/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.run;

import org.apertura.engine.check.CheckOptions;
import org.eclipse.core.runtime.IProgressMonitor;

/**
 * Engine options that report the engine's (done, total) progress to a job's monitor, in 1000 ticks,
 * and stop the engine when the job is cancelled. The engine calls back from its worker threads, so
 * the monitor is only touched under a lock.
 */
final class EngineProgress {

    private static final int TICKS = 1000;

    private EngineProgress() {
    }

    /** Options for {@code threads} workers; {@code monitor} must have TICKS units to give. */
    static CheckOptions options(int threads, IProgressMonitor monitor) {
        int[] reported = {0};
        return new CheckOptions(threads, (done, total) -> {
            if (total <= 0) {
                return;
            }
            int ticks = (int) Math.min(TICKS, done * TICKS / total);
            synchronized (reported) {
                if (ticks > reported[0]) {
                    monitor.worked(ticks - reported[0]);
                    reported[0] = ticks;
                }
            }
        }, monitor::isCanceled);
    }

    static int ticks() {
        return TICKS;
    }
}
