/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.colour;

/** How a layer's multiple patterning changes with the migration. */
public enum Transition {
    /** Multi-mask under the source option, one mask under the target: its colouring conflicts vanish. */
    LEAVING,
    /** One mask under the source option, multi-mask under the target: it must now be decomposed. */
    ENTERING,
    /** Multi-mask under both options (the colouring distance or mask count may change). */
    STAYING
}
