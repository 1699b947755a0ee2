/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Tests of the XMI native format.
 */
package org.apertura.layout.tests.xmi;
