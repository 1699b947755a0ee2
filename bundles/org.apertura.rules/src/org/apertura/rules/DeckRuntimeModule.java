/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules;

import org.apertura.rules.formatting.DeckFormatter;
import org.apertura.rules.validation.DeckLinkingDiagnosticMessageProvider;
import org.eclipse.xtext.formatting2.FormatterPreferenceValuesProvider;
import org.eclipse.xtext.formatting2.FormatterPreferences;
import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.linking.ILinkingDiagnosticMessageProvider;
import org.eclipse.xtext.naming.IQualifiedNameProvider;
import org.eclipse.xtext.preferences.IPreferenceValuesProvider;
import org.eclipse.xtext.scoping.IGlobalScopeProvider;
import org.eclipse.xtext.validation.CompositeEValidator;
import org.apertura.rules.scoping.DeckQualifiedNameProvider;
import org.apertura.rules.scoping.TransitiveImportGlobalScopeProvider;

import com.google.inject.Binder;
import com.google.inject.name.Names;

/**
 * Runtime bindings of the deck language: decks see the layers and options of the decks they import
 * (by file, {@code import "other.apdeck"}), unresolved names get our issue codes, and the formatter.
 */
public class DeckRuntimeModule extends AbstractDeckRuntimeModule {

	@Override
	public Class<? extends IGlobalScopeProvider> bindIGlobalScopeProvider() {
		return TransitiveImportGlobalScopeProvider.class;
	}

	/** Layers and options are the only named things. */
	@Override
	public Class<? extends IQualifiedNameProvider> bindIQualifiedNameProvider() {
		return DeckQualifiedNameProvider.class;
	}

	/** Unknown layer and option names get codes from {@code DeckIssueCodes}. */
	public Class<? extends ILinkingDiagnosticMessageProvider> bindILinkingDiagnosticMessageProvider() {
		return DeckLinkingDiagnosticMessageProvider.class;
	}

	/** The formatter (also used by the serializer). */
	public Class<? extends IFormatter2> bindIFormatter2() {
		return DeckFormatter.class;
	}

	/**
	 * No generic EMF constraint checks: they only restate the grammar, and their containment check
	 * walks to the root from every object (quadratic in deeply nested expressions).
	 */
	public void configureUseEObjectValidator(Binder binder) {
		binder.bindConstant().annotatedWith(Names.named(CompositeEValidator.USE_EOBJECT_VALIDATOR)).to(false);
	}

	/** Formatter preferences from the defaults. */
	public void configureFormatterPreferences(Binder binder) {
		binder.bind(IPreferenceValuesProvider.class).annotatedWith(FormatterPreferences.class)
				.to(FormatterPreferenceValuesProvider.class);
	}
}
