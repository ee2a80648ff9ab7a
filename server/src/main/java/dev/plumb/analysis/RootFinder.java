package dev.plumb.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Finds where a residual changes sign, on doubles in SI.
 *
 * <p>A coarse scan first (60 points, log-spaced when the bracket spans two decades or more)
 * finds every sign change, so several roots are reported rather than one taken silently. The
 * first sign change is then refined with Brent's method (Commons Math {@link BrentSolver}):
 * bracketing, so it cannot leave the bracket or diverge, and superlinear on smooth residuals,
 * which suits drag balances whose coefficients come from piecewise fits; the Illinois/Pegasus
 * variants guarantee the same but converge more slowly on such functions. Tolerances are
 * relative to the root's magnitude: 1e-12, with an absolute floor of 1e-14 of the bracket.
 */
final class RootFinder {
    static final int SCAN_POINTS = 60;
    static final int MAX_EVALUATIONS = 200;
    static final int OUTWARD_STEPS = 40;

    /** TOO_WIDE: a root was bracketed, but only to within a fraction of the bracket, too coarse for its size. */
    enum Status { SOLVED, NO_ROOT, NOT_CONVERGED, NO_VALUE, TOO_WIDE }

    /** One evaluation of the residual during refinement, with the bracket known after it. */
    record Iterate(int n, double x, double residual, double low, double high) {
    }

    /**
     * @param brackets every sign change the scan found, as {low, high} pairs
     * @param wider for NO_ROOT, a sign change found when scanning a wider range, or null
     */
    record Result(Status status, double root, double residual, List<Iterate> record, List<double[]> brackets,
                  double low, double high, double fLow, double fHigh, double[] wider) {
        int iterations() {
            return record.size();
        }
    }

    private RootFinder() {
    }

    /** Searches from a starting value: the bracket doubles on each side until the residual changes sign. */
    static Result outwardFrom(DoubleUnaryOperator f, double start) {
        double fStart = f.applyAsDouble(start);
        for (int k = 1; k <= OUTWARD_STEPS; k++) {
            double factor = Math.pow(2, k);
            double low = start > 0 ? start / factor : start < 0 ? start * factor : -factor;
            double high = start > 0 ? start * factor : start < 0 ? start / factor : factor;
            double fl = f.applyAsDouble(low);
            double fh = f.applyAsDouble(high);
            if (changes(fl, fStart) || changes(fStart, fh) || changes(fl, fh)) return within(f, low, high);
        }
        double low = start > 0 ? start / Math.pow(2, OUTWARD_STEPS) : start < 0 ? start * Math.pow(2, OUTWARD_STEPS) : -1e12;
        double high = start > 0 ? start * Math.pow(2, OUTWARD_STEPS) : start < 0 ? start / Math.pow(2, OUTWARD_STEPS) : 1e12;
        return within(f, low, high);
    }

    static Result within(DoubleUnaryOperator f, double a, double b) {
        double low = Math.min(a, b);
        double high = Math.max(a, b);
        double[] xs = samples(low, high, SCAN_POINTS);
        double[] fs = new double[xs.length];
        for (int i = 0; i < xs.length; i++) fs[i] = f.applyAsDouble(xs[i]);
        double fLow = fs[0];
        double fHigh = fs[fs.length - 1];
        List<double[]> brackets = signChanges(xs, fs);
        boolean anyValue = false;
        for (double v : fs) anyValue |= Double.isFinite(v);
        if (!anyValue) return new Result(Status.NO_VALUE, Double.NaN, Double.NaN, List.of(), List.of(), low, high, fLow, fHigh, null);
        if (brackets.isEmpty()) {
            return new Result(Status.NO_ROOT, Double.NaN, Double.NaN, List.of(), List.of(), low, high, fLow, fHigh,
                wider(f, low, high));
        }
        double[] first = brackets.get(0);
        if (first[0] == first[1]) {
            return new Result(Status.SOLVED, first[0], 0, List.of(), brackets, low, high, fLow, fHigh, null);
        }
        return refine(f, first, brackets, low, high, fLow, fHigh, logSpaced(low, high));
    }

    private static Result refine(DoubleUnaryOperator f, double[] bracket, List<double[]> brackets, double low,
                                 double high, double fLow, double fHigh, boolean log) {
        List<Iterate> record = new ArrayList<>();
        double[] known = {bracket[0], f.applyAsDouble(bracket[0]), bracket[1], f.applyAsDouble(bracket[1])};
        // In log space u = ln|x| and x = sign·e^u, the sign being the bracket's.
        double sign = Math.signum(bracket[0] != 0 ? bracket[0] : bracket[1]);
        DoubleUnaryOperator g = u -> {
            double x = log ? sign * Math.exp(u) : u;
            double fx = f.applyAsDouble(x);
            if (Double.isFinite(fx)) {
                if (changes(known[1], fx)) {
                    known[2] = x;
                    known[3] = fx;
                } else {
                    known[0] = x;
                    known[1] = fx;
                }
            }
            record.add(new Iterate(record.size() + 1, x, fx, Math.min(known[0], known[2]), Math.max(known[0], known[2])));
            return Double.isFinite(fx) ? fx : Double.NaN;
        };
        double u0 = log ? Math.log(Math.abs(bracket[0])) : bracket[0];
        double u1 = log ? Math.log(Math.abs(bracket[1])) : bracket[1];
        double absolute = 1e-14 * Math.max(Math.abs(u0), Math.abs(u1)) + Double.MIN_NORMAL;
        BrentSolver solver = new BrentSolver(1e-12, absolute);
        try {
            double u = solver.solve(MAX_EVALUATIONS, g::applyAsDouble, Math.min(u0, u1), Math.max(u0, u1));
            double root = log ? sign * Math.exp(u) : u;
            double residual = f.applyAsDouble(root);
            // Converging on a jump (a pole, a step) shrinks the bracket but leaves the residual large.
            double scale = Math.max(Math.abs(known[1]), Math.abs(known[3]));
            double ends = Math.max(finiteAbs(fLow), finiteAbs(fHigh));
            if (!Double.isFinite(residual) || Math.abs(residual) > 1e-6 * Math.max(scale, ends)) {
                return new Result(Status.NOT_CONVERGED, root, residual, record, brackets, Math.min(known[0], known[2]),
                    Math.max(known[0], known[2]), fLow, fHigh, null);
            }
            // The absolute floor is a fraction of the bracket: a root far smaller than the bracket
            // is then known only roughly. Say so rather than give a rough value as solved.
            if (!log && residual != 0 && absolute > 1e-6 * Math.abs(root)) {
                return new Result(Status.TOO_WIDE, root, residual, record, brackets, low, high, fLow, fHigh, null);
            }
            return new Result(Status.SOLVED, root, residual, record, brackets, low, high, fLow, fHigh, null);
        } catch (TooManyEvaluationsException e) {
            return new Result(Status.NOT_CONVERGED, Double.NaN, Double.NaN, record, brackets, Math.min(known[0], known[2]),
                Math.max(known[0], known[2]), fLow, fHigh, null);
        } catch (RuntimeException e) {
            // A residual that is not finite inside the bracket (NaN) stops the solver.
            return new Result(Status.NOT_CONVERGED, Double.NaN, Double.NaN, record, brackets, Math.min(known[0], known[2]),
                Math.max(known[0], known[2]), fLow, fHigh, null);
        }
    }

    private static double finiteAbs(double v) {
        return Double.isFinite(v) ? Math.abs(v) : 0;
    }

    /** Log spacing when both ends have one sign and span two decades or more. */
    static boolean logSpaced(double low, double high) {
        boolean oneSign = (low > 0 && high > 0) || (low < 0 && high < 0);
        return oneSign && Math.max(Math.abs(low), Math.abs(high)) / Math.min(Math.abs(low), Math.abs(high)) >= 100;
    }

    static double[] samples(double low, double high, int n) {
        double[] xs = new double[n];
        boolean log = logSpaced(low, high);
        for (int i = 0; i < n; i++) {
            double t = (double) i / (n - 1);
            xs[i] = log ? Math.copySign(Math.exp(Math.log(Math.abs(low)) + t * (Math.log(Math.abs(high)) - Math.log(Math.abs(low)))), low)
                : Double.isFinite(high - low) ? low + t * (high - low)
                    : low * (1 - t) + high * t;   // a bracket of ±1e308: its width overflows
        }
        xs[0] = low;
        xs[n - 1] = high;
        return xs;
    }

    private static List<double[]> signChanges(double[] xs, double[] fs) {
        List<double[]> out = new ArrayList<>();
        int last = -1;
        for (int i = 0; i < xs.length; i++) {
            if (!Double.isFinite(fs[i])) continue;
            if (fs[i] == 0) {
                out.add(new double[] {xs[i], xs[i]});
                last = -1;
                continue;
            }
            if (last >= 0 && changes(fs[last], fs[i])) out.add(new double[] {xs[last], xs[i]});
            last = i;
        }
        return out;
    }

    /** A wider scan (a thousand times each way for one-signed brackets, ten widths otherwise). */
    private static double[] wider(DoubleUnaryOperator f, double low, double high) {
        boolean positive = low > 0;
        boolean negative = high < 0;
        double width = Math.min(high - low, Double.MAX_VALUE);
        double wl = Math.max(-Double.MAX_VALUE, positive ? low / 1000 : negative ? low * 1000 : low - 10 * width);
        double wh = Math.min(Double.MAX_VALUE, positive ? high * 1000 : negative ? high / 1000 : high + 10 * width);
        double[] xs = samples(wl, wh, 2 * SCAN_POINTS);
        double[] fs = new double[xs.length];
        for (int i = 0; i < xs.length; i++) fs[i] = f.applyAsDouble(xs[i]);
        List<double[]> found = signChanges(xs, fs);
        return found.isEmpty() ? null : found.get(0);
    }

    private static boolean changes(double a, double b) {
        return Double.isFinite(a) && Double.isFinite(b) && ((a < 0 && b > 0) || (a > 0 && b < 0));
    }
}
