/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** The Apertura workbench: an Eclipse RCP application for authoring decks and reviewing migrations. */
package org.apertura.ui;
