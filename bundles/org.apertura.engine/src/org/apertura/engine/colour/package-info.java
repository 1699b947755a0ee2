/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Multiple patterning: the conflict graph of merged shapes closer than the same-mask spacing and its
 * colouring with two masks (exact, with odd cycles as proof when impossible) or three masks (exact
 * search on small components, a stated heuristic beyond).
 */
package org.apertura.engine.colour;
