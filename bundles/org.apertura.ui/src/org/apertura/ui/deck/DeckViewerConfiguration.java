/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.deck;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.jface.text.BadLocationException;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.IRegion;
import org.eclipse.jface.text.ITextHover;
import org.eclipse.jface.text.ITextViewer;
import org.eclipse.jface.text.Region;
import org.eclipse.jface.text.TextAttribute;
import org.eclipse.jface.text.contentassist.CompletionProposal;
import org.eclipse.jface.text.contentassist.ContentAssistant;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.contentassist.IContentAssistProcessor;
import org.eclipse.jface.text.contentassist.IContentAssistant;
import org.eclipse.jface.text.contentassist.IContextInformation;
import org.eclipse.jface.text.contentassist.IContextInformationValidator;
import org.eclipse.jface.text.information.IInformationPresenter;
import org.eclipse.jface.text.information.IInformationProvider;
import org.eclipse.jface.text.information.InformationPresenter;
import org.eclipse.jface.text.presentation.IPresentationReconciler;
import org.eclipse.jface.text.presentation.PresentationReconciler;
import org.eclipse.jface.text.rules.DefaultDamagerRepairer;
import org.eclipse.jface.text.rules.EndOfLineRule;
import org.eclipse.jface.text.rules.IRule;
import org.eclipse.jface.text.rules.IToken;
import org.eclipse.jface.text.rules.IWordDetector;
import org.eclipse.jface.text.rules.MultiLineRule;
import org.eclipse.jface.text.rules.NumberRule;
import org.eclipse.jface.text.rules.RuleBasedScanner;
import org.eclipse.jface.text.rules.SingleLineRule;
import org.eclipse.jface.text.rules.Token;
import org.eclipse.jface.text.rules.WordRule;
import org.eclipse.jface.text.source.DefaultAnnotationHover;
import org.eclipse.jface.text.source.IAnnotationHover;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Display;
import org.eclipse.ui.editors.text.TextSourceViewerConfiguration;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;

/**
 * Colours, completion and hovers of the deck editor. Colours are Apertura's own: keywords in deep
 * teal, numbers and units in amber-brown, strings in olive, comments in slate grey italics.
 */
final class DeckViewerConfiguration extends TextSourceViewerConfiguration {

    private final DeckEditor editor;

    DeckViewerConfiguration(DeckEditor editor) {
        this.editor = editor;
    }

    @Override
    public IPresentationReconciler getPresentationReconciler(ISourceViewer viewer) {
        PresentationReconciler reconciler = new PresentationReconciler();
        DefaultDamagerRepairer dr = new DefaultDamagerRepairer(scanner());
        reconciler.setDamager(dr, IDocument.DEFAULT_CONTENT_TYPE);
        reconciler.setRepairer(dr, IDocument.DEFAULT_CONTENT_TYPE);
        return reconciler;
    }

    private static RuleBasedScanner scanner() {
        Display d = Display.getCurrent();
        IToken keyword = new Token(new TextAttribute(new Color(d, new RGB(0x0B, 0x6E, 0x75)), null, SWT.BOLD));
        IToken number = new Token(new TextAttribute(new Color(d, new RGB(0x9A, 0x5B, 0x13))));
        IToken string = new Token(new TextAttribute(new Color(d, new RGB(0x5C, 0x6F, 0x1E))));
        IToken comment = new Token(new TextAttribute(new Color(d, new RGB(0x6B, 0x76, 0x84)), null, SWT.ITALIC));
        WordRule words = new WordRule(new IWordDetector() {
            @Override
            public boolean isWordStart(char c) {
                return Character.isLetter(c) || c == '_';
            }

            @Override
            public boolean isWordPart(char c) {
                return Character.isLetterOrDigit(c) || c == '_' || c == '-';
            }
        }, new Token(null)); // other words (layer and option names) stay plain, digits included
        for (String k : DeckLanguage.get().keywords()) {
            words.addWord(k, keyword);
        }
        RuleBasedScanner scanner = new RuleBasedScanner();
        List<IRule> rules = new ArrayList<>();
        rules.add(new EndOfLineRule("//", comment));
        rules.add(new MultiLineRule("/*", "*/", comment));
        rules.add(new SingleLineRule("\"", "\"", string, '\\'));
        rules.add(new NumberRule(number));
        rules.add(words);
        scanner.setRules(rules.toArray(IRule[]::new));
        return scanner;
    }

    @Override
    public IContentAssistant getContentAssistant(ISourceViewer viewer) {
        ContentAssistant assistant = new ContentAssistant();
        assistant.setContentAssistProcessor(new Processor(), IDocument.DEFAULT_CONTENT_TYPE);
        assistant.enableAutoActivation(false);
        assistant.setInformationControlCreator(getInformationControlCreator(viewer));
        return assistant;
    }

    @Override
    public ITextHover getTextHover(ISourceViewer viewer, String contentType) {
        return new K1Hover();
    }

    /** Show Information (F2) at the caret shows the same k1 text as the hover, without a mouse. */
    @Override
    public IInformationPresenter getInformationPresenter(ISourceViewer viewer) {
        InformationPresenter presenter = new InformationPresenter(getInformationControlCreator(viewer));
        K1Hover hover = new K1Hover();
        presenter.setInformationProvider(new IInformationProvider() {
            @Override
            public IRegion getSubject(ITextViewer textViewer, int offset) {
                return hover.getHoverRegion(textViewer, offset);
            }

            @Override
            public String getInformation(ITextViewer textViewer, IRegion subject) {
                return hover.getHoverInfo(textViewer, subject);
            }
        }, IDocument.DEFAULT_CONTENT_TYPE);
        presenter.setSizeConstraints(70, 7, true, true);
        return presenter;
    }

    @Override
    public IAnnotationHover getAnnotationHover(ISourceViewer viewer) {
        return new DefaultAnnotationHover();
    }

    /** Proposals of the ide module's proposal provider, replacing the prefix it reports. */
    private final class Processor implements IContentAssistProcessor {
        @Override
        public ICompletionProposal[] computeCompletionProposals(ITextViewer viewer, int offset) {
            String text = viewer.getDocument().get();
            List<ICompletionProposal> out = new ArrayList<>();
            try {
                for (ContentAssistEntry e : DeckLanguage.get().proposals(text, offset, editor.uri())) {
                    String prefix = e.getPrefix() == null ? "" : e.getPrefix();
                    String proposal = e.getProposal();
                    if (proposal == null || proposal.isEmpty()) {
                        continue;
                    }
                    String label = e.getLabel() != null ? e.getLabel() : proposal;
                    if (e.getDescription() != null) {
                        label += " – " + e.getDescription();
                    }
                    out.add(new CompletionProposal(proposal, offset - prefix.length(), prefix.length(),
                            proposal.length(), null, label, null, null));
                }
            } catch (IOException | RuntimeException ex) {
                // no proposals when the text cannot be read
            }
            return out.toArray(ICompletionProposal[]::new);
        }

        @Override
        public IContextInformation[] computeContextInformation(ITextViewer viewer, int offset) {
            return null;
        }

        @Override
        public char[] getCompletionProposalAutoActivationCharacters() {
            return null;
        }

        @Override
        public char[] getContextInformationAutoActivationCharacters() {
            return null;
        }

        @Override
        public String getErrorMessage() {
            return null;
        }

        @Override
        public IContextInformationValidator getContextInformationValidator() {
            return null;
        }
    }

    /** Pitch and k1 of the layer whose rule block the pointer is in. */
    private final class K1Hover implements ITextHover {
        @Override
        public String getHoverInfo(ITextViewer viewer, IRegion region) {
            String text = viewer.getDocument().get();
            Optional<String> layer = DeckHover.layerAt(text, region.getOffset());
            Optional<Path> file = editor.path();
            if (layer.isEmpty() || file.isEmpty()) {
                return null;
            }
            return DeckHover.describe(file.get(), text, layer.get()).orElse(null);
        }

        @Override
        public IRegion getHoverRegion(ITextViewer viewer, int offset) {
            try {
                IDocument doc = viewer.getDocument();
                int start = offset;
                int end = offset;
                while (start > 0 && Character.isLetterOrDigit(doc.getChar(start - 1))) {
                    start--;
                }
                while (end < doc.getLength() && Character.isLetterOrDigit(doc.getChar(end))) {
                    end++;
                }
                return new Region(start, end - start);
            } catch (BadLocationException e) {
                return new Region(offset, 0);
            }
        }
    }
}
