/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Tests of the layout viewer's index, renderer, view arithmetic and rulers (no workbench needed). */
package org.apertura.ui.tests.viewer;
