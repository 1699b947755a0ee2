/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The migration analysis: {@link org.apertura.migrate.MigrationStudy} runs a study of moving layers of
 * a layout from one lithography option of a deck to another and returns a
 * {@link org.apertura.migrate.MigrationResult}; {@link org.apertura.migrate.SummaryTable} renders its
 * short text summary. Lengths in results are nm unless a name says database units.
 */
package org.apertura.migrate;
