package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * First-order propagation of tolerances against hand derivations. For y = f(x₁ … xₙ) with
 * independent tolerances uᵢ, u_y² = Σ (∂f/∂xᵢ · uᵢ)² (JCGM 100:2008, eq. (10)); for a product
 * y = c·Π xᵢ^pᵢ that gives (u_y/y)² = Σ (pᵢ · uᵢ/xᵢ)²: relative tolerances add in quadrature, and
 * a power multiplies its base's relative tolerance by the exponent.
 */
class PropagationTest {
    private static Spread spread(Analysis a, String name) {
        return Fixture.value(a, name).spread();
    }

    private static double relative(Analysis a, String name) {
        return spread(a, name).si() / Math.abs(Fixture.value(a, name).value().si());
    }

    @Test
    void relativeTolerancesOfAProductAddInQuadrature() {
        // F = Cd · ½ρV² · A: (uF/F)² = (0.10)² + (0.03)² + (2 · 2/31)² + 0².
        Analysis a = Fixture.analyze("""
            input V = 31 m/s ± 2 m/s
            input rho = 1.2 kg/m^3 +- 3 %
            input A = 0.5 m^2
            input Cd = 1.2 ± 10 %
            F = Cd * 0.5 * rho * V^2 * A
            """);
        double expected = Math.sqrt(0.1 * 0.1 + 0.03 * 0.03 + Math.pow(2 * 2.0 / 31, 2));
        assertEquals(expected, relative(a, "F"), 1e-7);
        assertEquals(0.12, spread(a, "Cd").si(), 1e-15, "10 % of 1.2");
        assertNull(spread(a, "A"), "no tolerance, nothing reaches it");
        assertTrue(a.diagnostics().isEmpty(), a.diagnostics().toString());
    }

    @Test
    void aPowerMultipliesTheRelativeTolerance() {
        // y = x³ and z = sqrt(x) = x^½: u_y/y = 3 · ux/x, u_z/z = ½ · ux/x, ux/x = 0.2/4 = 5 %.
        Analysis a = Fixture.analyze("""
            input x = 4 m ± 0.2 m
            y = x^3
            z = sqrt(x / 1 m)
            """);
        assertEquals(0.15, relative(a, "y"), 1e-7);
        assertEquals(0.025, relative(a, "z"), 1e-7);
    }

    @Test
    void aQuotientsRelativeTolerancesAddInQuadratureToo() {
        // Re = V·L/ν: (u/Re)² = (uV/V)² + (uν/ν)² = 0.05² + 0.02².
        Analysis a = Fixture.analyze("""
            input V = 2 m/s ± 5 %
            input L = 1.5 m
            input nu = 1.0e-6 m^2/s ± 2 %
            Re = V * L / nu
            """);
        assertEquals(Math.hypot(0.05, 0.02), relative(a, "Re"), 1e-7);
    }

    @Test
    void aSolvedValueCarriesTheSpreadOfTheInputsItsEquationUses() {
        // Terminal speed with constant Cd: V = sqrt(4 ρp g d / (3 ρ Cd)) ∝ d^½, so uV/V = ½ · ud/d = ½ · 0.2/5.
        // Gravel of our own in air.
        Analysis a = Fixture.analyze("""
            input d = 5 mm ± 0.2 mm
            input rho_p = 2650 kg/m^3
            input rho = 1.2 kg/m^3
            input Cd = 0.45
            W = rho_p * pi * d^3 / 6 * 9.81 m/s^2
            F_D = 0.5 * rho * V_t^2 * Cd * pi * d^2 / 4
            seek V_t in 0.1 m/s .. 200 m/s where F_D = W
            """);
        assertEquals(0.5 * 0.2 / 5, relative(a, "V_t"), 1e-6);
    }

    @Test
    void aStatedAccuracyIsASourceAndTheSharesRankTheSources() {
        // Cd = cd_strut(Re) with accuracy 10 %; F = Cd · q: (uF/F)² = 0.10² + (uq/q)², uq/q = 2 · 1 %.
        // Shares of the variance: 0.01 / 0.0104 and 0.0004 / 0.0104.
        Analysis a = Fixture.analyze("""
            correlation cd_strut(Re)
                valid 1e4 <= Re <= 2e5
                accuracy 10 %
                = 0.12
            end
            input V = 10 m/s ± 1 %
            Cd = cd_strut(5e4)
            F = Cd * 0.5 * 1.2 kg/m^3 * V^2
            """);
        Spread s = spread(a, "F");
        assertEquals(Math.sqrt(0.0104), relative(a, "F"), 1e-7);
        assertEquals(List.of("accuracy of cd_strut (Cd)", "V"), s.shares().stream().map(Spread.Share::source).toList());
        assertEquals(0.01 / 0.0104, s.fraction(s.shares().get(0)), 1e-6);
        assertEquals(1.0, s.shares().stream().mapToDouble(s::fraction).sum(), 1e-12);
    }

    @Test
    void aTemperatureToleranceIsADifference() {
        // ρ = p / (R T): uρ/ρ = uT/T = 2 K / 288.15 K.
        Analysis a = Fixture.analyze("""
            input T = 15 degC ± 2 K
            rho = 101325 Pa / (287.05 J/(kg*K) * T)
            """);
        assertEquals(2 / 288.15, relative(a, "rho"), 1e-7);
        assertEquals(2.0, spread(a, "T").si(), 1e-15);
    }
}
