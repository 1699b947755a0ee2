/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Name resolution of layers and options across a deck and its imports. */
package org.apertura.rules.scoping;
