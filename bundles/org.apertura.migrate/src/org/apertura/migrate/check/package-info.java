/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Bridges a resolved deck to the check engine: engine rules per option, each traced back to the deck
 * rule it came from ({@link org.apertura.migrate.check.RuleRef}).
 */
package org.apertura.migrate.check;
