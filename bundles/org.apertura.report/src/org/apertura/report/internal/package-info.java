/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Helpers shared by the writers: number formatting, picture drawing. Not API. */
package org.apertura.report.internal;
