package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/** `evolve`: motions against closed forms, results the calc can use, and the findings. */
class MotionTest {
    private static final double G = 9.80665; // standard gravity, exact (3rd CGPM, 1901)

    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    private static double si(Analysis a, String name) {
        return Fixture.value(a, name).value().si();
    }

    private static void relative(double expected, double actual, double tolerance, String what) {
        assertEquals(expected, actual, Math.abs(expected) * tolerance, what);
    }

    @Test
    void aSmallGrainSettlingInStokesFlowFollowsTheExponentialApproach() {
        // Derivation (Stokes drag 3πμdv, added mass and the history force neglected): a sphere of
        // density ρp, diameter d, volume V = πd³/6 and mass m = ρp V released from rest in a fluid
        // of density ρf and viscosity μ obeys m dv/dt = (ρp − ρf) V g − 3πμ d v. Dividing by m,
        // dv/dt = g' − v/τ with g' = g (1 − ρf/ρp) and τ = ρp V / (3πμ d) = ρp d² / (18 μ). With
        // v(0) = 0 the solution is v(t) = v_t (1 − e^(−t/τ)), v_t = g' τ.
        // The case: a 50 µm quartz grain (2650 kg/m³) in water at 20 °C (998.2 kg/m³, 1.002 mPa·s,
        // IAPWS values from memory; any values would do for the closed form).
        Analysis a = Fixture.analyze("""
            input rho_p = 2650 kg/m^3
            input rho_f = 998.2 kg/m^3
            input mu    = 1.002e-3 Pa*s
            input d     = 50 um
            V_p  = pi * d^3 / 6
            m_p  = rho_p * V_p
            W_net = (rho_p - rho_f) * V_p * g_n
            evolve v from 0 m/s over t
                rates (W_net - 3 * pi * mu * d * v) / m_p
                until t >= 0.01 s
            v_a = v(0.1 ms)
            v_b = v(0.5 ms)
            v_c = v(2 ms)
            """);
        assertEquals(List.of(), codes(a));
        double tau = 2650 * 50e-6 * 50e-6 / (18 * 1.002e-3);
        double vt = G * (1 - 998.2 / 2650) * tau;
        relative(vt * (1 - Math.exp(-1e-4 / tau)), si(a, "v_a"), 1e-6, "v at 0.1 ms");
        relative(vt * (1 - Math.exp(-5e-4 / tau)), si(a, "v_b"), 1e-6, "v at 0.5 ms");
        relative(vt * (1 - Math.exp(-2e-3 / tau)), si(a, "v_c"), 1e-6, "v at 2 ms");
        relative(vt * (1 - Math.exp(-1e-2 / tau)), si(a, "v"), 1e-6, "v at the stop");
        relative(0.01, si(a, "t"), 1e-9, "the stop on the time");
    }

    @Test
    void aBodyFallingWithQuadraticDragFollowsTheHyperbolicTangent() {
        // Derivation (constant Cd, added mass neglected): m dv/dt = (ρp − ρf) V g − ½ ρf Cd A v²
        // for v ≥ 0. With m = ρp V, g' = g (1 − ρf/ρp) and k = ½ ρf Cd A / m this is
        // dv/dt = g' (1 − v²/v_t²), v_t = √(g'/k). Separating, v_t atanh(v/v_t) = g' t, so from
        // rest v(t) = v_t tanh(g' t / v_t); integrating again, y(t) = (v_t²/g') ln cosh(g' t / v_t).
        // It reaches 0.99 v_t at t = (v_t/g') atanh(0.99).
        // The case (invented): a 40 mm steel ball (7850 kg/m³) in water (998 kg/m³), Cd = 0.47
        // held constant.
        Analysis a = Fixture.analyze("""
            input rho_p = 7850 kg/m^3
            input rho_f = 998 kg/m^3
            input d     = 40 mm
            input Cd    = 0.47
            V_p  = pi * d^3 / 6
            m_p  = rho_p * V_p
            A    = pi * d^2 / 4
            W_net = (rho_p - rho_f) * V_p * g_n
            v_t  = sqrt(W_net / (0.5 * rho_f * Cd * A))
            evolve v, y from 0 m/s, 0 m over t
                rates (W_net - 0.5 * rho_f * Cd * A * v^2) / m_p, v
                until v >= 0.99 * v_t
            v_1 = v(0.1 s)
            y_1 = y(0.1 s)
            """);
        assertEquals(List.of(), codes(a));
        double gp = G * (1 - 998.0 / 7850);
        double vp = Math.PI * Math.pow(0.04, 3) / 6;
        double k = 0.5 * 998 * 0.47 * Math.PI * 0.04 * 0.04 / 4 / (7850 * vp);
        double vt = Math.sqrt(gp / k);
        relative(vt, si(a, "v_t"), 1e-12, "terminal speed");
        relative(vt * Math.tanh(gp * 0.1 / vt), si(a, "v_1"), 1e-6, "v at 0.1 s");
        relative(vt * vt / gp * Math.log(Math.cosh(gp * 0.1 / vt)), si(a, "y_1"), 1e-6, "y at 0.1 s");
        double tStop = vt / gp * 0.5 * Math.log((1 + 0.99) / (1 - 0.99));
        relative(tStop, si(a, "t"), 1e-6, "time to 99 % of the terminal speed");
        relative(0.99 * vt, si(a, "v"), 1e-9, "speed at the stop");
        relative(vt * vt / gp * Math.log(Math.cosh(gp * tStop / vt)), si(a, "y"), 1e-6, "depth at the stop");
        // The states and the time are names of their own: what uses y depends on the motion.
        assertTrue(a.graph().uses("y").contains("t"), a.graph().uses("y").toString());
        assertTrue(a.graph().dependents("t").contains("y_1"));
        Trajectory tr = a.trajectory("y");
        assertNotNull(tr);
        assertEquals(List.of("t", "v", "y"), tr.names());
        // Ten rows and the stop when `every` is not given.
        assertEquals(11, tr.times().length);
        relative(tStop, tr.end(), 1e-6, "the table ends at the stop");
    }

    @Test
    void aStateReadOutsideTheMotionIsADomainError() {
        Analysis a = Fixture.analyze("input u = 2 m/s\nevolve x from 0 m over t rates u until x >= 10 m\nx_late = x(8 s)\n");
        assertEquals(List.of(Code.MATH_DOMAIN), codes(a));
        assertFalse(Fixture.value(a, "x_late").value().known());
        // by hand: 10 m at 2 m/s takes 5 s
        relative(5, si(a, "t"), 1e-9, "the stop");
    }

    @Test
    void aCorrelationThatLeavesItsRangeDuringTheMotionWarnsOnceWithTheRangeVisited() {
        // A 2 mm steel ball shot through still water at 1.5 m/s slows under drag; Schiller–Naumann
        // (valid to Re = 800) is used from Re ≈ 3000 (by hand: 998 × 1.5 × 0.002 / 0.001 = 2994)
        // until Re = 100. Outside at the start, inside at the stop: one warning, from the motion.
        Analysis a = Fixture.analyze("""
            input d = 2 mm
            input rho_p = 7800 kg/m^3
            input rho_f = 998 kg/m^3
            input mu = 1.0e-3 Pa*s
            evolve v, x from 1.5 m/s, 0 m over t
                rates -0.75 * rho_f / rho_p * Cd * v^2 / d, v
                until Re <= 100
            Re = rho_f * v * d / mu
            Cd = cd_sphere_sn(Re)
            """);
        assertEquals(List.of(Code.RANGE_OUTSIDE), codes(a));
        String message = a.diagnostics().get(0).message();
        assertTrue(message.startsWith("during the motion, first at t = 0 s") && message.contains("Re from 100 to 2990"),
            message);
        relative(100, si(a, "Re"), 1e-6, "Re at the stop");
        assertEquals(List.of("cd_sphere_sn: Re from 100 to 2990"), a.trajectory("t").visited());
    }

    @Test
    void aMotionWhoseRatesCostTooMuchIsStoppedByTheBudget() {
        // Each evaluation of the rate walks more than 2^14 = 16,384 nodes (a function that calls the
        // one below it twice, fourteen levels deep); a stop that never comes lets the steps grow to
        // the end of the time axis, some 350 steps of about 13 evaluations: over 70,000,000 nodes, past
        // the statement's 20,000,000. The motion is cut, with the finding, and the rest goes on.
        StringBuilder calc = new StringBuilder("f0(x) = x\n");
        for (int i = 1; i <= 14; i++) calc.append("f").append(i).append("(x) = f").append(i - 1).append("(x) + f")
            .append(i - 1).append("(x)\n");
        calc.append("evolve y from 0 over t rates f14(1) / 16384 / 1 s until y <= -1\nz = 2\n");
        Analysis a = Fixture.analyze(calc.toString());
        assertEquals(List.of(Code.LIMIT_BUDGET), codes(a));
        assertFalse(Fixture.value(a, "y").value().known());
        assertEquals(2, si(a, "z"), 0);
    }

    @Test
    void aStateNamedLikeTheTimeIsADuplicateAndNothingMoves() {
        Analysis a = Fixture.analyze("evolve t from 1 over t rates 1 / 1 s until t >= 2\n");
        assertEquals(List.of(Code.NAME_DUPLICATE), codes(a));
        assertFalse(Fixture.value(a, "t").value().known());
    }

    @Test
    void aLongMotionWithAFineTableIsCheckedAtItsStepsNotAtEveryRow() {
        // by hand: x = 1 m + 1 m/s × t reaches 1e6 m at t = 999,999 s; the table asks for a row
        // every millisecond (a billion rows), so it is widened to 1,000 rows, and the stop is
        // still found at the integrator's steps.
        Analysis a = Fixture.analyze("evolve x from 1 m over t rates 1 m/s until x >= 1e6 m every 1 ms\n");
        assertEquals(List.of(), codes(a));
        relative(999_999, si(a, "t"), 1e-9, "the stop");
        assertTrue(a.trajectory("x").widened());
        assertEquals(Trajectory.MAX_ROWS + 1, a.trajectory("x").times().length);
    }

    @Test
    void theFindingsOfTheFixtures() {
        Fixture.checkResource("motion.count-mismatch.plumb");
        Fixture.checkResource("motion.not-evaluated.plumb");
        Fixture.checkResource("motion.stops-at-start.plumb");
        Fixture.checkResource("motion.no-stop.plumb");
        Fixture.checkResource("motion.step-collapse.plumb");
        Fixture.checkResource("motion.units.plumb");
    }
}
