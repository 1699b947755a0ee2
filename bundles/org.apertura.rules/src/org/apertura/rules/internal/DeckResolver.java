/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Deque;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalLong;
import java.util.Set;

import org.apertura.rules.deck.AreaRule;
import org.apertura.rules.deck.Deck;
import org.apertura.rules.deck.DeckElement;
import org.apertura.rules.deck.DeckPackage;
import org.apertura.rules.deck.Demagnification;
import org.apertura.rules.deck.DensityRule;
import org.apertura.rules.deck.EnclosureRule;
import org.apertura.rules.deck.EndOfLineRule;
import org.apertura.rules.deck.ExposureField;
import org.apertura.rules.deck.Expression;
import org.apertura.rules.deck.Import;
import org.apertura.rules.deck.K1Floor;
import org.apertura.rules.deck.K2;
import org.apertura.rules.deck.LithoEtch;
import org.apertura.rules.deck.MaskSpacingRule;
import org.apertura.rules.deck.MaskWidthRule;
import org.apertura.rules.deck.MaxWidthRule;
import org.apertura.rules.deck.NumericalAperture;
import org.apertura.rules.deck.OpticsReference;
import org.apertura.rules.deck.OpticsSymbol;
import org.apertura.rules.deck.Option;
import org.apertura.rules.deck.OptionSetting;
import org.apertura.rules.deck.PatterningRule;
import org.apertura.rules.deck.PitchRule;
import org.apertura.rules.deck.Quantity;
import org.apertura.rules.deck.Rule;
import org.apertura.rules.deck.RuleReference;
import org.apertura.rules.deck.RuleSymbol;
import org.apertura.rules.deck.SameMaskSpacingRule;
import org.apertura.rules.deck.SidePair;
import org.apertura.rules.deck.SingleExposure;
import org.apertura.rules.deck.SpacerDivision;
import org.apertura.rules.deck.SpacingCondition;
import org.apertura.rules.deck.SpacingRule;
import org.apertura.rules.deck.Technology;
import org.apertura.rules.deck.StitchKeepOut;
import org.apertura.rules.deck.Throughput;
import org.apertura.rules.deck.TipBound;
import org.apertura.rules.deck.Value;
import org.apertura.rules.deck.Wavelength;
import org.apertura.rules.deck.WidthRule;
import org.apertura.rules.internal.Evaluator.Q;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.resolved.ConditionalSpacing;
import org.apertura.rules.resolved.Density;
import org.apertura.rules.resolved.Direction;
import org.apertura.rules.resolved.Enclosure;
import org.apertura.rules.resolved.EndOfLine;
import org.apertura.rules.resolved.LithographyOption;
import org.apertura.rules.resolved.Patterning;
import org.apertura.rules.resolved.ResolvedDeck;
import org.apertura.rules.resolved.RuleKind;
import org.apertura.rules.resolved.RuleValue;
import org.apertura.rules.resolved.SpacingMetric;
import org.apertura.rules.validation.DeckIssueCodes;
import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.xtext.diagnostics.Severity;

/**
 * Resolves a parsed deck and the decks it imports: collects layers and options, follows option
 * inheritance, evaluates every rule under every option and checks the result. One resolver serves
 * both the validator (which reports the problems in the file being validated) and the loader (which
 * returns the {@link ResolvedDeck}).
 *
 * <p>Rule lookup for (option O, layer L): O's block for L, then the blocks of O's parents in order,
 * then the deck-level blocks for L (the root deck's before imported ones). Expressions are evaluated
 * late: λ, NA, k1 and rule references mean the values of O and L, so an option that overrides only
 * the pitch gets a width written as {@code pitch / 2} recomputed.
 */
public final class DeckResolver {

	/** The outcome: the resolved deck (null if anything is an error) and every problem found. */
	public record Resolution(ResolvedDeck deck, List<Problem> problems, List<Deck> closure) {

		/** Whether any problem is an error. */
		public boolean hasErrors() {
			return problems.stream().anyMatch(p -> p.severity() == Severity.ERROR);
		}
	}

	private static final BigDecimal PHYSICAL_K1 = new BigDecimal("0.25");
	private static final MathContext SHOW = new MathContext(4);

	private enum Slot {
		PATTERNING, WIDTH, MAX_WIDTH, SPACING, PITCH, END_OF_LINE, AREA, DENSITY, SAME_MASK, MASK_WIDTH, MASK_SPACING
	}

	/** The rules of one block ("on L { ... }"), indexed. */
	private static final class Block {
		final org.apertura.rules.deck.LayerRules source;
		final EnumMap<Slot, Rule> rules = new EnumMap<>(Slot.class);
		final List<SpacingRule> conditional = new ArrayList<>();
		final Map<String, EnclosureRule> enclosures = new LinkedHashMap<>();

		Block(org.apertura.rules.deck.LayerRules source) {
			this.source = source;
		}
	}

	private final Deck root;
	private final boolean requireTechnology;
	private final Map<List<Object>, Problem> problems = new LinkedHashMap<>();
	private final List<Deck> closure = new ArrayList<>();
	private BigDecimal dbuNm = BigDecimal.ONE;
	private BigDecimal gridNm = BigDecimal.ONE;
	private long gridDbu = 1;
	private boolean unitsKnown;
	private final Map<String, org.apertura.rules.deck.Layer> layers = new LinkedHashMap<>();
	private final Map<String, Option> options = new LinkedHashMap<>();
	private final Map<Option, List<Option>> chains = new IdentityHashMap<>();
	private final Map<String, List<Block>> defaults = new HashMap<>();
	private final Map<Option, Map<String, Block>> optionBlocks = new IdentityHashMap<>();
	private final Set<EObject> badValues = Collections.newSetFromMap(new IdentityHashMap<>());
	private final Typer typer = new Typer(this::add);

	private DeckResolver(Deck root, boolean requireTechnology) {
		this.root = root;
		this.requireTechnology = requireTechnology;
	}

	/**
	 * Resolves a deck.
	 *
	 * @param root              the deck to resolve, loaded in a resource set so imports can be found
	 * @param requireTechnology whether a missing technology header is an error (true for a deck loaded
	 *                          as the root; a deck that is only imported may leave it out unless it
	 *                          declares options)
	 */
	public static Resolution resolve(Deck root, boolean requireTechnology) {
		DeckResolver r = new DeckResolver(root, requireTechnology);
		ResolvedDeck deck = r.run();
		List<Problem> list = List.copyOf(r.problems.values());
		boolean errors = list.stream().anyMatch(p -> p.severity() == Severity.ERROR);
		return new Resolution(errors ? null : deck, list, List.copyOf(r.closure));
	}

	// ------------------------------------------------------------------------------------ problems

	private void add(Problem p) {
		if (p.object() == null) {
			return;
		}
		problems.putIfAbsent(Arrays.asList(p.object(), p.feature(), p.code(), p.message()), p);
	}

	private void problem(EObject object, EStructuralFeature feature, Severity severity, String code, String message) {
		add(new Problem(object, feature, severity, code, message));
	}

	/**
	 * Reports a problem found while resolving under {@code context}: at the object if it lives in the
	 * same file as the option, else at the option's name (the inherited value is only wrong there).
	 */
	private void report(EObject object, EStructuralFeature feature, Severity severity, String code, String message,
			Option context) {
		if (context != null && object != null && object.eResource() != context.eResource()) {
			problem(context, DeckPackage.Literals.OPTION__NAME, severity, code,
					message + " (value inherited from " + fileName(object) + ")");
		} else {
			problem(object, feature, severity, code, message);
		}
	}

	private static String fileName(EObject o) {
		Resource r = o.eResource();
		return r == null || r.getURI() == null ? "another deck" : r.getURI().lastSegment();
	}

	private static String show(BigDecimal v) {
		return v.round(SHOW).stripTrailingZeros().toPlainString();
	}

	// ------------------------------------------------------------------------------------ main

	private ResolvedDeck run() {
		collect(root, new ArrayDeque<>(), new HashSet<>());
		header();
		declarations();
		for (Deck d : closure) {
			for (DeckElement e : d.getElements()) {
				if (e instanceof Option o) {
					checkSettings(o);
				}
			}
		}
		blocks();
		List<org.apertura.rules.resolved.Layer> resolvedLayers = new ArrayList<>();
		for (org.apertura.rules.deck.Layer l : layers.values()) {
			resolvedLayers.add(toLayer(l));
		}
		List<LithographyOption> resolvedOptions = new ArrayList<>();
		List<org.apertura.rules.resolved.LayerRules> rules = new ArrayList<>();
		for (Option o : options.values()) {
			OptionContext oc = new OptionContext(o);
			LithographyOption lo = oc.resolveOptics();
			if (lo == null) {
				continue;
			}
			resolvedOptions.add(lo);
			for (org.apertura.rules.deck.Layer l : layers.values()) {
				rules.add(new LayerContext(oc, l).resolve());
			}
		}
		String title = root.getTechnology() == null || root.getTechnology().getTitle() == null ? ""
				: root.getTechnology().getTitle();
		return new ResolvedDeck(title, dbuNm, gridDbu, resolvedLayers, resolvedOptions, rules);
	}

	// ------------------------------------------------------------------------------------ imports

	private void collect(Deck deck, Deque<Deck> stack, Set<Deck> done) {
		stack.push(deck);
		for (Import imp : deck.getImports()) {
			Deck target = load(deck, imp);
			if (target == null) {
				continue;
			}
			if (stack.contains(target)) {
				problem(imp, DeckPackage.Literals.IMPORT__IMPORT_URI, Severity.ERROR, DeckIssueCodes.IMPORT_CYCLE,
						"importing '" + imp.getImportURI() + "' closes an import cycle");
				continue;
			}
			if (!done.contains(target)) {
				collect(target, stack, done);
			}
		}
		stack.pop();
		done.add(deck);
		closure.add(deck);
	}

	private Deck load(Deck from, Import imp) {
		Resource res = from.eResource();
		if (imp.getImportURI() == null || res == null || res.getResourceSet() == null) {
			return null;
		}
		try {
			URI uri = URI.createURI(imp.getImportURI());
			if (uri.isRelative() && res.getURI() != null) {
				uri = uri.resolve(res.getURI());
			}
			Resource target = res.getResourceSet().getResource(uri, true);
			if (target != null && !target.getContents().isEmpty() && target.getContents().get(0) instanceof Deck d) {
				return d;
			}
			problem(imp, DeckPackage.Literals.IMPORT__IMPORT_URI, Severity.ERROR, DeckIssueCodes.IMPORT_NOT_FOUND,
					"cannot load imported deck '" + imp.getImportURI() + "'");
		} catch (RuntimeException e) {
			problem(imp, DeckPackage.Literals.IMPORT__IMPORT_URI, Severity.ERROR, DeckIssueCodes.IMPORT_NOT_FOUND,
					"cannot load imported deck '" + imp.getImportURI() + "': " + rootMessage(e));
		}
		return null;
	}

	private static String rootMessage(Throwable t) {
		Throwable c = t;
		while (c.getCause() != null && c.getCause() != c) {
			c = c.getCause();
		}
		return c.getMessage() == null ? c.getClass().getSimpleName() : c.getMessage();
	}

	// ------------------------------------------------------------------------------------ header

	private void header() {
		Technology t = root.getTechnology();
		boolean hasOptions = root.getElements().stream().anyMatch(Option.class::isInstance);
		if (t == null) {
			if (requireTechnology || hasOptions) {
				problem(root, null, Severity.ERROR, DeckIssueCodes.MISSING_TECHNOLOGY,
						"the deck needs a header: technology \"name\" database unit <length> grid <length>");
			}
			return;
		}
		BigDecimal dbu = headerLength(t, t.getDatabaseUnit(), "database unit");
		BigDecimal grid = headerLength(t, t.getGrid(), "grid");
		if (dbu == null || grid == null) {
			return;
		}
		BigDecimal ratio = grid.divide(dbu, Evaluator.MATH);
		if (!isInteger(ratio) || ratio.signum() <= 0) {
			problem(t.getGrid(), null, Severity.ERROR, DeckIssueCodes.GRID_NOT_MULTIPLE_OF_UNIT, "the grid "
					+ show(grid) + " nm is not a whole multiple of the database unit " + show(dbu) + " nm");
			return;
		}
		dbuNm = dbu;
		gridNm = grid;
		gridDbu = ratio.longValueExact();
		unitsKnown = true;
		for (Deck d : closure) {
			Technology other = d.getTechnology();
			if (d == root || other == null) {
				continue;
			}
			BigDecimal od = value(other.getDatabaseUnit());
			BigDecimal og = value(other.getGrid());
			if ((od != null && od.compareTo(dbu) != 0) || (og != null && og.compareTo(grid) != 0)) {
				problem(t, DeckPackage.Literals.TECHNOLOGY__TITLE, Severity.ERROR, DeckIssueCodes.CONFLICTING_TECHNOLOGY,
						"imported deck " + fileName(d) + " declares another database unit or grid");
			}
		}
	}

	private static BigDecimal value(Quantity q) {
		if (q == null || q.getValue() == null || Units.dimension(q.getUnit()) != 1) {
			return null;
		}
		return new BigDecimal(q.getValue()).multiply(Units.scale(q.getUnit()));
	}

	private BigDecimal headerLength(Technology t, Quantity q, String what) {
		if (q == null) {
			problem(t, DeckPackage.Literals.TECHNOLOGY__TITLE, Severity.ERROR, DeckIssueCodes.MISSING_UNITS_HEADER,
					"the technology header needs its " + what);
			return null;
		}
		if (!typer.check(q, 1, "the " + what)) {
			return null;
		}
		BigDecimal v = value(q);
		if (v == null || v.signum() <= 0) {
			problem(q, null, Severity.ERROR, DeckIssueCodes.NON_POSITIVE_VALUE, "the " + what + " must be positive");
			return null;
		}
		return v;
	}

	private static boolean isInteger(BigDecimal v) {
		return v.signum() == 0 || v.stripTrailingZeros().scale() <= 0;
	}

	// ------------------------------------------------------------------------------------ declarations

	private void declarations() {
		Map<List<Integer>, org.apertura.rules.deck.Layer> gds = new HashMap<>();
		for (Deck d : closure) {
			for (DeckElement e : d.getElements()) {
				if (e instanceof org.apertura.rules.deck.Layer l && l.getName() != null) {
					if (layers.putIfAbsent(l.getName(), l) != null) {
						problem(l, DeckPackage.Literals.LAYER__NAME, Severity.ERROR, DeckIssueCodes.DUPLICATE_LAYER,
								"layer '" + l.getName() + "' is declared twice");
						continue;
					}
					if (l.getGdsLayer() > 65535 || l.getGdsDatatype() > 65535) {
						problem(l, DeckPackage.Literals.LAYER__GDS_LAYER, Severity.ERROR, DeckIssueCodes.NUMBER_OUT_OF_RANGE,
								"GDS layer and datatype go from 0 to 65535");
					}
					org.apertura.rules.deck.Layer before = gds.putIfAbsent(List.of(l.getGdsLayer(), l.getGdsDatatype()), l);
					if (before != null) {
						problem(l, DeckPackage.Literals.LAYER__GDS_LAYER, Severity.WARNING,
								DeckIssueCodes.DUPLICATE_GDS_NUMBER, "layer '" + l.getName() + "' uses GDS "
										+ l.getGdsLayer() + "/" + l.getGdsDatatype() + " like '" + before.getName() + "'");
					}
					boolean line = l.getKind() == org.apertura.rules.deck.LayerKind.LINE;
					if (line && l.getDirection() == null) {
						problem(l, DeckPackage.Literals.LAYER__KIND, Severity.ERROR, DeckIssueCodes.MISSING_DIRECTION,
								"line layer '" + l.getName() + "' needs a preferred direction (horizontal or vertical)");
					} else if (!line && l.getDirection() != null) {
						problem(l, DeckPackage.Literals.LAYER__DIRECTION, Severity.WARNING,
								DeckIssueCodes.DIRECTION_ON_NON_LINE_LAYER,
								"only line layers have a preferred direction; it is ignored here");
					}
				} else if (e instanceof Option o && o.getName() != null) {
					if (options.putIfAbsent(o.getName(), o) != null) {
						problem(o, DeckPackage.Literals.OPTION__NAME, Severity.ERROR, DeckIssueCodes.DUPLICATE_OPTION,
								"option '" + o.getName() + "' is declared twice");
					}
				}
			}
		}
	}

	private List<Option> chain(Option o) {
		return chains.computeIfAbsent(o, k -> {
			List<Option> list = new ArrayList<>();
			Option cur = k;
			while (cur != null && !cur.eIsProxy()) {
				if (list.contains(cur)) {
					problem(k, DeckPackage.Literals.OPTION__PARENT, Severity.ERROR, DeckIssueCodes.INHERITANCE_CYCLE,
							"option '" + k.getName() + "' extends itself through " + names(list));
					break;
				}
				list.add(cur);
				cur = cur.getParent();
			}
			return list;
		});
	}

	private static String names(List<Option> list) {
		return String.join(" -> ", list.stream().map(Option::getName).toList());
	}

	// ------------------------------------------------------------------------------------ static checks

	private static String settingName(OptionSetting s) {
		if (s instanceof Wavelength) {
			return "wavelength";
		} else if (s instanceof NumericalAperture) {
			return "NA";
		} else if (s instanceof K1Floor) {
			return "k1 floor";
		} else if (s instanceof K2) {
			return "k2";
		} else if (s instanceof Demagnification) {
			return "demagnification";
		} else if (s instanceof ExposureField) {
			return "field";
		} else if (s instanceof StitchKeepOut) {
			return "stitch keep-out";
		}
		return "throughput";
	}

	private static int settingDimension(OptionSetting s) {
		return s instanceof Wavelength || s instanceof ExposureField || s instanceof StitchKeepOut ? 1 : 0;
	}

	private void checkSettings(Option o) {
		Set<Class<?>> seen = new HashSet<>();
		for (OptionSetting s : o.getSettings()) {
			if (!seen.add(s.eClass().getInstanceClass())) {
				problem(s, null, Severity.ERROR, DeckIssueCodes.DUPLICATE_SETTING,
						"option '" + o.getName() + "' sets its " + settingName(s) + " twice");
			}
			boolean perAxisAllowed = s instanceof Demagnification || s instanceof ExposureField;
			Value v = s.getValue();
			if (v != null && v.getExpression() == null && !perAxisAllowed) {
				problem(v, null, Severity.ERROR, DeckIssueCodes.UNIT_MISMATCH,
						"the " + settingName(s) + " takes one value, not one per axis");
				badValues.add(v);
				continue;
			}
			checkValue(v, settingDimension(s), "the " + settingName(s));
		}
	}

	private void checkValue(Value v, int dimension, String what) {
		if (v == null) {
			return;
		}
		boolean ok = true;
		for (Expression e : Arrays.asList(v.getExpression(), v.getX(), v.getY())) {
			if (e != null) {
				ok &= typer.check(e, dimension, what);
			}
		}
		if (!ok) {
			badValues.add(v);
		}
	}

	private void checkExpression(Expression e, int dimension, String what) {
		if (e != null && !typer.check(e, dimension, what)) {
			badValues.add(e);
		}
	}

	private void blocks() {
		List<Deck> rootFirst = new ArrayList<>(closure);
		Collections.reverse(rootFirst);
		for (Deck d : rootFirst) {
			Map<String, Block> seen = new HashMap<>();
			for (DeckElement e : d.getElements()) {
				if (e instanceof org.apertura.rules.deck.LayerRules lr) {
					Block b = index(lr, seen);
					if (b != null) {
						defaults.computeIfAbsent(lr.getLayer().getName(), k -> new ArrayList<>()).add(b);
					}
				}
			}
		}
		for (Deck d : closure) {
			for (DeckElement e : d.getElements()) {
				if (e instanceof Option o) {
					Map<String, Block> byLayer = new HashMap<>();
					for (org.apertura.rules.deck.LayerRules lr : o.getLayerRules()) {
						index(lr, byLayer);
					}
					optionBlocks.put(o, byLayer);
				}
			}
		}
	}

	/** Indexes a block, checking its rules; null if its layer is unknown or the block is a duplicate. */
	private Block index(org.apertura.rules.deck.LayerRules lr, Map<String, Block> seen) {
		org.apertura.rules.deck.Layer layer = lr.getLayer();
		if (layer == null || layer.eIsProxy() || layer.getName() == null) {
			return null;
		}
		Block b = new Block(lr);
		if (seen.putIfAbsent(layer.getName(), b) != null) {
			problem(lr, DeckPackage.Literals.LAYER_RULES__LAYER, Severity.ERROR, DeckIssueCodes.DUPLICATE_LAYER_BLOCK,
					"a second block for layer '" + layer.getName() + "' here; merge it with the first");
			return null;
		}
		boolean line = layer.getKind() == org.apertura.rules.deck.LayerKind.LINE;
		for (Rule r : lr.getRules()) {
			Slot slot = slot(r);
			if (r instanceof SpacingRule s && s.getCondition() != null) {
				b.conditional.add(s);
				checkValue(s.getValue(), 1, "a spacing");
				SpacingCondition c = s.getCondition();
				checkExpression(c.getWidthLimit(), 1, "a width threshold");
				checkExpression(c.getRunLimit(), 1, "a run-length threshold");
				continue;
			}
			if (r instanceof EnclosureRule en) {
				org.apertura.rules.deck.Layer inner = en.getInner();
				if (inner == null || inner.eIsProxy()) {
					continue;
				}
				if (b.enclosures.putIfAbsent(inner.getName(), en) != null) {
					problem(r, null, Severity.ERROR, DeckIssueCodes.DUPLICATE_RULE,
							"a second enclosure of '" + inner.getName() + "' in this block");
				}
				if (inner == layer) {
					problem(r, DeckPackage.Literals.ENCLOSURE_RULE__INNER, Severity.ERROR,
							DeckIssueCodes.ENCLOSURE_OF_SELF, "a layer cannot enclose itself");
				}
				checkValue(en.getValue(), 1, "an enclosure");
				checkValue(en.getSides(), 1, "an enclosure");
				continue;
			}
			if (slot == null) {
				continue;
			}
			if (b.rules.putIfAbsent(slot, r) != null) {
				problem(r, null, Severity.ERROR, DeckIssueCodes.DUPLICATE_RULE,
						"a second " + describe(slot) + " rule for '" + layer.getName() + "' in this block");
				continue;
			}
			switch (slot) {
				case PATTERNING -> checkPatterning((PatterningRule) r);
				case PITCH -> {
					if (!line) {
						problem(r, null, Severity.ERROR, DeckIssueCodes.PITCH_ON_NON_LINE_LAYER,
								"layer '" + layer.getName() + "' is not a line layer: it has no pitch");
					}
					checkValue(((PitchRule) r).getValue(), 1, "a pitch");
				}
				case AREA -> checkValue(((AreaRule) r).getValue(), 2, "an area");
				case END_OF_LINE -> {
					EndOfLineRule eol = (EndOfLineRule) r;
					checkValue(eol.getTipLength(), 1, "a tip length");
					checkValue(eol.getTipToTip(), 1, "a tip-to-tip spacing");
					checkValue(eol.getTipToSide(), 1, "a tip-to-side spacing");
				}
				case DENSITY -> {
					DensityRule d = (DensityRule) r;
					checkExpression(d.getMinimum(), 0, "a density");
					checkExpression(d.getMaximum(), 0, "a density");
					checkValue(d.getWindow(), 1, "a density window");
					checkValue(d.getStep(), 1, "a density step");
				}
				default -> checkValue(scalarValue(r), 1, "a " + describe(slot));
			}
		}
		return b;
	}

	private void checkPatterning(PatterningRule p) {
		if (p.getScheme() instanceof LithoEtch le && (le.getMasks() < 2 || le.getMasks() > 4)) {
			problem(le, DeckPackage.Literals.LITHO_ETCH__MASKS, Severity.ERROR, DeckIssueCodes.INVALID_PATTERNING,
					"litho-etch takes 2, 3 or 4 masks");
		} else if (p.getScheme() instanceof SpacerDivision sd && sd.getDivision() != 2 && sd.getDivision() != 4) {
			problem(sd, DeckPackage.Literals.SPACER_DIVISION__DIVISION, Severity.ERROR,
					DeckIssueCodes.INVALID_PATTERNING, "spacer patterning divides the pitch by 2 or 4");
		}
	}

	private static Slot slot(Rule r) {
		if (r instanceof PatterningRule) {
			return Slot.PATTERNING;
		} else if (r instanceof WidthRule) {
			return Slot.WIDTH;
		} else if (r instanceof MaxWidthRule) {
			return Slot.MAX_WIDTH;
		} else if (r instanceof SpacingRule) {
			return Slot.SPACING;
		} else if (r instanceof PitchRule) {
			return Slot.PITCH;
		} else if (r instanceof EndOfLineRule) {
			return Slot.END_OF_LINE;
		} else if (r instanceof AreaRule) {
			return Slot.AREA;
		} else if (r instanceof DensityRule) {
			return Slot.DENSITY;
		} else if (r instanceof SameMaskSpacingRule) {
			return Slot.SAME_MASK;
		} else if (r instanceof MaskWidthRule) {
			return Slot.MASK_WIDTH;
		} else if (r instanceof MaskSpacingRule) {
			return Slot.MASK_SPACING;
		}
		return null;
	}

	private static String describe(Slot s) {
		return switch (s) {
			case MAX_WIDTH -> "max width";
			case END_OF_LINE -> "end-of-line";
			case SAME_MASK -> "same-mask spacing";
			case MASK_WIDTH -> "mask width";
			case MASK_SPACING -> "mask spacing";
			default -> s.name().toLowerCase(java.util.Locale.ROOT);
		};
	}

	/** The value of a rule that has exactly one. */
	private static Value scalarValue(Rule r) {
		if (r instanceof WidthRule w) {
			return w.getValue();
		} else if (r instanceof MaxWidthRule w) {
			return w.getValue();
		} else if (r instanceof SpacingRule s) {
			return s.getValue();
		} else if (r instanceof PitchRule p) {
			return p.getValue();
		} else if (r instanceof AreaRule a) {
			return a.getValue();
		} else if (r instanceof SameMaskSpacingRule s) {
			return s.getValue();
		} else if (r instanceof MaskWidthRule m) {
			return m.getValue();
		} else if (r instanceof MaskSpacingRule m) {
			return m.getValue();
		}
		return null;
	}

	private static org.apertura.rules.resolved.Layer toLayer(org.apertura.rules.deck.Layer l) {
		org.apertura.rules.resolved.LayerKind kind = switch (l.getKind()) {
			case LINE -> org.apertura.rules.resolved.LayerKind.LINE;
			case CUT -> org.apertura.rules.resolved.LayerKind.CUT;
			default -> org.apertura.rules.resolved.LayerKind.OTHER;
		};
		Direction dir = kind != org.apertura.rules.resolved.LayerKind.LINE || l.getDirection() == null ? Direction.NONE
				: "horizontal".equals(l.getDirection()) ? Direction.HORIZONTAL : Direction.VERTICAL;
		return new org.apertura.rules.resolved.Layer(l.getName(), l.getGdsLayer(), l.getGdsDatatype(), kind, dir,
				l.getDescription() == null ? "" : l.getDescription());
	}

	// ------------------------------------------------------------------------------------ optics

	/** One option with its inheritance chain and evaluated optics. */
	private final class OptionContext implements Evaluator.Context {
		final Option option;
		final List<Option> chain;
		final Map<Class<?>, Q> optics = new HashMap<>();
		final Set<Class<?>> inProgress = new HashSet<>();
		final Map<Class<?>, EvaluationException> failed = new HashMap<>();

		OptionContext(Option option) {
			this.option = option;
			this.chain = chain(option);
		}

		OptionSetting setting(Class<?> type) {
			for (Option o : chain) {
				for (OptionSetting s : o.getSettings()) {
					if (type.isInstance(s)) {
						return s;
					}
				}
			}
			return null;
		}

		Q evaluateSetting(Class<?> type, Axis axis, EObject where) throws EvaluationException {
			Class<?> key = type;
			boolean perAxis = type == Demagnification.class || type == ExposureField.class;
			if (!perAxis && optics.containsKey(key)) {
				return optics.get(key);
			}
			if (failed.containsKey(key)) {
				throw EvaluationException.silent();
			}
			OptionSetting s = setting(type);
			if (s == null || s.getValue() == null) {
				throw new EvaluationException(where, DeckIssueCodes.MISSING_OPTICS,
						"option '" + option.getName() + "' has no " + typeName(type));
			}
			if (badValues.contains(s.getValue())) {
				throw EvaluationException.silent();
			}
			if (!inProgress.add(key)) {
				throw new EvaluationException(where, DeckIssueCodes.EXPRESSION_CYCLE,
						"the " + settingName(s) + " of option '" + option.getName() + "' refers to itself");
			}
			try {
				Value v = s.getValue();
				Expression e = v.getExpression() != null ? v.getExpression() : axis == Axis.X ? v.getX() : v.getY();
				Q q = Evaluator.evaluate(e, axis, this);
				if (!perAxis) {
					optics.put(key, q);
				}
				return q;
			} catch (EvaluationException ex) {
				failed.put(key, ex);
				throw ex;
			} finally {
				inProgress.remove(key);
			}
		}

		@Override
		public Q optics(OpticsSymbol symbol, OpticsReference where) throws EvaluationException {
			Class<?> type = switch (symbol) {
				case LAMBDA, GREEK_LAMBDA -> Wavelength.class;
				case NA -> NumericalAperture.class;
				case K1 -> K1Floor.class;
				default -> K2.class;
			};
			return evaluateSetting(type, Axis.X, where);
		}

		@Override
		public Q rule(RuleSymbol symbol, Axis axis, RuleReference where) throws EvaluationException {
			throw new EvaluationException(where, DeckIssueCodes.EVALUATION_FAILED,
					"optics settings cannot refer to layer rules");
		}

		@Override
		public BigDecimal gridNm() {
			return gridNm;
		}

		private static String typeName(Class<?> type) {
			if (type == Wavelength.class) {
				return "wavelength";
			} else if (type == NumericalAperture.class) {
				return "NA";
			} else if (type == K1Floor.class) {
				return "k1 floor";
			} else if (type == K2.class) {
				return "k2";
			} else if (type == Demagnification.class) {
				return "demagnification";
			} else if (type == ExposureField.class) {
				return "field";
			} else if (type == StitchKeepOut.class) {
				return "stitch keep-out";
			}
			return "throughput";
		}

		/** The optics of this option, or null (problems reported) if incomplete. */
		LithographyOption resolveOptics() {
			List<String> missing = new ArrayList<>();
			Map<Class<?>, BigDecimal[]> values = new HashMap<>();
			boolean broken = false;
			for (Class<?> type : List.of(Wavelength.class, NumericalAperture.class, K1Floor.class, K2.class,
					Demagnification.class, ExposureField.class, Throughput.class, StitchKeepOut.class)) {
				OptionSetting s = setting(type);
				if (s == null) {
					if (type != Throughput.class && type != StitchKeepOut.class) {
						missing.add(typeName(type));
					}
					continue;
				}
				try {
					BigDecimal x = evaluateSetting(type, Axis.X, s).value();
					BigDecimal y = evaluateSetting(type, Axis.Y, s).value();
					values.put(type, new BigDecimal[] { x, y });
					checkRange(s, type, x);
					if (y.compareTo(x) != 0) {
						checkRange(s, type, y);
					}
				} catch (EvaluationException ex) {
					broken = true;
					if (ex.code() != null) {
						report(ex.where(), null, Severity.ERROR, ex.code(), ex.getMessage(), option);
					}
				}
			}
			if (!missing.isEmpty()) {
				problem(option, DeckPackage.Literals.OPTION__NAME, Severity.ERROR, DeckIssueCodes.MISSING_OPTICS,
						"option '" + option.getName() + "' needs " + String.join(", ", missing)
								+ " (set here or in an option it extends)");
				return null;
			}
			if (broken) {
				return null;
			}
			BigDecimal[] demag = values.get(Demagnification.class);
			BigDecimal[] field = values.get(ExposureField.class);
			BigDecimal[] tp = values.get(Throughput.class);
			BigDecimal[] keepOut = values.get(StitchKeepOut.class);
			Option parent = option.getParent();
			return new LithographyOption(option.getName(), option.getDescription() == null ? "" : option.getDescription(),
					parent == null || parent.eIsProxy() ? Optional.empty() : Optional.ofNullable(parent.getName()),
					values.get(Wavelength.class)[0].doubleValue(), values.get(NumericalAperture.class)[0].doubleValue(),
					values.get(K1Floor.class)[0].doubleValue(), values.get(K2.class)[0].doubleValue(),
					demag[0].doubleValue(), demag[1].doubleValue(),
					field[0].movePointLeft(6).doubleValue(), field[1].movePointLeft(6).doubleValue(),
					tp == null ? OptionalDouble.empty() : OptionalDouble.of(tp[0].doubleValue()),
					keepOut == null ? OptionalDouble.empty() : OptionalDouble.of(keepOut[0].doubleValue()));
		}

		private void checkRange(OptionSetting s, Class<?> type, BigDecimal v) {
			String name = typeName(type);
			if (type == K1Floor.class) {
				if (v.compareTo(PHYSICAL_K1) < 0 || v.compareTo(BigDecimal.ONE) > 0) {
					report(s, DeckPackage.Literals.OPTION_SETTING__VALUE, Severity.WARNING,
							DeckIssueCodes.OPTICS_OUT_OF_RANGE, "a k1 floor of " + show(v)
									+ " is outside 0.25..1; the physical limit 0.25 is enforced anyway",
							option);
				}
				return;
			}
			if (v.signum() <= 0) {
				report(s, DeckPackage.Literals.OPTION_SETTING__VALUE, Severity.ERROR, DeckIssueCodes.NON_POSITIVE_VALUE,
						"the " + name + " of option '" + option.getName() + "' must be positive", option);
			} else if (type == NumericalAperture.class && v.compareTo(BigDecimal.valueOf(2)) >= 0) {
				report(s, DeckPackage.Literals.OPTION_SETTING__VALUE, Severity.ERROR, DeckIssueCodes.OPTICS_OUT_OF_RANGE,
						"an NA of " + show(v) + " is not physical (immersion optics reach about 1.35)", option);
			} else if (type == Demagnification.class && v.compareTo(BigDecimal.ONE) < 0) {
				report(s, DeckPackage.Literals.OPTION_SETTING__VALUE, Severity.ERROR, DeckIssueCodes.OPTICS_OUT_OF_RANGE,
						"a demagnification below 1 would enlarge the mask image", option);
			} else if (type == StitchKeepOut.class && unitsKnown && !isInteger(v.divide(gridNm, Evaluator.MATH))) {
				report(s, DeckPackage.Literals.OPTION_SETTING__VALUE, Severity.ERROR, DeckIssueCodes.OFF_GRID,
						"the stitch keep-out of option '" + option.getName() + "' is " + show(v) + " nm, off the "
								+ show(gridNm) + " nm manufacturing grid",
						option);
			}
		}
	}

	// ------------------------------------------------------------------------------------ layer rules

	private record Memo(RuleSymbol symbol, Axis axis) {
	}

	/** One layer under one option: the block chain, memoised rule values and the checks. */
	private final class LayerContext implements Evaluator.Context {
		final OptionContext oc;
		final org.apertura.rules.deck.Layer layer;
		final List<Block> blocks = new ArrayList<>();
		final Map<Memo, Object> memo = new HashMap<>();
		final Set<Memo> inProgress = new HashSet<>();

		LayerContext(OptionContext oc, org.apertura.rules.deck.Layer layer) {
			this.oc = oc;
			this.layer = layer;
			for (Option o : oc.chain) {
				Map<String, Block> byLayer = optionBlocks.get(o);
				Block b = byLayer == null ? null : byLayer.get(layer.getName());
				if (b != null) {
					blocks.add(b);
				}
			}
			blocks.addAll(defaults.getOrDefault(layer.getName(), List.of()));
		}

		Rule find(Slot slot) {
			for (Block b : blocks) {
				Rule r = b.rules.get(slot);
				if (r != null) {
					return r;
				}
			}
			return null;
		}

		String where() {
			return "'" + layer.getName() + "' under option '" + oc.option.getName() + "'";
		}

		@Override
		public Q optics(OpticsSymbol symbol, OpticsReference where) throws EvaluationException {
			return oc.optics(symbol, where);
		}

		@Override
		public BigDecimal gridNm() {
			return gridNm;
		}

		@Override
		public Q rule(RuleSymbol symbol, Axis axis, RuleReference where) throws EvaluationException {
			Memo key = new Memo(symbol, axis);
			Object known = memo.get(key);
			if (known instanceof Q q) {
				return q;
			}
			if (known instanceof EvaluationException) {
				throw EvaluationException.silent();
			}
			Value v = switch (symbol) {
				case WIDTH -> find(Slot.WIDTH) instanceof WidthRule w ? w.getValue() : null;
				case SPACING -> find(Slot.SPACING) instanceof SpacingRule s ? s.getValue() : null;
				case PITCH -> find(Slot.PITCH) instanceof PitchRule p ? p.getValue() : null;
				case AREA -> find(Slot.AREA) instanceof AreaRule a ? a.getValue() : null;
				case TIP_TO_TIP -> find(Slot.END_OF_LINE) instanceof EndOfLineRule e ? e.getTipToTip() : null;
				default -> find(Slot.END_OF_LINE) instanceof EndOfLineRule e ? e.getTipToSide() : null;
			};
			if (v == null) {
				throw new EvaluationException(where, DeckIssueCodes.UNDEFINED_RULE_REFERENCE,
						where() + " has no " + symbol.getLiteral() + " rule to refer to");
			}
			if (badValues.contains(v)) {
				throw EvaluationException.silent();
			}
			if (!inProgress.add(key)) {
				throw new EvaluationException(where, DeckIssueCodes.EXPRESSION_CYCLE,
						"the " + symbol.getLiteral() + " of " + where() + " depends on itself");
			}
			try {
				Q q = evaluate(v, axis);
				memo.put(key, q);
				return q;
			} catch (EvaluationException ex) {
				memo.put(key, ex);
				throw ex;
			} finally {
				inProgress.remove(key);
			}
		}

		Q evaluate(Value v, Axis axis) throws EvaluationException {
			Expression e = v.getExpression() != null ? v.getExpression() : axis == Axis.X ? v.getX() : v.getY();
			return Evaluator.evaluate(e, axis, this);
		}

		/** Kinds of conversion to database units. */
		enum Fit {
			/** A wafer length on the manufacturing grid. */
			GRID,
			/** A whole number of database units (thresholds, mask-side values, areas). */
			UNIT
		}

		/** Evaluates a value per axis into database units, or null (problem reported). */
		RuleValue dbu(Rule source, Value v, int dimension, Fit fit, String what, boolean mayBeZero) {
			if (v == null || badValues.contains(v)) {
				return null;
			}
			long[] out = new long[2];
			for (Axis axis : Axis.values()) {
				try {
					Q q = evaluate(v, axis);
					Long d = toDbu(source, q, dimension, fit, what, mayBeZero);
					if (d == null) {
						return null;
					}
					out[axis.ordinal()] = d;
				} catch (EvaluationException ex) {
					if (ex.code() != null) {
						report(ex.where(), null, Severity.ERROR, ex.code(), ex.getMessage(), oc.option);
					}
					return null;
				}
			}
			return new RuleValue(out[0], out[1]);
		}

		Long toDbu(EObject source, Q q, int dimension, Fit fit, String what, boolean mayBeZero) {
			if (q.dimension() != dimension) {
				return null;
			}
			String unit = dimension == 2 ? " nm2" : " nm";
			if (q.value().signum() < 0 || (!mayBeZero && q.value().signum() == 0)) {
				report(source, null, Severity.ERROR, DeckIssueCodes.NON_POSITIVE_VALUE, "the " + what + " of " + where()
						+ " is " + show(q.value()) + unit + "; it must be positive", oc.option);
				return null;
			}
			BigDecimal units = q.value().divide(dbuNm.pow(dimension), Evaluator.MATH);
			if (!isInteger(units)) {
				report(source, null, Severity.ERROR, DeckIssueCodes.OFF_GRID,
						"the " + what + " of " + where() + " is " + show(q.value()) + unit
								+ ", not a whole number of database units (" + show(dbuNm) + " nm); "
								+ "round it with ceil(...), floor(...) or round(...)",
						oc.option);
				return null;
			}
			long n;
			try {
				n = units.longValueExact();
			} catch (ArithmeticException ex) {
				report(source, null, Severity.ERROR, DeckIssueCodes.NUMBER_OUT_OF_RANGE,
						"the " + what + " of " + where() + " is too large", oc.option);
				return null;
			}
			if (fit == Fit.GRID && unitsKnown && n % gridDbu != 0) {
				report(source, null, Severity.ERROR, DeckIssueCodes.OFF_GRID,
						"the " + what + " of " + where() + " is " + show(q.value()) + unit + ", off the "
								+ show(gridNm) + " nm manufacturing grid; round it with ceil(...), floor(...) or round(...)",
						oc.option);
				return null;
			}
			return n;
		}

		org.apertura.rules.resolved.LayerRules resolve() {
			Map<RuleKind, RuleValue> values = new EnumMap<>(RuleKind.class);
			Map<RuleKind, Rule> sources = new EnumMap<>(RuleKind.class);
			scalar(values, sources, RuleKind.WIDTH, Slot.WIDTH, "width", Fit.GRID);
			scalar(values, sources, RuleKind.MAX_WIDTH, Slot.MAX_WIDTH, "max width", Fit.GRID);
			scalar(values, sources, RuleKind.SPACING, Slot.SPACING, "spacing", Fit.GRID);
			scalar(values, sources, RuleKind.PITCH, Slot.PITCH, "pitch", Fit.GRID);
			scalar(values, sources, RuleKind.SAME_MASK_SPACING, Slot.SAME_MASK, "same-mask spacing", Fit.GRID);
			scalar(values, sources, RuleKind.MASK_WIDTH, Slot.MASK_WIDTH, "mask width", Fit.UNIT);
			scalar(values, sources, RuleKind.MASK_SPACING, Slot.MASK_SPACING, "mask spacing", Fit.UNIT);
			Rule area = find(Slot.AREA);
			if (area != null) {
				RuleValue a = dbu(area, ((AreaRule) area).getValue(), 2, Fit.UNIT, "area", false);
				if (a != null) {
					values.put(RuleKind.AREA, a);
					sources.put(RuleKind.AREA, area);
				}
			}
			Optional<EndOfLine> eol = endOfLine(values);
			Optional<Density> density = density(values);
			Patterning patterning = patterning();
			SpacingMetric metric = find(Slot.SPACING) instanceof SpacingRule s && "projection".equals(s.getMetric())
					? SpacingMetric.PROJECTION : SpacingMetric.EUCLIDEAN;
			List<ConditionalSpacing> table = spacingTable();
			List<Enclosure> enclosures = enclosures();
			check(values, sources, patterning);
			return new org.apertura.rules.resolved.LayerRules(oc.option.getName(), layer.getName(), patterning, values,
					metric, table, enclosures, eol, density);
		}

		private void scalar(Map<RuleKind, RuleValue> values, Map<RuleKind, Rule> sources, RuleKind kind, Slot slot,
				String what, Fit fit) {
			Rule r = find(slot);
			if (r == null) {
				return;
			}
			RuleValue v = dbu(r, scalarValue(r), 1, fit, what, false);
			if (v != null) {
				values.put(kind, v);
				sources.put(kind, r);
			}
		}

		private Patterning patterning() {
			if (find(Slot.PATTERNING) instanceof PatterningRule p) {
				if (p.getScheme() instanceof LithoEtch le && le.getMasks() >= 2) {
					return Patterning.lithoEtch(le.getMasks());
				}
				if (p.getScheme() instanceof SpacerDivision sd && sd.getDivision() >= 2) {
					org.apertura.rules.deck.Layer cut = sd.getCutLayer();
					return Patterning.spacerDivision(sd.getDivision(),
							cut == null || cut.eIsProxy() ? Optional.empty() : Optional.ofNullable(cut.getName()));
				}
				if (p.getScheme() instanceof SingleExposure) {
					return Patterning.SINGLE;
				}
			}
			return Patterning.SINGLE;
		}

		private Optional<EndOfLine> endOfLine(Map<RuleKind, RuleValue> values) {
			if (!(find(Slot.END_OF_LINE) instanceof EndOfLineRule r)) {
				return Optional.empty();
			}
			RuleValue tip = dbu(r, r.getTipLength(), 1, Fit.UNIT, "end-of-line tip length", false);
			RuleValue t2t = r.getTipToTip() == null ? null : dbu(r, r.getTipToTip(), 1, Fit.GRID, "tip-to-tip spacing", false);
			RuleValue t2s = r.getTipToSide() == null ? null
					: dbu(r, r.getTipToSide(), 1, Fit.GRID, "tip-to-side spacing", false);
			if (tip == null) {
				return Optional.empty();
			}
			values.put(RuleKind.END_OF_LINE_TIP_LENGTH, tip);
			if (t2t != null) {
				values.put(RuleKind.END_OF_LINE_TIP_TO_TIP, t2t);
			}
			if (t2s != null) {
				values.put(RuleKind.END_OF_LINE_TIP_TO_SIDE, t2s);
			}
			return Optional.of(new EndOfLine(tip, r.getTipBound() == TipBound.AT_MOST, Optional.ofNullable(t2t),
					Optional.ofNullable(t2s)));
		}

		private Optional<Density> density(Map<RuleKind, RuleValue> values) {
			if (!(find(Slot.DENSITY) instanceof DensityRule r)) {
				return Optional.empty();
			}
			RuleValue window = dbu(r, r.getWindow(), 1, Fit.GRID, "density window", false);
			RuleValue step = dbu(r, r.getStep(), 1, Fit.GRID, "density step", false);
			OptionalDouble min = fraction(r, r.getMinimum());
			OptionalDouble max = fraction(r, r.getMaximum());
			if (window == null || step == null || min == null || max == null) {
				return Optional.empty();
			}
			if (!window.isIsotropic() || !step.isIsotropic()) {
				report(r, null, Severity.ERROR, DeckIssueCodes.EVALUATION_FAILED,
						"a density window is square: give its size and step as single values", oc.option);
				return Optional.empty();
			}
			if (min.isEmpty() && max.isEmpty()) {
				report(r, null, Severity.ERROR, DeckIssueCodes.DENSITY_RANGE,
						"a density rule needs a min, a max or both", oc.option);
				return Optional.empty();
			}
			if (min.isPresent() && max.isPresent() && min.getAsDouble() > max.getAsDouble()) {
				report(r, null, Severity.ERROR, DeckIssueCodes.DENSITY_RANGE,
						"the density minimum of " + where() + " is above its maximum", oc.option);
			}
			if (step.x() > window.x()) {
				report(r, null, Severity.WARNING, DeckIssueCodes.DENSITY_STEP_EXCEEDS_WINDOW,
						"the density step of " + where() + " is larger than its window: parts of the layout are never "
								+ "inside a window",
						oc.option);
			}
			values.put(RuleKind.DENSITY_WINDOW, window);
			values.put(RuleKind.DENSITY_STEP, step);
			return Optional.of(new Density(min, max, window.x(), step.x()));
		}

		private OptionalDouble fraction(Rule r, Expression e) {
			if (e == null) {
				return OptionalDouble.empty();
			}
			if (badValues.contains(e)) {
				return null;
			}
			try {
				Q q = Evaluator.evaluate(e, Axis.X, this);
				if (q.value().signum() < 0 || q.value().compareTo(BigDecimal.ONE) > 0) {
					report(e, null, Severity.ERROR, DeckIssueCodes.DENSITY_RANGE,
							"a density is a fraction from 0 to 100 %, not " + show(q.value()), oc.option);
					return null;
				}
				return OptionalDouble.of(q.value().doubleValue());
			} catch (EvaluationException ex) {
				if (ex.code() != null) {
					report(ex.where(), null, Severity.ERROR, ex.code(), ex.getMessage(), oc.option);
				}
				return null;
			}
		}

		private List<ConditionalSpacing> spacingTable() {
			List<ConditionalSpacing> rows = new ArrayList<>();
			for (Block b : blocks) {
				if (b.conditional.isEmpty()) {
					continue;
				}
				Set<String> seen = new HashSet<>();
				for (SpacingRule s : b.conditional) {
					SpacingCondition c = s.getCondition();
					RuleValue v = dbu(s, s.getValue(), 1, Fit.GRID, "spacing", false);
					OptionalLong w = threshold(s, c.getWidthLimit(), "width threshold");
					OptionalLong run = threshold(s, c.getRunLimit(), "run-length threshold");
					if (v == null || w == null || run == null) {
						continue;
					}
					String key = w + "/" + c.getWidthBound() + "/" + run + "/" + c.getRunBound();
					if (!seen.add(key)) {
						report(s, null, Severity.ERROR, DeckIssueCodes.DUPLICATE_RULE,
								"two spacing rows of " + where() + " have the same condition", oc.option);
						continue;
					}
					rows.add(new ConditionalSpacing(v,
							"projection".equals(s.getMetric()) ? SpacingMetric.PROJECTION : SpacingMetric.EUCLIDEAN, w,
							c.getWidthBound() == org.apertura.rules.deck.Bound.AT_LEAST, run,
							c.getRunBound() == org.apertura.rules.deck.Bound.AT_LEAST));
				}
				break;
			}
			return rows;
		}

		private OptionalLong threshold(Rule source, Expression e, String what) {
			if (e == null) {
				return OptionalLong.empty();
			}
			if (badValues.contains(e)) {
				return null;
			}
			try {
				Long n = toDbu(source, Evaluator.evaluate(e, Axis.X, this), 1, Fit.UNIT, what, true);
				return n == null ? null : OptionalLong.of(n);
			} catch (EvaluationException ex) {
				if (ex.code() != null) {
					report(ex.where(), null, Severity.ERROR, ex.code(), ex.getMessage(), oc.option);
				}
				return null;
			}
		}

		private List<Enclosure> enclosures() {
			Map<String, EnclosureRule> found = new LinkedHashMap<>();
			for (Block b : blocks) {
				b.enclosures.forEach(found::putIfAbsent);
			}
			List<Enclosure> out = new ArrayList<>();
			for (Map.Entry<String, EnclosureRule> e : found.entrySet()) {
				EnclosureRule r = e.getValue();
				RuleValue all = dbu(r, r.getValue(), 1, Fit.GRID, "enclosure of " + e.getKey(), true);
				RuleValue pair = r.getSides() == null ? null
						: dbu(r, r.getSides(), 1, Fit.GRID, "enclosure of " + e.getKey(), true);
				if (all == null || (r.getSides() != null && pair == null)) {
					continue;
				}
				Enclosure.SidePair kind = pair == null ? Enclosure.SidePair.NONE
						: r.getPair() == SidePair.ADJACENT ? Enclosure.SidePair.ADJACENT : Enclosure.SidePair.OPPOSITE;
				out.add(new Enclosure(e.getKey(), all, Optional.ofNullable(pair), kind));
			}
			return out;
		}

		// ------------------------------------------------------------------ semantic checks

		private BigDecimal nm(long dbu) {
			return dbuNm.multiply(BigDecimal.valueOf(dbu));
		}

		private void check(Map<RuleKind, RuleValue> values, Map<RuleKind, Rule> sources, Patterning patterning) {
			boolean line = layer.getKind() == org.apertura.rules.deck.LayerKind.LINE;
			RuleValue pitch = values.get(RuleKind.PITCH);
			List<Axis> pitchAxes = layer.getDirection() == null ? List.of(Axis.X, Axis.Y)
					: List.of("horizontal".equals(layer.getDirection()) ? Axis.Y : Axis.X);
			if (line && pitch != null) {
				Axis axis = pitchAxes.size() == 1 ? pitchAxes.get(0) : pitch.x() <= pitch.y() ? Axis.X : Axis.Y;
				k1(sources.get(RuleKind.PITCH), nm(pitch.along(axis)), patterning);
				RuleValue w = values.get(RuleKind.WIDTH);
				RuleValue s = values.get(RuleKind.SPACING);
				if (w != null && s != null && w.along(axis) + s.along(axis) > pitch.along(axis)) {
					report(sources.get(RuleKind.PITCH), null, Severity.ERROR, DeckIssueCodes.WIDTH_SPACING_EXCEED_PITCH,
							"width " + show(nm(w.along(axis))) + " nm plus spacing " + show(nm(s.along(axis)))
									+ " nm exceed the pitch " + show(nm(pitch.along(axis))) + " nm of " + where(),
							oc.option);
				}
			}
			RuleValue same = values.get(RuleKind.SAME_MASK_SPACING);
			if (same != null) {
				if (!patterning.isMultiMask()) {
					report(sources.get(RuleKind.SAME_MASK_SPACING), null, Severity.ERROR,
							DeckIssueCodes.SAME_MASK_ON_SINGLE_MASK,
							"same-mask spacing needs litho-etch patterning, but " + where() + " is patterned "
									+ patterning.label(),
							oc.option);
				} else if (values.get(RuleKind.SPACING) != null
						&& same.min() < values.get(RuleKind.SPACING).max()) {
					report(sources.get(RuleKind.SAME_MASK_SPACING), null, Severity.WARNING,
							DeckIssueCodes.SAME_MASK_BELOW_SPACING,
							"the same-mask spacing of " + where() + " is below its spacing between masks", oc.option);
				}
			}
			RuleValue w = values.get(RuleKind.WIDTH);
			RuleValue maxW = values.get(RuleKind.MAX_WIDTH);
			if (w != null && maxW != null && (maxW.x() < w.x() || maxW.y() < w.y())) {
				report(sources.get(RuleKind.MAX_WIDTH), null, Severity.ERROR, DeckIssueCodes.MAX_WIDTH_BELOW_WIDTH,
						"the max width of " + where() + " is below its min width", oc.option);
			}
			maskSide(values, sources, RuleKind.MASK_WIDTH, RuleKind.WIDTH, "width");
			maskSide(values, sources, RuleKind.MASK_SPACING, RuleKind.SPACING, "spacing");
		}

		private void maskSide(Map<RuleKind, RuleValue> values, Map<RuleKind, Rule> sources, RuleKind maskKind,
				RuleKind waferKind, String what) {
			RuleValue mask = values.get(maskKind);
			RuleValue wafer = values.get(waferKind);
			if (mask == null || wafer == null) {
				return;
			}
			for (Axis axis : Axis.values()) {
				BigDecimal demag;
				try {
					demag = oc.evaluateSetting(Demagnification.class, axis, oc.option).value();
				} catch (EvaluationException ex) {
					return;
				}
				BigDecimal onMask = nm(wafer.along(axis)).multiply(demag);
				if (onMask.compareTo(nm(mask.along(axis))) < 0) {
					report(sources.get(maskKind), null, Severity.ERROR, DeckIssueCodes.MASK_FEATURE_TOO_SMALL,
							"the " + what + " of " + where() + " along " + axis.name().toLowerCase(java.util.Locale.ROOT)
									+ " is " + show(onMask) + " nm on the mask (x" + show(demag)
									+ "), below the mask minimum " + show(nm(mask.along(axis))) + " nm",
							oc.option);
				}
			}
		}

		private void k1(Rule pitchRule, BigDecimal pitchNm, Patterning patterning) {
			BigDecimal lambda;
			BigDecimal na;
			BigDecimal floor;
			try {
				lambda = oc.evaluateSetting(Wavelength.class, Axis.X, oc.option).value();
				na = oc.evaluateSetting(NumericalAperture.class, Axis.X, oc.option).value();
				floor = oc.evaluateSetting(K1Floor.class, Axis.X, oc.option).value();
			} catch (EvaluationException ex) {
				return;
			}
			if (lambda.signum() <= 0) {
				return;
			}
			BigDecimal k1 = k1(pitchNm, patterning.pitchSplit(), na, lambda);
			String context = "the pitch " + show(pitchNm) + " nm of " + where() + " (" + patterning.label() + ", NA "
					+ show(na) + ", \u03bb " + show(lambda) + " nm) gives k1 " + k1.setScale(2, java.math.RoundingMode.HALF_EVEN).toPlainString();
			if (k1.compareTo(PHYSICAL_K1) < 0) {
				String fix = null;
				for (int split = patterning.pitchSplit() + 1; split <= 4 && fix == null; split++) {
					BigDecimal k = k1(pitchNm, split, na, lambda);
					if (k.compareTo(PHYSICAL_K1) >= 0) {
						String schemes = switch (split) {
							case 2 -> "LE2 or SADP";
							case 3 -> "LE3";
							default -> "SAQP";
						};
						fix = schemes + " would make it printable (k1 " + k.setScale(2, java.math.RoundingMode.HALF_EVEN).toPlainString() + ")";
					}
				}
				if (fix == null) {
					fix = "not even SAQP makes it printable with these optics";
				}
				report(pitchRule, null, Severity.ERROR, DeckIssueCodes.K1_BELOW_LIMIT,
						context + ", below the physical limit 0.25; " + fix, oc.option);
			} else if (k1.compareTo(floor) < 0) {
				report(pitchRule, null, Severity.WARNING, DeckIssueCodes.K1_BELOW_FLOOR,
						context + ", below the option's practical k1 floor " + show(floor), oc.option);
			}
		}

		private static BigDecimal k1(BigDecimal pitchNm, int split, BigDecimal na, BigDecimal lambda) {
			return pitchNm.multiply(BigDecimal.valueOf(split)).multiply(na)
					.divide(lambda.multiply(BigDecimal.valueOf(2)), Evaluator.MATH);
		}
	}
}
