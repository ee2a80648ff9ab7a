package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Runs one {@code sweep}: works out its values, evaluates the document again for each through
 * the {@link StudyRun}, and makes its {@link Row.SweepRow}. What the rows found is told once for
 * the sweep, not once per row: the rows outside a correlation's range ({@code sweep.range}), the
 * rows where a check fails ({@code sweep.check-failed}) and the rows with any other new finding
 * ({@code sweep.row-findings}), each naming the rows.
 */
final class SweepRunner extends StudyRunner {
    /** The most rows one sweep may have: far more than a table or a plot can show. */
    static final int MAX_ROWS = 10_000;
    /** Relative slack when a whole number of steps reaches the end, so 0.1 steps from 0 reach 1. */
    private static final double REACH = 1e-9;

    /** The second value of the grid being run and its unit, for naming its rows; null in a one-way sweep. */
    private String acrossName;
    private Unit acrossUnit;

    SweepRunner(StudyRun study, Map<String, Statement> own, List<Statement> statements, Scope scope, List<Diagnostic> base,
                Reporter reporter, String text, UnitRegistry units, Budget budget, int digits) {
        super(study, own, statements, scope, base, reporter, text, units, budget, digits);
    }

    /** The sweep's row; one whose values cannot be made has no lines, and a finding says why. */
    Row.SweepRow run(Statement.Sweep s) {
        String name = s.name().text();
        Evaluator ends = overBase();
        List<Column> columns = columns(s, ends);
        List<String> checkSources = new ArrayList<>();
        Binding.ValueBinding swept = varied(s.name());
        if (swept == null) return empty(s, null, columns, checkSources);
        Values values = values(s.axis(), ends, swept);
        if (values == null) return empty(s, swept.display(), columns, checkSources);
        // A grid: every value of the first with every value of the second.
        Statement.SweepAxis second = s.across();
        String acrossName = second == null ? null : second.name().text();
        Values across = null;
        if (second != null) {
            Binding.ValueBinding other = varied(second.name());
            if (other == null) return empty(s, swept.display(), columns, checkSources);
            if (acrossName.equals(name)) {
                invalid(second.name().span(), "a grid varies two different values: " + name + " is varied already");
                return empty(s, swept.display(), columns, checkSources);
            }
            across = values(second, ends, other);
            if (across == null) return empty(s, swept.display(), columns, checkSources);
            long cells = (long) values.given().size() * across.given().size();
            if (cells > MAX_ROWS) {
                invalid(Span.cover(s.name().span(), second.name().span()), "this grid would have " + String.format(
                    java.util.Locale.ROOT, "%,d", cells) + " rows (" + values.given().size() + " × " + across.given().size()
                    + "), more than the " + String.format(java.util.Locale.ROOT, "%,d", MAX_ROWS) + " a sweep may have: "
                    + "take larger steps or fewer steps");
                return empty(s, swept.display(), columns, checkSources);
            }
        }
        this.acrossName = across == null ? null : acrossName;
        this.acrossUnit = across == null ? null : across.unit();
        List<Value[]> pairs = new ArrayList<>();
        for (Value x : values.given()) {
            if (across == null) pairs.add(new Value[] {x, null});
            else for (Value y : across.given()) pairs.add(new Value[] {x, y});
        }
        List<Row.SweepLine> lines = new ArrayList<>(pairs.size());
        List<Integer> outside = new ArrayList<>();
        List<Integer> failing = new ArrayList<>();
        List<Integer> troubled = new ArrayList<>();
        String firstOutside = null;
        String firstTrouble = null;
        Set<String> failingChecks = new LinkedHashSet<>();
        boolean stopped = false;
        for (Value[] pair : pairs) {
            Value x = pair[0];
            Map<String, Value> given = pair[1] == null ? Map.of(name, x) : Map.of(name, x, acrossName, pair[1]);
            StudyRun.Outcome o = study.withSpreads(study.run(given, true), statements);
            if (o.stopped()) {
                stopped = true;
                break;
            }
            if (checkSources.isEmpty()) o.checks().forEach(c -> checkSources.add(c.source()));
            List<Value> results = new ArrayList<>(columns.size());
            for (Column c : columns) results.add(valueOf(c.name(), o.values()));
            List<Row.Verdict> verdicts = o.checks().stream().map(Row.CheckRow::verdict).toList();
            List<String> outsideHere = new ArrayList<>();
            String trouble = null;
            for (Diagnostic d : o.findings()) {
                if (d.code() == Code.RANGE_OUTSIDE || d.code() == Code.RANGE_REGIME) {
                    String where = definedAt(d.span());
                    if (!outsideHere.contains(where)) outsideHere.add(where);
                    if (firstOutside == null) firstOutside = d.message();
                } else if (d.code() != Code.CHECK_FAILED && d.code() != Code.CHECK_NOT_EVALUATED
                    && d.code() != Code.CHECK_FAILS_AT_BOUND
                    && d.severity() != dev.plumb.diagnostics.Severity.HINT
                    && !inBase(d) && trouble == null) {
                    trouble = definedAt(d.span()) + ": " + d.message();
                }
            }
            int row = lines.size() + 1;
            if (!outsideHere.isEmpty()) outside.add(row);
            if (trouble != null) {
                troubled.add(row);
                if (firstTrouble == null) firstTrouble = trouble;
            }
            for (Row.CheckRow c : o.checks()) {
                if (c.verdict() == Row.Verdict.FAILED) failingChecks.add(c.source());
                if (c.verdict() == Row.Verdict.FAILS_AT_BOUND) failingChecks.add(c.source() + " at its bounds");
            }
            Row.SweepLine line = new Row.SweepLine(x, pair[1], results, verdicts, outsideHere, trouble);
            if (line.anyFails()) failing.add(row);
            lines.add(line);
        }
        Unit unit = values.unit();
        if (stopped) {
            reporter.report(Code.LIMIT_BUDGET, s.name().span(), "this sweep was stopped after " + lines.size() + " of "
                + pairs.size() + " rows: the run's " + Budget.SECONDS + " s are up. Sweep fewer values, or "
                + "look for a formula that does repeated work");
        }
        if (!outside.isEmpty()) {
            reporter.report(Code.SWEEP_RANGE, s.name().span(), rowsWord(name, outside, lines, unit) + (outside.size() == 1
                ? " lies" : " lie") + " outside the stated "
                + "range of a correlation (marked in the table); at the first: " + firstOutside);
        }
        if (!failing.isEmpty()) {
            reporter.report(Code.SWEEP_CHECK_FAILED, s.name().span(), "a check fails at " + rowsWord(name, failing, lines, unit)
                + " (" + String.join("; ", failingChecks) + ")");
        }
        if (!troubled.isEmpty()) {
            reporter.report(Code.SWEEP_ROW_FINDINGS, s.name().span(), "at " + rowsWord(name, troubled, lines, unit)
                + " a value could not be computed or a finding came up that the base calc does not have; at the first, in "
                + firstTrouble);
        }
        Row.SweepColumn acrossColumn = across == null ? null : new Row.SweepColumn(acrossName, across.unit());
        return new Row.SweepRow(s.span(), name, unit, acrossColumn, columns.stream()
            .map(c -> new Row.SweepColumn(c.name(), c.unit())).toList(), checkSources, lines, stopped, s.note());
    }

    /** A shown result and its unit. */
    private record Column(String name, Unit unit) {
    }

    /** The values of the sweep and the unit they read in. */
    private record Values(List<Value> given, Unit unit) {
    }

    private Row.SweepRow empty(Statement.Sweep s, Unit unit, List<Column> columns, List<String> checks) {
        return new Row.SweepRow(s.span(), s.name().text(), unit, null, columns.stream()
            .map(c -> new Row.SweepColumn(c.name(), c.unit())).toList(), checks, List.of(), false, s.note());
    }

    /** The real run's binding of a value the sweep varies; null, after a finding, when it is not one of the calc's own values. */
    private Binding.ValueBinding varied(dev.plumb.syntax.Ident name) {
        Binding.ValueBinding b = study.base().get(name.text());
        if (own.get(name.text()) instanceof Statement.Definition && b != null) return b;
        // A name defined nowhere was reported where it is written (name.unknown): once is enough.
        if (own.containsKey(name.text()) || scope.lookup(name.text()) != null) invalid(name.span(), refusal(name.text()));
        return null;
    }

    private String refusal(String name) {
        Statement st = own.get(name);
        if (st instanceof Statement.Seek) {
            return name + " is solved by its `seek`, so it cannot be given values: sweep an input the equation uses";
        }
        if (st != null && !(st instanceof Statement.Definition)) return name + " is not a value: sweep an input of this calc";
        return name + " is defined in another file: a sweep varies one of the calc's own values (an input, usually)";
    }

    /** The results to show, each in its `in` unit when that fits its dimension, else in the unit it is shown in. */
    private List<Column> columns(Statement.Sweep s, Evaluator ends) {
        List<Column> out = new ArrayList<>();
        for (Statement.Shown shown : s.shown()) {
            String n = shown.name().text();
            Binding b = study.base().get(n) != null ? study.base().get(n) : scope.lookup(n);
            if (b != null && !(b instanceof Binding.ValueBinding)) {
                invalid(shown.name().span(), n + " is not a value: a sweep shows values, such as a force or a speed");
                continue;
            }
            Binding.ValueBinding v = (Binding.ValueBinding) b;
            Unit unit = v == null ? null : v.display();
            if (shown.unit() != null) {
                Unit written = ends.resolveUnit(shown.unit(), false);
                if (written != null && v != null && v.value().known() && !written.dimension().equals(v.value().dimension())) {
                    reporter.report(Code.UNIT_MISMATCH, shown.unit().span(), "`in " + shown.unit().text() + "` shows "
                        + written.dimension().describe() + ", but " + n + " is " + v.value().dimension().describe());
                } else if (written != null) {
                    unit = written;
                }
            }
            out.add(new Column(n, unit));
        }
        return out;
    }

    /** The values to give, from the range; null after a finding when there are none. */
    private Values values(Statement.SweepAxis s, Evaluator ends, Binding.ValueBinding swept) {
        Value from = ends.eval(s.from());
        Value to = ends.eval(s.to());
        Value step = s.step() == null ? null : ends.eval(s.step());
        if (!from.known() || !to.known() || (step != null && !step.known())) return null;
        Span range = Span.cover(s.from().span(), s.to().span());
        if (!from.dimension().equals(to.dimension())) {
            reporter.report(Code.UNIT_MISMATCH, range, "the sweep's ends differ in dimension: " + Shown.value(from) + " is "
                + from.dimension().describe() + ", " + Shown.value(to) + " is " + to.dimension().describe());
            return null;
        }
        Value nominal = swept.value();
        if (nominal.known() && !nominal.dimension().equals(from.dimension())) {
            reporter.report(Code.UNIT_MISMATCH, range, "the sweep gives " + s.name().text() + " values of "
                + from.dimension().describe() + ", but it is " + nominal.dimension().describe());
            return null;
        }
        Unit unit = DisplayChoice.written(s.from(), units);
        if (unit == null) unit = swept.display() != null ? swept.display() : DisplayUnits.defaultFor(from.dimension());
        double a = from.si();
        double b = to.si();
        if (a == b) {
            invalid(range, "the sweep's ends are the same value, " + Shown.value(from, unit, digits) + ": give two different "
                + "ends, FROM .. TO");
            return null;
        }
        List<Double> xs = new ArrayList<>();
        if (step != null) {
            if (!step.dimension().equals(from.dimension())) {
                reporter.report(Code.UNIT_MISMATCH, s.step().span(), "the step is " + step.dimension().describe()
                    + ", but the sweep's ends are " + from.dimension().describe());
                return null;
            }
            if (step.point()) {
                invalid(s.step().span(), "a step is a temperature difference, not a reading on a scale: write it in K "
                    + "(or delta_degF), as `by 5 K`");
                return null;
            }
            double h = step.si();
            if (h == 0 || Math.signum(h) != Math.signum(b - a)) {
                invalid(s.step().span(), h == 0 ? "a step of zero never reaches the end: give a step such as "
                    + "a tenth of the range" : "the step goes away from the end: from " + Shown.value(from, unit, digits)
                    + " to " + Shown.value(to, unit, digits) + " it must be " + (b > a ? "positive" : "negative"));
                return null;
            }
            double n = Math.floor((b - a) / h * (1 + REACH) + REACH) + 1;
            if (n > MAX_ROWS) {
                invalid(s.step().span(), tooMany(n));
                return null;
            }
            for (int i = 0; i < (int) n; i++) xs.add(a + i * h);
        } else {
            int n = s.count();
            if (n < 2 || n > MAX_ROWS) {
                invalid(s.countSpan(), n > MAX_ROWS ? tooMany(n) : "a sweep needs at least 2 values (the two ends), "
                    + "given as a whole number: write `in 7 steps`");
                return null;
            }
            Ident spacing = s.spacing();
            boolean log = spacing != null;
            if (log && !spacing.text().equals("log")) {
                invalid(spacing.span(), "`" + spacing.text() + " steps` is not a spacing: write `in " + n + " steps` for "
                    + "even steps or `in " + n + " log steps` for steps even in the logarithm");
                return null;
            }
            if (log && (a <= 0 || b <= 0)) {
                invalid(range, "log steps need both ends above zero (" + Shown.value(from, unit, digits) + " .. "
                    + Shown.value(to, unit, digits) + "): use even steps, `in " + n + " steps`");
                return null;
            }
            for (int i = 0; i < n; i++) {
                double t = (double) i / (n - 1);
                xs.add(i == n - 1 ? b : log ? a * Math.pow(b / a, t) : a + t * (b - a));
            }
        }
        Value shape = nominal.known() ? nominal : from;
        List<Value> given = new ArrayList<>(xs.size());
        for (double x : xs) {
            given.add(new Value(x, from.dimension(), from.temperature(), shape.notes(), shape.angle()));
        }
        return new Values(given, unit);
    }

    private static String tooMany(double n) {
        return "this sweep would have " + String.format(java.util.Locale.ROOT, "%,.0f", n) + " rows, more than the "
            + String.format(java.util.Locale.ROOT, "%,d", MAX_ROWS) + " a sweep may have: take a larger step or fewer steps";
    }

    private void invalid(Span at, String message) {
        reporter.report(Code.SWEEP_INVALID, at, message);
    }

    /** A shown result in a run's values: an own value from the run, anything else from the scope. */
    private Value valueOf(String name, Environment values) {
        Binding.ValueBinding own = values.get(name);
        if (own != null) return own.value();
        return scope.lookup(name) instanceof Binding.ValueBinding v ? v.value() : Value.UNKNOWN;
    }

    /** The name whose statement holds a place, or "the calc" when none does. */
    private String definedAt(Span at) {
        for (var e : own.entrySet()) {
            Span s = e.getValue().span();
            if (at.start() >= s.start() && at.end() <= s.end()) return e.getKey();
        }
        return "a check";
    }

    /** "rows 1, 2 and 7 (V = 10 m/s, 15 m/s, 40 m/s)": at most six named, then how many more. */
    private String rowsWord(String name, List<Integer> rows, List<Row.SweepLine> lines, Unit unit) {
        List<String> numbers = new ArrayList<>();
        List<String> values = new ArrayList<>();
        for (int i = 0; i < rows.size() && i < 6; i++) {
            numbers.add(String.valueOf(rows.get(i)));
            Row.SweepLine line = lines.get(rows.get(i) - 1);
            String given = Shown.value(line.given(), unit, digits);
            // In a grid each row is a pair: "V = 32 m/s and d = 0.2 m".
            values.add(line.across() == null ? given : name + " = " + given + " and " + acrossName + " = "
                + Shown.value(line.across(), acrossUnit, digits));
        }
        String more = rows.size() > 6 ? " and " + (rows.size() - 6) + " more" : "";
        String listed = acrossName == null ? name + " = " + String.join(", ", values) : String.join("; ", values);
        return (rows.size() == 1 ? "row " : "rows ") + String.join(", ", numbers) + more + " (" + listed
            + (rows.size() > 6 ? ", …" : "") + ")";
    }
}
