/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apertura.rules.resolved.DeckDiagnostic;
import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.DeckLoader;
import org.apertura.rules.resolved.ResolvedDeck;

/** Shared helpers: loading decks from text, finding the repository, reading diagnostics. */
abstract class DeckTestSupport {

	/** A header with a 1 nm database unit on a 1 nm grid. */
	static final String HEADER = "technology \"Test\" database unit 1 nm grid 1 nm\n";

	/** An option with 0.33-NA EUV optics, for tests that need one. */
	static final String EUV = """
			option euv {
				wavelength 13.5 nm
				NA 0.33
				k1 floor 0.3
				k2 0.5
				demagnification 4
				field x 26 mm y 33 mm
			""";

	static final DeckLoader LOADER = new DeckLoader();

	/** Loads a deck from text as if it were a file in a scratch folder. */
	static DeckLoadResult load(String text) {
		return LOADER.load(Path.of(System.getProperty("java.io.tmpdir"), "apertura-test", "test.apdeck"), text);
	}

	/** Loads a deck and fails the test, listing the diagnostics, if it has errors. */
	static ResolvedDeck resolve(String text) {
		DeckLoadResult r = load(text);
		assertThat(r.errors()).as("errors").isEmpty();
		return r.deck().orElseThrow();
	}

	static List<String> codes(DeckLoadResult r) {
		return r.diagnostics().stream().map(DeckDiagnostic::code).toList();
	}

	static List<String> errorCodes(DeckLoadResult r) {
		return r.errors().stream().map(DeckDiagnostic::code).toList();
	}

	/** The repository root: the system property apertura.repo, else the first parent with samples/. */
	static Path repository() {
		String p = System.getProperty("apertura.repo");
		if (p != null) {
			return Path.of(p);
		}
		Path dir = Path.of("").toAbsolutePath();
		while (dir != null) {
			if (Files.isDirectory(dir.resolve("samples/decks"))) {
				return dir;
			}
			dir = dir.getParent();
		}
		throw new IllegalStateException("cannot find the repository (samples/decks); set -Dapertura.repo");
	}

	/** A deck shipped with the tests, under resources/decks. */
	static Path testDeck(String name) {
		return repository().resolve("tests/org.apertura.rules.tests/resources/decks").resolve(name);
	}
}
