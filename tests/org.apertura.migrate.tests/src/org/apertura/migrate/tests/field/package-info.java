/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Tests of the field and stitching check. */
package org.apertura.migrate.tests.field;
