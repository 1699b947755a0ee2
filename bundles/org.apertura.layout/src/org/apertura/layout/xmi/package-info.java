/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * XMI persistence of the layout model (file extension {@code aplayout}) for use with and without
 * the Eclipse extension registry.
 */
package org.apertura.layout.xmi;
