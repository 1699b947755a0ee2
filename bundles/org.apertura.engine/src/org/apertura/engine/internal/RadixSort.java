/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

/**
 * Stable least-significant-digit radix sort of non-negative long keys that yields the permutation, not
 * the sorted keys: the JDK sorts primitive arrays but cannot carry a payload along, and packing an index
 * into the key runs out of bits for large layers. Eleven bits per pass; the histograms of all passes come
 * from one sweep, and passes whose digit is the same for every key are skipped.
 */
public final class RadixSort {

    private static final int BITS = 11, RADIX = 1 << BITS;

    private RadixSort() {
    }

    /**
     * The indices of {@code key} in ascending key order (ties in index order).
     *
     * @throws IllegalArgumentException when a key is negative
     */
    public static int[] order(long[] key) {
        int n = key.length;
        int[] idx = new int[n];
        long all = 0;
        for (int i = 0; i < n; i++) {
            idx[i] = i;
            if (key[i] < 0) {
                throw new IllegalArgumentException("negative sort key at " + i + ": " + key[i]);
            }
            all |= key[i];
        }
        long[] k = key.clone();
        long[] k2 = new long[n];
        int[] idx2 = new int[n];
        int bits = 64 - Long.numberOfLeadingZeros(all);
        int passes = (bits + BITS - 1) / BITS;
        // the histograms of all digits in one sweep over the keys
        int[][] count = new int[passes][RADIX + 1];
        for (int i = 0; i < n; i++) {
            long v = k[i];
            for (int p = 0; p < passes; p++) {
                count[p][(int) ((v >>> (p * BITS)) & (RADIX - 1)) + 1]++;
            }
        }
        for (int p = 0; p < passes; p++) {
            int[] c = count[p];
            boolean single = false;
            for (int d = 1; d <= RADIX; d++) {
                if (c[d] == n) {
                    single = true;
                    break;
                }
            }
            if (single) {
                // every key has the same digit here: the order does not change
                continue;
            }
            for (int d = 0; d < RADIX; d++) {
                c[d + 1] += c[d];
            }
            int shift = p * BITS;
            for (int i = 0; i < n; i++) {
                int d = (int) ((k[i] >>> shift) & (RADIX - 1));
                int to = c[d]++;
                k2[to] = k[i];
                idx2[to] = idx[i];
            }
            long[] tk = k;
            k = k2;
            k2 = tk;
            int[] ti = idx;
            idx = idx2;
            idx2 = ti;
        }
        return idx;
    }
}
