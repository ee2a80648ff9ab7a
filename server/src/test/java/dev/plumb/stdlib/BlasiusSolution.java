package dev.plumb.stdlib;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Blasius' similarity solution of the laminar flat-plate boundary layer, computed here so that
 * the standard library's laminar constants can be checked against an independent solution.
 *
 * <p>The equation is f''' + f f''/2 = 0 with f(0) = f'(0) = 0 and f'(∞) = 1, where
 * η = y·√(U/(ν x)) and u/U = f'(η). It is solved by shooting: the Dormand–Prince 8(5,3)
 * integrator carries the initial-value problem to {@link #ETA_END}, and Brent's method finds the
 * wall curvature f''(0) that makes f'(ETA_END) = 1. Two more equations integrate the
 * displacement and momentum thicknesses along with it: ∫(1 − f')dη and ∫f'(1 − f')dη.
 */
final class BlasiusSolution {
    /** Where "infinity" is taken: 1 − f' is about 2e-14 there, below what the checks can see. */
    static final double ETA_END = 12.0;

    private static final double TOLERANCE = 1e-13;

    /** f''(0), the wall curvature: cf·√Re_x = 2 f''(0). */
    final double wallCurvature;
    /** η where u = 0.99 U: δ99·√(U/(ν x)). */
    final double eta99;
    /** ∫(1 − f')dη: δ*·√(U/(ν x)). */
    final double displacement;
    /** ∫f'(1 − f')dη: θ·√(U/(ν x)). */
    final double momentum;

    private BlasiusSolution(double wallCurvature, double eta99, double displacement, double momentum) {
        this.wallCurvature = wallCurvature;
        this.eta99 = eta99;
        this.displacement = displacement;
        this.momentum = momentum;
    }

    private static final BlasiusSolution SOLUTION = compute();

    /** The solution, computed once per test run (a few milliseconds). */
    static BlasiusSolution get() {
        return SOLUTION;
    }

    private static BlasiusSolution compute() {
        // f'(ETA_END) rises monotonically with f''(0): the solution for curvature a is the
        // Blasius one rescaled, with f'(∞) = (a / 0.332)^(2/3). So [0.2, 0.5] brackets f' = 1.
        BrentSolver brent = new BrentSolver(1e-15, 1e-15);
        double a = brent.solve(200, s -> integrate(s)[1] - 1.0, 0.2, 0.5);
        Crossing at99 = new Crossing(0.99);
        double[] end = integrate(a, at99);
        return new BlasiusSolution(a, at99.eta, end[3], end[4]);
    }

    /** The state [f, f', f'', ∫(1 − f'), ∫f'(1 − f')] at ETA_END for wall curvature a. */
    private static double[] integrate(double a, EventHandler... events) {
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(1e-12, 0.05, TOLERANCE, TOLERANCE);
        for (EventHandler e : events) integrator.addEventHandler(e, 0.05, 1e-14, 1000);
        double[] y = {0.0, 0.0, a, 0.0, 0.0};
        integrator.integrate(new Equations(), 0.0, y, ETA_END, y);
        return y;
    }

    private static final class Equations implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return 5;
        }

        @Override
        public void computeDerivatives(double eta, double[] y, double[] dy) {
            double f = y[0], fp = y[1], fpp = y[2];
            dy[0] = fp;
            dy[1] = fpp;
            dy[2] = -0.5 * f * fpp;
            dy[3] = 1.0 - fp;
            dy[4] = fp * (1.0 - fp);
        }
    }

    /** Records the η where f' first reaches a given value. */
    private static final class Crossing implements EventHandler {
        private final double level;
        double eta = Double.NaN;

        Crossing(double level) {
            this.level = level;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double t, double[] y) {
            return y[1] - level;
        }

        @Override
        public Action eventOccurred(double t, double[] y, boolean increasing) {
            if (Double.isNaN(eta)) eta = t;
            return Action.CONTINUE;
        }

        @Override
        public void resetState(double t, double[] y) {
        }
    }
}
