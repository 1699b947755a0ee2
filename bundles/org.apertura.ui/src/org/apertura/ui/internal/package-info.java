/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Workbench application plumbing: advisors and perspectives. */
package org.apertura.ui.internal;
