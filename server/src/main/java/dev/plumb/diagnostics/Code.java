package dev.plumb.diagnostics;

/**
 * Every diagnostic code Plumb reports. The ids are stable: tools and reviewers filter on them.
 * docs/diagnostics.md documents each one with an example; a test keeps the two in step.
 */
public enum Code {
    SYNTAX_ERROR("syntax.error", Severity.ERROR),
    SYNTAX_NESTING("syntax.nesting", Severity.ERROR),
    SYNTAX_RENAMED("syntax.renamed", Severity.ERROR),
    FILE_NOT_TEXT("file.not-text", Severity.ERROR),
    FILE_UNREADABLE("file.unreadable", Severity.ERROR),
    UNIT_UNKNOWN("unit.unknown", Severity.ERROR),
    UNIT_MISMATCH("unit.mismatch", Severity.ERROR),
    UNIT_NOT_DIMENSIONLESS("unit.not-dimensionless", Severity.ERROR),
    UNIT_FRACTIONAL_POWER("unit.fractional-power", Severity.ERROR),
    UNIT_TEMPERATURE_SUM("unit.temperature-sum", Severity.ERROR),
    UNIT_BARE_ANGLE("unit.bare-angle", Severity.WARNING),
    UNIT_HAND_CONVERSION("unit.hand-conversion", Severity.WARNING),
    UNIT_ALSO_A_NAME("unit.also-a-name", Severity.HINT),
    NAME_UNKNOWN("name.unknown", Severity.ERROR),
    NAME_DUPLICATE("name.duplicate", Severity.ERROR),
    NAME_CYCLE("name.cycle", Severity.ERROR),
    NAME_KIND("name.kind", Severity.ERROR),
    CALL_ARITY("call.arity", Severity.ERROR),
    MATH_DIVISION_BY_ZERO("math.division-by-zero", Severity.ERROR),
    MATH_DOMAIN("math.domain", Severity.ERROR),
    MATH_NOT_FINITE("math.not-finite", Severity.ERROR),
    CHECK_FAILED("check.failed", Severity.ERROR),
    CHECK_NOT_EVALUATED("check.not-evaluated", Severity.ERROR),
    RANGE_OUTSIDE("range.outside", Severity.WARNING),
    RANGE_REGIME("range.regime", Severity.WARNING),
    RANGE_NO_FORMULA("range.no-formula", Severity.ERROR),
    RANGE_TRANSITION_NAME("range.transition-name", Severity.WARNING),
    SOLVE_NO_ROOT("solve.no-root", Severity.ERROR),
    SOLVE_NOT_CONVERGED("solve.not-converged", Severity.ERROR),
    SOLVE_MULTIPLE_ROOTS("solve.multiple-roots", Severity.WARNING),
    SOLVE_NOT_EVALUATED("solve.not-evaluated", Severity.ERROR),
    SOLVE_COUNT_MISMATCH("solve.count-mismatch", Severity.ERROR),
    SOLVE_SINGULAR("solve.singular", Severity.ERROR),
    SOLVE_OUTSIDE_BRACKET("solve.outside-bracket", Severity.ERROR),
    MOTION_COUNT_MISMATCH("motion.count-mismatch", Severity.ERROR),
    MOTION_NOT_EVALUATED("motion.not-evaluated", Severity.ERROR),
    MOTION_STOPS_AT_START("motion.stops-at-start", Severity.WARNING),
    MOTION_NO_STOP("motion.no-stop", Severity.ERROR),
    MOTION_STEP_COLLAPSE("motion.step-collapse", Severity.ERROR),
    INPUT_UNUSED("input.unused", Severity.HINT),
    BASIS_UNKNOWN("basis.unknown", Severity.ERROR),
    BASIS_AREA("basis.area", Severity.WARNING),
    BASIS_DENSITY("basis.density", Severity.WARNING),
    BLOCK_INVALID("block.invalid", Severity.ERROR),
    USE_NOT_FOUND("use.not-found", Severity.ERROR),
    USE_CYCLE("use.cycle", Severity.ERROR),
    USE_OUTSIDE_WORKSPACE("use.outside-workspace", Severity.ERROR),
    USE_HAS_ERRORS("use.has-errors", Severity.ERROR),
    LIMIT_BUDGET("limit.budget", Severity.ERROR),
    LIMIT_MEMORY("limit.memory", Severity.ERROR),
    ACCEPT_INVALID("accept.invalid", Severity.ERROR),
    ACCEPT_STALE("accept.stale", Severity.WARNING),
    SWEEP_INVALID("sweep.invalid", Severity.ERROR),
    SWEEP_RANGE("sweep.range", Severity.WARNING),
    SWEEP_CHECK_FAILED("sweep.check-failed", Severity.WARNING),
    SWEEP_ROW_FINDINGS("sweep.row-findings", Severity.WARNING),
    CASE_INVALID("case.invalid", Severity.ERROR),
    CASE_NO_CHANGE("case.no-change", Severity.WARNING),
    TOLERANCE_INVALID("tolerance.invalid", Severity.ERROR),
    TOLERANCE_NOT_PROPAGATED("tolerance.not-propagated", Severity.WARNING),
    CHECK_FAILS_AT_BOUND("check.fails-at-bound", Severity.ERROR),
    TOLERANCE_SAMPLES_FAILED("tolerance.samples-failed", Severity.WARNING);

    private final String id;
    private final Severity severity;

    Code(String id, Severity severity) {
        this.id = id;
        this.severity = severity;
    }

    public String id() {
        return id;
    }

    public Severity severity() {
        return severity;
    }

    @Override
    public String toString() {
        return id;
    }
}
