/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Cell hierarchy queries: top cells, children, cycle detection and depth, with
 * {@link org.apertura.layout.hierarchy.LayoutHierarchyException} for hierarchies that cannot be
 * expanded.
 */
package org.apertura.layout.hierarchy;
