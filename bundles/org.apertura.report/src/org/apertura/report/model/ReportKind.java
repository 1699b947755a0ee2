/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report.model;

/** What produced the report. */
public enum ReportKind {
    /** a layout checked against a deck under one option */
    CHECK,
    /** two options of a deck compared (deck delta and layout impact) */
    COMPARE,
    /** the full migration analysis */
    MIGRATION
}
