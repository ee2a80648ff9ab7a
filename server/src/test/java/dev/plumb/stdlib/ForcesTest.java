package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.n;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The force helpers of the standard library against their definitions, worked by hand. */
class ForcesTest {

    @Test
    void dynamicPressure() {
        // q = ρV²/2: 0.5 × 1.225 × 40² = 980 Pa.
        assertEquals(980.0, StdlibCheck.si("dynamic_pressure(1.225 kg/m^3, 40 m/s)"), 1e-9);
        // Units convert: 36 km/h is 10 m/s, so 0.5 × 1000 × 100 = 50 000 Pa.
        assertEquals(50_000.0, StdlibCheck.si("dynamic_pressure(1000 kg/m^3, 36 km/h)"), 1e-6);
    }

    @Test
    void reynoldsNumbersAgreeWithEachOther() {
        // Re = ρVL/μ = VL/ν with ν = μ/ρ: sea-level air (US Standard Atmosphere 1976:
        // ρ = 1.2250 kg/m³, μ = 1.7894e-5 Pa·s), 10 m/s over 1 m: 684 590.
        double byMu = StdlibCheck.si("reynolds(1.225 kg/m^3, 10 m/s, 1 m, 1.7894e-5 Pa*s)");
        assertEquals(1.225 * 10 * 1 / 1.7894e-5, byMu, 1e-6);
        double byNu = StdlibCheck.si("reynolds_nu(10 m/s, 1 m, " + (1.7894e-5 / 1.225) + " m^2/s)");
        assertEquals(byMu, byNu, byMu * 1e-12);
    }

    @Test
    void reynoldsNumberInTradeUnits() {
        // Water at 20 °C (998.21 kg/m³, 1.0016 cP), 1 m/s past a 10 cm body:
        // 998.21 × 1 × 0.1 / 1.0016e-3 = 99 661.5.
        assertEquals(998.21 * 0.1 / 1.0016e-3, StdlibCheck.si("reynolds(998.21 kg/m^3, 1 m/s, 10 cm, 1.0016 cP)"), 1e-6);
        // 1 cSt = 1e-6 m²/s: 2 m/s over 0.5 m is Re = 1e6.
        assertEquals(1e6, StdlibCheck.si("reynolds_nu(2 m/s, 0.5 m, 1 cSt)"), 1e-6);
    }

    @Test
    void aDynamicViscosityWhereTheKinematicOneBelongsIsRefused() {
        // The classic slip: μ passed for ν. reynolds_nu(V, L, nu: kinematic_viscosity) refuses it.
        List<Diagnostic> d = StdlibCheck.diagnostics("reynolds_nu(2 m/s, 0.5 m, 1.0016e-3 Pa*s)");
        assertTrue(d.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + d);
        List<Diagnostic> swapped = StdlibCheck.diagnostics("dynamic_pressure(40 m/s, 1.225 kg/m^3)");
        assertTrue(swapped.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + swapped);
    }

    @Test
    void forcesFromCoefficients() {
        // F = C·A·q: 1.2 × 2 m² × 980 Pa = 2352 N; 0.8 × 10 m² × 500 Pa = 4000 N.
        assertEquals(2352.0, StdlibCheck.si("drag_force(1.2, 2 m^2, 980 Pa)"), 1e-9);
        assertEquals(4000.0, StdlibCheck.si("lift_force(0.8, 10 m^2, 500 Pa)"), 1e-9);
        List<Diagnostic> d = StdlibCheck.diagnostics("drag_force(1.2, 2 m, 980 Pa)");
        assertTrue(d.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + d);
    }

    @Test
    void powerToOvercomeDrag() {
        // P = F·V: 100 N at 10 m/s is 1 kW; 1 kN at 36 km/h (10 m/s) is 10 kW.
        assertEquals(1000.0, StdlibCheck.si("drag_power(100 N, 10 m/s)"), 1e-9);
        assertEquals(10_000.0, StdlibCheck.si("drag_power(1 kN, 36 km/h)"), 1e-6);
    }

    @Test
    void resolvingAResultantForce() {
        // At 30° to the free stream: drag = R cos 30° = R √3/2, lift = R sin 30° = R/2.
        assertEquals(100 * Math.sqrt(3) / 2, StdlibCheck.si("drag_from_resultant(100 N, 30 deg)"), 1e-9);
        assertEquals(50.0, StdlibCheck.si("lift_from_resultant(100 N, 30 deg)"), 1e-9);
        // Along the stream it is all drag; across it, all lift.
        assertEquals(100.0, StdlibCheck.si("drag_from_resultant(100 N, 0 deg)"), 1e-9);
        assertEquals(100.0, StdlibCheck.si("lift_from_resultant(100 N, 90 deg)"), 1e-9);
        // Whatever the angle, the components rebuild the resultant (Pythagoras).
        double d = StdlibCheck.si("drag_from_resultant(250 N, 37 deg)");
        double l = StdlibCheck.si("lift_from_resultant(250 N, 37 deg)");
        assertEquals(250.0, Math.hypot(d, l), 1e-9);
    }

    @Test
    void anAngleWithoutItsUnitIsAFinding() {
        // Angles are dimensionless, so a bare 30 is 30 rad: cos(30 rad) = 0.154, not cos 30° = 0.866
        // (by hand: 30 rad = 30 - 4*2π = 4.867 rad = 278.9°, cos = 0.1543). Computed, and warned.
        for (String f : new String[] {"drag_from_resultant", "lift_from_resultant"}) {
            RangeAssertions.assertOneWarning("x = " + f + "(100 N, 30)\n", "unit.bare-angle", f,
                n(30), n(Math.toDegrees(30)));
            RangeAssertions.assertClean(f + "(100 N, 30 deg)");
        }
        assertEquals(100 * Math.cos(30), StdlibCheck.si("drag_from_resultant(100 N, 30)"), 1e-9);
        // An angle from an inverse trigonometric function is one: atan(3/4) = 36.87° (3-4-5 triangle).
        RangeAssertions.assertClean("drag_from_resultant(250 N, atan(0.75))");
        assertEquals(200.0, StdlibCheck.si("drag_from_resultant(250 N, atan(0.75))"), 1e-9);
    }

    @Test
    void helpersHaveNoRangeToWarnAbout() {
        RangeAssertions.assertClean("dynamic_pressure(1.225 kg/m^3, 300 m/s)");
        RangeAssertions.assertClean("reynolds(1.225 kg/m^3, 0.001 m/s, 1 mm, 1.7894e-5 Pa*s)");
        RangeAssertions.assertClean("drag_force(0, 1 m^2, 1 Pa)");
        RangeAssertions.assertClean("drag_from_resultant(1 N, 180 deg)");
    }

    @Test
    void aSignPanelCalculationEndToEnd() {
        // A worked calc: a 3.2 m × 1.4 m panel normal to a 31 m/s gust in air at 12 °C and
        // 99.8 kPa, Cd = 1.2 (flat plate normal to the flow). By hand:
        // ρ = 99800/(287.05 × 285.15) = 1.21926 kg/m³, q = ρ × 31²/2, F = 1.2 × 4.48 m² × q.
        Analysis a = StdlibCheck.analyze("""
            input V  = 31 m/s
            input T  = 12 degC
            input p  = 99.8 kPa
            rho = air_density(T, p)
            q   = dynamic_pressure(rho, V)
            F   = drag_force(1.2, 3.2 m * 1.4 m, q)   in kN
            """);
        assertTrue(RangeAssertions.errors(a.diagnostics()).isEmpty(), () -> "" + a.diagnostics());
        double rho = 99800.0 / (287.05 * 285.15);
        double expected = 1.2 * 3.2 * 1.4 * 0.5 * rho * 31 * 31;
        double f = a.rows().stream()
            .filter(r -> r instanceof Row.ValueRow v && v.name().equals("F"))
            .mapToDouble(r -> ((Row.ValueRow) r).value().si())
            .findFirst().orElseThrow();
        assertEquals(expected, f, expected * 1e-9);
    }
}
