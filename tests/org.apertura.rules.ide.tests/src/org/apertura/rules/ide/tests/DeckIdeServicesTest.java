/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.ide.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

import org.apertura.rules.ide.DeckIdeSetup;
import org.apertura.rules.ide.highlighting.DeckHighlightingStyles;
import org.eclipse.emf.common.util.URI;
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
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.google.inject.Injector;

/** Content assist and semantic highlighting of the deck language, through the ide injector. */
class DeckIdeServicesTest {

	private static final String DECK = """
			technology "T" database unit 1 nm grid 1 nm
			layer M1 gds 19/0 line horizontal "first metal"
			layer V1 gds 21/0 cut
			option euv "0.33-NA EUV" {
				wavelength 13.5 nm
				NA 0.33
				k1 floor 0.3
				k2 0.5
				demagnification 4
				field x 26 mm y 33 mm
				on M1 { pitch ceil(2 * k1 * lambda / NA) width pitch / 2 enclosure of V1 2 nm }
			}
			""";

	private static Injector injector;
	private static ExecutorService pool;

	@BeforeAll
	static void setUp() {
		injector = new DeckIdeSetup().createInjectorAndDoEMFRegistration();
		pool = Executors.newSingleThreadExecutor();
	}

	@AfterAll
	static void tearDown() {
		pool.shutdownNow();
	}

	private static XtextResource parse(String text) throws Exception {
		XtextResourceSet set = injector.getInstance(XtextResourceSet.class);
		XtextResource resource = (XtextResource) set.createResource(URI.createURI("memory:/ide-test.apdeck"));
		resource.load(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), Map.of());
		return resource;
	}

	private record Highlight(String text, String style) {
	}

	@Test
	void semanticHighlighting() throws Exception {
		XtextResource resource = parse(DECK);
		List<Highlight> found = new ArrayList<>();
		injector.getInstance(ISemanticHighlightingCalculator.class).provideHighlightingFor(resource,
				(offset, length, styles) -> Arrays.stream(styles)
						.forEach(s -> found.add(new Highlight(DECK.substring(offset, offset + length), s))),
				CancelIndicator.NullImpl);
		assertThat(found).contains(new Highlight("M1", DeckHighlightingStyles.LAYER), // declaration
				new Highlight("V1", DeckHighlightingStyles.LAYER), new Highlight("euv", DeckHighlightingStyles.OPTION),
				new Highlight("nm", DeckHighlightingStyles.UNIT), new Highlight("13.5", DeckHighlightingStyles.NUMBER),
				new Highlight("lambda", DeckHighlightingStyles.OPTICS_SYMBOL),
				new Highlight("NA", DeckHighlightingStyles.OPTICS_SYMBOL),
				new Highlight("pitch", DeckHighlightingStyles.RULE_REFERENCE),
				new Highlight("ceil", DeckHighlightingStyles.FUNCTION));
		// M1 is highlighted where declared and where its block names it; V1 also as enclosed layer
		assertThat(found.stream().filter(h -> h.text().equals("M1"))).hasSize(2);
		assertThat(found.stream().filter(h -> h.text().equals("V1"))).hasSize(2);
		// the NA setting keyword is not an optics reference; only the one inside the expression is
		assertThat(found.stream().filter(h -> h.style().equals(DeckHighlightingStyles.OPTICS_SYMBOL))).hasSize(3);
	}

	private static List<ContentAssistEntry> proposals(String text, int offset) throws Exception {
		XtextResource resource = parse(text);
		ContentAssistContextFactory factory = injector.getInstance(ContentAssistContextFactory.class);
		factory.setPool(pool);
		ContentAssistContext[] contexts = factory.create(text, new TextRegion(offset, 0), offset, resource);
		IdeContentProposalAcceptor acceptor = injector.getInstance(IdeContentProposalAcceptor.class);
		injector.getInstance(IdeContentProposalProvider.class).createProposals(Arrays.asList(contexts), acceptor);
		List<ContentAssistEntry> entries = new ArrayList<>();
		acceptor.getEntries().forEach(entries::add);
		return entries;
	}

	@Test
	void proposesLayersWithTheirDescription() throws Exception {
		String text = DECK.replace("on M1 {", "on M1 { enclosure of  2 nm ").replace("}\n}", "}\n}");
		int offset = text.indexOf("enclosure of ") + "enclosure of ".length();
		List<ContentAssistEntry> entries = proposals(text, offset);
		assertThat(entries).extracting(ContentAssistEntry::getProposal).contains("M1", "V1");
		assertThat(entries).filteredOn(e -> "V1".equals(e.getProposal())).singleElement()
				.satisfies(e -> assertThat(e.getDescription()).isEqualTo("cut, GDS 21/0"));
		assertThat(entries).filteredOn(e -> "M1".equals(e.getProposal())).singleElement()
				.satisfies(e -> assertThat(e.getDescription()).isEqualTo("line horizontal, GDS 19/0"));
	}

	@Test
	void proposesRuleKeywordsInsideABlock() throws Exception {
		String text = DECK.replace("on M1 { pitch", "on M1 { \n pitch");
		int offset = text.indexOf("on M1 { ") + "on M1 { ".length();
		List<ContentAssistEntry> entries = proposals(text, offset);
		assertThat(entries).extracting(ContentAssistEntry::getProposal).contains("width", "spacing", "pitch",
				"end-of-line", "enclosure", "density", "same-mask", "patterning", "area");
		assertThat(entries).extracting(ContentAssistEntry::getProposal).doesNotContain("{", "(");
	}

	@Test
	void proposesUnitsAfterANumber() throws Exception {
		String text = DECK.replace("k2 0.5", "k2 0.5\n\t\twavelength 13 ");
		int offset = text.indexOf("wavelength 13 ") + "wavelength 13 ".length();
		List<ContentAssistEntry> entries = proposals(text, offset);
		assertThat(entries).extracting(ContentAssistEntry::getProposal).contains("nm", "um", "µm", "mm");
	}
}
