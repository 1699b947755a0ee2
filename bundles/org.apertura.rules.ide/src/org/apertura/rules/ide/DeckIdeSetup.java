/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide;

import org.apertura.rules.DeckRuntimeModule;
import org.apertura.rules.DeckStandaloneSetup;
import org.eclipse.xtext.util.Modules2;

import com.google.inject.Guice;
import com.google.inject.Injector;

/** Creates an injector with the runtime and the editor services of the deck language. */
public class DeckIdeSetup extends DeckStandaloneSetup {

	@Override
	public Injector createInjector() {
		return Guice.createInjector(Modules2.mixin(new DeckRuntimeModule(), new DeckIdeModule()));
	}
}
