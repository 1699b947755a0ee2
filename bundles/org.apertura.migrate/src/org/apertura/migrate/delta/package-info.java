/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The deck delta between two lithography options: per layer and rule, old and new value, difference,
 * ratio, whether the rule tightened or relaxed, and why.
 */
package org.apertura.migrate.delta;
