package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Carries the tolerances of a document's inputs (`± 2 m/s`, `± 10 %`) and the stated accuracy of
 * the correlations its definitions call to every value, to first order ({@link Spread}). Each
 * source's derivatives come from central differences through the {@link StudyRun}: the document
 * evaluated again with the source a small step below and above its value (solve statements
 * solved again), so a value reached through a solve or a table has its derivative like any
 * other. The step is a thousandth of the source's tolerance (the curvature over it is far below
 * what the first-order estimate neglects anyway), but no less than 10⁻⁸ of the value, so rounding
 * stays small beside it. Where a value cannot be computed on one side (a formula's domain ends
 * there), the other side's one-sided difference is used; on neither, the value has no spread and
 * {@code tolerance.not-propagated} says so.
 */
final class Propagation {
    /** A source of spread: the own value it acts on and its tolerance in SI. */
    private record Source(String name, String label, Spread.Kind kind, Value nominal, double u) {
    }

    /** One source's two runs, kept for the sides of checks `with spread`. */
    private record Runs(Source source, double h, StudyRun.Outcome up, StudyRun.Outcome down) {
    }

    private final List<Runs> runs = new ArrayList<>();
    private final StudyRun study;
    private final Map<String, Statement> own;
    private final List<String> order;
    private final Scope scope;
    private final Reporter reporter;
    private final String text;
    private final UnitRegistry units;
    private final Budget budget;

    Propagation(StudyRun study, Plan plan, Scope scope, Reporter reporter, String text, UnitRegistry units, Budget budget) {
        this.study = study;
        this.own = plan.own();
        this.order = plan.order();
        this.scope = scope;
        this.reporter = reporter;
        this.text = text;
        this.units = units;
        this.budget = budget;
    }

    /** The sources found by {@link #run}. */
    private List<Source> sources = List.of();

    /** Each own value's spread, by name; empty when the document has no tolerance and no stated accuracy. */
    Map<String, Spread> run(List<Statement> statements) {
        sources = sources(statements);
        Map<String, Spread> out = new LinkedHashMap<>();
        if (sources.isEmpty()) return out;
        Map<String, List<Spread.Share>> shares = new LinkedHashMap<>();
        Map<String, String> lost = new LinkedHashMap<>();
        for (Source s : sources) {
            double h = Math.max(s.u() * 1e-3, Math.abs(s.nominal().si()) * 1e-8);
            StudyRun.Outcome up = study.run(Map.of(s.name(), shifted(s.nominal(), h)), false);
            StudyRun.Outcome down = study.run(Map.of(s.name(), shifted(s.nominal(), -h)), false);
            // Values the budget left unknown say nothing about the formulas: stop, and say so once.
            if (up.stopped() || down.stopped()) throw new Budget.Exhausted(Budget.Limit.TIME);
            runs.add(new Runs(s, h, up, down));
            for (String name : order) {
                Binding.ValueBinding base = study.base().get(name);
                if (base == null || !base.value().known()) continue;
                double f0 = base.value().si();
                Double fu = known(up, name);
                Double fd = known(down, name);
                double slope;
                if (name.equals(s.name())) slope = 1;   // the source itself: exactly, not by differences
                else if (fu != null && fd != null) slope = (fu - fd) / (2 * h);
                else if (fu != null) slope = (fu - f0) / h;
                else if (fd != null) slope = (f0 - fd) / h;
                else {
                    lost.putIfAbsent(name, s.label());
                    continue;
                }
                if (slope != 0) shares.computeIfAbsent(name, k -> new ArrayList<>()).add(new Spread.Share(s.label(), s.kind(),
                    slope * s.u()));
            }
        }
        for (var e : shares.entrySet()) {
            if (!lost.containsKey(e.getKey())) out.put(e.getKey(), Spread.of(e.getValue()));
        }
        lost.forEach((name, source) -> reporter.report(Code.TOLERANCE_NOT_PROPAGATED, nameSpan(name), name + " has no ± : "
            + "it could not be computed a small step either side of " + source + " (a formula's domain or a solve's "
            + "bracket ends there), so how far it may lie from its value is not known; look at the formulas between them"));
        return out;
    }

    /** The inputs with a tolerance and the definitions that take a stated accuracy from their correlation. */
    private List<Source> sources(List<Statement> statements) {
        List<Source> out = new ArrayList<>();
        Evaluator amounts = new Evaluator(scope, study.base(), Map.of(), reporter, text, units, budget);
        for (Statement st : statements) {
            if (!(st instanceof Statement.Definition d)) continue;
            // Only a tolerance or a correlation's result (whose origin may state an accuracy) is a
            // source: most definitions are neither, and need no lookups.
            if (d.tolerance() == null && !(Expr.inner(d.expr()) instanceof Expr.Call)) continue;
            if (own.get(d.name().text()) != d) continue;
            Binding.ValueBinding b = study.base().get(d.name().text());
            if (b == null || !b.value().known()) continue;
            Value nominal = b.value();
            if (d.tolerance() != null) {
                Double u = tolerance(d, nominal, amounts);
                if (u != null && u > 0) out.add(new Source(d.name().text(), d.name().text(), Spread.Kind.TOLERANCE, nominal, u));
            }
            if (b.origin() != null && b.origin().accuracy() != null && nominal.si() != 0) {
                out.add(new Source(d.name().text(), "accuracy of " + b.origin().correlation() + " (" + d.name().text() + ")",
                    Spread.Kind.ACCURACY, nominal, Math.abs(nominal.si()) * b.origin().accuracy()));
            }
        }
        return out;
    }

    /** An input's tolerance in SI: a percentage of its value, or an amount of its dimension; null after a finding. */
    private Double tolerance(Statement.Definition d, Value nominal, Evaluator amounts) {
        Expr amount = d.tolerance().amount();
        Value t = amounts.eval(amount);
        if (!t.known()) return null;
        String name = d.name().text();
        boolean percent = Expr.inner(amount) instanceof Expr.Quantity q && q.unit() != null && q.unit().text().equals("%");
        if (t.si() < 0) {
            reporter.report(Code.TOLERANCE_INVALID, d.tolerance().span(), "a tolerance is how far either way " + name
                + " may lie, so it is not negative: write `± " + Shown.source(text, amount.span()).replaceFirst("^-\\s*", "")
                + "`");
            return null;
        }
        if (percent) return Math.abs(nominal.si()) * t.si();
        if (!t.dimension().equals(nominal.dimension())) {
            reporter.report(Code.UNIT_MISMATCH, amount.span(), "the tolerance is " + t.dimension().describe() + ", but "
                + name + " is " + nominal.dimension().describe() + (nominal.dimensionless()
                    ? ": give it as a plain number, or as a percentage of the value (`± 10 %`)"
                    : ": give it in a unit of " + name + ", or as a percentage of the value (`± 10 %`)"));
            return null;
        }
        if (nominal.dimension().equals(Dimension.TEMPERATURE) && t.point()) {
            reporter.report(Code.TOLERANCE_INVALID, amount.span(), "a tolerance on a temperature is a difference, not a "
                + "reading on a scale: write it in K (`± 2 K`)");
            return null;
        }
        return t.si();
    }

    private static Value shifted(Value v, double by) {
        return new Value(v.si() + by, v.dimension(), v.temperature(), v.notes(), v.angle());
    }

    private static Double known(StudyRun.Outcome o, String name) {
        Binding.ValueBinding b = o.values().get(name);
        return b != null && b.value().known() && Double.isFinite(b.value().si()) ? b.value().si() : null;
    }

    private dev.plumb.diagnostics.Span nameSpan(String name) {
        return DeclarationPass.definedName(own.get(name)).span();
    }

    /**
     * The spread of an expression (a side of a check {@code with spread}) from the runs made by
     * {@link #run}, the same way as a value's; null when it cannot be computed on either side of a
     * source. Zero when no source reaches it (or there is none).
     */
    Double spreadOf(Expr e) {
        double sum = 0;
        Evaluator base = new Evaluator(scope, study.base(), Map.of(), Reporter.discarding(), text, units, budget);
        Value v0 = base.eval(e);
        if (!v0.known()) return null;
        for (Runs r : runs) {
            Double fu = side(e, r.up());
            Double fd = side(e, r.down());
            double slope;
            if (fu != null && fd != null) slope = (fu - fd) / (2 * r.h());
            else if (fu != null) slope = (fu - v0.si()) / r.h();
            else if (fd != null) slope = (v0.si() - fd) / r.h();
            else return null;
            sum += slope * r.source().u() * slope * r.source().u();
        }
        return Math.sqrt(sum);
    }

    private Double side(Expr e, StudyRun.Outcome o) {
        Value v = new Evaluator(scope, o.values(), Map.of(), Reporter.discarding(), text, units, budget).eval(e);
        return v.known() && Double.isFinite(v.si()) ? v.si() : null;
    }

    /**
     * A Monte Carlo estimate for each value that has a spread: {@code n} draws of every source
     * from a normal distribution whose standard deviation is its tolerance (Commons Math's
     * Well19937c generator from {@code seed}, so a run gives the same figures every time), the
     * calc evaluated again for each draw. A value that cannot be computed in some draws counts
     * them as failed ({@code tolerance.samples-failed}); when the run's time runs out, no estimate
     * is given and {@code limit.budget} says how far it came.
     */
    Map<String, Spread> sample(Map<String, Spread> spreads, int n, long seed) {
        if (n == 0 || sources.isEmpty() || spreads.isEmpty()) return spreads;
        org.apache.commons.math3.random.RandomGenerator random = new org.apache.commons.math3.random.Well19937c(seed);
        Map<String, double[]> moments = new LinkedHashMap<>();   // count, mean, M2 (Welford), failed
        spreads.keySet().forEach(name -> moments.put(name, new double[4]));
        for (int i = 0; i < n; i++) {
            Map<String, Double> offsets = new LinkedHashMap<>();
            for (Source s : sources) offsets.merge(s.name(), s.u() * random.nextGaussian(), Double::sum);
            Map<String, Value> given = new LinkedHashMap<>();
            for (Source s : sources) given.putIfAbsent(s.name(), shifted(s.nominal(), offsets.get(s.name())));
            StudyRun.Outcome o = study.run(given, false);
            if (o.stopped()) {
                reporter.report(Code.LIMIT_BUDGET, nameSpan(spreads.keySet().iterator().next()), "the Monte Carlo estimate "
                    + "was stopped after " + i + " of " + n + " samples: the run's " + Budget.SECONDS + " s are up; ask for "
                    + "fewer samples (the first-order spreads are shown)");
                return spreads;
            }
            for (var e : moments.entrySet()) {
                Double v = known(o, e.getKey());
                double[] m = e.getValue();
                if (v == null) {
                    m[3]++;
                    continue;
                }
                m[0]++;
                double delta = v - m[1];
                m[1] += delta / m[0];
                m[2] += delta * (v - m[1]);
            }
        }
        Map<String, Spread> out = new LinkedHashMap<>();
        for (var e : spreads.entrySet()) {
            double[] m = moments.get(e.getKey());
            double sd = m[0] > 1 ? Math.sqrt(m[2] / (m[0] - 1)) : Double.NaN;
            out.put(e.getKey(), e.getValue().withSampled(new Spread.Sampled(m[1], sd, n, (int) m[3], seed)));
            if (m[3] > 0) {
                reporter.report(Code.TOLERANCE_SAMPLES_FAILED, nameSpan(e.getKey()), e.getKey() + " could not be computed "
                    + "in " + (long) m[3] + " of " + n + " Monte Carlo samples (a draw fell outside a formula's domain or a "
                    + "solve's bracket): its estimate is over the other " + (long) m[0] + ", and says nothing of those draws");
            }
        }
        return out;
    }
}
