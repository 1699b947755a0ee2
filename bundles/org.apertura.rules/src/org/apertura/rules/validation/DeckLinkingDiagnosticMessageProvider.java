/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.validation;

import org.apertura.rules.deck.DeckPackage;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.xtext.diagnostics.DiagnosticMessage;
import org.eclipse.xtext.diagnostics.Severity;
import org.eclipse.xtext.linking.impl.LinkingDiagnosticMessageProvider;

/** Gives unresolved layer and option names our own issue codes and wording. */
public class DeckLinkingDiagnosticMessageProvider extends LinkingDiagnosticMessageProvider {

	@Override
	public DiagnosticMessage getUnresolvedProxyMessage(ILinkingDiagnosticContext context) {
		EClass type = context.getReference().getEReferenceType();
		String what;
		String code;
		if (type == DeckPackage.Literals.LAYER) {
			what = "layer";
			code = DeckIssueCodes.UNKNOWN_LAYER;
		} else if (type == DeckPackage.Literals.OPTION) {
			what = "option";
			code = DeckIssueCodes.UNKNOWN_OPTION;
		} else {
			what = type.getName();
			code = DeckIssueCodes.UNKNOWN_REFERENCE;
		}
		return new DiagnosticMessage("no " + what + " named '" + context.getLinkText()
				+ "' in this deck or the decks it imports", Severity.ERROR, code);
	}
}
