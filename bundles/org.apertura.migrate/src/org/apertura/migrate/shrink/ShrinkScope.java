/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.shrink;

/** How the layout is shrunk. */
public enum ShrinkScope {
    /** The same linear factor along x and y. */
    UNIFORM,
    /** Along x only, y kept. */
    X,
    /** Along y only, x kept. */
    Y
}
