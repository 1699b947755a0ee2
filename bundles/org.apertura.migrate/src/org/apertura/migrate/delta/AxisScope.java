/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.delta;

/** Which axis a compared value applies to. */
public enum AxisScope {
    /** Both axes carry the value (isotropic under both options). */
    BOTH,
    /** The value measured along x. */
    X,
    /** The value measured along y. */
    Y
}
