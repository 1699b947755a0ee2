/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Internal algorithms of the check engine: the packed edge index, the facing-pair geometry and the
 * tiled parallel pair search. Not API.
 */
package org.apertura.engine.internal;
