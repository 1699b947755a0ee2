/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The anamorphic mask side: wafer features taken to mask scale with the demagnification of each axis
 * and checked against the deck's mask-side minimums, saying which axis binds.
 */
package org.apertura.migrate.anamorphic;
