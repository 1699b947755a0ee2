/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** New wizards: a rule deck, and a migration study. */
package org.apertura.ui.wizards;
