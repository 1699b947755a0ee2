/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide.highlighting;

import org.apertura.rules.deck.DeckPackage;
import org.apertura.rules.deck.EnclosureRule;
import org.apertura.rules.deck.FunctionCall;
import org.apertura.rules.deck.Layer;
import org.apertura.rules.deck.LayerRules;
import org.apertura.rules.deck.OpticsReference;
import org.apertura.rules.deck.Option;
import org.apertura.rules.deck.Quantity;
import org.apertura.rules.deck.RuleReference;
import org.apertura.rules.deck.SpacerDivision;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.ide.editor.syntaxcoloring.DefaultSemanticHighlightingCalculator;
import org.eclipse.xtext.ide.editor.syntaxcoloring.IHighlightedPositionAcceptor;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.util.CancelIndicator;

/**
 * Marks what the lexer alone cannot tell apart: layer and option names (declarations and
 * references), numbers and their units, optics symbols, references to other rules and functions in
 * expressions. Styles are the identifiers of {@link DeckHighlightingStyles}.
 */
public class DeckSemanticHighlightingCalculator extends DefaultSemanticHighlightingCalculator {

	@Override
	protected boolean highlightElement(EObject object, IHighlightedPositionAcceptor acceptor,
			CancelIndicator cancelIndicator) {
		if (object instanceof Layer) {
			highlightFeature(acceptor, object, DeckPackage.Literals.LAYER__NAME, DeckHighlightingStyles.LAYER);
		} else if (object instanceof Option) {
			highlightFeature(acceptor, object, DeckPackage.Literals.OPTION__NAME, DeckHighlightingStyles.OPTION);
			highlightFeature(acceptor, object, DeckPackage.Literals.OPTION__PARENT, DeckHighlightingStyles.OPTION);
		} else if (object instanceof LayerRules) {
			highlightFeature(acceptor, object, DeckPackage.Literals.LAYER_RULES__LAYER, DeckHighlightingStyles.LAYER);
		} else if (object instanceof EnclosureRule) {
			highlightFeature(acceptor, object, DeckPackage.Literals.ENCLOSURE_RULE__INNER, DeckHighlightingStyles.LAYER);
		} else if (object instanceof SpacerDivision) {
			highlightFeature(acceptor, object, DeckPackage.Literals.SPACER_DIVISION__CUT_LAYER,
					DeckHighlightingStyles.LAYER);
		} else if (object instanceof Quantity) {
			// the number is one datatype token sequence (13 . 5): highlight it as a whole
			for (INode node : NodeModelUtils.findNodesForFeature(object, DeckPackage.Literals.QUANTITY__VALUE)) {
				acceptor.addPosition(node.getOffset(), node.getLength(), DeckHighlightingStyles.NUMBER);
			}
			highlightFeature(acceptor, object, DeckPackage.Literals.QUANTITY__UNIT, DeckHighlightingStyles.UNIT);
			return true;
		} else if (object instanceof OpticsReference) {
			highlightFeature(acceptor, object, DeckPackage.Literals.OPTICS_REFERENCE__SYMBOL,
					DeckHighlightingStyles.OPTICS_SYMBOL);
			return true;
		} else if (object instanceof RuleReference) {
			highlightFeature(acceptor, object, DeckPackage.Literals.RULE_REFERENCE__RULE,
					DeckHighlightingStyles.RULE_REFERENCE);
			return true;
		} else if (object instanceof FunctionCall) {
			highlightFeature(acceptor, object, DeckPackage.Literals.FUNCTION_CALL__FUNCTION,
					DeckHighlightingStyles.FUNCTION);
		}
		return false;
	}
}
