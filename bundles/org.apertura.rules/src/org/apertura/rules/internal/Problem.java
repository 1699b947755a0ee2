/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.xtext.diagnostics.Severity;

/**
 * A problem found by {@link DeckResolver}, attached to a model object and optionally one of its
 * features, with a code from {@code DeckIssueCodes}.
 */
public record Problem(EObject object, EStructuralFeature feature, Severity severity, String code, String message) {
}
