package dev.plumb.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.apache.commons.math3.util.Pair;

/**
 * Solves n equations in n unknowns, F(x) = 0, on doubles in SI.
 *
 * <p>Why this method: the systems a calc writes are small (two to five unknowns), smooth where
 * their correlations are, and each evaluation of F re-evaluates part of the document, so what
 * counts is few evaluations and a clear verdict. Newton's method on a scaled problem converges
 * quadratically near the root with n + 1 evaluations per step (a forward-difference Jacobian);
 * a backtracking line search on |F| keeps it from running off from a rough start. Where Newton
 * stalls (a singular or badly conditioned Jacobian on the way, or no step that lowers |F|),
 * Commons Math's Levenberg–Marquardt takes over from the best point: a trust-region method that
 * stays defined where the Jacobian is singular. Powell's hybrid method would do the same job but
 * Commons Math has none, and a hand-written one is what the project avoids.
 *
 * <p>Scaling: each unknown is measured in units of its start value's size (of its bracket's width
 * when the start is zero, else 1 SI); each equation in units of the larger of its two sides at the
 * start (of its Jacobian row when both are zero). Convergence is every scaled residual below
 * {@value #TOLERANCE}. At the solution the scaled Jacobian's singular values say whether the
 * solution is determined: when the smallest is below {@value #SINGULAR} of the largest, the
 * equations are dependent there, and the left singular vector says which. Unsolved, the same
 * test at the start tells dependent equations from a system with no solution nearby.
 */
final class SystemSolver {
    static final double TOLERANCE = 1e-12;
    static final double SINGULAR = 1e-10;
    static final int MAX_NEWTON_STEPS = 50;
    static final int MAX_LM_EVALUATIONS = 400;

    enum Status { SOLVED, SINGULAR, NOT_CONVERGED, NO_VALUE }

    /** An accepted iterate: the unknowns (SI) and each equation's residual LHS − RHS (SI). */
    record Iterate(int n, double[] x, double[] residual) {
    }

    /**
     * @param x the last point (SI); the solution when SOLVED
     * @param residual LHS − RHS at x, per equation (SI)
     * @param method "Newton" or "Levenberg–Marquardt"
     * @param dependent for SINGULAR, the equations (0-based) that take part in the dependence
     * @param undetermined for SINGULAR, the unknowns the equations do not fix there
     * @param wanders for NOT_CONVERGED, the unknown that moved farthest from its start, in its own scale
     */
    record Result(Status status, double[] x, double[] residual, String method, int evaluations, List<Iterate> record,
                  int[] dependent, int[] undetermined, int wanders) {
    }

    /** Thrown inside a Levenberg–Marquardt run when F has no value: the run stops there. */
    private static final class NoValue extends RuntimeException {
        NoValue() {
            super(null, null, false, false);
        }
    }

    private final Function<double[], double[]> f;
    private final double[] xScale;
    private double[] fScale;
    private int evaluations;
    private final List<Iterate> record = new ArrayList<>();

    /**
     * @param f LHS − RHS per equation for the unknowns (SI); NaN where it cannot be computed
     * @param xScale the size of each unknown, for scaling (positive)
     */
    private SystemSolver(Function<double[], double[]> f, double[] xScale) {
        this.f = f;
        this.xScale = xScale.clone();
    }

    /** @param sides the larger magnitude of each equation's two sides at the start (SI), for scaling */
    static Result solve(Function<double[], double[]> f, double[] start, double[] xScale, double[] sides) {
        return new SystemSolver(f, xScale).run(start, sides);
    }

    private Result run(double[] start, double[] sides) {
        int n = start.length;
        double[] z = new double[n];
        for (int j = 0; j < n; j++) z[j] = start[j] / xScale[j];
        double[] r0 = raw(z);
        if (!finite(r0)) return new Result(Status.NO_VALUE, start.clone(), r0, "Newton", evaluations, record, null, null, -1);
        fScale = sides.clone();
        double[][] j0 = jacobian(z, r0, null);
        for (int i = 0; i < n; i++) {
            if (!(fScale[i] > 0) || !Double.isFinite(fScale[i])) {
                double row = 0;
                if (j0 != null) for (int k = 0; k < n; k++) row = Math.max(row, Math.abs(j0[i][k]));
                fScale[i] = row > 0 && Double.isFinite(row) ? row : 1;
            }
        }
        record.add(new Iterate(0, x(z), r0));
        double[] best = z.clone();
        double[] rBest = r0;
        String method = "Newton";
        boolean done = converged(r0);
        double[][] jac = j0;
        for (int step = 1; step <= MAX_NEWTON_STEPS && !done; step++) {
            double[] dz = jac == null ? null : newtonStep(scaledJacobian(jac), scaled(rBest));
            double[] next = dz == null ? null : lineSearch(best, rBest, dz);
            if (next == null) break;
            best = next;
            rBest = raw(best);
            record.add(new Iterate(step, x(best), rBest));
            done = converged(rBest);
            if (!done) jac = jacobian(best, rBest, null);
        }
        if (!done) {
            method = "Levenberg–Marquardt";
            double[] fromLm = levenbergMarquardt(best);
            if (fromLm != null) {
                double[] r = raw(fromLm);
                if (finite(r) && norm(scaled(r)) < norm(scaled(rBest))) {
                    best = fromLm;
                    rBest = r;
                    record.add(new Iterate(record.size(), x(best), rBest));
                }
            }
            done = converged(rBest);
        }
        // Solved, a singular Jacobian means the solution is not determined (a whole line of them);
        // unsolved, |F| has a minimum above zero, where the Jacobian is always singular, so only
        // a Jacobian singular from the start says the equations themselves are dependent.
        double[][] at = done ? jacobian(best, rBest, null) : j0;
        int[][] dependence = at == null ? null : dependence(scaledJacobian(at));
        if (dependence != null) {
            return new Result(Status.SINGULAR, x(best), rBest, method, evaluations, record, dependence[0], dependence[1], -1);
        }
        if (done) return new Result(Status.SOLVED, x(best), rBest, method, evaluations, record, null, null, -1);
        int wanders = 0;
        double far = -1;
        for (int j = 0; j < n; j++) {
            double moved = Math.abs(best[j] - z[j]);
            // Ties (unknowns that moved together) name the first.
            if (!Double.isFinite(moved) || moved > far * (1 + 1e-6)) {
                far = Double.isFinite(moved) ? moved : Double.MAX_VALUE;
                wanders = j;
            }
        }
        return new Result(Status.NOT_CONVERGED, x(best), rBest, method, evaluations, record, null, null, wanders);
    }

    /** F at a scaled point, unscaled residuals (SI). */
    private double[] raw(double[] z) {
        evaluations++;
        return f.apply(x(z));
    }

    private double[] x(double[] z) {
        double[] x = new double[z.length];
        for (int j = 0; j < z.length; j++) x[j] = z[j] * xScale[j];
        return x;
    }

    private double[] scaled(double[] r) {
        double[] out = new double[r.length];
        for (int i = 0; i < r.length; i++) out[i] = r[i] / fScale[i];
        return out;
    }

    private boolean converged(double[] r) {
        if (!finite(r)) return false;
        for (double v : scaled(r)) if (Math.abs(v) > TOLERANCE) return false;
        return true;
    }

    /**
     * The Jacobian of the raw residual in the scaled unknowns, by forward differences (backward
     * where the forward point has no value); null where neither has one.
     */
    private double[][] jacobian(double[] z, double[] r, double[][] into) {
        int n = z.length;
        double[][] jac = into != null ? into : new double[r.length][n];
        for (int j = 0; j < n; j++) {
            double h = 1e-7 * Math.max(Math.abs(z[j]), 1);
            double[] zz = z.clone();
            zz[j] = z[j] + h;
            double[] rr = raw(zz);
            if (!finite(rr)) {
                zz[j] = z[j] - h;
                rr = raw(zz);
                h = -h;
            }
            if (!finite(rr)) return null;
            for (int i = 0; i < r.length; i++) jac[i][j] = (rr[i] - r[i]) / h;
        }
        return jac;
    }

    private double[][] scaledJacobian(double[][] jac) {
        double[][] out = new double[jac.length][];
        for (int i = 0; i < jac.length; i++) {
            out[i] = new double[jac[i].length];
            for (int j = 0; j < jac[i].length; j++) out[i][j] = jac[i][j] / fScale[i];
        }
        return out;
    }

    /** The Newton step, or null when the scaled Jacobian is singular or badly conditioned there. */
    private static double[] newtonStep(double[][] jac, double[] r) {
        RealMatrix m = new Array2DRowRealMatrix(jac, false);
        if (dependence(jac) != null) return null;
        LUDecomposition lu = new LUDecomposition(m);
        if (!lu.getSolver().isNonSingular()) return null;
        RealVector dz = lu.getSolver().solve(new ArrayRealVector(r, true)).mapMultiply(-1);
        double[] out = dz.toArray();
        return finite(out) ? out : null;
    }

    /** Backtracking on the scaled residual's norm (at most 30 halvings); null when no step lowers it. */
    private double[] lineSearch(double[] z, double[] r, double[] dz) {
        double now = norm(scaled(r));
        double lambda = 1;
        for (int k = 0; k < 30; k++, lambda /= 2) {
            double[] next = new double[z.length];
            for (int j = 0; j < z.length; j++) next[j] = z[j] + lambda * dz[j];
            double[] rn = raw(next);
            if (finite(rn) && norm(scaled(rn)) <= (1 - 1e-4 * lambda) * now) return next;
        }
        return null;
    }

    /** Levenberg–Marquardt from {@code z} on the scaled problem; null when F had no value on the way or it gave up. */
    private double[] levenbergMarquardt(double[] z) {
        int n = z.length;
        LeastSquaresProblem problem = new LeastSquaresBuilder()
            .start(z)
            .target(new double[fScale.length])
            .model(point -> {
                double[] p = point.toArray();
                double[] r = raw(p);
                if (!finite(r)) throw new NoValue();
                double[][] jac = jacobian(p, r, null);
                if (jac == null) throw new NoValue();
                return new Pair<>(new ArrayRealVector(scaled(r), false),
                    new Array2DRowRealMatrix(scaledJacobian(jac), false));
            })
            .maxEvaluations(MAX_LM_EVALUATIONS / (n + 1))
            .maxIterations(MAX_LM_EVALUATIONS / (n + 1))
            .checker((iteration, previous, current) -> current.getCost() < TOLERANCE * 1e-3)
            .build();
        try {
            LeastSquaresOptimizer.Optimum o = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-15).withParameterRelativeTolerance(1e-15).withOrthoTolerance(1e-15)
                .optimize(problem);
            return o.getPoint().toArray();
        } catch (NoValue e) {
            return null;
        } catch (org.apache.commons.math3.exception.MathIllegalStateException e) {
            // Too many evaluations, or tolerances too small to make progress: it did not converge.
            return null;
        }
    }

    /**
     * When the scaled Jacobian is singular: {dependent equations, undetermined unknowns}, from
     * the singular vectors of its smallest singular value; null when it is well conditioned.
     */
    static int[][] dependence(double[][] jac) {
        if (!finite2(jac)) return new int[][] {all(jac.length), all(jac[0].length)};
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(jac, false));
        double[] s = svd.getSingularValues();
        int last = s.length - 1;
        if (s[0] > 0 && s[last] > SINGULAR * s[0]) return null;
        return new int[][] {large(svd.getU().getColumn(last)), large(svd.getV().getColumn(last))};
    }

    /** The components that matter in a unit vector: those of at least a tenth of the largest. */
    private static int[] large(double[] v) {
        double max = Arrays.stream(v).map(Math::abs).max().orElse(0);
        return java.util.stream.IntStream.range(0, v.length).filter(i -> Math.abs(v[i]) >= 0.1 * max).toArray();
    }

    private static int[] all(int n) {
        return java.util.stream.IntStream.range(0, n).toArray();
    }

    private static double norm(double[] v) {
        double s = 0;
        for (double d : v) s += d * d;
        return Math.sqrt(s);
    }

    private static boolean finite(double[] v) {
        if (v == null) return false;
        for (double d : v) if (!Double.isFinite(d)) return false;
        return true;
    }

    private static boolean finite2(double[][] m) {
        for (double[] row : m) if (!finite(row)) return false;
        return true;
    }
}
