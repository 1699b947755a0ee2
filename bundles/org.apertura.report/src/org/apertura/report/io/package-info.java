/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** File output that never leaves a half-written file behind. */
package org.apertura.report.io;
