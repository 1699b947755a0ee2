/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.scoping;

import org.apertura.rules.deck.Layer;
import org.apertura.rules.deck.Option;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.naming.IQualifiedNameProvider;
import org.eclipse.xtext.naming.QualifiedName;

/**
 * Only layers and options have names, and they are simple names. Answering directly (instead of
 * the reflective default, which walks up to the resource for every object) keeps scoping linear in
 * the size of the deck even for deeply nested expressions.
 */
public class DeckQualifiedNameProvider extends IQualifiedNameProvider.AbstractImpl {

	@Override
	public QualifiedName getFullyQualifiedName(EObject obj) {
		String name = null;
		if (obj instanceof Layer layer) {
			name = layer.getName();
		} else if (obj instanceof Option option) {
			name = option.getName();
		}
		return name == null || name.isEmpty() ? null : QualifiedName.create(name);
	}
}
