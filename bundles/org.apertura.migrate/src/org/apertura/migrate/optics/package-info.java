/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Optical resolution arithmetic for lithography options: Rayleigh resolution and depth of focus,
 * the k1 factor a drawn pitch implies, and the printability verdict derived from it.
 */
package org.apertura.migrate.optics;
