/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules;

/**
 * Sets the deck language up without OSGi: registers the EMF package and the {@code .apdeck}
 * resource factory and creates the injector. Plain Java callers normally use
 * {@link org.apertura.rules.resolved.DeckLoader}, which does this once per JVM.
 */
public class DeckStandaloneSetup extends DeckStandaloneSetupGenerated {

	/** Registers the language globally (EMF registries) and discards the injector. */
	public static void doSetup() {
		new DeckStandaloneSetup().createInjectorAndDoEMFRegistration();
	}
}
