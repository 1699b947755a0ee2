/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Workbench views: the violations table and the migration review. */
package org.apertura.ui.views;
