/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.impact;

/** What a migration does to one violation. */
public enum ImpactStatus {
    /** Violates under the target option only: the migration breaks the layout here. */
    NEW,
    /** Violates under the source option only: the migration fixes it. */
    FIXED,
    /** Violates under both options. */
    PERSISTING
}
