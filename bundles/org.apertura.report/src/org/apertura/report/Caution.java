/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.report;

import org.apertura.migrate.MigrationResult;

/** The caution every report, summary and help text carries. */
public final class Caution {

    /** One sentence, plain text; the same words the migration study saves with its results. */
    public static final String TEXT = MigrationResult.CAUTION;

    private Caution() {
    }
}
