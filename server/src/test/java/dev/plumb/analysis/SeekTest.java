package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;

/** `seek`: terminal velocities against independent results, and the solver's reporting. */
class SeekTest {
    private static final double G = 9.80665; // standard gravity, exact (3rd CGPM, 1901)

    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    /** A falling sphere: weight less buoyancy balances drag with Cd from the given call. */
    private static String settling(String d, String rhoP, String rhoF, String mu, String cd, String bracket) {
        return "input d = " + d + "\ninput rho_p = " + rhoP + "\ninput rho_f = " + rhoF + "\ninput mu = " + mu + "\n"
            + "W = (rho_p - rho_f) * g_n * pi * d^3 / 6\n"
            + "seek V " + bracket + "\n    where drag = W\n"
            + "Re = rho_f * V * d / mu\n"
            + "Cd = " + cd + "(Re)\n"
            + "drag = Cd * pi * d^2 / 4 * 0.5 * rho_f * V^2\n";
    }

    @Test
    void stokesRegimeMatchesStokesLaw() {
        // Stokes' law (Stokes 1851): V = (rho_p - rho_f) g d² / (18 mu), the closed form of
        // 24/Re drag; a 20 µm quartz grain in water at 20 °C settles at Re ≈ 0.007.
        Analysis a = Fixture.analyze(settling("20 um", "2650 kg/m^3", "998.2 kg/m^3", "1.002 mPa*s",
            "cd_sphere_stokes", "in 1 um/s .. 1 m/s"));
        assertEquals(List.of(), codes(a));
        double expected = (2650 - 998.2) * G * 20e-6 * 20e-6 / (18 * 1.002e-3);
        assertEquals(expected, Fixture.value(a, "V").value().si(), expected * 1e-9);
    }

    /** Schiller–Naumann (1933): Cd = 24/Re (1 + 0.15 Re^0.687), coded here independently. */
    private static double schillerNaumann(double re) {
        return 24 / re * (1 + 0.15 * Math.pow(re, 0.687));
    }

    /** Terminal velocity by an independent Brent solve in plain Java with Commons Math. */
    private static double terminalVelocity(double d, double rhoP, double rhoF, double mu,
                                           java.util.function.DoubleUnaryOperator cd) {
        double weight = (rhoP - rhoF) * G * Math.PI * d * d * d / 6;
        UnivariateFunction f = v -> cd.applyAsDouble(rhoF * v * d / mu) * Math.PI * d * d / 4 * 0.5 * rhoF * v * v - weight;
        return new BrentSolver(1e-14, 1e-18).solve(1000, f, 1e-9, 100);
    }

    @Test
    void denseSphereInWaterMatchesAnIndependentSolve() {
        // A 1 mm glass bead (2500 kg/m³) in water at 20 °C (998.2 kg/m³, 1.002 mPa·s: IAPWS
        // values, from memory) settles at Re ≈ 150, inside the Schiller–Naumann range.
        Analysis a = Fixture.analyze(settling("1 mm", "2500 kg/m^3", "998.2 kg/m^3", "1.002 mPa*s", "cd_sphere_sn",
            "in 1 mm/s .. 10 m/s"));
        assertEquals(List.of(), codes(a), "Re at the root lies in the correlation's range");
        double expected = terminalVelocity(1e-3, 2500, 998.2, 1.002e-3, SeekTest::schillerNaumann);
        assertEquals(expected, Fixture.value(a, "V").value().si(), expected * 1e-9);
        double re = Fixture.value(a, "Re").value().si();
        assertTrue(re > 50 && re < 800, "Re = " + re);
    }

    @Test
    void hailstoneInAirMatchesAnIndependentSolve() {
        // A 10 mm hailstone of ice (917 kg/m³) in air at 1.2 kg/m³ and 1.8e-5 Pa·s falls at
        // Re ≈ 1e4. Clift–Gauvin (1970) as restated in Clift, Grace and Weber (1978):
        // Cd = 24/Re (1 + 0.15 Re^0.687) + 0.42 / (1 + 4.25e4 Re^-1.16), coded here independently.
        Analysis a = Fixture.analyze(settling("10 mm", "917 kg/m^3", "1.2 kg/m^3", "1.8e-5 Pa*s",
            "cd_sphere_clift_gauvin", "from 5 m/s"));
        assertEquals(List.of(), codes(a));
        double expected = terminalVelocity(10e-3, 917, 1.2, 1.8e-5,
            re -> schillerNaumann(re) + 0.42 / (1 + 4.25e4 * Math.pow(re, -1.16)));
        assertEquals(expected, Fixture.value(a, "V").value().si(), expected * 1e-9);
    }

    @Test
    void rangeWarningsSpeakOfTheSolutionOnly() {
        // The same bead with the Stokes law: the root's Re (≈ 400) is far outside Stokes' range;
        // one warning, with the Re of the root, not of any trial value.
        Analysis a = Fixture.analyze(settling("1 mm", "2500 kg/m^3", "998.2 kg/m^3", "1.002 mPa*s",
            "cd_sphere_stokes", "in 1 mm/s .. 10 m/s"));
        assertEquals(List.of(Code.RANGE_OUTSIDE), codes(a));
        double re = Fixture.value(a, "Re").value().si();
        String shown = dev.plumb.units.QuantityFormat.number(re, 4);
        assertTrue(a.diagnostics().get(0).message().contains("Re = " + shown), a.diagnostics().get(0).message());
    }

    @Test
    void theSolutionRecordsItsIterations() {
        Analysis a = Fixture.analyze("seek x in 0 .. 3 where x^2 = 2\n");
        Row.ValueRow row = Fixture.value(a, "x");
        assertEquals(Math.sqrt(2), row.value().si(), 1e-12);
        Solution s = row.solution();
        assertNotNull(s);
        assertTrue(s.iterations() > 2 && s.iterations() < 30, "iterations: " + s.iterations());
        assertTrue(Math.abs(s.residual()) < 1e-10);
        Solution.Step last = s.steps().get(s.steps().size() - 1);
        assertTrue(last.low() <= Math.sqrt(2) + 1e-12 && last.high() >= Math.sqrt(2) - 1e-12, "the bracket holds the root");
    }

    @Test
    void theBracketMayBeNamedValuesAndTheHeadMayContinueOnTheNextLine() {
        // `in` right after `seek NAME` starts the bracket: the names after it are values, not units.
        Analysis a = Fixture.analyze("""
            input x_lo = 1 m
            input x_hi = 4 m
            seek x in x_lo .. x_hi where x^2 = 4 m^2   in mm
            seek y
                in x_lo .. x_hi
                where y^3 = 8 m^3
            """);
        assertEquals(List.of(), codes(a));
        // by hand: x² = 4 m² and y³ = 8 m³ give x = y = 2 m, x shown in mm
        assertEquals("2000 mm", Fixture.shown(a, "x"));
        assertEquals(2, Fixture.value(a, "y").value().si(), 1e-12);
    }

    @Test
    void aStartValueBracketsOutward() {
        Analysis a = Fixture.analyze("seek h from 1 m where h^3 = 8 m^3\n");
        assertEquals(List.of(), codes(a));
        assertEquals(2, Fixture.value(a, "h").value().si(), 1e-12);
        assertEquals("2 m", Fixture.shown(a, "h"));
    }

    @Test
    void eachSolverDiagnosticHasItsFixture() {
        Fixture.checkResource("solve.no-root.plumb");
        Fixture.checkResource("solve.not-converged.plumb");
        Fixture.checkResource("solve.multiple-roots.plumb");
        Fixture.checkResource("solve.not-evaluated.plumb");
    }

    @Test
    void noRootSuggestsAWiderBracket() {
        Analysis a = Fixture.analyze("seek c in 2 .. 5 where c^2 = 1\n");
        assertEquals(List.of(Code.SOLVE_NO_ROOT), codes(a));
        String m = a.diagnostics().get(0).message();
        assertTrue(m.contains("LHS − RHS is 3 at 2 and 24 at 5"), m);
        assertTrue(m.contains("a wider search finds a sign change between"), m);
    }

    @Test
    void severalRootsAreAllReported() {
        Analysis a = Fixture.analyze("seek b in -3 .. 3 where b^2 = 1\n");
        assertEquals(List.of(Code.SOLVE_MULTIPLE_ROOTS), codes(a));
        assertEquals(-1, Fixture.value(a, "b").value().si(), 1e-12);
        assertTrue(a.diagnostics().get(0).message().contains("has 2 roots"));
    }

    @Test
    void aJumpIsNotARoot() {
        Fixture.assertOneFinding("seek a in -1 .. 2 where 1 / a = 0\n", Code.SOLVE_NOT_CONVERGED,
            Code.SOLVE_NOT_CONVERGED.severity(), "jump");
    }

    @Test
    void errorsInTheEquationAreReportedOnceAtTheirPlace() {
        Analysis a = Fixture.analyze("seek e in 1 m .. 2 m where e = 3 s\nseek f in 1 .. 2 where f = spedd\n");
        assertEquals(List.of(Code.UNIT_MISMATCH, Code.NAME_UNKNOWN), codes(a));
    }

    @Test
    void aMistakeInADependentIsReportedAtItsLineAsWithoutTheSolve() {
        // The same three mistakes, once with V given and once with V solved for: each is reported
        // at its own line either way, and the solve adds only its own error naming the first.
        String mistakes = """
            Re = reynolds(1.2 kg/m^3, V, 0.05 m, 15 cSt)
            M  = W * 0.3 m + W * V / (1 m/s)
            k  = ln(V * 1 s)
            F  = 0.5 * 1.2 kg/m^3 * V^2 * 0.002 m^2 + 0 N * (Re + M / (1 N*m) + k)
            """;
        Analysis given = Fixture.analyze("V = 10 m/s\nW = 0.4 N\n" + mistakes);
        Analysis solved = Fixture.analyze("seek V in 1 m/s .. 100 m/s where F = W\nW = 0.4 N\n" + mistakes);
        assertEquals(List.of("unit.mismatch@3", "unit.mismatch@4", "unit.not-dimensionless@5"), found(given));
        assertEquals(found(given), found(solved).stream().filter(s -> !s.startsWith("solve.")).toList());
        assertEquals(List.of("solve.not-evaluated@1"), found(solved).stream().filter(s -> s.startsWith("solve.")).toList());
    }

    /** "code@line" of every finding, in order. */
    private static List<String> found(Analysis a) {
        return a.diagnostics().stream().map(d -> d.code().id() + "@" + a.lines().line(d.span().start())).toList();
    }

    @Test
    void extremeBracketsAreSearchedOrRefusedNeverSilentlyWrong() {
        // by hand: w^3 = 0 at w = 0 exactly
        Analysis a = Fixture.analyze("seek w in -3 .. 3 where w^3 = 0\n");
        assertEquals(List.of(), codes(a));
        assertEquals(0, Fixture.value(a, "w").value().si(), 0);
        // x = 3 lies in a bracket of ±1e308, far too wide to pin it down: said, not guessed
        Fixture.assertOneFinding("seek x in -1e308 .. 1e308 where x = 3\n", Code.SOLVE_NOT_CONVERGED,
            Code.SOLVE_NOT_CONVERGED.severity(), "narrow the bracket");
        Fixture.assertOneFinding("seek y in 0 .. 0 where y = 0\n", Code.SOLVE_NO_ROOT,
            Code.SOLVE_NO_ROOT.severity(), "holds a single value");
    }

    @Test
    void theBracketMustHaveOneDimension() {
        Fixture.assertOneFinding("seek x in 1 m .. 2 s where x = 1.5 m\n", Code.UNIT_MISMATCH,
            Code.UNIT_MISMATCH.severity(), "the bracket's ends differ");
    }
}
