/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.resolved;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.atomic.AtomicReference;

import org.apertura.rules.DeckStandaloneSetup;
import org.apertura.rules.deck.Deck;
import org.apertura.rules.internal.DeckResolver;
import org.apertura.rules.internal.Problem;
import org.apertura.rules.validation.DeckIssueCodes;
import org.apertura.rules.validation.DeckValidator;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.nodemodel.ICompositeNode;
import org.eclipse.xtext.nodemodel.INode;
import org.eclipse.xtext.nodemodel.util.NodeModelUtils;
import org.eclipse.xtext.resource.XtextResource;
import org.eclipse.xtext.resource.XtextResourceSet;
import org.eclipse.xtext.util.CancelIndicator;
import org.eclipse.xtext.util.IResourceScopeCache;
import org.eclipse.xtext.validation.CheckMode;
import org.eclipse.xtext.validation.IResourceValidator;
import org.eclipse.xtext.validation.Issue;

import com.google.inject.Injector;

/**
 * Loads a deck file and the decks it imports without OSGi: parses, links, validates and resolves
 * them, and returns the {@link ResolvedDeck} or the diagnostics.
 *
 * <p>Loading never throws for bad content: unreadable files, binary garbage, truncated text, deep
 * nesting and huge files all end as diagnostics. Work runs on a thread with a large stack so that
 * deeply nested input is reported rather than overflowing the caller's stack.
 *
 * <p>A loader is thread-safe; each call uses its own resource set.
 */
public final class DeckLoader {

	/** Stack size for the loading thread: generous, since the parser recurses per nesting level. */
	private static final long STACK_BYTES = 512L * 1024 * 1024;

	private static volatile Injector injector;

	private static Injector injector() {
		Injector i = injector;
		if (i == null) {
			synchronized (DeckLoader.class) {
				i = injector;
				if (i == null) {
					i = new DeckStandaloneSetup().createInjectorAndDoEMFRegistration();
					injector = i;
				}
			}
		}
		return i;
	}

	/** Creates a loader (the language is set up once per JVM, on first use). */
	public DeckLoader() {
	}

	/**
	 * Loads a deck file.
	 *
	 * @param file the deck; its imports are resolved relative to it
	 */
	public DeckLoadResult load(Path file) {
		Path abs = file.toAbsolutePath().normalize();
		String name = file.toString();
		byte[] bytes;
		try {
			bytes = Files.readAllBytes(abs);
		} catch (IOException | RuntimeException e) {
			return new DeckLoadResult(Optional.empty(), List.of(new DeckDiagnostic(name, 0, 0, -1,
					DeckDiagnostic.Severity.ERROR, DeckIssueCodes.LOAD_FAILED, "cannot read the deck: " + e)));
		}
		return load(abs, name, bytes);
	}

	/**
	 * Loads a deck from text, as if it were stored at {@code file} (imports are resolved relative to
	 * that path; the file itself need not exist).
	 */
	public DeckLoadResult load(Path file, String text) {
		Path abs = file.toAbsolutePath().normalize();
		return load(abs, file.toString(), text.getBytes(StandardCharsets.UTF_8));
	}

	private DeckLoadResult load(Path abs, String name, byte[] bytes) {
		AtomicReference<DeckLoadResult> result = new AtomicReference<>();
		AtomicReference<Throwable> failure = new AtomicReference<>();
		Thread worker = new Thread(null, () -> {
			try {
				result.set(loadHere(abs, name, bytes));
			} catch (StackOverflowError e) {
				failure.set(e);
			} catch (RuntimeException | LinkageError | OutOfMemoryError e) {
				failure.set(e);
			}
		}, "apertura-deck-loader", STACK_BYTES);
		worker.setDaemon(true);
		worker.start();
		boolean interrupted = false;
		while (true) {
			try {
				worker.join();
				break;
			} catch (InterruptedException e) {
				interrupted = true;
			}
		}
		if (interrupted) {
			Thread.currentThread().interrupt();
		}
		if (result.get() != null) {
			return result.get();
		}
		Throwable t = failure.get();
		String why = t instanceof StackOverflowError ? "the deck is nested too deeply to read"
				: t instanceof OutOfMemoryError ? "the deck is too large to load in this memory"
						: "the deck could not be loaded: " + t;
		return new DeckLoadResult(Optional.empty(), List.of(
				new DeckDiagnostic(name, 0, 0, -1, DeckDiagnostic.Severity.ERROR, DeckIssueCodes.LOAD_FAILED, why)));
	}

	private DeckLoadResult loadHere(Path abs, String name, byte[] bytes) {
		Injector inj = injector();
		XtextResourceSet set = inj.getInstance(XtextResourceSet.class);
		set.addLoadOption(XtextResource.OPTION_RESOLVE_ALL, Boolean.TRUE);
		URI uri = URI.createFileURI(abs.toString());
		Resource resource = set.createResource(uri);
		try (InputStream in = new ByteArrayInputStream(bytes)) {
			resource.load(in, Map.of(XtextResource.OPTION_ENCODING, StandardCharsets.UTF_8.name()));
		} catch (IOException | RuntimeException e) {
			return new DeckLoadResult(Optional.empty(), List.of(new DeckDiagnostic(name, 0, 0, -1,
					DeckDiagnostic.Severity.ERROR, DeckIssueCodes.LOAD_FAILED, "cannot parse the deck: " + e)));
		}
		IResourceValidator validator = inj.getInstance(IResourceValidator.class);
		List<DeckDiagnostic> diagnostics = new ArrayList<>();
		Set<Resource> validated = new HashSet<>();
		boolean more = true;
		while (more) {
			more = false;
			for (Resource r : List.copyOf(set.getResources())) {
				if (validated.add(r)) {
					more = true;
					if (r != resource && r.getContents().isEmpty()) {
						continue; // an import that could not be loaded: reported at the import
					}
					String file = r == resource ? name : fileOf(r);
					for (Issue issue : validator.validate(r, CheckMode.ALL, CancelIndicator.NullImpl)) {
						diagnostics.add(toDiagnostic(file, issue));
					}
				}
			}
		}
		ResolvedDeck deck = null;
		if (!resource.getContents().isEmpty() && resource.getContents().get(0) instanceof Deck root) {
			DeckResolver.Resolution resolution = DeckValidator.resolution(inj.getInstance(IResourceScopeCache.class),
					root);
			if (root.getTechnology() == null && diagnostics.stream()
					.noneMatch(d -> d.code().equals(DeckIssueCodes.MISSING_TECHNOLOGY) && d.file().equals(name))) {
				diagnostics.add(new DeckDiagnostic(name, 1, 1, 0, DeckDiagnostic.Severity.ERROR,
						DeckIssueCodes.MISSING_TECHNOLOGY,
						"the deck needs a header: technology \"name\" database unit <length> grid <length>"));
			}
			Set<String> known = new HashSet<>();
			for (DeckDiagnostic d : diagnostics) {
				known.add(d.file() + "|" + d.offset() + "|" + d.code());
			}
			for (Problem p : resolution.problems()) {
				DeckDiagnostic d = toDiagnostic(p.object().eResource() == resource ? name : fileOf(p.object().eResource()),
						p);
				if (known.add(d.file() + "|" + d.offset() + "|" + d.code())) {
					diagnostics.add(d);
				}
			}
			deck = resolution.deck();
		} else if (diagnostics.stream().noneMatch(d -> d.severity() == DeckDiagnostic.Severity.ERROR)) {
			diagnostics.add(new DeckDiagnostic(name, 0, 0, -1, DeckDiagnostic.Severity.ERROR,
					DeckIssueCodes.MISSING_TECHNOLOGY, "the deck is empty"));
		}
		List<DeckDiagnostic> sorted = new ArrayList<>(new LinkedHashSet<>(diagnostics));
		sorted.sort(Comparator.comparing((DeckDiagnostic d) -> !d.file().equals(name)).thenComparing(DeckDiagnostic::file)
				.thenComparingInt(DeckDiagnostic::line).thenComparingInt(DeckDiagnostic::column));
		boolean errors = sorted.stream().anyMatch(d -> d.severity() == DeckDiagnostic.Severity.ERROR);
		return new DeckLoadResult(errors ? Optional.empty() : Optional.ofNullable(deck), sorted);
	}

	private static String fileOf(Resource r) {
		if (r == null || r.getURI() == null) {
			return "";
		}
		URI u = r.getURI();
		return u.isFile() ? u.toFileString() : u.toString();
	}

	private static DeckDiagnostic toDiagnostic(String file, Issue issue) {
		String code = issue.getCode();
		if (code == null || !code.startsWith("org.apertura.rules.")) {
			code = issue.isSyntaxError() ? DeckIssueCodes.SYNTAX_ERROR
					: code != null && code.endsWith("Linking") ? DeckIssueCodes.UNKNOWN_REFERENCE
							: code == null ? DeckIssueCodes.SYNTAX_ERROR : code;
		}
		DeckDiagnostic.Severity severity = switch (issue.getSeverity()) {
			case ERROR -> DeckDiagnostic.Severity.ERROR;
			case WARNING -> DeckDiagnostic.Severity.WARNING;
			default -> DeckDiagnostic.Severity.INFO;
		};
		return new DeckDiagnostic(file, orZero(issue.getLineNumber()), orZero(issue.getColumn()),
				issue.getOffset() == null ? -1 : issue.getOffset(), severity, code,
				issue.getMessage() == null ? "" : issue.getMessage());
	}

	private static int orZero(Integer i) {
		return i == null ? 0 : i;
	}

	private static DeckDiagnostic toDiagnostic(String file, Problem p) {
		EObject o = p.object();
		INode node = null;
		if (p.feature() != null) {
			List<INode> nodes = NodeModelUtils.findNodesForFeature(o, p.feature());
			if (!nodes.isEmpty()) {
				node = nodes.get(0);
			}
		}
		if (node == null) {
			node = NodeModelUtils.findActualNodeFor(o);
		}
		int line = 0;
		int column = 0;
		int offset = -1;
		if (node != null) {
			offset = node.getOffset();
			line = node.getStartLine();
			ICompositeNode root = node.getRootNode();
			String text = root == null ? "" : root.getText();
			int lineStart = text.lastIndexOf('\n', Math.max(0, offset - 1));
			column = offset - lineStart;
			if (offset == 0) {
				column = 1;
			}
		}
		DeckDiagnostic.Severity severity = switch (p.severity()) {
			case ERROR -> DeckDiagnostic.Severity.ERROR;
			case WARNING -> DeckDiagnostic.Severity.WARNING;
			default -> DeckDiagnostic.Severity.INFO;
		};
		return new DeckDiagnostic(file, line, column, offset, severity, p.code(), p.message());
	}
}
