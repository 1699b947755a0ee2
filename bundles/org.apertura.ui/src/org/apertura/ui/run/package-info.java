/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * Long work as Eclipse jobs with progress and cancel: checking a layout against a deck option and
 * running a migration study; results go to the {@link org.apertura.ui.findings.ReviewSession} and the
 * {@link org.apertura.ui.run.StudySession}.
 */
package org.apertura.ui.run;
