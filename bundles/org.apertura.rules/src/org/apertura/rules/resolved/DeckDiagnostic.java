/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.util.Objects;

/**
 * One problem found while loading a deck.
 *
 * @param file     the file it was found in (as given to the loader, or the import's resolved path)
 * @param line     1-based line, 0 if the problem concerns the file as a whole
 * @param column   1-based column, 0 if unknown
 * @param offset   0-based character offset, -1 if unknown
 * @param severity error, warning or info
 * @param code     an issue code from {@code org.apertura.rules.validation.DeckIssueCodes}
 * @param message  what is wrong, in words
 */
public record DeckDiagnostic(String file, int line, int column, int offset, Severity severity, String code,
		String message) {

	/** How bad a problem is. */
	public enum Severity {
		/** The deck cannot be used. */
		ERROR,
		/** The deck is usable but probably not what was meant. */
		WARNING,
		/** For information. */
		INFO
	}

	/** Checks the components are present. */
	public DeckDiagnostic {
		Objects.requireNonNull(file, "file");
		Objects.requireNonNull(severity, "severity");
		Objects.requireNonNull(code, "code");
		Objects.requireNonNull(message, "message");
	}

	/** {@code file:line:column: severity: message [code]}. */
	@Override
	public String toString() {
		return file + ":" + line + ":" + column + ": " + severity.name().toLowerCase(java.util.Locale.ROOT) + ": "
				+ message + " [" + code + "]";
	}
}
