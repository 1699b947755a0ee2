/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apertura.rules.deck.Deck;
import org.apertura.rules.resolved.ResolvedDeck;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.xtext.formatting2.FormatterRequest;
import org.eclipse.xtext.formatting2.IFormatter2;
import org.eclipse.xtext.formatting2.regionaccess.ITextRegionAccess;
import org.eclipse.xtext.formatting2.regionaccess.ITextReplacement;
import org.eclipse.xtext.formatting2.regionaccess.TextRegionAccessBuilder;
import org.eclipse.xtext.resource.SaveOptions;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.serializer.ISerializer;
import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;

import com.google.inject.Inject;
import com.google.inject.Provider;

/** Formatting and serialisation round-trip: format, parse again, same model and same resolved deck. */
@ExtendWith(InjectionExtension.class)
@InjectWith(DeckInjectorProvider.class)
class FormattingTest extends DeckTestSupport {

	@Inject
	private ParseHelper<Deck> parser;

	@Inject
	private ISerializer serializer;

	@Inject
	private Provider<TextRegionAccessBuilder> regionAccess;

	@Inject
	private Provider<FormatterRequest> requests;

	@Inject
	private Provider<IFormatter2> formatters;

	@Inject
	private Provider<XtextResourceSet> resourceSets;

	private static final String MESSY = HEADER + """
			layer   M1 gds 19 / 0 line horizontal   "metal"
			layer V1 gds 21/0 cut
			option euv
			  "EUV" {  wavelength 13.5 nm NA 0.33 k1 floor 0.3 k2 0.5
			demagnification x 4 y 8 field x 26 mm y 16.5 mm
			throughput 150 wph   stitch   keep-out 2  um
			// the metal
			on M1 { patterning litho-etch 2 width pitch/2 spacing   pitch - width projection
			spacing 40 nm if width > 100 nm and run >= 1 um
			pitch floor( 2 * k1 * lambda / NA ) same-mask spacing 2*pitch - width
			end-of-line tip <= 2 * width : tip-to-tip max( spacing , 20 nm ) tip-to-side - ( -21 nm )
			area 2 * pitch * pitch enclosure of V1 0 nm , 4 nm on opposite sides
			density min 20 % max 80 % window 50 um step 25 um mask width 40 nm mask spacing 40 nm }
			}
			""";

	private static final String CANONICAL = """
			technology "Test"
				database unit 1 nm
				grid 1 nm
			layer M1 gds 19/0 line horizontal "metal"
			layer V1 gds 21/0 cut

			option euv "EUV" {
				wavelength 13.5 nm
				NA 0.33
				k1 floor 0.3
				k2 0.5
				demagnification x 4 y 8
				field x 26 mm y 16.5 mm
				throughput 150 wph
				stitch keep-out 2 um

				// the metal
				on M1 {
					patterning litho-etch 2
					width pitch / 2
					spacing pitch - width projection
					spacing 40 nm if width > 100 nm and run >= 1 um
					pitch floor(2 * k1 * lambda / NA)
					same-mask spacing 2 * pitch - width
					end-of-line tip <= 2 * width: tip-to-tip max(spacing, 20 nm) tip-to-side -(-21 nm)
					area 2 * pitch * pitch
					enclosure of V1 0 nm, 4 nm on opposite sides
					density min 20 % max 80 % window 50 um step 25 um
					mask width 40 nm
					mask spacing 40 nm
				}
			}
			""";

	/** Formats text the way an editor does: replacements computed over the parsed text. */
	private String format(String text) throws Exception {
		XtextResource resource = (XtextResource) parser.parse(text).eResource();
		ITextRegionAccess access = regionAccess.get().forNodeModel(resource).create();
		FormatterRequest request = requests.get();
		request.setTextRegionAccess(access);
		List<ITextReplacement> replacements = formatters.get().format(request);
		return access.getRewriter().renderToString(replacements);
	}

	@Test
	void formatsToTheCanonicalLayout() throws Exception {
		String out = format(MESSY);
		Files.writeString(Path.of(System.getProperty("java.io.tmpdir"), "formatted-messy.apdeck"), out);
		assertThat(out).isEqualTo(CANONICAL);
	}

	@Test
	void canonicalLayoutIsStable() throws Exception {
		assertThat(format(CANONICAL)).isEqualTo(CANONICAL);
	}

	@Test
	void formattingTheSampleDeckIsIdempotentAndKeepsItsMeaning() throws Exception {
		Path file = repository().resolve("samples/decks/meridian-mx3.apdeck");
		String once = format(Files.readString(file));
		assertThat(format(once)).isEqualTo(once);
		// the sample is written in the canonical layout already
		assertThat(once).isEqualTo(Files.readString(file));
		assertThat(LOADER.load(file, once).deck()).isEqualTo(LOADER.load(file).deck());
	}

	@Test
	void formattedTextParsesToTheSameModelAndDeck() throws Exception {
		Deck messy = parser.parse(MESSY);
		Deck canonical = parser.parse(CANONICAL);
		EcoreUtil.resolveAll(messy);
		EcoreUtil.resolveAll(canonical);
		assertThat(EcoreUtil.equals(messy, canonical)).isTrue();
		ResolvedDeck a = resolve(MESSY);
		ResolvedDeck b = resolve(CANONICAL);
		assertThat(a).isEqualTo(b);
	}

	@Test
	void serializerRoundTripsTheSampleDeck() throws Exception {
		for (String name : new String[] { "meridian-mx3.apdeck", "meridian-layers.apdeck" }) {
			Path file = repository().resolve("samples/decks").resolve(name);
			XtextResourceSet set = resourceSets.get();
			XtextResource resource = (XtextResource) set.getResource(URI.createFileURI(file.toString()), true);
			Deck deck = (Deck) resource.getContents().get(0);
			// the serializer writes the model (comments are not part of it: the text formatter, which
			// editors use, keeps them); plain and formatted output parse back to an equal model
			String[] texts = { serializer.serialize(deck),
					serializer.serialize(deck, SaveOptions.newBuilder().format().getOptions()) };
			for (int i = 0; i < texts.length; i++) {
				String text = texts[i];
				URI sibling = URI.createFileURI(file.resolveSibling("round-trip-" + i + "-" + name).toString());
				Deck again = parser.parse(text, sibling, set);
				EcoreUtil.resolveAll(again);
				assertThat(again.eResource().getErrors()).as(text).isEmpty();
				assertThat(EcoreUtil.equals(deck, again)).as(text).isTrue();
			}
		}
	}

	@Test
	void serializerWritesAModelBuiltInCode() throws Exception {
		// a model changed in memory: the serializer writes valid text for the new value
		Deck deck = parser.parse(HEADER + "layer M1 gds 19/0 line horizontal\n");
		var layer = (org.apertura.rules.deck.Layer) deck.getElements().get(0);
		layer.setName("M9");
		layer.setDirection("vertical");
		layer.setDescription("renamed");
		String text = serializer.serialize(deck, SaveOptions.newBuilder().format().getOptions());
		assertThat(text).contains("layer M9 gds 19/0 line vertical \"renamed\"");
		assertThat(resolve(text).layer("M9")).isPresent();
	}
}
