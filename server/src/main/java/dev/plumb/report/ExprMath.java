package dev.plumb.report;

import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * Walks one expression tree into MathML, every node kind in one place. The layout choices:
 * <ul>
 *   <li>Division is a fraction. A chain {@code a/b/c} is one fraction, a over b⋅c, as the
 *       language reads a chain of divisions and as a unit chain is read; {@code a*b/c} is a⋅b over
 *       c and {@code a/b*c} the fraction a over b, times c, as written.</li>
 *   <li>Inside a superscript, division stays on the line ({@code Re^(-2/3)} is Re to the −2/3),
 *       since a fraction there would be too small to read.</li>
 *   <li>The user's own brackets are kept, except round a whole numerator, denominator or
 *       exponent: there the layout already shows the grouping.</li>
 *   <li>Brackets the tree needs but the user did not write (a value with a unit raised to a
 *       power, a negative value after an operator) are added; products show a dot, always, as
 *       names of several letters would otherwise run together.</li>
 *   <li>{@code sqrt(x)} is a root sign and {@code abs(x)} is |x|; {@code x^0.5} stays a power, as
 *       written. Other function names are upright, followed by their arguments in brackets.</li>
 * </ul>
 */
final class ExprMath {
    private final UnitMath units;
    private final ValueSource values;

    ExprMath(UnitMath units, ValueSource values) {
        this.units = units;
        this.values = values;
    }

    Fragment of(Expr e) {
        return of(e, false);
    }

    /** {@code a < b ≤ c}: a check, a piece's condition, a valid range. */
    String comparison(List<Expr> operands, List<Comparator> comparators) {
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < operands.size(); i++) {
            if (i > 0) parts.add(MathElements.mo(symbol(comparators.get(i - 1))));
            parts.add(of(operands.get(i)).markup());
        }
        return MathElements.row(parts.toArray(String[]::new));
    }

    private Fragment of(Expr e, boolean script) {
        if (e instanceof Expr.Group g) return Fragment.atom(MathElements.fenced("(", of(g.inner(), script).markup(), ")"));
        if (e instanceof Expr.Quantity q) return units.quantity(NumberMath.of(q.numberText()), q.unit() == null ? null : q.unit().text());
        if (e instanceof Expr.Reference r) return reference(r.name());
        if (e instanceof Expr.Call c) return call(c, script);
        if (e instanceof Expr.Unary u) return unary(u, script);
        if (e instanceof Expr.Binary b) return binary(b, script);
        if (e instanceof Expr.Piecewise p) return piecewise(p, script);
        throw new IllegalArgumentException("an expression kind the typesetter does not know: " + e.getClass().getSimpleName());
    }

    /** Where the layout itself groups (a numerator, an exponent), without the user's brackets. */
    private String laidOut(Expr e, boolean script) {
        return of(Expr.inner(e), script).markup();
    }

    private Fragment reference(String name) {
        return values.find(name)
            .map(v -> units.quantity(NumberMath.of(v.number()), v.unit()))
            .orElseGet(() -> Fragment.atom(SymbolMath.of(name)));
    }

    private Fragment call(Expr.Call c, boolean script) {
        String name = c.callee().text();
        List<Expr> args = c.args();
        if (args.size() == 1 && name.equals("sqrt")) return Fragment.atom(MathElements.sqrt(of(args.get(0), script).markup()));
        if (args.size() == 1 && name.equals("abs")) {
            return Fragment.atom(MathElements.fenced("|", of(args.get(0), script).markup(), "|"));
        }
        String shownName = name.equals("log10") ? MathElements.sub(MathElements.upright("log"), MathElements.mn("10"))
            : MathElements.upright(name);
        List<String> list = new ArrayList<>();
        for (Expr arg : args) {
            if (!list.isEmpty()) list.add(MathElements.mo(",", "0", "0.2"));
            list.add(of(arg, script).markup());
        }
        String arguments = MathElements.fenced("(", MathElements.row(list.toArray(String[]::new)), ")");
        return Fragment.atom(MathElements.row(shownName, MathElements.APPLY_FUNCTION, arguments));
    }

    private Fragment unary(Expr.Unary u, boolean script) {
        String sign = u.op() == Expr.Op.NEGATE ? "−" : "+";
        Fragment operand = of(u.operand(), script).bracketedBelow(Fragment.SCALED, false);
        return new Fragment(MathElements.row(MathElements.mo(sign), operand.markup()), Fragment.UNARY, true);
    }

    private Fragment binary(Expr.Binary b, boolean script) {
        return switch (b.op()) {
            case ADD, SUBTRACT -> {
                Fragment left = of(b.left(), script).bracketedBelow(Fragment.SUM, true);
                Fragment right = of(b.right(), script).bracketedBelow(Fragment.PRODUCT, false);
                String op = b.op() == Expr.Op.ADD ? "+" : "−";
                yield new Fragment(MathElements.row(left.markup(), MathElements.mo(op), right.markup()), Fragment.SUM, left.signed());
            }
            case MULTIPLY -> product(of(b.left(), script), of(b.right(), script));
            case DIVIDE -> script ? inlineQuotient(of(b.left(), true), of(b.right(), true)) : fraction(b);
            case POWER -> {
                Fragment base = of(b.left(), script).bracketedBelow(Fragment.ATOM, false);
                yield new Fragment(MathElements.sup(base.markup(), laidOut(b.right(), true)), Fragment.POWER, false);
            }
            default -> throw new IllegalArgumentException("not a binary operator: " + b.op());
        };
    }

    /** {@code left ⋅ right}; a value with a unit may stand on the right without brackets. */
    private static Fragment product(Fragment l, Fragment r) {
        Fragment left = l.bracketedBelow(Fragment.PRODUCT, true);
        Fragment right = r.bracketedBelow(Fragment.SCALED, false);
        return new Fragment(MathElements.row(left.markup(), MathElements.mo("⋅"), right.markup()), Fragment.PRODUCT, left.signed());
    }

    /** {@code a/b} on the line, for an exponent: the solidus sits close, as in a printed exponent. */
    private static Fragment inlineQuotient(Fragment l, Fragment r) {
        Fragment left = l.bracketedBelow(Fragment.PRODUCT, true);
        Fragment right = r.bracketedBelow(Fragment.POWER, false);
        String markup = MathElements.row(left.markup(), MathElements.mo("/", "0", "0"), right.markup());
        return new Fragment(markup, Fragment.PRODUCT, left.signed());
    }

    /** A division, with a chain of divisions to its left gathered into one denominator. */
    private Fragment fraction(Expr.Binary b) {
        List<Expr> denominators = new ArrayList<>();
        Expr numerator = b;
        while (numerator instanceof Expr.Binary d && d.op() == Expr.Op.DIVIDE) {
            denominators.add(0, d.right());
            numerator = d.left();
        }
        String below;
        if (denominators.size() == 1) {
            below = laidOut(denominators.get(0), false);
        } else {
            Fragment product = of(denominators.get(0), false);
            for (int i = 1; i < denominators.size(); i++) product = product(product, of(denominators.get(i), false));
            below = product.markup();
        }
        return new Fragment(MathElements.frac(laidOut(numerator, false), below), Fragment.POWER, false);
    }

    /** The pieces one under another after a brace, each with its condition. */
    private Fragment piecewise(Expr.Piecewise p, boolean script) {
        List<Statement.Piece> pieces = p.pieces();
        if (pieces.size() == 1 && pieces.get(0).condition() == null) return of(pieces.get(0).expr(), script);
        StringBuilder rows = new StringBuilder();
        for (Statement.Piece piece : pieces) {
            String when = piece.condition() == null ? MathElements.mtext("otherwise")
                : MathElements.row(MathElements.mtext("when"), MathElements.space("0.5"),
                    comparison(piece.condition().operands(), piece.condition().comparators()));
            rows.append("<mtr>").append(cell(of(piece.expr(), script).markup())).append(cell(when)).append("</mtr>");
        }
        // Display style: a fraction in a piece is as large as one outside the brace.
        String table = "<mtable displaystyle=\"true\" columnalign=\"left left\">" + rows + "</mtable>";
        return Fragment.atom(MathElements.row(MathElements.mo("{"), table));
    }

    /** A table cell set flush left; the style does it where the column attribute is not read. */
    private static String cell(String content) {
        return "<mtd style=\"text-align: left\">" + content + "</mtd>";
    }

    private static String symbol(Comparator c) {
        return switch (c) {
            case LT -> "<";
            case LE -> "≤";
            case GT -> ">";
            case GE -> "≥";
            case EQ -> "=";
            case NE -> "≠";
        };
    }
}
