/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** The canonical layout of deck files, used by the formatter and the serializer. */
package org.apertura.rules.formatting;
