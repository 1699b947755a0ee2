/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Report writers: a self-contained HTML page ({@link org.apertura.report.write.HtmlReport}), CSV tables
 * ({@link org.apertura.report.write.CsvReport}), JSON with a published schema
 * ({@link org.apertura.report.write.JsonReport}) and SARIF 2.1.0 ({@link org.apertura.report.write.SarifReport}),
 * and {@link org.apertura.report.write.ReportSet}, which writes a chosen set of them into a folder that is
 * swapped in whole.
 */
package org.apertura.report.write;
