/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.ui.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apertura.rules.ide.highlighting.DeckHighlightingStyles;
import org.apertura.ui.WorkbenchIds;
import org.apertura.ui.deck.DeckEditor;
import org.apertura.ui.deck.DeckLanguage;
import org.apertura.ui.deck.DeckStyles;
import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IProject;
import org.eclipse.emf.common.util.URI;
import org.eclipse.jface.text.IDocument;
import org.eclipse.jface.text.contentassist.ICompletionProposal;
import org.eclipse.jface.text.source.ISourceViewer;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.StyleRange;
import org.eclipse.swt.custom.StyledText;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.PlatformUI;
import org.eclipse.ui.handlers.IHandlerService;
import org.eclipse.ui.ide.IDE;
import org.eclipse.ui.texteditor.ITextEditorActionConstants;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * The deck editor's language services on the sample deck: semantic colours of layer names, content
 * assist after {@code on }, Format Deck and the k1 hover. Each step saves a screenshot.
 */
class DeckEditorServicesTest {

    private static IProject project;
    private static IFile deck;
    private static String sample;
    private DeckEditor editor;

    @BeforeAll
    static void copySamples() throws Exception {
        Path samples = Ui.root().resolve("samples");
        project = Ui.project("deck-services");
        Ui.put(project, "meridian-layers.apdeck", Files.readAllBytes(samples.resolve("decks/meridian-layers.apdeck")));
        deck = Ui.put(project, "meridian-mx3.apdeck", Files.readAllBytes(samples.resolve("decks/meridian-mx3.apdeck")));
        sample = Files.readString(deck.getLocation().toPath());
        Ui.run(() -> {
            page().closeAllEditors(false);
            page().resetPerspective();
            page().getWorkbenchWindow().getShell().setBounds(Ui.display().getClientArea());
        });
    }

    private static IWorkbenchPage page() {
        return PlatformUI.getWorkbench().getActiveWorkbenchWindow().getActivePage();
    }

    @BeforeEach
    void open() throws Exception {
        editor = (DeckEditor) Ui.sync(() -> IDE.openEditor(page(), deck, WorkbenchIds.DECK_EDITOR));
        Ui.waitUntil("the first validation", 120, () -> !editor.isValidating());
    }

    @AfterEach
    void close() {
        Ui.run(() -> page().closeAllEditors(false));
    }

    private IDocument document() {
        return editor.getDocumentProvider().getDocument(editor.getEditorInput());
    }

    @Test
    void layerNamesInRulesGetTheLayerColourOverTheKeywordColours() throws Exception {
        int block = sample.indexOf("on M1 {");
        int inner = sample.indexOf("enclosure of V1", block) + "enclosure of ".length();
        int header = block + "on ".length();
        DeckStyles.Style layer = DeckStyles.of(DeckHighlightingStyles.LAYER).orElseThrow();
        Ui.waitUntil("semantic colours on M1 and V1", 60, () -> {
            StyledText text = editor.viewer().getTextWidget();
            return hasStyle(text.getStyleRangeAtOffset(header), layer)
                    && hasStyle(text.getStyleRangeAtOffset(inner), layer);
        });
        assertTrue(editor.highlightStylesAt(inner).contains(DeckHighlightingStyles.LAYER));
        Ui.run(() -> {
            StyledText text = editor.viewer().getTextWidget();
            // the keyword before the layer keeps the scanner's keyword colour (bold, not the layer colour)
            StyleRange on = text.getStyleRangeAtOffset(block);
            assertNotNull(on, "the keyword 'on' is coloured");
            assertNotEquals(layer.colour(), on.foreground.getRGB());
            assertEquals(SWT.BOLD, on.fontStyle & SWT.BOLD);
            // a word that is no layer stays plain: 'pitch' in 'width pitch / 2' is a rule reference
            int ref = sample.indexOf("width pitch / 2", block) + "width ".length();
            StyleRange r = text.getStyleRangeAtOffset(ref);
            assertTrue(r == null || r.foreground == null || !r.foreground.getRGB().equals(layer.colour()));
            editor.selectAndReveal(inner, 2);
        });
        assertNotNull(Ui.screenshot("07-deck-semantic-colours"));
    }

    private static boolean hasStyle(StyleRange r, DeckStyles.Style s) {
        return r != null && r.foreground != null && r.foreground.getRGB().equals(s.colour())
                && (r.fontStyle & s.fontStyle()) == s.fontStyle();
    }

    @Test
    void contentAssistAfterOnProposesTheLayers() throws Exception {
        String text = sample.stripTrailing() + "\n\non ";
        Ui.run(() -> {
            document().set(text);
            editor.selectAndReveal(text.length(), 0);
        });
        List<String> proposals = Ui.sync(() -> Arrays.stream(editor.proposalsAt(text.length()))
                .map(ICompletionProposal::getDisplayString).toList());
        // the layers of the imported layer map (samples/decks/meridian-layers.apdeck)
        for (String layer : List.of("NW", "ACT", "GATE", "CT", "M1", "V1", "M2")) {
            assertTrue(proposals.stream().anyMatch(p -> p.equals(layer) || p.startsWith(layer + " ")),
                    "proposal " + layer + " among " + proposals);
        }
        Ui.run(() -> editor.viewer().getTextWidget().setFocus());
        Ui.run(() -> ((org.eclipse.jface.text.ITextOperationTarget) editor.viewer())
                .doOperation(ISourceViewer.CONTENTASSIST_PROPOSALS));
        assertNotNull(Ui.screenshot("08-content-assist-layers"));
    }

    @Test
    void formatDeckGivesTheFormattersText() throws Exception {
        // the sample with its indentation flattened and runs of blanks inside the M1 block
        String messy = sample.replace("\n\t", "\n").replace("width pitch / 2", "width    pitch   /   2");
        URI uri = URI.createFileURI(deck.getLocation().toPath().toAbsolutePath().toString());
        String expected = DeckLanguage.get().format(messy, uri);
        assertNotEquals(messy, expected, "the formatter has something to do in the messy text");
        Ui.run(() -> document().set(messy));
        Ui.run(() -> PlatformUI.getWorkbench().getService(IHandlerService.class)
                .executeCommand("org.apertura.ui.command.formatDeck", null));
        assertEquals(expected, Ui.sync(() -> document().get()));
        assertTrue(expected.contains("\twidth pitch / 2"), "indentation and blanks restored in the M1 block");
        Ui.run(() -> editor.selectAndReveal(expected.indexOf("on M1 {"), 0));
        assertNotNull(Ui.screenshot("09-deck-formatted"));
    }

    /** k1 = (p · split / 2) · NA / λ (Rayleigh, half-pitch; references.md "k1 of a pitch p"). */
    private static double k1(double pitchNm, int split, double na, double lambdaNm) {
        return pitchNm * split / 2 * na / lambdaNm;
    }

    @Test
    void hoverInTheM1BlockShowsItsK1UnderEveryOption() throws Exception {
        // M1 pitch per option, as the sample deck sets it (its comments show the same arithmetic):
        // duv_le2 42 nm in two passes at 193 nm / NA 1.35; euv_se the floor pitch ceil(2·0.33·13.5/0.33) = 27 nm;
        // euv_le2 20 nm in two passes at NA 0.33; euv_hna 20 nm at NA 0.55; EUV wavelength 13.5 nm
        Map<String, Double> expected = Map.of("duv_le2", k1(42, 2, 1.35, 193), "euv_se", k1(27, 1, 0.33, 13.5),
                "euv_le2", k1(20, 2, 0.33, 13.5), "euv_hna", k1(20, 1, 0.55, 13.5));
        int offset = sample.indexOf("spacing pitch - width", sample.indexOf("on M1 {"));
        String hover = Ui.sync(() -> editor.hoverAt(offset));
        assertNotNull(hover, "a hover inside the M1 block");
        assertTrue(hover.startsWith("M1"), hover);
        for (Map.Entry<String, Double> e : expected.entrySet()) {
            String line = hover.lines().filter(l -> l.strip().startsWith(e.getKey() + " ")).findFirst().orElse("");
            String k1 = String.format(Locale.ROOT, "k1 %.3f", e.getValue());
            assertTrue(line.contains(k1), "option " + e.getKey() + " shows " + k1 + ": " + hover);
        }
        // show it as a user does without a mouse: caret in the block, Show Information (F2)
        Ui.run(() -> {
            editor.viewer().getTextWidget().setFocus();
            editor.selectAndReveal(offset, 0);
            editor.getAction(ITextEditorActionConstants.SHOW_INFORMATION).run();
        });
        Thread.sleep(1500);
        assertNotNull(Ui.screenshot("10-k1-hover"));
    }
}
