/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The layout editor: opens a GDSII file, lists its cell hierarchy and layers, and shows the chosen
 * cell in a {@link org.apertura.ui.viewer.LayoutCanvas} with the current review's violations on top.
 */
package org.apertura.ui.layout;
