package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Cases: named variations evaluated again through the study run. Scenarios of our own; expected
 * ratios from the scaling laws derived in the comments.
 */
class CaseTest {
    private static Row.CaseRow variation(Analysis a, String name) {
        return a.rows().stream().filter(r -> r instanceof Row.CaseRow c && c.name().equals(name))
            .map(r -> (Row.CaseRow) r).findFirst().orElseThrow();
    }

    private static double ratio(Row.CaseRow c, String name) {
        Row.CaseValue v = c.changed().stream().filter(x -> x.name().equals(name)).findFirst().orElseThrow();
        return v.value().si() / v.base().si();
    }

    @Test
    void doublingTheSpeedScalesEachDragByItsLaw() {
        // Quadratic drag at constant Cd: F = ½ρV²CdA, so F(2V)/F(V) = 2² = 4.
        // Laminar plate (Blasius 1908, Cf = 1.328 Re^-½): D ∝ V^1.5, so 2^1.5.
        // Turbulent plate (1/7-power law, Cf = 0.074 Re^-0.2, Schlichting 1979 ch. XXI): D ∝ V^1.8, so 2^1.8.
        // A small survey boat of our own: a 5 cm laminar fin and a 2 m turbulent hull bottom (Re 7.5e4 and 3e6, doubled still inside both ranges) in water.
        Analysis a = Fixture.analyze("""
            input V = 1.5 m/s
            input rho = 1000 kg/m^3
            input nu = 1.0e-6 m^2/s
            input Cd = 1.1
            input A = 0.02 m^2
            F_form = 0.5 * rho * V^2 * Cd * A
            Re_fin = V * 0.05 m / nu
            D_fin = 0.5 * rho * V^2 * cf_plate_blasius_avg(Re_fin) * 0.03 m^2
            Re_hull = V * 2 m / nu
            D_hull = 0.5 * rho * V^2 * cf_plate_turb_avg(Re_hull) * 6 m^2
            case doubled: V = 2 * V
            """);
        Row.CaseRow c = variation(a, "doubled");
        assertEquals(4.0, ratio(c, "F_form"), 1e-12);
        assertEquals(Math.pow(2, 1.5), ratio(c, "D_fin"), 1e-12);
        assertEquals(Math.pow(2, 1.8), ratio(c, "D_hull"), 1e-12);
        assertEquals(2.0, ratio(c, "V"), 0.0, "the right side saw the base speed");
        assertTrue(a.diagnostics().isEmpty(), a.diagnostics().toString());
    }

    @Test
    void aCheckFailingUnderACaseIsAFindingThatNamesTheCase() {
        // F = 0.6 kg/m · V²: 240 N at 20 m/s, 1215 N at 45 m/s.
        Analysis a = Fixture.analyze("""
            input V = 20 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 400 N
            case storm: V = 45 m/s
            """);
        Row.CaseRow c = variation(a, "storm");
        assertEquals(Row.Verdict.FAILED, c.checks().get(0).verdict());
        List<Diagnostic> failed = a.diagnostics().stream().filter(d -> d.code() == Code.CHECK_FAILED).toList();
        assertEquals(1, failed.size());
        assertTrue(failed.get(0).message().startsWith("in case storm: check failed: F = 1215 N"), failed.get(0).message());
        assertEquals("240 N", Fixture.shown(a, "F"), "the base is left as it was");
    }

    @Test
    void aCheckWithSpreadIsJudgedAtTheCasesOwnBoundsAndInEachSweepRow() {
        // A hoarding frame of our own. F = 1.2 · A · ½ · 1.2 kg/m³ · V² = 1.44 kg/m · V² with A = 2 m², and
        // to first order u(F) = |dF/dV| · u(V) = 2.88 kg/m · V · 3 m/s (GUM, JCGM 100:2008, eq. 10).
        // Case V = 31 m/s: F = 1383.84 N, u(F) = 267.84 N, F at its upper bound 1651.68 N > 1500 N: the
        // check holds for the values but fails at its bounds. Case V = 25 m/s: F = 900 N, u(F) = 216 N,
        // 1116 N <= 1500 N: it holds at its bounds too.
        // Sweep rows: 28 m/s gives 1128.96 N + 241.92 N = 1370.88 N (holds); 32 m/s gives 1474.56 N,
        // below 1500 N, but 1474.56 N + 276.48 N = 1751.04 N (fails at its bounds).
        Analysis a = Fixture.analyze("""
            input V = 30 m/s ± 3 m/s
            input A = 2 m^2
            q = 0.5 * 1.2 kg/m^3 * V^2
            F = 1.2 * A * q in N
            check F <= 1500 N with spread "frame capacity"
            case storm: V = 31 m/s
            case breeze: V = 25 m/s
            sweep V over 28 m/s .. 32 m/s by 4 m/s
                show F
            """);
        Row.CheckRow storm = variation(a, "storm").checks().get(0);
        assertEquals(Row.Verdict.FAILS_AT_BOUND, storm.verdict());
        assertEquals(267.84, storm.spreads().get(0), 1e-3);
        assertEquals(Row.Verdict.PASSED, variation(a, "breeze").checks().get(0).verdict());
        assertEquals(216.0, variation(a, "breeze").checks().get(0).spreads().get(0), 1e-3);
        assertTrue(a.diagnostics().stream().anyMatch(d -> d.code() == Code.CHECK_FAILS_AT_BOUND
            && d.message().startsWith("in case storm:") && d.message().contains("1652 N")), a.diagnostics().toString());
        Row.SweepRow sweep = a.rows().stream().filter(r -> r instanceof Row.SweepRow).map(r -> (Row.SweepRow) r)
            .findFirst().orElseThrow();
        assertEquals(List.of(Row.Verdict.PASSED), sweep.lines().get(0).verdicts());
        assertEquals(List.of(Row.Verdict.FAILS_AT_BOUND), sweep.lines().get(1).verdicts());
        assertTrue(a.diagnostics().stream().anyMatch(d -> d.code() == Code.SWEEP_CHECK_FAILED
            && d.message().contains("at its bounds")), a.diagnostics().toString());
        assertTrue(a.diagnostics().stream().noneMatch(d -> d.code() == Code.SWEEP_ROW_FINDINGS), a.diagnostics().toString());
    }

    @Test
    void aSolvedValueIsSolvedAgainUnderACase() {
        // Terminal speed with constant Cd: V = sqrt(4 ρp g d / (3 ρ Cd)) ∝ sqrt(d): four times d, twice V.
        Analysis a = Fixture.analyze("""
            input d = 4 mm
            input rho_p = 2500 kg/m^3
            input rho = 1.2 kg/m^3
            input Cd = 0.47
            W = rho_p * pi * d^3 / 6 * 9.81 m/s^2
            F_D = 0.5 * rho * V_t^2 * Cd * pi * d^2 / 4
            seek V_t in 0.1 m/s .. 100 m/s where F_D = W
            case coarse: d = 4 * d
            """);
        assertEquals(2.0, ratio(variation(a, "coarse"), "V_t"), 1e-9);
    }

    @Test
    void aTemperatureOnAScaleShowsNoRatio() {
        Analysis a = Fixture.analyze("""
            input T = 15 degC
            rho = 101325 Pa / (287.05 J/(kg*K) * T)
            case winter: T = -10 degC
            """);
        Row.CaseRow c = variation(a, "winter");
        assertTrue(c.changed().get(0).value().point(), "given as a reading on its scale");
        // ρ = p/(R T): 288.15 K / 263.15 K.
        assertEquals(288.15 / 263.15, ratio(c, "rho"), 1e-12);
    }
}
