package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;
import java.util.List;

/**
 * Expression nodes. Parentheses the user wrote are kept ({@link Group}), so that what shows a
 * formula can show it as written; what computes with it looks through them ({@link #inner}).
 */
public sealed interface Expr {
    Span span();

    /** The expression inside any parentheses around it. */
    static Expr inner(Expr e) {
        while (e instanceof Group g) e = g.inner();
        return e;
    }

    /**
     * {@code ( inner )}. {@code span} is the inner expression's, what a finding about the value
     * points at; {@code written} covers the parentheses too, for what shows the formula as written.
     */
    record Group(Span span, Span written, Expr inner) implements Expr {
    }

    /** A number with an optional unit written right after it: {@code 1.2 kg/m^3}. */
    record Quantity(Span span, double number, String numberText, UnitText unit) implements Expr {
    }

    record Reference(Span span, String name) implements Expr {
    }

    record Call(Span span, Ident callee, List<Expr> args) implements Expr {
        public Call {
            args = List.copyOf(args);
        }
    }

    record Unary(Span span, Op op, Expr operand) implements Expr {
    }

    record Binary(Span span, Op op, Expr left, Expr right) implements Expr {
    }

    /**
     * A piecewise formula, the whole right side of a definition or function: the first piece whose
     * {@code when} condition holds gives the value; an {@code otherwise} piece, last, has none.
     */
    record Piecewise(Span span, List<Statement.Piece> pieces) implements Expr {
        public Piecewise {
            pieces = List.copyOf(pieces);
        }
    }

    enum Op {
        ADD("+"), SUBTRACT("-"), MULTIPLY("*"), DIVIDE("/"), POWER("^"), NEGATE("-"), PLUS("+");

        private final String symbol;

        Op(String symbol) {
            this.symbol = symbol;
        }

        public String symbol() {
            return symbol;
        }
    }
}
