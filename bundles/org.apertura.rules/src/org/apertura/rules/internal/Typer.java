/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import java.util.function.Consumer;

import org.apertura.rules.deck.BinaryOperation;
import org.apertura.rules.deck.DeckPackage;
import org.apertura.rules.deck.Expression;
import org.apertura.rules.deck.Function;
import org.apertura.rules.deck.FunctionCall;
import org.apertura.rules.deck.Negation;
import org.apertura.rules.deck.OpticsReference;
import org.apertura.rules.deck.OpticsSymbol;
import org.apertura.rules.deck.Quantity;
import org.apertura.rules.deck.RuleReference;
import org.apertura.rules.deck.RuleSymbol;
import org.apertura.rules.validation.DeckIssueCodes;
import org.eclipse.xtext.diagnostics.Severity;

/**
 * Static dimension analysis of expressions, independent of any option: finds missing units and
 * mixed quantities once, where they are written.
 */
final class Typer {

	private final Consumer<Problem> sink;

	Typer(Consumer<Problem> sink) {
		this.sink = sink;
	}

	/**
	 * Checks an expression has the expected dimension.
	 *
	 * @return whether it does (problems are reported)
	 */
	boolean check(Expression e, int expected, String what) {
		Integer d = dimension(e, 0);
		if (d == null) {
			return false;
		}
		if (d != expected) {
			if (d == 0 && expected > 0) {
				sink.accept(new Problem(e, null, Severity.ERROR, DeckIssueCodes.MISSING_UNIT,
						what + " needs a unit: write it as " + Units.describe(expected)));
			} else {
				sink.accept(new Problem(e, null, Severity.ERROR, DeckIssueCodes.UNIT_MISMATCH,
						what + " must be " + Units.describe(expected) + ", not " + Units.describe(d)));
			}
			return false;
		}
		return true;
	}

	/** The rule kinds an expression may name, and their dimension. */
	static int dimension(RuleSymbol symbol) {
		return symbol == RuleSymbol.AREA ? 2 : 1;
	}

	static int dimension(OpticsSymbol symbol) {
		return symbol == OpticsSymbol.LAMBDA || symbol == OpticsSymbol.GREEK_LAMBDA ? 1 : 0;
	}

	private Integer dimension(Expression e, int depth) {
		if (e == null) {
			return null;
		}
		if (depth > Evaluator.MAX_DEPTH) {
			sink.accept(new Problem(e, null, Severity.ERROR, DeckIssueCodes.EVALUATION_FAILED,
					"expression nested deeper than " + Evaluator.MAX_DEPTH + " levels"));
			return null;
		}
		if (e instanceof Quantity q) {
			return Units.dimension(q.getUnit());
		}
		if (e instanceof Negation n) {
			return dimension(n.getOperand(), depth + 1);
		}
		if (e instanceof OpticsReference o) {
			return dimension(o.getSymbol());
		}
		if (e instanceof RuleReference r) {
			return dimension(r.getRule());
		}
		if (e instanceof BinaryOperation b) {
			Integer l = dimension(b.getLeft(), depth + 1);
			Integer r = dimension(b.getRight(), depth + 1);
			if (l == null || r == null) {
				return null;
			}
			return switch (b.getOperator()) {
				case TIMES -> l + r;
				case DIVIDED_BY -> l - r;
				default -> {
					if (!l.equals(r)) {
						mismatch(b, b.getLeft(), l, b.getRight(), r);
						yield null;
					}
					yield l;
				}
			};
		}
		if (e instanceof FunctionCall f) {
			Integer result = null;
			if (f.getFunction() != Function.MIN && f.getFunction() != Function.MAX && f.getArguments().size() != 1) {
				sink.accept(new Problem(f, DeckPackage.Literals.FUNCTION_CALL__FUNCTION, Severity.ERROR,
						DeckIssueCodes.EVALUATION_FAILED, f.getFunction().getLiteral() + " takes one argument"));
				return null;
			}
			Expression first = null;
			for (Expression a : f.getArguments()) {
				Integer d = dimension(a, depth + 1);
				if (d == null) {
					return null;
				}
				if (result != null && !result.equals(d)) {
					mismatch(f, first, result, a, d);
					return null;
				}
				result = d;
				first = a;
			}
			return result;
		}
		return null;
	}

	private void mismatch(Expression where, Expression left, int l, Expression right, int r) {
		if (l == 0 && left instanceof Quantity) {
			sink.accept(new Problem(left, null, Severity.ERROR, DeckIssueCodes.MISSING_UNIT,
					"this number needs a unit: it is combined with " + Units.describe(r)));
		} else if (r == 0 && right instanceof Quantity) {
			sink.accept(new Problem(right, null, Severity.ERROR, DeckIssueCodes.MISSING_UNIT,
					"this number needs a unit: it is combined with " + Units.describe(l)));
		} else {
			sink.accept(new Problem(where, null, Severity.ERROR, DeckIssueCodes.UNIT_MISMATCH,
					"cannot combine " + Units.describe(l) + " with " + Units.describe(r)));
		}
	}
}
