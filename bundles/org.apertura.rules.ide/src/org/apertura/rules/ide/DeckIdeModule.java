/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide;

import org.apertura.rules.ide.contentassist.DeckContentProposalProvider;
import org.apertura.rules.ide.highlighting.DeckSemanticHighlightingCalculator;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.ide.editor.syntaxcoloring.ISemanticHighlightingCalculator;
import org.eclipse.xtext.ide.server.rename.IRenameService2;
import org.eclipse.xtext.ide.refactoring.IRenameStrategy2;

/**
 * Editor services of the deck language, without UI dependencies: content assist and semantic
 * highlighting, for the workbench's deck editor (or a language server).
 */
public class DeckIdeModule extends AbstractDeckIdeModule {

	/** Described layer and option proposals. */
	public Class<? extends IdeContentProposalProvider> bindIdeContentProposalProvider() {
		return DeckContentProposalProvider.class;
	}

	/**
	 * No rename service: Xtext's generic one is built on the language-server protocol library
	 * (lsp4j), which the workbench does not ship; without these overrides the injector would fail to
	 * load it.
	 */
	@Override
	public Class<? extends IRenameService2> bindIRenameService2() {
		return null;
	}

	/** No rename strategy either (see {@link #bindIRenameService2()}). */
	@Override
	public Class<? extends IRenameStrategy2> bindIRenameStrategy2() {
		return null;
	}

	/** Semantic highlighting with the styles of {@code DeckHighlightingStyles}. */
	public Class<? extends ISemanticHighlightingCalculator> bindISemanticHighlightingCalculator() {
		return DeckSemanticHighlightingCalculator.class;
	}
}
