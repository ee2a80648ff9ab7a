package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Sweeps: every row a full re-evaluation. The scenarios are our own; the expected values come
 * from closed forms derived in the comments and the published forms of the correlations used.
 */
class SweepTest {
    private static Row.SweepRow sweep(Analysis a) {
        return a.rows().stream().filter(r -> r instanceof Row.SweepRow).map(r -> (Row.SweepRow) r).findFirst().orElseThrow();
    }

    /** The exponent n of y ∝ x^n between two rows: ln(y2/y1) / ln(x2/x1). */
    private static double slope(Row.SweepLine a, Row.SweepLine b, int column) {
        return Math.log(b.results().get(column).si() / a.results().get(column).si()) / Math.log(b.given().si() / a.given().si());
    }

    @Test
    void aGridGivesEveryPairOfValuesItsOwnRow() {
        // A pole of our own: F = ½ρ Cd d L V² with ρ = 1.2 kg/m³, Cd = 1.0, L = 1 m, so F = 0.6 kg/m³ · V² · d · 1 m:
        // 6 N at V = 10 m/s, d = 0.1 m, scaling with V² and with d: the grid's rows are V-major.
        Analysis a = Fixture.analyze("""
            input V = 20 m/s
            input d = 0.2 m
            F = 0.6 kg/m^3 * V^2 * d * 1 m in N
            check F <= 60 N
            sweep V over 10 m/s .. 30 m/s by 10 m/s, d over 0.1 m .. 0.3 m in 3 steps
                show F
            """);
        Row.SweepRow w = sweep(a);
        assertEquals("d", w.across().name());
        assertEquals(9, w.lines().size());
        double[] vs = {10, 20, 30};
        double[] ds = {0.1, 0.2, 0.3};
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                Row.SweepLine l = w.lines().get(3 * i + j);
                assertEquals(vs[i], l.given().si(), 1e-12);
                assertEquals(ds[j], l.across().si(), 1e-12);
                assertEquals(0.6 * vs[i] * vs[i] * ds[j], l.results().get(0).si(), 1e-9);
                boolean holds = 0.6 * vs[i] * vs[i] * ds[j] <= 60;
                assertEquals(holds ? Row.Verdict.PASSED : Row.Verdict.FAILED, l.verdicts().get(0), "V " + vs[i] + ", d " + ds[j]);
            }
        }
        // 72 N, 108 N and 162 N fail: rows 6, 8 and 9, each named by its pair.
        Diagnostic failed = a.diagnostics().stream().filter(d -> d.code() == Code.SWEEP_CHECK_FAILED).findFirst().orElseThrow();
        assertTrue(failed.message().contains("rows 6, 8, 9 (V = 20 m/s and d = 0.3 m; V = 30 m/s and d = 0.2 m; "
            + "V = 30 m/s and d = 0.3 m)"), failed.message());
    }

    @Test
    void aGridOfOneValueTwiceOrOfTooManyRowsIsRefused() {
        Analysis twice = Fixture.analyze("""
            input V = 20 m/s
            F = 0.6 kg/m * V^2 in N
            sweep V over 10 m/s .. 30 m/s by 10 m/s, V over 1 m/s .. 2 m/s by 1 m/s
                show F
            """);
        assertTrue(twice.diagnostics().stream().anyMatch(d -> d.code() == Code.SWEEP_INVALID
            && d.message().contains("a grid varies two different values")), twice.diagnostics().toString());
        // 200 × 100 = 20,000 rows, over the 10,000 a sweep may have.
        Analysis many = Fixture.analyze("""
            input V = 20 m/s
            input d = 0.2 m
            F = 0.6 kg/m^3 * V^2 * d * 1 m in N
            sweep V over 1 m/s .. 200 m/s by 1 m/s, d over 0.01 m .. 1 m in 100 steps
                show F
            """);
        assertTrue(many.diagnostics().stream().anyMatch(d -> d.code() == Code.SWEEP_INVALID
            && d.message().contains("20,000 rows (200 × 100)")), many.diagnostics().toString());
        assertEquals(0, sweep(many).lines().size());
    }

    @Test
    void quadraticDragScalesWithTheSquareOfSpeedAtConstantCd() {
        // F = ½ ρ V² Cd A with Cd, ρ, A fixed: F(V2)/F(V1) = (V2/V1)², and the values are exact products.
        Analysis a = Fixture.analyze("""
            input V = 12 m/s
            input rho = 1.225 kg/m^3
            input Cd = 1.17
            input A = 0.8 m^2
            F_D = 0.5 * rho * V^2 * Cd * A
            sweep V over 10 m/s .. 40 m/s by 5 m/s
                show F_D in N
            """);
        Row.SweepRow s = sweep(a);
        assertEquals(7, s.lines().size());
        for (Row.SweepLine l : s.lines()) {
            double v = l.given().si();
            assertEquals(0.5 * 1.225 * v * v * 1.17 * 0.8, l.results().get(0).si(), 1e-9);
        }
        assertEquals(2.0, slope(s.lines().get(0), s.lines().get(6), 0), 1e-12);
        assertEquals(40.0, s.lines().get(6).given().si(), 0.0, "the end is reached by a whole number of steps");
    }

    @Test
    void laminarPlateFrictionDragScalesWithSpeedToThePowerOneAndAHalf() {
        // Blasius (1908): Cf = 1.328/sqrt(Re_L), Re_L = V L / ν, so D = ½ ρ V² Cf S ∝ V² · V^-½ = V^1.5.
        // A glider's wing-tip fence in still air, all laminar: Re_L from 2.7e4 to 2.7e5.
        Analysis a = Fixture.analyze("""
            input V = 5 m/s
            input L = 0.4 m
            input nu = 1.5e-5 m^2/s
            input rho = 1.2 kg/m^3
            input S = 0.06 m^2
            Re = V * L / nu
            Cf = cf_plate_blasius_avg(Re)
            D = 0.5 * rho * V^2 * Cf * S
            sweep V over 1 m/s .. 10 m/s in 5 log steps
                show D, Re
            """);
        Row.SweepRow s = sweep(a);
        assertEquals(5, s.lines().size());
        assertEquals(Math.sqrt(10), s.lines().get(2).given().si() / s.lines().get(0).given().si(), 1e-12,
            "log steps: equal ratios, 10^(1/4) per step");
        for (int i = 1; i < 5; i++) assertEquals(1.5, slope(s.lines().get(i - 1), s.lines().get(i), 0), 1e-9);
        assertTrue(s.lines().stream().allMatch(l -> l.outside().isEmpty()));
    }

    @Test
    void turbulentPlateFrictionDragScalesWithSpeedToThePowerOnePointEight() {
        // 1/7-power law (Prandtl 1927, in Schlichting 1979 ch. XXI): Cf = 0.074 Re_L^-0.2, so
        // D ∝ V² · V^-0.2 = V^1.8. A barge's flat bottom: Re_L from 1.5e6 to 6e6, inside 5e5 .. 1e7.
        Analysis a = Fixture.analyze("""
            input V = 1 m/s
            input L = 3 m
            input nu = 1.0e-6 m^2/s
            input rho = 1000 kg/m^3
            input S = 6 m^2
            Re = V * L / nu
            Cf = cf_plate_turb_avg(Re)
            D = 0.5 * rho * V^2 * Cf * S
            sweep V over 0.5 m/s .. 2 m/s in 4 steps
                show D
            """);
        Row.SweepRow s = sweep(a);
        for (int i = 1; i < 4; i++) assertEquals(1.8, slope(s.lines().get(i - 1), s.lines().get(i), 0), 1e-9);
    }

    @Test
    void aSolvedValueIsSolvedAgainAtEveryRow() {
        // Terminal speed of a sphere with constant Cd: ρp·(π d³/6)·g = ½ ρ V² Cd (π d²/4)
        // gives V = sqrt(4 ρp g d / (3 ρ Cd)): V ∝ sqrt(d). Hail of our own invention in air.
        Analysis a = Fixture.analyze("""
            input d = 10 mm
            input rho_p = 900 kg/m^3
            input rho = 1.1 kg/m^3
            input Cd = 0.5
            g = 9.81 m/s^2
            W = rho_p * pi * d^3 / 6 * g
            F_D = 0.5 * rho * V_t^2 * Cd * pi * d^2 / 4
            seek V_t in 0.1 m/s .. 200 m/s where F_D = W
            sweep d over 5 mm .. 40 mm by 5 mm
                show V_t, F_D
            """);
        Row.SweepRow s = sweep(a);
        assertEquals(8, s.lines().size());
        for (Row.SweepLine l : s.lines()) {
            double d = l.given().si();
            double expected = Math.sqrt(4 * 900 * 9.81 * d / (3 * 1.1 * 0.5));
            assertEquals(expected, l.results().get(0).si(), expected * 1e-9);
        }
        assertTrue(a.diagnostics().isEmpty(), a.diagnostics().toString());
    }

    @Test
    void rowsOutsideARangeAreMarkedAndToldOnce() {
        Analysis a = Fixture.analyze("""
            input V = 5 m/s
            input L = 0.4 m
            input nu = 1.5e-5 m^2/s
            Re = V * L / nu
            Cf = cf_plate_blasius_avg(Re)
            sweep V over 5 m/s .. 200 m/s in 5 log steps
                show Cf
            """);
        Row.SweepRow s = sweep(a);
        List<Integer> marked = new java.util.ArrayList<>();
        for (int i = 0; i < s.lines().size(); i++) if (!s.lines().get(i).outside().isEmpty()) marked.add(i + 1);
        // Re_L = V·0.4/1.5e-5: 1.33e5, 3.35e5, 8.4e5, 2.1e6, 5.3e6; the entry is laminar (Re_crit 5e5)
        // and valid to 3e6, so rows 3 to 5 lie outside its regime or range.
        assertEquals(List.of(3, 4, 5), marked);
        assertEquals(List.of("Cf"), s.lines().get(4).outside());
        assertEquals(1, a.diagnostics().stream().filter(d -> d.code() == Code.SWEEP_RANGE).count());
        assertTrue(a.diagnostics().stream().noneMatch(d -> d.code() == Code.RANGE_OUTSIDE || d.code() == Code.RANGE_REGIME),
            "the base calc is inside: no finding of its own");
    }

    @Test
    void checksAreJudgedAtEveryRow() {
        Analysis a = Fixture.analyze("""
            input V = 20 m/s
            F = 0.6 kg/m * V^2 in N
            check F <= 400 N
            sweep V over 10 m/s .. 40 m/s by 10 m/s
                show F
            """);
        Row.SweepRow s = sweep(a);
        assertEquals(List.of("F <= 400 N"), s.checks());
        // F = 0.6 V²: 60, 240, 540, 960 N.
        assertEquals(List.of(false, false, true, true), s.lines().stream().map(Row.SweepLine::anyFails).toList());
    }

    @Test
    void theSweepLeavesTheCalcsOwnValuesAsTheyWere() {
        Analysis a = Fixture.analyze("""
            input V = 20 m/s
            F = 0.6 kg/m * V^2 in N
            sweep V over 10 m/s .. 40 m/s by 10 m/s show F
            """);
        assertEquals("240 N", Fixture.shown(a, "F"));
        assertFalse(sweep(a).lines().isEmpty());
    }

    @Test
    void aTemperaturePointCanBeSweptOnItsOwnScale() {
        // Air density from the ideal-gas law, ρ = p / (R T), with T in kelvin: 0 °C → 273.15 K.
        Analysis a = Fixture.analyze("""
            input T = 15 degC
            input p = 101325 Pa
            rho = p / (287.05 J/(kg*K) * T)
            sweep T over 0 degC .. 40 degC by 20 K
                show rho
            """);
        Row.SweepRow s = sweep(a);
        assertEquals(3, s.lines().size());
        assertEquals(101325 / (287.05 * 273.15), s.lines().get(0).results().get(0).si(), 1e-9);
        assertEquals("°C", s.unit().symbol());
    }

    @Test
    void aSpacingOtherThanLogIsASyntaxErrorThatSaysSo() {
        Fixture.assertOneFinding("input V = 2 m/s\nF = V * 1 kg/s\nsweep V over 1 m/s .. 3 m/s in 3 lin steps show F\n",
            Code.SYNTAX_ERROR, dev.plumb.diagnostics.Severity.ERROR, "'lin' is neither");
    }

    @Test
    void theWordsOfASweepStayNamesElsewhere() {
        Analysis a = Fixture.analyze("""
            over = 2
            by = 3
            steps = 4
            show = 5
            total = over * by * steps * show
            """);
        assertEquals("120", Fixture.shown(a, "total"));
    }
}
