/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** Where a finding stands. */
public enum FindingStatus {
    /** present under the target option only: the migration breaks this place */
    NEW,
    /** present under the source option only: the migration fixes this place */
    FIXED,
    /** present under both options */
    PERSISTING,
    /** a plain check under one option: the violation is present */
    OPEN;

    /** True when the violation exists in the result being reported (everything but {@link #FIXED}). */
    public boolean present() {
        return this != FIXED;
    }
}
