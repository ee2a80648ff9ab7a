package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;

/** One line of a document's results, in source order: what `plumb eval` and reports show. */
public sealed interface Row {
    Span span();

    record SectionRow(Span span, String title) implements Row {
    }

    record NarrativeRow(Span span, String text) implements Row {
    }

    /**
     * A defined value. {@code display} is the unit it is shown in (null when unknown: the layers
     * that show values then use SI), and {@code statement} the statement that defines it (a
     * definition, a solve statement, or a broken line), whose spans say where its formula and its
     * `in` unit are written; {@code spread} how far it may lie from its value (null when no
     * tolerance or stated accuracy reaches it); {@code modelForm} the values the other valid
     * entries of its correlation's family give (null when there are none). The engine does not word it: the layers that show
     * things do.
     */
    record ValueRow(Span span, String name, boolean input, Value value, String basis, String note,
                    Origin origin, Solution solution, dev.plumb.units.Unit display, dev.plumb.syntax.Statement statement,
                    Spread spread, ModelForm modelForm)
        implements Row {

        /** A value with no spread (none of the sources of one reaches it). */
        public ValueRow(Span span, String name, boolean input, Value value, String basis, String note, Origin origin,
                        Solution solution, dev.plumb.units.Unit display, dev.plumb.syntax.Statement statement) {
            this(span, name, input, value, basis, note, origin, solution, display, statement, null, null);
        }

        /** This row with a spread. */
        ValueRow withSpread(Spread s) {
            return new ValueRow(span, name, input, value, basis, note, origin, solution, display, statement, s, modelForm);
        }

        /** This row with the model-form range of its correlation's family. */
        ValueRow withModelForm(ModelForm m) {
            return new ValueRow(span, name, input, value, basis, note, origin, solution, display, statement, spread, m);
        }

        /** The formula as written, for a definition; null for a solved value or a broken line. */
        public dev.plumb.syntax.Expr formula() {
            return statement instanceof dev.plumb.syntax.Statement.Definition d ? d.expr() : null;
        }

        /** Where the `in` unit is written, or null when none is. */
        public dev.plumb.syntax.UnitText displayUnitWritten() {
            if (statement instanceof dev.plumb.syntax.Statement.Definition d) return d.displayUnit();
            if (statement instanceof dev.plumb.syntax.Statement.Seek s) return s.displayUnit();
            return null;
        }
    }

    /** What a callable row defines. */
    enum Callable {
        FUNCTION, CORRELATION, TABLE;

        /** The word for people: "function", "correlation", "table". */
        public String word() {
            return name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    /** A function, correlation or table column. */
    record FunctionRow(Span span, String signature, Callable kind, String note) implements Row {
    }

    /**
     * A check. {@code source} is its comparison as written (shortened); {@code values} the value of
     * each side, in order, with the {@code comparators} between them, to be shown in {@code unit}
     * to {@code digits} significant figures (enough that a failing pair does not read the same).
     * Values and unit are empty/null when the check was not judged. For a check {@code with spread},
     * {@code spreads} holds each side's spread in SI (empty otherwise).
     */
    record CheckRow(Span span, String source, Verdict verdict, java.util.List<Value> values,
                    java.util.List<dev.plumb.syntax.Comparator> comparators, dev.plumb.units.Unit unit, int digits,
                    String note, java.util.List<Double> spreads) implements Row {
        public CheckRow {
            values = java.util.List.copyOf(values);
            comparators = java.util.List.copyOf(comparators);
            spreads = java.util.List.copyOf(spreads);
        }

        /** A check judged on its sides' values alone. */
        public CheckRow(Span span, String source, Verdict verdict, java.util.List<Value> values,
                        java.util.List<dev.plumb.syntax.Comparator> comparators, dev.plumb.units.Unit unit, int digits,
                        String note) {
            this(span, source, verdict, values, comparators, unit, digits, note, java.util.List.of());
        }

        /** A check that was not judged, for the given reason. */
        static CheckRow unjudged(Span span, String source, Verdict why, String note) {
            return new CheckRow(span, source, why, java.util.List.of(), java.util.List.of(), null, 0, note);
        }

        /** True passed, false failed, null not evaluated. */
        public Boolean passed() {
            return verdict == Verdict.PASSED ? Boolean.TRUE
                : verdict == Verdict.FAILED || verdict == Verdict.FAILS_AT_BOUND ? Boolean.FALSE : null;
        }
    }

    /** A check's outcome; every verdict but the first three means it was not evaluated, and why. */
    enum Verdict {
        PASSED, FAILED,
        /** Holds for the values but not at their bounds (a check `with spread`): a failure of its own kind. */
        FAILS_AT_BOUND,
        /** Stopped by the run's budget. */
        STOPPED,
        /** A value it needs is unknown. */
        VALUE_UNKNOWN,
        /** Its sides differ in dimension. */
        DIMENSIONS_DIFFER,
        /** A temperature point is compared with a temperature difference. */
        POINT_AND_DIFFERENCE
    }

    /**
     * A sweep: the calc evaluated again for each value of {@code varied}, shown in {@code unit}.
     * {@code columns} are the results shown, {@code checks} the document's checks (as written), and
     * each {@link SweepLine} one value of the sweep with its results in column order; a grid also
     * varies {@code across} (null for a one-way sweep), each line one pair of values. The rows
     * that ran out of the run's budget are not here: {@code stopped} says the sweep was cut short.
     * The engine does not word it: {@code dev.plumb.present.SweepText} does.
     */
    record SweepRow(Span span, String varied, dev.plumb.units.Unit unit, SweepColumn across,
                    java.util.List<SweepColumn> columns, java.util.List<String> checks, java.util.List<SweepLine> lines,
                    boolean stopped, String note)
        implements Row {
        public SweepRow {
            columns = java.util.List.copyOf(columns);
            checks = java.util.List.copyOf(checks);
            lines = java.util.List.copyOf(lines);
        }
    }

    /** A result a sweep shows, in {@code unit} (null: SI of its dimension). */
    record SweepColumn(String name, dev.plumb.units.Unit unit) {
    }

    /**
     * One value of a sweep: the value given (and, in a grid, the second value, else null), each shown result (unknown where it could not be
     * computed), each check's verdict (in the order of {@link SweepRow#checks}), the definitions
     * whose correlation calls lie outside a stated range here, and the first other finding of
     * this row that the base calc does not have (null when none).
     */
    record SweepLine(Value given, Value across, java.util.List<Value> results, java.util.List<Verdict> verdicts,
                     java.util.List<String> outside, String trouble) {
        public SweepLine {
            results = java.util.List.copyOf(results);
            verdicts = java.util.List.copyOf(verdicts);
            outside = java.util.List.copyOf(outside);
        }

        /** Whether every check was judged and passed here. */
        public boolean allPass() {
            return verdicts.stream().allMatch(v -> v == Verdict.PASSED);
        }

        /** Whether a check failed here. */
        public boolean anyFails() {
            return verdicts.contains(Verdict.FAILED) || verdicts.contains(Verdict.FAILS_AT_BOUND);
        }
    }

    /**
     * A case: the calc evaluated again with {@code given} values in place of their definitions.
     * {@code changed} holds every own value that differs from the base (the given ones first),
     * each with its base value; {@code checks} are the document's checks judged under the case.
     * Worded by {@code dev.plumb.present.CaseText}.
     */
    record CaseRow(Span span, String name, java.util.List<CaseValue> given, java.util.List<CaseValue> changed,
                   java.util.List<CheckRow> checks, String note) implements Row {
        public CaseRow {
            given = java.util.List.copyOf(given);
            changed = java.util.List.copyOf(changed);
            checks = java.util.List.copyOf(checks);
        }
    }

    /** A value under a case beside its base value, shown in {@code display} (null: SI). */
    record CaseValue(String name, Value base, Value value, dev.plumb.units.Unit display) {
    }
}
