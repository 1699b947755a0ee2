/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Benchmark of the check engine (run by bench/engine/run, not a test): a seeded generator of
 * routing-like layouts and a straightforward JTS checker to compare against.
 */
package org.apertura.engine.bench;
