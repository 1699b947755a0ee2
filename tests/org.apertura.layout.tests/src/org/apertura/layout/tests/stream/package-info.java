/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of the streaming GDSII reader and its flattener: same shapes, same errors as the EMF path.
 */
package org.apertura.layout.tests.stream;
