/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The die against each option's exposure field: how many fields it needs, where it is stitched, and
 * which critical shapes meet a stitching line or its keep-out band.
 */
package org.apertura.migrate.field;
