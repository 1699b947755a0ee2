/*
 * Copyright (c) 2026 Apertura contributors.
 * SPDX-License-Identifier: EPL-2.0
 */
package org.apertura.rules.internal;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import org.apertura.rules.deck.BinaryOperation;
import org.apertura.rules.deck.Expression;
import org.apertura.rules.deck.FunctionCall;
import org.apertura.rules.deck.Negation;
import org.apertura.rules.deck.OpticsReference;
import org.apertura.rules.deck.OpticsSymbol;
import org.apertura.rules.deck.Quantity;
import org.apertura.rules.deck.RuleReference;
import org.apertura.rules.deck.RuleSymbol;
import org.apertura.rules.resolved.Axis;
import org.apertura.rules.validation.DeckIssueCodes;

/**
 * Evaluates deck expressions exactly in decimal arithmetic (34 significant digits for quotients),
 * lengths in nanometres. Each result carries its length dimension so that grid snapping knows its
 * unit.
 */
final class Evaluator {

	/** Deeper expressions are refused rather than risking the stack. */
	static final int MAX_DEPTH = 500;

	static final MathContext MATH = MathContext.DECIMAL128;

	/** A value and its length dimension (0 plain, 1 nm, 2 nm²). */
	record Q(BigDecimal value, int dimension) {
	}

	/** What symbols mean where an expression is evaluated. */
	interface Context {
		/** The option's optics value for a symbol (lambda in nm; NA, k1 floor and k2 plain). */
		Q optics(OpticsSymbol symbol, OpticsReference where) throws EvaluationException;

		/** Another rule of the same layer under the same option, along the axis being evaluated. */
		Q rule(RuleSymbol symbol, Axis axis, RuleReference where) throws EvaluationException;

		/** The manufacturing grid in nanometres, for ceil/floor/round. */
		BigDecimal gridNm();
	}

	private Evaluator() {
	}

	static Q evaluate(Expression e, Axis axis, Context context) throws EvaluationException {
		return evaluate(e, axis, context, 0);
	}

	private static Q evaluate(Expression e, Axis axis, Context context, int depth) throws EvaluationException {
		if (e == null) {
			throw EvaluationException.silent();
		}
		if (depth > MAX_DEPTH) {
			throw new EvaluationException(e, DeckIssueCodes.EVALUATION_FAILED,
					"expression nested deeper than " + MAX_DEPTH + " levels");
		}
		if (e instanceof Quantity q) {
			if (q.getValue() == null) {
				throw EvaluationException.silent();
			}
			BigDecimal v = new BigDecimal(q.getValue()).multiply(Units.scale(q.getUnit()));
			return new Q(v, Units.dimension(q.getUnit()));
		}
		if (e instanceof Negation n) {
			Q o = evaluate(n.getOperand(), axis, context, depth + 1);
			return new Q(o.value().negate(), o.dimension());
		}
		if (e instanceof BinaryOperation b) {
			Q l = evaluate(b.getLeft(), axis, context, depth + 1);
			Q r = evaluate(b.getRight(), axis, context, depth + 1);
			switch (b.getOperator()) {
				case PLUS, MINUS -> {
					if (l.dimension() != r.dimension()) {
						throw new EvaluationException(b, DeckIssueCodes.UNIT_MISMATCH, "cannot add or subtract "
								+ Units.describe(l.dimension()) + " and " + Units.describe(r.dimension()));
					}
					return new Q(b.getOperator() == org.apertura.rules.deck.Operator.PLUS ? l.value().add(r.value())
							: l.value().subtract(r.value()), l.dimension());
				}
				case TIMES -> {
					return new Q(l.value().multiply(r.value()), l.dimension() + r.dimension());
				}
				case DIVIDED_BY -> {
					if (r.value().signum() == 0) {
						throw new EvaluationException(b, DeckIssueCodes.EVALUATION_FAILED, "division by zero");
					}
					return new Q(l.value().divide(r.value(), MATH), l.dimension() - r.dimension());
				}
				default -> throw new EvaluationException(b, DeckIssueCodes.EVALUATION_FAILED, "unknown operator");
			}
		}
		if (e instanceof OpticsReference o) {
			return context.optics(o.getSymbol(), o);
		}
		if (e instanceof RuleReference r) {
			return context.rule(r.getRule(), axis, r);
		}
		if (e instanceof FunctionCall f) {
			return call(f, axis, context, depth);
		}
		throw new EvaluationException(e, DeckIssueCodes.EVALUATION_FAILED, "cannot evaluate " + e.eClass().getName());
	}

	private static Q call(FunctionCall f, Axis axis, Context context, int depth) throws EvaluationException {
		var args = f.getArguments();
		if (args.isEmpty()) {
			throw new EvaluationException(f, DeckIssueCodes.EVALUATION_FAILED, "a function needs an argument");
		}
		switch (f.getFunction()) {
			case MIN, MAX -> {
				Q best = null;
				for (Expression a : args) {
					Q q = evaluate(a, axis, context, depth + 1);
					if (best != null && best.dimension() != q.dimension()) {
						throw new EvaluationException(f, DeckIssueCodes.UNIT_MISMATCH,
								f.getFunction().getLiteral() + " of different kinds of quantity");
					}
					if (best == null) {
						best = q;
					} else {
						int c = q.value().compareTo(best.value());
						if (f.getFunction() == org.apertura.rules.deck.Function.MIN ? c < 0 : c > 0) {
							best = q;
						}
					}
				}
				return best;
			}
			default -> {
				if (args.size() != 1) {
					throw new EvaluationException(f, DeckIssueCodes.EVALUATION_FAILED,
							f.getFunction().getLiteral() + " takes one argument");
				}
				Q q = evaluate(args.get(0), axis, context, depth + 1);
				if (q.dimension() < 0 || q.dimension() > 2) {
					throw new EvaluationException(f, DeckIssueCodes.UNIT_MISMATCH,
							f.getFunction().getLiteral() + " snaps lengths to the grid, areas to the grid squared, "
									+ "plain numbers to integers");
				}
				BigDecimal step = context.gridNm().pow(q.dimension());
				RoundingMode mode = switch (f.getFunction()) {
					case CEIL -> RoundingMode.CEILING;
					case FLOOR -> RoundingMode.FLOOR;
					default -> RoundingMode.HALF_UP;
				};
				BigDecimal n = q.value().divide(step, MATH).setScale(0, mode);
				return new Q(n.multiply(step), q.dimension());
			}
		}
	}
}
