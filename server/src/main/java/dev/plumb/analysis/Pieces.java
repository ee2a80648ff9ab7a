package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * Chooses the piece of a piecewise formula that applies — in a definition, a function or a
 * correlation, with the same checks everywhere: each condition compares like with like, every
 * piece gives one dimension (judged also on the pieces that do not apply here, so a mistake in
 * a branch is found before the day it is taken), and a value no piece covers is a finding.
 */
final class Pieces {
    private final Evaluator eval;
    private final Reporter reporter;
    private final String text;

    Pieces(Evaluator eval, Reporter reporter, String text) {
        this.eval = eval;
        this.reporter = reporter;
        this.text = text;
    }

    /** The piece that applied (null when none did) and the value it gave. */
    record Chosen(Value value, Statement.Piece piece) {
    }

    /**
     * The value of the first piece that applies; UNKNOWN when none does, after handing
     * {@code noneApplies} the false conditions with their values, to report in its own words.
     */
    Chosen choose(List<Statement.Piece> pieces, Consumer<String> noneApplies) {
        List<String> falseConditions = new ArrayList<>();
        for (int i = 0; i < pieces.size(); i++) {
            Statement.Piece piece = pieces.get(i);
            Boolean holds = piece.condition() == null ? Boolean.TRUE : holds(piece.condition(), falseConditions);
            if (holds == null) return new Chosen(Value.UNKNOWN, null);
            if (!holds) continue;
            Value v = eval.eval(piece.expr());
            // A formula whose pieces disagree is wrong whichever applies: its value is unknown.
            if (v.known() && pieces.size() > 1 && !agree(pieces, i, v)) return new Chosen(Value.UNKNOWN, piece);
            return new Chosen(v, piece);
        }
        noneApplies.accept(String.join("; ", falseConditions));
        return new Chosen(Value.UNKNOWN, null);
    }

    /** Whether a condition holds; null (reported) when it cannot be judged. */
    private Boolean holds(Statement.Bound condition, List<String> falseConditions) {
        List<Value> sides = new ArrayList<>();
        for (var operand : condition.operands()) sides.add(eval.eval(operand));
        if (sides.stream().anyMatch(v -> !v.known())) return null;
        for (int k = 0; k < condition.comparators().size(); k++) {
            Value left = sides.get(k);
            Value right = sides.get(k + 1);
            if (!left.dimension().equals(right.dimension())) {
                reporter.report(Code.UNIT_MISMATCH, condition.span(), "this condition compares "
                    + eval.operand(condition.operands().get(k), left) + ", " + left.dimension().describe() + ", with "
                    + eval.operand(condition.operands().get(k + 1), right) + ", " + right.dimension().describe()
                    + ": both sides of a comparison need the same dimension");
                return null;
            }
        }
        for (int k = 0; k < condition.comparators().size(); k++) {
            if (!RangeCheck.holds(sides.get(k).si(), condition.comparators().get(k), sides.get(k + 1).si())) {
                falseConditions.add(describe(condition, sides));
                return false;
            }
        }
        return true;
    }

    /** "AR < 5 (AR = 7)": a false condition with the values it was judged on. */
    private String describe(Statement.Bound condition, List<Value> sides) {
        List<String> values = new ArrayList<>();
        for (int k = 0; k < sides.size(); k++) {
            var operand = condition.operands().get(k);
            if (!(operand instanceof dev.plumb.syntax.Expr.Quantity)) values.add(eval.operand(operand, sides.get(k)));
        }
        String written = Shown.source(text, condition.span());
        return values.isEmpty() ? written + " is false" : written + " is false (" + String.join(", ", values) + ")";
    }

    /**
     * Whether the pieces agree in dimension. Within one run their dimensions depend only on the
     * parameters', so an agreement found once is remembered (a correlation called a thousand
     * times is judged once); a disagreement is judged, and reported, at every call.
     */
    private boolean agree(List<Statement.Piece> pieces, int applying, Value v) {
        List<Object> key = eval.parameterDimensions();
        if (eval.budget().agreed(pieces, applying, key)) return true;
        boolean same = sameDimension(pieces, applying, v);
        if (same) eval.budget().rememberAgreed(pieces, applying, key);
        return same;
    }

    /** Judges the other pieces' dimensions against the one that applies, quietly evaluated. */
    private boolean sameDimension(List<Statement.Piece> pieces, int taken, Value v) {
        Evaluator quiet = eval.quiet();
        for (int j = 0; j < pieces.size(); j++) {
            if (j == taken) continue;
            Statement.Piece other = pieces.get(j);
            Value w = quiet.eval(other.expr());
            if (!w.known() || w.dimension().equals(v.dimension())) continue;
            reporter.report(Code.UNIT_MISMATCH, other.expr().span(), "the pieces of this formula differ in dimension: "
                + Shown.source(text, other.expr().span()) + " is " + w.dimension().describe() + ", but "
                + Shown.source(text, pieces.get(taken).expr().span()) + ", the piece that applies here, is "
                + v.dimension().describe() + ": every piece must give the same dimension");
            return false;
        }
        return true;
    }
}
