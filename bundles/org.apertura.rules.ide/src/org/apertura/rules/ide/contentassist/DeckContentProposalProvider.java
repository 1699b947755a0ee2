/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide.contentassist;

import org.apertura.rules.deck.Layer;
import org.apertura.rules.deck.Option;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.Assignment;
import org.eclipse.xtext.CrossReference;
import org.eclipse.xtext.EcoreUtil2;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.ParserRule;
import org.eclipse.xtext.RuleCall;
import org.eclipse.xtext.Keyword;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IIdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.resource.IEObjectDescription;
import org.eclipse.xtext.scoping.IScope;

/**
 * Proposes keywords (rule kinds, units, directions, patterning schemes), and layer and option names from the
 * deck and its imports, each name described by what it is: a layer's kind, GDS number and direction,
 * an option's description.
 */
public class DeckContentProposalProvider extends IdeContentProposalProvider {

	@Override
	protected void _createProposals(CrossReference reference, ContentAssistContext context,
			IIdeContentProposalAcceptor acceptor) {
		if (context.getCurrentModel() == null) {
			return;
		}
		var eReference = GrammarUtil.getReference(reference);
		if (eReference == null) {
			return;
		}
		IScope scope = getScopeProvider().getScope(context.getCurrentModel(), eReference);
		for (IEObjectDescription candidate : scope.getAllElements()) {
			String name = getQualifiedNameConverter().toString(candidate.getName());
			if (!name.startsWith(context.getPrefix())) {
				continue;
			}
			ContentAssistEntry entry = new ContentAssistEntry();
			entry.setPrefix(context.getPrefix());
			entry.setProposal(name);
			entry.setKind(ContentAssistEntry.KIND_REFERENCE);
			entry.setDescription(describe(candidate, context));
			acceptor.accept(entry, getProposalPriorities().getCrossRefPriority(candidate, entry));
		}
	}

	private static String describe(IEObjectDescription candidate, ContentAssistContext context) {
		EObject object = candidate.getEObjectOrProxy();
		if (object.eIsProxy() && context.getResource() != null) {
			object = org.eclipse.emf.ecore.util.EcoreUtil.resolve(object, context.getResource());
		}
		if (object instanceof Layer l && !l.eIsProxy()) {
			String direction = l.getDirection() == null ? "" : " " + l.getDirection();
			return l.getKind().getLiteral() + direction + ", GDS " + l.getGdsLayer() + "/" + l.getGdsDatatype();
		}
		if (object instanceof Option o && !o.eIsProxy()) {
			return o.getDescription() == null ? "lithography option" : o.getDescription();
		}
		return null;
	}

	/**
	 * Words written through small datatype rules (units, directions, spacing metrics) are proposed
	 * like keywords where such a value may follow.
	 */
	@Override
	protected void _createProposals(Assignment assignment, ContentAssistContext context,
			IIdeContentProposalAcceptor acceptor) {
		if (assignment.getTerminal() instanceof RuleCall call && call.getRule() instanceof ParserRule rule
				&& GrammarUtil.isDatatypeRule(rule)) {
			for (Keyword keyword : EcoreUtil2.getAllContentsOfType(rule, Keyword.class)) {
				_createProposals(keyword, context, acceptor);
			}
		}
		super._createProposals(assignment, context, acceptor);
	}

	/** Punctuation is not worth proposing; words are. */
	@Override
	protected boolean filterKeyword(Keyword keyword, ContentAssistContext context) {
		String value = keyword.getValue();
		return !value.isEmpty() && (Character.isLetter(value.charAt(0)) || value.equals("%")) && super.filterKeyword(keyword, context);
	}
}
