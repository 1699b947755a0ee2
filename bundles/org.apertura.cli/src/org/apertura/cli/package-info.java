/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * The headless Apertura command: the Equinox application that the {@code ./apertura} launcher
 * script starts, and the command tree it runs.
 */
package org.apertura.cli;
