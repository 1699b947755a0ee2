/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Internal algorithms of the check engine: the edge index (rows and columns of sorted axis-parallel
 * edges, a grid for other angles), the facing-pair geometry, the parallel pair search over the index,
 * the task runner and a radix sort that yields permutations. Not API.
 */
package org.apertura.engine.internal;
