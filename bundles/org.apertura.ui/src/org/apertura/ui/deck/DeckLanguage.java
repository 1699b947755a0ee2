/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.deck;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.apertura.rules.ide.DeckIdeSetup;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.xtext.GrammarUtil;
import org.eclipse.xtext.IGrammarAccess;
import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.formatting2.regionaccess.ITextReplacement;
import org.eclipse.xtext.formatting2.regionaccess.TextRegionAccessBuilder;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistContext;
import org.eclipse.xtext.ide.editor.contentassist.ContentAssistEntry;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalAcceptor;
import org.eclipse.xtext.ide.editor.contentassist.IdeContentProposalProvider;
import org.eclipse.xtext.ide.editor.contentassist.antlr.ContentAssistContextFactory;
import org.eclipse.xtext.ide.editor.syntaxcoloring.ISemanticHighlightingCalculator;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.util.TextRegion;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.IResourceValidator;
import org.eclipse.xtext.validation.Issue;

import com.google.inject.Injector;
import com.google.inject.Provider;

/**
 * The deck language's services for the editor, from one Guice injector made by
 * {@link DeckIdeSetup} (runtime module mixed with the ide module). Every method parses the text it is
 * given into a fresh resource set, so calls are independent and may run on any thread; imported
 * decks are found through the file's own URI.
 */
public final class DeckLanguage {

    private static volatile DeckLanguage instance;

    private final Injector injector;
    private final Set<String> keywords;
    private final ExecutorService assistPool = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "deck content assist");
        t.setDaemon(true);
        return t;
    });

    private DeckLanguage() {
        injector = new DeckIdeSetup().createInjectorAndDoEMFRegistration();
        Set<String> words = new TreeSet<>();
        for (String k : GrammarUtil.getAllKeywords(injector.getInstance(IGrammarAccess.class).getGrammar())) {
            if (k.chars().allMatch(c -> Character.isLetter(c) || c == '-')) {
                words.add(k);
            }
        }
        keywords = Collections.unmodifiableSet(words);
    }

    /** The language, set up on first use (takes a moment: call it off the UI thread first). */
    public static DeckLanguage get() {
        DeckLanguage l = instance;
        if (l == null) {
            synchronized (DeckLanguage.class) {
                l = instance;
                if (l == null) {
                    l = new DeckLanguage();
                    instance = l;
                }
            }
        }
        return l;
    }

    /** The grammar's word keywords ({@code on}, {@code width}, {@code option}, ...). */
    public Set<String> keywords() {
        return keywords;
    }

    /**
     * Parses text as the deck at {@code uri} (a file URI, so that imports resolve beside it).
     *
     * @throws IOException only if the in-memory stream fails
     */
    public XtextResource parse(String text, URI uri) throws IOException {
        ResourceSet set = injector.getInstance(XtextResourceSet.class);
        XtextResource resource = (XtextResource) injector.getInstance(org.eclipse.xtext.resource.IResourceFactory.class)
                .createResource(uri);
        set.getResources().add(resource);
        resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), null);
        return resource;
    }

    /** Syntax, linking and validation issues of a parsed deck, in document order. */
    public List<Issue> validate(XtextResource resource, CancelIndicator cancel) {
        List<Issue> issues = new ArrayList<>(
                injector.getInstance(IResourceValidator.class).validate(resource, CheckMode.ALL, cancel));
        issues.sort(Comparator.comparing((Issue i) -> i.getOffset() == null ? 0 : i.getOffset()));
        return issues;
    }

    /** Semantic highlighting of a parsed deck from the ide module's calculator. */
    public void highlight(XtextResource resource, org.eclipse.xtext.ide.editor.syntaxcoloring.IHighlightedPositionAcceptor acceptor,
            CancelIndicator cancel) {
        injector.getInstance(ISemanticHighlightingCalculator.class).provideHighlightingFor(resource, acceptor, cancel);
    }

    /**
     * The text formatted by the language's formatter; the text itself when it does not parse (a deck
     * with syntax errors is left alone).
     */
    public String format(String text, URI uri) throws IOException {
        XtextResource resource = parse(text, uri);
        if (!resource.getErrors().isEmpty() || resource.getParseResult() == null) {
            return text;
        }
        FormatterRequest request = injector.getInstance(FormatterRequest.class);
        request.setTextRegionAccess(injector.getInstance(TextRegionAccessBuilder.class).forNodeModel(resource).create());
        request.setAllowIdentityEdits(false);
        List<ITextReplacement> replacements = new ArrayList<>(injector.getInstance(IFormatter2.class).format(request));
        replacements.sort(Comparator.comparingInt(ITextReplacement::getOffset).reversed());
        StringBuilder sb = new StringBuilder(text);
        for (ITextReplacement r : replacements) {
            sb.replace(r.getOffset(), r.getOffset() + r.getLength(), r.getReplacementText());
        }
        return sb.toString();
    }

    /** Completion proposals at an offset, from the ide module's proposal provider. */
    public List<ContentAssistEntry> proposals(String text, int offset, URI uri) throws IOException {
        XtextResource resource = parse(text, uri);
        Provider<ContentAssistContextFactory> factories = injector.getProvider(ContentAssistContextFactory.class);
        ContentAssistContextFactory factory = factories.get();
        factory.setPool(assistPool);
        ContentAssistContext[] contexts = factory.create(text, new TextRegion(offset, 0), offset, resource);
        IdeContentProposalAcceptor acceptor = injector.getInstance(IdeContentProposalAcceptor.class);
        injector.getInstance(IdeContentProposalProvider.class).createProposals(Arrays.asList(contexts), acceptor);
        List<ContentAssistEntry> out = new ArrayList<>();
        acceptor.getEntries().forEach(out::add);
        return out;
    }
}
