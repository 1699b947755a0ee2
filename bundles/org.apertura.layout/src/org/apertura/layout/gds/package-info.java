/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
/**
 * GDSII stream reading and writing (Calma, "GDS II Stream Format Manual", Release 6.0, February
 * 1987): {@link org.apertura.layout.gds.GdsReader}, {@link org.apertura.layout.gds.GdsWriter}, the
 * 8-byte real codec {@link org.apertura.layout.gds.Real8}, record and data type tables, the checks
 * and warning texts both readers share ({@link org.apertura.layout.gds.GdsReadChecks}), and
 * {@link org.apertura.layout.gds.GdsFormatException} for malformed input (file, byte offset, problem).
 * Coordinates stay in database units.
 */
package org.apertura.layout.gds;
