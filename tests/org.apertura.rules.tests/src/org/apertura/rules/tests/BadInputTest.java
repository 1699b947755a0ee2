/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.tests;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Random;

import org.apertura.rules.resolved.DeckLoadResult;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.validation.DeckIssueCodes;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Bad input ends in diagnostics, never in an exception or a hang. The timeouts below only guard
 * against hangs; they are far above the normal running time and assert nothing about speed.
 */
class BadInputTest extends DeckTestSupport {

	private static final Duration HANG_GUARD = Duration.ofSeconds(120);

	@Test
	void everyTruncationOfTheSampleDeckLoadsWithoutThrowing() throws Exception {
		String full = Files.readString(repository().resolve("samples/decks/meridian-mx3.apdeck"));
		Path where = repository().resolve("samples/decks/truncated.apdeck"); // imports resolve, not written
		int withErrors = 0;
		int cuts = 0;
		for (int cut = 0; cut < full.length(); cut += 211) {
			String prefix = full.substring(0, cut);
			DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> LOADER.load(where, prefix));
			assertThat(r).isNotNull();
			cuts++;
			if (r.hasErrors()) {
				withErrors++;
				assertThat(r.deck()).isEmpty();
				assertThat(r.errors()).allSatisfy(d -> assertThat(d.message()).isNotBlank());
			}
		}
		// most cuts fall inside a statement or block and must be reported
		assertThat(withErrors).isGreaterThan(cuts / 2);
		DeckLoadResult mid = LOADER.load(where, full.substring(0, full.indexOf("on M1 {") + 12));
		assertThat(errorCodes(mid)).contains(DeckIssueCodes.SYNTAX_ERROR);
	}

	@Test
	void binaryGarbage(@TempDir Path dir) throws Exception {
		Random random = new Random(20261201L);
		for (int i = 0; i < 5; i++) {
			byte[] bytes = new byte[4096 << i];
			random.nextBytes(bytes);
			Path file = dir.resolve("garbage" + i + ".apdeck");
			Files.write(file, bytes);
			DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> LOADER.load(file));
			assertThat(r.hasErrors()).isTrue();
			assertThat(r.deck()).isEmpty();
			assertThat(r.errors().get(0).file()).isEqualTo(file.toString());
		}
		// a real GDSII file given by mistake
		Path gds = repository().resolve("../shared/data/openmpl/sim_c1.gds").normalize();
		if (Files.exists(gds)) {
			DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> LOADER.load(gds));
			assertThat(r.hasErrors()).isTrue();
		}
	}

	@Test
	void deeplyNestedParentheses() {
		int depth = 100_000;
		String text = HEADER + "layer M1 gds 19/0 line horizontal\n" + EUV + "on M1 { width " + "(".repeat(depth)
				+ "18 nm" + ")".repeat(depth) + " }\n}\n";
		// parentheses add no model depth: the parser (on the loader's large stack) reads them and the
		// value is exact
		DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> load(text));
		assertThat(r.diagnostics()).isEmpty();
		assertThat(r.deck().orElseThrow().value("euv", "M1", RuleKind.WIDTH)).contains(RuleValue.of(18));
	}

	@Test
	void deeplyNestedNegations() {
		int depth = 100_000;
		String text = HEADER + "layer M1 gds 19/0 line horizontal\n" + EUV + "on M1 { width " + "-".repeat(depth)
				+ "18 nm }\n}\n";
		DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> load(text));
		assertThat(errorCodes(r)).containsExactly(DeckIssueCodes.EVALUATION_FAILED);
		assertThat(r.errors().get(0).message()).contains("nested deeper than");
	}

	@Test
	void moderatelyNestedExpressionsStillEvaluate() {
		int depth = 200;
		String text = HEADER + "layer M1 gds 19/0 line horizontal\n" + EUV + "on M1 { width " + "(".repeat(depth)
				+ "18 nm" + ")".repeat(depth) + " }\n}\n";
		assertThat(resolve(text).value("euv", "M1", RuleKind.WIDTH)).contains(RuleValue.of(18));
	}

	@Test
	void longChainsOfOperators() {
		// 50,000 additions: a left-leaning tree far deeper than the evaluator accepts
		String sum = "1 nm" + " + 1 nm".repeat(50_000);
		DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD,
				() -> load(HEADER + "layer M1 gds 19/0 line horizontal\n" + EUV + "on M1 { width " + sum + " }\n}\n"));
		assertThat(errorCodes(r)).contains(DeckIssueCodes.EVALUATION_FAILED);
	}

	@Test
	void unbalancedBraces() {
		DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD,
				() -> load(HEADER + "option a {".repeat(20_000) + "\n"));
		assertThat(r.hasErrors()).isTrue();
	}

	@Test
	void tenMegabyteDeck(@TempDir Path dir) throws Exception {
		StringBuilder b = new StringBuilder(11 << 20);
		b.append(HEADER);
		int n = 0;
		while (b.length() < 10 << 20) {
			b.append("layer L").append(n).append(" gds ").append(n % 65536).append('/').append(n / 65536)
					.append(" line horizontal \"generated layer number ").append(n).append("\"\n");
			n++;
		}
		b.append(EUV);
		for (int i = 0; i < n; i += 10) {
			b.append("on L").append(i).append(" { width 18 nm spacing 18 nm pitch 36 nm }\n");
		}
		b.append("}\n");
		Path file = dir.resolve("huge.apdeck");
		Files.writeString(file, b, StandardCharsets.UTF_8);
		assertThat(Files.size(file)).isGreaterThan(10L << 20);
		final int layers = n;
		DeckLoadResult r = assertTimeoutPreemptively(HANG_GUARD, () -> LOADER.load(file));
		assertThat(r.diagnostics()).isEmpty();
		assertThat(r.deck().orElseThrow().layers()).hasSize(layers);
		assertThat(r.deck().orElseThrow().value("euv", "L10", RuleKind.PITCH)).contains(RuleValue.of(36));
		// the same deck with one error near the end is reported at the right line
		String broken = b.toString().replace("on L10 { width 18 nm", "on L10 { width 18");
		DeckLoadResult bad = assertTimeoutPreemptively(HANG_GUARD, () -> LOADER.load(file, broken));
		assertThat(errorCodes(bad)).containsExactly(DeckIssueCodes.MISSING_UNIT);
		assertThat(bad.errors().get(0).line()).isEqualTo(layers + 10); // header, layers, 7 option lines, L0
	}
}
