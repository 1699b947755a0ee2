/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.internal;

/**
 * Stable least-significant-digit radix sort of non-negative long keys that yields the permutation, not
 * the sorted keys: the JDK sorts primitive arrays but cannot carry a payload along, and packing an index
 * into the key runs out of bits for large layers. Eleven bits per pass; passes whose digit is the same
 * for every key are skipped, so small key ranges cost few passes.
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
        int[] count = new int[RADIX + 1];
        for (int shift = 0; shift < bits; shift += BITS) {
            java.util.Arrays.fill(count, 0);
            for (int i = 0; i < n; i++) {
                count[(int) ((k[i] >>> shift) & (RADIX - 1)) + 1]++;
            }
            boolean single = false;
            for (int d = 1; d <= RADIX; d++) {
                if (count[d] == n) {
                    single = true;
                    break;
                }
            }
            if (single) {
                continue;
            }
            for (int d = 0; d < RADIX; d++) {
                count[d + 1] += count[d];
            }
            for (int i = 0; i < n; i++) {
                int d = (int) ((k[i] >>> shift) & (RADIX - 1));
                int to = count[d]++;
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
