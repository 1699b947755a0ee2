/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import org.eclipse.emf.ecore.EObject;

/**
 * Thrown while evaluating an expression. A {@code null} code means the cause has already been
 * reported elsewhere and the value is simply unavailable.
 */
final class EvaluationException extends Exception {

	private static final long serialVersionUID = 1L;

	private final transient EObject where;
	private final String code;

	EvaluationException(EObject where, String code, String message) {
		super(message, null, false, false);
		this.where = where;
		this.code = code;
	}

	static EvaluationException silent() {
		return new EvaluationException(null, null, "already reported");
	}

	EObject where() {
		return where;
	}

	String code() {
		return code;
	}
}
