/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/** The subcommands of the headless command and what they share: progress, input errors, exit codes. */
package org.apertura.cli.internal;
