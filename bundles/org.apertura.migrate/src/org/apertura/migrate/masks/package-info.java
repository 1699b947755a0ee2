/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Masks, exposures and scanner time per layer under two lithography options, and what a migration
 * saves or adds.
 */
package org.apertura.migrate.masks;
