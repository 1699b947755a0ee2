/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.formatting;

import java.util.IdentityHashMap;
import java.util.Map;
import java.util.Set;

import org.apertura.rules.deck.Deck;
import org.apertura.rules.deck.FunctionCall;
import org.apertura.rules.deck.Import;
import org.apertura.rules.deck.Layer;
import org.apertura.rules.deck.LayerRules;
import org.apertura.rules.deck.Negation;
import org.apertura.rules.deck.Option;
import org.apertura.rules.deck.OptionSetting;
import org.apertura.rules.deck.Rule;
import org.apertura.rules.deck.Technology;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.xtext.formatting2.AbstractFormatter2;
import org.eclipse.xtext.formatting2.IFormattableDocument;
import org.eclipse.xtext.formatting2.ITextReplacer;
import org.eclipse.xtext.formatting2.ITextReplacerContext;
import org.eclipse.xtext.formatting2.regionaccess.IComment;
import org.eclipse.xtext.formatting2.regionaccess.IHiddenRegionPart;
import org.eclipse.xtext.formatting2.regionaccess.ITextSegment;
import org.eclipse.xtext.formatting2.regionaccess.IEObjectRegion;
import org.eclipse.xtext.formatting2.regionaccess.IHiddenRegion;
import org.eclipse.xtext.formatting2.regionaccess.ISemanticRegion;
import org.eclipse.xtext.resource.XtextResource;

/**
 * The canonical layout of a deck: one statement per line (an import, a layer, a setting, a rule),
 * blocks indented by one tab, a blank line before each option and each deck-level block (a blank line
 * the author left between statements is kept), single spaces between tokens, none inside
 * parentheses, before commas and colons, after a unary minus or in a GDS number ({@code 19/0}).
 * Comments stay where they are: one on its own line is indented like the statement after it, one
 * after a token keeps the author's alignment.
 *
 * <p>It decides every gap between two tokens exactly once, walking the token sequence and writing
 * each gap's whole text (indentation included) with one replacer, so no two formatting requests can
 * conflict and comments are placed exactly.
 */
public class DeckFormatter extends AbstractFormatter2 {

	private static final Set<String> FUNCTIONS = Set.of("min", "max", "ceil", "floor", "round");

	private enum Gap {
		NONE, SPACE, LINE, BLANK_LINE
	}

	@Override
	public void format(Object obj, IFormattableDocument document) {
		if (obj instanceof XtextResource resource) {
			_format(resource, document);
		} else if (obj instanceof Deck deck) {
			formatDeck(deck, document);
		}
	}

	private void formatDeck(Deck deck, IFormattableDocument document) {
		Map<IHiddenRegion, Gap> before = new IdentityHashMap<>();
		Set<IHiddenRegion> continuation = java.util.Collections.newSetFromMap(new IdentityHashMap<>());
		for (Import i : deck.getImports()) {
			mark(before, i, Gap.LINE);
		}
		boolean first = deck.getImports().isEmpty();
		if (deck.getTechnology() != null) {
			Technology t = deck.getTechnology();
			mark(before, t, first ? Gap.LINE : Gap.BLANK_LINE);
			for (String k : new String[] { "database", "grid" }) {
				ISemanticRegion r = textRegionExtensions.regionFor(t).keyword(k);
				if (r != null) {
					before.put(r.getPreviousHiddenRegion(), Gap.LINE);
					continuation.add(r.getPreviousHiddenRegion());
				}
			}
			first = false;
		}
		for (EObject e : deck.getElements()) {
			boolean loose = e instanceof Option || e instanceof LayerRules;
			mark(before, e, first ? Gap.LINE : loose ? Gap.BLANK_LINE : Gap.LINE);
			first = false;
		}
		var all = deck.eAllContents();
		while (all.hasNext()) {
			EObject e = all.next();
			if (e instanceof OptionSetting || e instanceof Rule) {
				mark(before, e, Gap.LINE);
			} else if (e instanceof LayerRules && e.eContainer() instanceof Option) {
				mark(before, e, Gap.BLANK_LINE);
			}
		}
		IEObjectRegion root = textRegionExtensions.regionForEObject(deck);
		if (root == null) {
			return;
		}
		IHiddenRegion h = root.getPreviousHiddenRegion();
		ISemanticRegion previous = null;
		int depth = 0;
		while (h != null) {
			ISemanticRegion next = h.getNextSemanticRegion();
			if (previous != null && "{".equals(previous.getText())) {
				depth++;
			}
			if (next != null && "}".equals(next.getText())) {
				depth = Math.max(0, depth - 1);
			}
			Gap gap = previous == null ? Gap.NONE : next == null ? Gap.LINE : gap(previous, next, before.get(h));
			int indent = depth + (continuation.contains(h) ? 1 : 0);
			String text = whitespace(h, gap, indent, previous == null, next == null);
			if (!text.equals(h.getText())) {
				final IHiddenRegion region = h;
				document.addReplacer(new ITextReplacer() {
					@Override
					public ITextSegment getRegion() {
						return region;
					}

					@Override
					public ITextReplacerContext createReplacements(ITextReplacerContext context) {
						context.addReplacement(region.replaceWith(text));
						return context;
					}
				});
			}
			if (next == null) {
				break;
			}
			previous = next;
			h = next.getNextHiddenRegion();
		}
	}

	/**
	 * The text of one gap between tokens, comments kept: a comment on its own line stays on its own
	 * line (indented like the next statement), a comment after a token stays after it, and at most one
	 * blank line the author left is kept.
	 */
	private static String whitespace(IHiddenRegion h, Gap gap, int indent, boolean atStart, boolean atEnd) {
		String tabs = "\t".repeat(indent);
		if (!h.containsComment()) {
			if (atEnd) {
				return atStart ? "" : "\n";
			}
			return switch (gap) {
				case NONE -> "";
				case SPACE -> " ";
				case LINE -> "\n".repeat(Math.min(2, Math.max(1, newlines(h.getText())))) + tabs;
				case BLANK_LINE -> "\n\n" + tabs;
			};
		}
		StringBuilder out = new StringBuilder();
		int pendingNewlines = 0;
		boolean lineStart = atStart;
		boolean firstComment = true;
		String spaceBefore = "";
		for (IHiddenRegionPart part : h.getParts()) {
			if (!(part instanceof IComment)) {
				pendingNewlines += newlines(part.getText());
				spaceBefore = part.getText();
				continue;
			}
			String comment = part.getText();
			boolean endsLine = comment.endsWith("\n");
			comment = comment.stripTrailing();
			if (atStart && firstComment) {
				// the first text of the file
			} else if (pendingNewlines == 0 && !lineStart) {
				// a comment after a token keeps the author's alignment (spaces or tabs only)
				out.append(spaceBefore.isEmpty() || !spaceBefore.isBlank() ? " " : spaceBefore);
			} else {
				int n = Math.min(2, Math.max(pendingNewlines, lineStart ? 0 : 1));
				if (firstComment && gap == Gap.BLANK_LINE && !atStart) {
					n = 2;
				}
				out.append("\n".repeat(n)).append(tabs);
			}
			out.append(comment);
			spaceBefore = "";
			firstComment = false;
			pendingNewlines = endsLine ? 1 : 0;
			lineStart = false;
		}
		if (atEnd) {
			return out.append('\n').toString();
		}
		if (pendingNewlines == 0 && (gap == Gap.NONE || gap == Gap.SPACE)) {
			return out.append(' ').toString();
		}
		return out.append("\n".repeat(Math.min(2, Math.max(1, pendingNewlines)))).append(tabs).toString();
	}

	private static int newlines(String s) {
		int n = 0;
		for (int i = 0; i < s.length(); i++) {
			if (s.charAt(i) == '\n') {
				n++;
			}
		}
		return n;
	}

	private void mark(Map<IHiddenRegion, Gap> before, EObject e, Gap gap) {
		IEObjectRegion r = textRegionExtensions.regionForEObject(e);
		if (r != null) {
			before.put(r.getPreviousHiddenRegion(), gap);
		}
	}

	private static Gap gap(ISemanticRegion a, ISemanticRegion b, Gap statement) {
		String at = a.getText();
		String bt = b.getText();
		if ("{".equals(at) || "}".equals(bt)) {
			return Gap.LINE;
		}
		if (statement != null) {
			return statement;
		}
		if (")".equals(bt) || ",".equals(bt) || ":".equals(bt) || "(".equals(at)) {
			return Gap.NONE;
		}
		if ("(".equals(bt) && a.getSemanticElement() instanceof FunctionCall && FUNCTIONS.contains(at)) {
			return Gap.NONE;
		}
		if ("-".equals(at) && a.getSemanticElement() instanceof Negation) {
			return Gap.NONE;
		}
		if (("/".equals(at) || "/".equals(bt)) && a.getSemanticElement() instanceof Layer
				&& b.getSemanticElement() instanceof Layer) {
			return Gap.NONE;
		}
		return Gap.SPACE;
	}
}
