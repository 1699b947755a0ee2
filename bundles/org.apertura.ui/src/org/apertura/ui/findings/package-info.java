/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The review the workbench shows: the findings of the last check or migration of a layout, shared by
 * the violations view and the layout editor, and the waivers a reviewer adds to them.
 */
package org.apertura.ui.findings;
