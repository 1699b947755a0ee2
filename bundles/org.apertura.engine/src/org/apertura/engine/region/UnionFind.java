/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.engine.region;

/**
 * Union-find over a parent array (p[i] == i for a root) with path halving. The lower number becomes
 * the root, so a group's root is its first member, whatever the order of the unions.
 */
final class UnionFind {

    private UnionFind() {
    }

    /** A parent array of n singletons. */
    static int[] singletons(int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        return p;
    }

    static int find(int[] p, int a) {
        while (p[a] != a) {
            p[a] = p[p[a]];
            a = p[a];
        }
        return a;
    }

    static void union(int[] p, int a, int b) {
        int ra = find(p, a), rb = find(p, b);
        if (ra != rb) {
            p[Math.max(ra, rb)] = Math.min(ra, rb);
        }
    }
}
