package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The studies of a document (its sweeps and cases), run after the real run and its checks, in
 * source order, each through the one {@link StudyRun}; each study statement's row, by identity.
 * A study's findings are not a base finding for those after it.
 */
final class Studies {
    private Studies() {
    }

    static Map<Statement, Row> run(List<Statement> statements, StudyRun study, Map<String, Statement> own, Scope scope,
                                   Reporter reporter, String text, UnitRegistry units, Budget budget, int digits,
                                   java.nio.file.Path file) {
        Map<Statement, Row> rows = new IdentityHashMap<>();
        SweepRunner sweeps = null;
        CaseRunner cases = null;
        List<dev.plumb.diagnostics.Diagnostic> base = reporter.all();
        for (Statement s : statements) {
            if (s instanceof Statement.Case c) {
                if (cases == null) {
                    cases = new CaseRunner(study, own, statements, scope, base, reporter, text, units, budget, digits, file);
                }
                try {
                    budget.nextStatement();
                    rows.put(s, cases.run(c));
                } catch (Budget.Exhausted e) {
                    reporter.report(Code.LIMIT_BUDGET, c.name().span(), "this case was stopped: "
                        + (e.limit == Budget.Limit.TIME ? "the run's " + Budget.SECONDS + " s are up" : "its values need "
                        + "more work than any calc does") + "; look for a formula that does repeated work");
                    rows.put(s, new Row.CaseRow(c.span(), c.name().text(), List.of(), List.of(), List.of(), c.note()));
                }
                continue;
            }
            if (!(s instanceof Statement.Sweep w)) continue;
            if (sweeps == null) {
                sweeps = new SweepRunner(study, own, statements, scope, base, reporter, text, units, budget, digits);
            }
            try {
                budget.nextStatement();
                rows.put(s, sweeps.run(w));
            } catch (Budget.Exhausted e) {
                reporter.report(Code.LIMIT_BUDGET, w.name().span(), "this sweep was stopped: "
                    + (e.limit == Budget.Limit.TIME ? "the run's " + Budget.SECONDS + " s are up" : "its range needs more work "
                    + "than any calc does") + "; sweep fewer values, or look for a formula that does repeated work");
                rows.put(s, new Row.SweepRow(w.span(), w.name().text(), null, null, List.of(), List.of(), List.of(), true,
                    w.note()));
            }
        }
        return rows;
    }

    /**
     * Every own value's spread from the tolerances and stated accuracies (none when there are none),
     * within the budget; the checks {@code with spread} are judged at their bounds, their rows in
     * {@code checkRows} replaced.
     */
    static Map<String, Spread> spreads(List<Statement> statements, StudyRun study, Plan plan, Scope scope, Reporter reporter,
                                       String text, UnitRegistry units, Budget budget, Settings settings,
                                       Map<Statement, Row> checkRows) {
        try {
            budget.nextStatement();
            Propagation propagation = new Propagation(study, plan, scope, reporter, text, units, budget);
            Map<String, Spread> out = propagation.sample(propagation.run(statements), settings.samples(), settings.seed());
            for (Statement s : statements) {
                if (s instanceof Statement.Check c && c.withSpread() && checkRows.get(c) instanceof Row.CheckRow row) {
                    checkRows.put(c, MarginCheck.judge(c, row, propagation, reporter, text, settings));
                }
            }
            return out;
        } catch (Budget.Exhausted e) {
            // A check asked to hold with spread cannot be judged without it: never on the values alone in silence.
            for (Statement s : statements) {
                if (s instanceof Statement.Check c && c.withSpread() && checkRows.get(c) instanceof Row.CheckRow row) {
                    checkRows.put(c, Row.CheckRow.unjudged(c.span(), row.source(), Row.Verdict.STOPPED, c.note()));
                }
            }
            reporter.report(Code.LIMIT_BUDGET, new dev.plumb.diagnostics.Span(0, 0), "the tolerances were not carried to "
                + "the values: " + (e.limit == Budget.Limit.TIME ? "the run's " + Budget.SECONDS + " s are up"
                : "that needs more work than any calc does") + ", so no value shows a ±");
            return Map.of();
        }
    }
}
