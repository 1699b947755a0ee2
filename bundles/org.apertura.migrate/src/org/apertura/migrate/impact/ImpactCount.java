/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.migrate.impact;

/**
 * Counts of changes for one layer and rule (or a total when {@code rule} is {@code *}).
 *
 * @param layer      the deck layer, {@code *} for all
 * @param rule       the rule name, {@code *} for all
 * @param newCount   violations under the target only
 * @param fixed      violations under the source only
 * @param persisting violations under both
 */
public record ImpactCount(String layer, String rule, int newCount, int fixed, int persisting) {
}
