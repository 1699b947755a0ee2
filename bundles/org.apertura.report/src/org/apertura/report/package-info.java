/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** Reports a reviewer can read, waive and sign off: writers for HTML, CSV, JSON and SARIF. */
package org.apertura.report;
