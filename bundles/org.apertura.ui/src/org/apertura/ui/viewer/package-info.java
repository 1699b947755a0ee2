/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The layout viewer: a scene of per-layer polygons in database units with a uniform-grid spatial
 * index ({@link org.apertura.ui.viewer.LayoutScene}), a software renderer that draws the visible part
 * of a scene into an off-screen image away from the UI thread ({@link org.apertura.ui.viewer.SceneRenderer}),
 * and the SWT widget that shows it with zoom, pan, fit, rulers, cursor coordinates and violation
 * markers ({@link org.apertura.ui.viewer.LayoutCanvas}).
 * <p>
 * Coordinates: world coordinates are database units with y pointing up; screen coordinates are
 * pixels with y pointing down. {@link org.apertura.ui.viewer.View} converts between them.
 */
package org.apertura.ui.viewer;
