/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import org.apertura.rules.DeckStandaloneSetup;
import org.eclipse.xtext.testing.IInjectorProvider;

import com.google.inject.Injector;

/** Gives Xtext's test helpers an injector of the deck language (standalone, no OSGi). */
public class DeckInjectorProvider implements IInjectorProvider {

	private static Injector injector;

	@Override
	public synchronized Injector getInjector() {
		if (injector == null) {
			injector = new DeckStandaloneSetup().createInjectorAndDoEMFRegistration();
		}
		return injector;
	}
}
