/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.layout.flatten;

/**
 * Non-negative counts that stop at {@link Long#MAX_VALUE} instead of wrapping: the flatteners estimate
 * the vertices a hierarchy expands to before expanding it, and a deep array of arrays must read as
 * "too many", never as a small or negative number.
 */
public final class Saturating {

    private Saturating() {
    }

    /** a + b for non-negative a and b, or {@link Long#MAX_VALUE} when it overflows. */
    public static long add(long a, long b) {
        long r = a + b;
        return r < 0 ? Long.MAX_VALUE : r;
    }

    /** a * b for non-negative a, 0 when a is 0 or b is not positive, {@link Long#MAX_VALUE} when it overflows. */
    public static long multiply(long a, long b) {
        if (a == 0 || b <= 0) {
            return 0;
        }
        return a > Long.MAX_VALUE / b ? Long.MAX_VALUE : a * b;
    }
}
