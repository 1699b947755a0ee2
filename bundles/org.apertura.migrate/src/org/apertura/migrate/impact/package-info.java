/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Layout impact of a migration: the layout checked by the engine under the source and the target
 * option, each violation classified as new (a break), fixed or persisting.
 */
package org.apertura.migrate.impact;
