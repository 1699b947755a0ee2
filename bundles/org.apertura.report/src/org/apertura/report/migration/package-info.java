/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Adapters from the migration analysis and the check engine to the report model: a
 * {@link org.apertura.migrate.MigrationResult}, a deck comparison, a plain check or a saved study
 * ({@code *.apstudy}) become a {@link org.apertura.report.model.ReportData} that every report writer reads.
 *
 * <p>Units: the migration and the engine work in the deck's database units; the report model is in
 * nanometres. {@link org.apertura.report.migration.ReportContext#databaseUnitNm()} gives the size of one
 * database unit, and every length is multiplied by it (areas by its square; densities stay fractions).
 *
 * <p>Findings: a violation becomes a {@link org.apertura.report.model.Finding} whose rule id is the engine
 * rule id ({@code layer/rule}, e.g. {@code M1/end-of-line}) and whose rule kind is the engine's violation kind
 * in lower case with hyphens ({@code tip-to-tip}). Its fingerprint is made from rule id, layer, kind and
 * marker box only, not from the edge pair: a saved study keeps markers but not edges, and a report rendered
 * from it must give every finding the fingerprint the original run gave it, so that waivers match either way.
 */
package org.apertura.report.migration;
