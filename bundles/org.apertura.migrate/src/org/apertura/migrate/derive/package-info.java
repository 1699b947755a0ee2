/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Derivation of a draft target deck from a source option by k1-preserving scaling, written in the
 * rule language and validated by its loader.
 */
package org.apertura.migrate.derive;
