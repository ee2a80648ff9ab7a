package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Comparator;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.exception.MathIllegalArgumentException;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.ode.ContinuousOutputModel;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

/**
 * Integrates one {@code evolve} statement: the states start at their start values at time 0, and
 * each evaluation of the rates binds the time and the states and re-evaluates the definitions that
 * depend on them ({@link Plan#dependentsOf} the time) through the document's {@link Plan},
 * quietly, exactly as a solve's trials do. The integrator is Commons Math's Dormand–Prince 8(5,3)
 * (adaptive, with dense output and event location): an explicit high-order method suits the
 * smooth, non-stiff motions of bodies in fluids, reaching tight tolerances in few steps. The stop
 * condition is an event located to the integrator's accuracy. Every step is bounded: by the run's
 * {@link Budget} through each evaluation, by {@value #MAX_STEPS} accepted steps, and by
 * {@value #MAX_REJECTED} evaluations without an accepted step (a collapsing step size).
 */
final class MotionRunner extends SolvingRunner {
    static final int MAX_STEPS = 20_000;
    static final int MAX_REJECTED = 3_000;
    static final double RELATIVE_TOLERANCE = 1e-9;
    static final double ABSOLUTE_TOLERANCE = 1e-12;
    static final int PLOT_POINTS = 200;
    static final int DEFAULT_ROWS = 10;

    /** The values at the stop (the time first, then the states; UNKNOWN each on failure), their units, the trajectory. */
    record Outcome(List<Value> values, List<Unit> units, Trajectory trajectory) {
    }

    /** The rates or the stop condition had no value at this time. */
    private static final class NoValue extends RuntimeException {
        final double t;
        final double[] y;

        NoValue(double t, double[] y) {
            super(null, null, false, false);
            this.t = t;
            this.y = y.clone();
        }
    }

    /** Too many steps, or a step size that collapsed, at this time. */
    private static final class Stopped extends RuntimeException {
        final boolean collapsed;
        final double t;

        Stopped(boolean collapsed, double t) {
            super(null, null, false, false);
            this.collapsed = collapsed;
            this.t = t;
        }
    }

    private Statement.Motion motion;
    private List<String> names;
    private Value[] start;
    private List<Statement.Definition> dependents;
    private int evaluations;
    /** The states the report plots, by their place among the names (1 the first state). */
    private List<Integer> drawn;

    MotionRunner(Plan plan, Scope scope, Environment env, Reporter reporter, String text, UnitRegistry units, Budget budget) {
        super(plan, scope, env, reporter, text, units, budget);
    }

    Outcome run(Statement.Evolve k) {
        motion = k.motion();
        names = Motions.names(k);
        int n = motion.states().size();
        if (!counted() || !Motions.ownsAll(k, plan.own()) || !drawnAreStates()) return failed();
        if (motion.stop() == Comparator.NE) {
            reporter.report(Code.MOTION_NO_STOP, motion.until(), "`until` needs a condition that starts to hold at a "
                + "moment (<=, <, >=, > or ==); `!=` holds almost everywhere: write the side the motion crosses, such as "
                + "`until " + Shown.source(text, motion.stopLeft().span()) + " >= " + Shown.source(text, motion.stopRight().span())
                + "`");
            return failed();
        }
        Evaluator real = evaluator(env, reporter);
        start = new Value[n];
        double[] y0 = new double[n];
        for (int j = 0; j < n; j++) {
            start[j] = real.eval(motion.starts().get(j));
            if (!start[j].known()) return failed();
            y0[j] = start[j].si();
        }
        Value every = motion.every() == null ? null : real.eval(motion.every());
        if (every != null && !every.known()) return failed();
        if (every != null && (!every.dimension().equals(Dimension.TIME) || !(every.si() > 0))) {
            reporter.report(Code.UNIT_MISMATCH, motion.every().span(), "`every` gives the interval of the trajectory "
                + "table, a positive time such as `0.5 s`; " + Shown.source(text, motion.every().span()) + " is "
                + Shown.value(every));
            return failed();
        }
        List<Unit> shown = new ArrayList<>();
        shown.add(timeUnit());
        for (int j = 0; j < n; j++) shown.add(DisplayChoice.writtenOrSi(motion.starts().get(j), start[j].dimension(), units));
        dependents = plan.dependentsOf(names.get(0));
        // At the start, quietly: every rate and both sides of the stop condition must have a value and the right dimension.
        Value[] at0 = sides(0, y0, Reporter.discarding(), Reporter.discarding());
        if (at0 == null) {
            notEvaluated(0, y0, shown);
            return failed();
        }
        if (!dimensionsAgree(at0)) return failed();
        if (holds(at0)) {
            reporter.report(Code.MOTION_STOPS_AT_START, motion.until(), "the stop condition `" + Shown.source(text,
                motion.until()) + "` already holds at the start (" + point(0, y0, shown) + "), so nothing moves: the "
                + "values are the start values. Check the condition's direction (<= or >=) or the start values");
            return done(k, 0, y0, shown, single(y0, shown, "at the start"));
        }
        double[] absTol = new double[n];
        double[] relTol = new double[n];
        for (int j = 0; j < n; j++) {
            absTol[j] = ABSOLUTE_TOLERANCE * Math.max(Math.abs(y0[j]), 1);
            relTol[j] = RELATIVE_TOLERANCE;
        }
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0, Double.MAX_VALUE, absTol, relTol);
        ContinuousOutputModel dense = new ContinuousOutputModel();
        Ranges ranges = new Ranges();
        Steps steps = new Steps(ranges);
        boolean[] stopped = {false};
        integrator.addStepHandler(dense);
        integrator.addStepHandler(steps);
        // The condition is checked at the end of every step: the step size control already keeps
        // steps short where the states change, and a fixed check interval would cost without bound
        // on a long motion (a check every second over a year).
        integrator.addEventHandler(new Stop(stopped), Double.MAX_VALUE, 1e-14, 200);
        double[] y = y0.clone();
        double end;
        try {
            end = integrator.integrate(new Rates(n, steps), 0, y0, Double.MAX_VALUE, y);
        } catch (NoValue e) {
            notEvaluated(e.t, e.y, shown);
            return failed();
        } catch (Stopped e) {
            reportStopped(e.collapsed, e.t, steps, dense, shown);
            return failed();
        } catch (MathIllegalStateException | MathIllegalArgumentException e) {
            reportStopped(true, steps.last, steps, dense, shown);
            return failed();
        }
        if (!stopped[0]) {
            reportStopped(false, end, steps, dense, shown);
            return failed();
        }
        // Once for real at the stop: the rates' and the condition's own findings describe it; the
        // dependents are evaluated in their own places afterwards, with the final states.
        sides(end, y, Reporter.discarding(), reporter);
        ranges.report(reporter, shown.get(0));
        Trajectory trajectory = trajectory(end, y, every, shown, steps.count, ranges.visited(), dense, describeStop());
        return done(k, end, y, shown, trajectory);
    }

    // ---- the motion's equations ---------------------------------------------------------

    /** dy/dt for the integrator; a rate without a value stops the run with the time it happened. */
    private final class Rates implements FirstOrderDifferentialEquations {
        private final int n;
        private final Steps steps;

        Rates(int n, Steps steps) {
            this.n = n;
            this.steps = steps;
        }

        @Override
        public int getDimension() {
            return n;
        }

        @Override
        public void computeDerivatives(double t, double[] y, double[] yDot) {
            if (++steps.sinceAccepted > MAX_REJECTED) throw new Stopped(true, t);
            Value[] s = sides(t, y, Reporter.discarding(), Reporter.discarding());
            if (s == null) throw new NoValue(t, y);
            for (int j = 0; j < n; j++) {
                yDot[j] = s[j].si();
                if (!Double.isFinite(yDot[j])) throw new NoValue(t, y);
            }
        }
    }

    /** The stop condition as an event: g crosses zero upward where it starts to hold. */
    private final class Stop implements EventHandler {
        private final boolean[] stopped;

        Stop(boolean[] stopped) {
            this.stopped = stopped;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            Value[] s = sides(t, y, Reporter.discarding(), Reporter.discarding());
            if (s == null) throw new NoValue(t, y);
            return MotionRunner.this.g(s);
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (increasing || motion.stop() == Comparator.EQ) {
                stopped[0] = true;
                return Action.STOP;
            }
            return Action.CONTINUE;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }

    /** Counts accepted steps, watches the step size, and records where the correlations in the rates go. */
    private final class Steps implements StepHandler {
        private final Ranges ranges;
        int count;
        int sinceAccepted;
        int tiny;
        double last;
        double[] lastState;

        Steps(Ranges ranges) {
            this.ranges = ranges;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            ranges.at(t0, y0);
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            count++;
            sinceAccepted = 0;
            double t = interpolator.getCurrentTime();
            double h = t - interpolator.getPreviousTime();
            // A step far below the time reached, again and again, is a step size collapsing toward a
            // point the rates cannot pass (they grow without bound there).
            tiny = h < 1e-12 * Math.abs(t) ? tiny + 1 : 0;
            last = t;
            interpolator.setInterpolatedTime(t);
            lastState = interpolator.getInterpolatedState().clone();
            if (tiny > 50) throw new Stopped(true, t);
            if (count >= MAX_STEPS) throw new Stopped(false, t);
            ranges.at(t, lastState);
        }
    }

    /**
     * Where each correlation call that the rates reach is evaluated over the motion: each argument's
     * smallest and largest value, and the first range finding with its time. Judged at each accepted
     * step, with the findings collected instead of reported.
     */
    private final class Ranges {
        private final Map<Integer, Analysis.CallSite> sites = new LinkedHashMap<>();
        private final Map<Integer, double[][]> extremes = new HashMap<>();
        private final Map<Integer, Diagnostic> firstOutside = new LinkedHashMap<>();
        private final Map<Integer, Double> firstOutsideAt = new HashMap<>();
        private final java.util.Set<Integer> outsideAtEnd = new java.util.HashSet<>();

        void at(double t, double[] y) {
            Reporter collected = new Reporter();
            sides(t, y, collected, collected);
            outsideAtEnd.clear();
            for (Diagnostic d : collected.all()) {
                if (d.code() != Code.RANGE_OUTSIDE && d.code() != Code.RANGE_REGIME) continue;
                int key = d.span().start();
                outsideAtEnd.add(key);
                if (!firstOutside.containsKey(key)) {
                    firstOutside.put(key, d);
                    firstOutsideAt.put(key, t);
                }
            }
            for (Analysis.CallSite c : collected.calls()) {
                int key = c.callee().start();
                sites.putIfAbsent(key, c);
                double[][] e = extremes.computeIfAbsent(key, x -> {
                    double[][] fresh = new double[c.arguments().size()][];
                    for (int i = 0; i < fresh.length; i++) fresh[i] = new double[] {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
                    return fresh;
                });
                for (int i = 0; i < Math.min(e.length, c.arguments().size()); i++) {
                    Value v = c.arguments().get(i).value();
                    if (!v.known()) continue;
                    e[i][0] = Math.min(e[i][0], v.si());
                    e[i][1] = Math.max(e[i][1], v.si());
                }
            }
        }

        /** Each call's arguments over the motion, in words: "cd_sphere: Re from 12 to 2,900". */
        List<String> visited() {
            List<String> out = new ArrayList<>();
            for (var entry : sites.entrySet()) out.add(visited(entry.getKey()));
            return out;
        }

        private String visited(int key) {
            Analysis.CallSite c = sites.get(key);
            double[][] e = extremes.get(key);
            List<String> args = new ArrayList<>();
            for (int i = 0; i < e.length; i++) {
                Analysis.Argument a = c.arguments().get(i);
                if (!Double.isFinite(e[i][0])) continue;
                Dimension d = a.value().dimension();
                Unit u = a.unit() != null ? a.unit() : DisplayUnits.defaultFor(d);
                args.add(e[i][0] == e[i][1] ? a.name() + " = " + Shown.value(Value.of(e[i][0], d), u, 3)
                    : a.name() + " from " + Shown.value(Value.of(e[i][0], d), u, 3) + " to " + Shown.value(Value.of(e[i][1], d), u, 3));
            }
            return c.name() + ": " + String.join(", ", args);
        }

        /**
         * One warning per call that left its range during the motion but not at its end (the end
         * state's own finding is reported where the call is evaluated in its place).
         */
        void report(Reporter to, Unit timeUnit) {
            for (var entry : firstOutside.entrySet()) {
                int key = entry.getKey();
                if (outsideAtEnd.contains(key)) continue;
                Diagnostic d = entry.getValue();
                String over = sites.containsKey(key) ? "; over the whole motion " + visited(key) : "";
                to.report(d.code(), d.span(), "during the motion, first at t = " + Shown.value(Value.of(firstOutsideAt.get(key),
                    Dimension.TIME), timeUnit, 4) + ": " + d.message() + over);
            }
        }
    }

    // ---- evaluation at a point ----------------------------------------------------------

    /**
     * The rates, then the stop condition's two sides, with the time and the states bound: n + 2
     * values, or null when one has no value. Dependents report to {@code dependentsTo}, the
     * rates and the condition to {@code ownTo}.
     */
    private Value[] sides(double t, double[] y, Reporter dependentsTo, Reporter ownTo) {
        evaluations++;
        Map<String, Value> bound = new HashMap<>();
        bound.put(names.get(0), Value.of(t, Dimension.TIME));
        for (int j = 0; j < y.length; j++) bound.put(names.get(j + 1), Value.of(y[j], start[j].dimension()).asAngle(start[j].angle()));
        Environment trial = plan.evaluate(env, bound, dependents, dependentsTo, budget);
        Evaluator e = evaluator(trial, ownTo);
        int n = y.length;
        Value[] out = new Value[n + 2];
        boolean known = true;
        for (int j = 0; j < n; j++) {
            out[j] = e.eval(motion.rates().get(j));
            known &= out[j].known();
        }
        out[n] = e.eval(motion.stopLeft());
        out[n + 1] = e.eval(motion.stopRight());
        known &= out[n].known() && out[n + 1].known();
        return known ? out : null;
    }

    /** The event function: positive where the stop condition holds (for ==, the difference). */
    private double g(Value[] s) {
        int n = s.length - 2;
        double d = s[n].si() - s[n + 1].si();
        return motion.stop() == Comparator.LE || motion.stop() == Comparator.LT ? -d : d;
    }

    private boolean holds(Value[] s) {
        double g = g(s);
        return switch (motion.stop()) {
            case GE, LE -> g >= 0;
            case GT, LT -> g > 0;
            default -> g == 0;
        };
    }

    private boolean dimensionsAgree(Value[] s) {
        int n = s.length - 2;
        for (int j = 0; j < n; j++) {
            Dimension wanted = start[j].dimension().divide(Dimension.TIME);
            if (!s[j].dimension().equals(wanted)) {
                Expr rate = motion.rates().get(j);
                reporter.report(Code.UNIT_MISMATCH, rate.span(), "the rate of " + names.get(j + 1) + " is its change per unit "
                    + "of time, " + wanted.describe() + ", but " + Shown.source(text, rate.span()) + " is "
                    + s[j].dimension().describe() + ": the rates are listed in the order of the states");
                return false;
            }
        }
        if (!s[n].dimension().equals(s[n + 1].dimension())) {
            reporter.report(Code.UNIT_MISMATCH, motion.until(), "the two sides of the stop condition differ in dimension: "
                + Shown.source(text, motion.stopLeft().span()) + " is " + s[n].dimension().describe() + ", "
                + Shown.source(text, motion.stopRight().span()) + " is " + s[n + 1].dimension().describe());
            return false;
        }
        return true;
    }

    // ---- results ----------------------------------------------------------------------------

    /** The time's unit: that of `every`, else of the stop condition's side when it is a time, else seconds. */
    private Unit timeUnit() {
        for (Expr e : new Expr[] {motion.every(), motion.stopRight(), motion.stopLeft()}) {
            Unit u = e == null ? null : DisplayChoice.written(e, units);
            if (u != null && u.dimension().equals(Dimension.TIME)) return u;
        }
        return DisplayUnits.defaultFor(Dimension.TIME);
    }

    private String describeStop() {
        return "when " + Shown.source(text, motion.until());
    }

    private Outcome done(Statement.Evolve k, double end, double[] y, List<Unit> shown, Trajectory trajectory) {
        List<Value> values = new ArrayList<>();
        values.add(Value.of(end, Dimension.TIME));
        for (int j = 0; j < y.length; j++) values.add(Value.of(y[j], start[j].dimension()).asAngle(start[j].angle()));
        return new Outcome(values, shown, trajectory);
    }

    private Outcome failed() {
        int count = motion.names().size();
        List<Value> unknown = new ArrayList<>();
        List<Unit> none = new ArrayList<>();
        for (int j = 0; j < count; j++) {
            unknown.add(Value.UNKNOWN);
            none.add(null);
        }
        return new Outcome(unknown, none, null);
    }

    private Trajectory single(double[] y0, List<Unit> shown, String how) {
        return new Trajectory(names, dimensions(), shown, new double[] {0}, new double[][] {y0.clone()}, new double[] {0},
            new double[][] {y0.clone()}, how, 0, evaluations, List.of(), false, drawn, null);
    }

    private List<Dimension> dimensions() {
        List<Dimension> out = new ArrayList<>();
        out.add(Dimension.TIME);
        for (Value v : start) out.add(v.dimension());
        return out;
    }

    private Trajectory trajectory(double end, double[] yEnd, Value every, List<Unit> shown, int steps, List<String> visited,
                                  ContinuousOutputModel dense, String stop) {
        double dt = every != null ? every.si() : end / DEFAULT_ROWS;
        boolean widened = false;
        if (end / dt > Trajectory.MAX_ROWS) {
            dt = end / Trajectory.MAX_ROWS;
            widened = true;
        }
        List<Double> times = new ArrayList<>();
        for (int i = 0; i * dt < end * (1 - 1e-12) && times.size() < Trajectory.MAX_ROWS; i++) times.add(i * dt);
        times.add(end);
        double[] ts = times.stream().mapToDouble(Double::doubleValue).toArray();
        double[][] rows = sample(ts, yEnd, dense);
        double[] pts = new double[PLOT_POINTS + 1];
        for (int i = 0; i <= PLOT_POINTS; i++) pts[i] = end * i / PLOT_POINTS;
        double[][] plot = sample(pts, yEnd, dense);
        return new Trajectory(names, dimensions(), shown, ts, rows, pts, plot, stop, steps, evaluations, visited, widened,
            drawn, new Trajectory.Dense(dense));
    }

    private static double[][] sample(double[] ts, double[] yEnd, ContinuousOutputModel dense) {
        double[][] out = new double[ts.length][];
        for (int i = 0; i < ts.length; i++) {
            if (i == ts.length - 1) {
                out[i] = yEnd.clone();
                continue;
            }
            dense.setInterpolatedTime(ts[i]);
            out[i] = dense.getInterpolatedState().clone();
        }
        return out;
    }

    // ---- findings -----------------------------------------------------------------------------

    private boolean counted() {
        int n = motion.states().size();
        String list = String.join(", ", motion.states().stream().map(dev.plumb.syntax.Ident::text).toList());
        if (motion.starts().size() != n) {
            Span where = Span.cover(motion.starts().get(0).span(), motion.starts().get(motion.starts().size() - 1).span());
            reporter.report(Code.MOTION_COUNT_MISMATCH, where, count(n, "state") + " (" + list + ") but "
                + count(motion.starts().size(), "start value") + ": give one start value per state, in the same order");
            return false;
        }
        if (motion.rates().size() != n) {
            Span where = Span.cover(motion.rates().get(0).span(), motion.rates().get(motion.rates().size() - 1).span());
            reporter.report(Code.MOTION_COUNT_MISMATCH, where, count(n, "state") + " (" + list + ") but "
                + count(motion.rates().size(), "rate") + ": give each state's rate of change, in the order of the states");
            return false;
        }
        return true;
    }

    /** The states `draw` names, each a state of this motion; all of them when it names none. */
    private boolean drawnAreStates() {
        drawn = new ArrayList<>();
        for (dev.plumb.syntax.Ident d : motion.drawn()) {
            int at = names.indexOf(d.text());
            if (at < 1) {
                reporter.report(Code.NAME_UNKNOWN, d.span(), "`draw` lists the states to plot against " + names.get(0)
                    + ", and " + d.text() + " is not one of this motion's states (" + String.join(", ", names.subList(1,
                        names.size())) + ")");
                return false;
            }
            if (!drawn.contains(at)) drawn.add(at);
        }
        if (drawn.isEmpty()) for (int j = 1; j < names.size(); j++) drawn.add(j);
        return true;
    }

    private static String count(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    /** The rates have no value at (t, y): says so, with the first finding evaluating them for real there gives. */
    private void notEvaluated(double t, double[] y, List<Unit> shown) {
        Reporter collected = new Reporter();
        sides(t, y, collected, collected);
        List<Diagnostic> found = collected.all();
        // Nothing found there: a value the rates use is unknown because of a mistake already
        // reported where it was made, and each mistake is reported once.
        if (found.isEmpty()) return;
        String why = found.get(0).message()
            + (found.size() > 1 ? " (and " + (found.size() - 1) + " more finding" + (found.size() > 2 ? "s" : "") + ")" : "");
        Span at = Span.cover(motion.states().get(0).span(), motion.time().span());
        reporter.report(Code.MOTION_NOT_EVALUATED, at, "the motion stops short: its rates cannot be evaluated at "
            + point(t, y, shown) + ": " + why + "; fix that (or start where the rates have a value), and the motion runs");
    }

    /** Where the motion got to: the last accepted step (the time and states there), else the start. */
    private void reportStopped(boolean collapsed, double failedAt, Steps steps, ContinuousOutputModel dense, List<Unit> shown) {
        double t = steps.lastState != null ? steps.last : 0;
        double[] y = steps.lastState != null ? steps.lastState : startState();
        Span at = Span.cover(motion.states().get(0).span(), motion.time().span());
        String condition = "`" + Shown.source(text, motion.until()) + "`";
        if (collapsed) {
            reporter.report(Code.MOTION_STEP_COLLAPSE, at, "the step size collapsed at " + point(t, y, shown) + " after "
                + String.format(java.util.Locale.ROOT, "%,d", steps.count) + " steps: the rates change faster and faster there (they may grow without bound, or jump), "
                + "so the motion cannot be followed past it and " + condition + " was not reached. Check the rates near "
                + "that point (a division by a state that goes to zero, a piecewise rate that jumps)");
        } else {
            reporter.report(Code.MOTION_NO_STOP, at, "the stop condition " + condition + " never held: the motion was "
                + "followed for " + String.format(java.util.Locale.ROOT, "%,d", steps.count) + " steps, to " + point(t, y, shown) + (steps.count >= MAX_STEPS
                ? " (the limit is " + String.format(java.util.Locale.ROOT, "%,d", MAX_STEPS) + " steps)" : "")
                + ". The states may settle before it holds (a speed that only approaches its limit): stop a little short "
                + "of it, or on the time");
        }
    }

    private double[] startState() {
        double[] y = new double[start.length];
        for (int j = 0; j < y.length; j++) y[j] = start[j].si();
        return y;
    }

    private String point(double t, double[] y, List<Unit> shown) {
        List<String> parts = new ArrayList<>();
        parts.add(names.get(0) + " = " + (Double.isFinite(t) ? Shown.value(Value.of(t, Dimension.TIME), shown.get(0), 4) : "?"));
        for (int j = 0; j < y.length; j++) {
            parts.add(names.get(j + 1) + " = " + (Double.isFinite(y[j])
                ? Shown.value(Value.of(y[j], start[j].dimension()).asAngle(start[j].angle()), shown.get(j + 1), 4) : "?"));
        }
        return String.join(", ", parts);
    }
}
