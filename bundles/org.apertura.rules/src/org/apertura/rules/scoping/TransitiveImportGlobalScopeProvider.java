/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.scoping;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.LinkedHashSet;
import java.util.Set;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.xtext.scoping.impl.ImportUriGlobalScopeProvider;
import org.eclipse.xtext.util.IAcceptor;

/**
 * Makes the layers and options of every deck in the import closure visible, not only those of the
 * directly imported decks: a deck that imports a deck that imports the layer map sees the layers.
 * Cycles and unloadable imports end the walk quietly (the validator reports them).
 */
public class TransitiveImportGlobalScopeProvider extends ImportUriGlobalScopeProvider {

	/** Resolves relative import paths against the importing deck's own location. */
	@Override
	protected IAcceptor<String> createURICollector(Resource resource, Set<URI> collectInto) {
		URI base = resource.getURI();
		return text -> {
			if (text == null || text.isEmpty()) {
				return;
			}
			try {
				URI uri = URI.createURI(text);
				if (uri.isRelative() && base != null && !base.isRelative()) {
					uri = uri.resolve(base);
				}
				collectInto.add(uri);
			} catch (IllegalArgumentException e) {
				// not a URI: the validator reports the import as not found
			}
		};
	}

	@Override
	protected LinkedHashSet<URI> getImportedUris(Resource resource) {
		LinkedHashSet<URI> all = new LinkedHashSet<>(super.getImportedUris(resource));
		ResourceSet set = resource.getResourceSet();
		if (set == null) {
			return all;
		}
		Deque<URI> pending = new ArrayDeque<>(all);
		while (!pending.isEmpty()) {
			URI uri = pending.poll();
			Resource imported;
			try {
				imported = set.getResource(uri, true);
			} catch (RuntimeException e) {
				continue;
			}
			if (imported == null || imported == resource) {
				continue;
			}
			for (URI next : super.getImportedUris(imported)) {
				if (!next.equals(resource.getURI()) && all.add(next)) {
					pending.add(next);
				}
			}
		}
		all.remove(resource.getURI());
		return all;
	}
}
