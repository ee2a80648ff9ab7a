package dev.plumb.analysis;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * What the runners of the study statements (`case`, `sweep`) share: the study run, the document's
 * own statements, where findings go, the budget, and the real run's findings, so that a study
 * tells only what its own runs found anew.
 */
abstract class StudyRunner {
    protected final StudyRun study;
    protected final Map<String, Statement> own;
    /** The document's statements: a run's checks `with spread` are judged at that run's own spreads. */
    protected final List<Statement> statements;
    protected final Scope scope;
    protected final Reporter reporter;
    protected final String text;
    protected final UnitRegistry units;
    protected final Budget budget;
    protected final int digits;
    /** The real run's findings, by code and place. */
    private final Set<List<Object>> baseFindings = new HashSet<>();

    StudyRunner(StudyRun study, Map<String, Statement> own, List<Statement> statements, Scope scope, List<Diagnostic> base,
                Reporter reporter, String text, UnitRegistry units, Budget budget, int digits) {
        this.study = study;
        this.own = own;
        this.statements = statements;
        this.scope = scope;
        this.reporter = reporter;
        this.text = text;
        this.units = units;
        this.budget = budget;
        this.digits = digits;
        for (Diagnostic d : base) baseFindings.add(List.of(d.code(), d.span()));
    }

    /** Whether the real run found {@code d} already (the same code at the same place). */
    protected final boolean inBase(Diagnostic d) {
        return baseFindings.contains(List.of(d.code(), d.span()));
    }

    /** An evaluator over the real run's values: for a study's own expressions (a sweep's ends, a case's right sides). */
    protected final Evaluator overBase() {
        return new Evaluator(scope, study.base(), Map.of(), reporter, text, units, budget);
    }
}
