/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Reading benchmark of the layout bundle (run by bench/layout/run; not a test).
 */
package org.apertura.layout.bench;
