package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * Judges a check {@code with spread} at its sides' bounds: each side moved by its spread the way
 * that works against the comparison ({@code a <= b}: a at its upper bound, b at its lower), so the
 * check holds for every value within the spreads to first order. {@code ==} and {@code !=} have no
 * unfavourable way and are judged on the values. A check that holds for the values but not at the
 * bounds is a verdict of its own ({@link Row.Verdict#FAILS_AT_BOUND}, {@code check.fails-at-bound});
 * one whose spread cannot be computed is not judged ({@code check.not-evaluated}).
 */
final class MarginCheck {
    private MarginCheck() {
    }

    static Row.CheckRow judge(Statement.Check c, Row.CheckRow row, Propagation propagation, Reporter reporter, String text,
                              Settings settings) {
        if (row.verdict() != Row.Verdict.PASSED && row.verdict() != Row.Verdict.FAILED) return row;
        List<Double> spreads = new ArrayList<>();
        for (var e : c.operands()) {
            Double u = propagation.spreadOf(e);
            if (u == null) {
                reporter.report(Code.CHECK_NOT_EVALUATED, c.span(), "this check is asked to hold with spread, but the spread "
                    + "of " + Shown.source(text, e.span()) + " could not be computed (see the finding that says why), so it "
                    + "neither passes nor fails at its bounds");
                return Row.CheckRow.unjudged(c.span(), row.source(), Row.Verdict.VALUE_UNKNOWN, c.note());
            }
            spreads.add(u);
        }
        Row.CheckRow withSpreads = new Row.CheckRow(c.span(), row.source(), row.verdict(), row.values(), row.comparators(),
            row.unit(), row.digits(), row.note(), spreads);
        if (row.verdict() == Row.Verdict.FAILED) return withSpreads;
        List<String> failures = new ArrayList<>();
        for (int i = 0; i < c.comparators().size(); i++) {
            Comparator op = c.comparators().get(i);
            double sign = switch (op) {
                case LT, LE -> 1;
                case GT, GE -> -1;
                default -> 0;
            };
            Value a = row.values().get(i);
            Value b = row.values().get(i + 1);
            double atA = a.si() + sign * spreads.get(i);
            double atB = b.si() - sign * spreads.get(i + 1);
            if (!RangeCheck.holds(atA, op, atB, settings.equalityTolerance())) {
                failures.add(bound(c, i, a, atA, row, text) + " is not " + op.symbol() + " " + bound(c, i + 1, b, atB, row, text));
            }
        }
        if (failures.isEmpty()) return withSpreads;
        String why = c.note() == null ? "" : " (" + c.note() + ")";
        reporter.report(Code.CHECK_FAILS_AT_BOUND, c.span(), "check holds for the values but not at their bounds: "
            + String.join("; ", failures) + why + "; the design needs more margin, or the inputs tighter tolerances");
        return new Row.CheckRow(c.span(), row.source(), Row.Verdict.FAILS_AT_BOUND, row.values(), row.comparators(),
            row.unit(), row.digits(), row.note(), spreads);
    }

    /** "M_base at its upper bound, 0.622 kN·m"; a side without spread is its value alone. */
    private static String bound(Statement.Check c, int i, Value v, double at, Row.CheckRow row, String text) {
        String shown = Shown.value(new Value(at, v.dimension(), v.temperature()), row.unit(), row.digits());
        if (at == v.si()) return shown;
        return Shown.source(text, c.operands().get(i).span()) + " at its " + (at > v.si() ? "upper" : "lower")
            + " bound, " + shown;
    }
}
