/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

/** What a layer carries. */
public enum LayerKind {
	/** Lines: routing metal, gate, local interconnect; has a preferred direction and a pitch. */
	LINE,
	/** Cuts: vias and contacts. */
	CUT,
	/** Anything else (wells, implants, markers). */
	OTHER
}
