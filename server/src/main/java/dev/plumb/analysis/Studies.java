package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The studies of a document (its sweeps), run after the real run and its checks, each through
 * the one {@link StudyRun}; each study statement's row, by identity.
 */
final class Studies {
    private Studies() {
    }

    static Map<Statement, Row> run(List<Statement> statements, StudyRun study, Map<String, Statement> own, Scope scope,
                                   Reporter reporter, String text, UnitRegistry units, Budget budget, int digits) {
        Map<Statement, Row> rows = new IdentityHashMap<>();
        SweepRunner sweeps = null;
        for (Statement s : statements) {
            if (!(s instanceof Statement.Sweep w)) continue;
            if (sweeps == null) {
                sweeps = new SweepRunner(study, own, scope, reporter.all(), reporter, text, units, budget, digits);
            }
            try {
                budget.nextStatement();
                rows.put(s, sweeps.run(w));
            } catch (Budget.Exhausted e) {
                reporter.report(Code.LIMIT_BUDGET, w.name().span(), "this sweep was stopped: "
                    + (e.limit == Budget.Limit.TIME ? "the run's " + Budget.SECONDS + " s are up" : "its range needs more work "
                    + "than any calc does") + "; sweep fewer values, or look for a formula that does repeated work");
                rows.put(s, new Row.SweepRow(w.span(), w.name().text(), null, List.of(), List.of(), List.of(), true,
                    w.note()));
            }
        }
        return rows;
    }
}
