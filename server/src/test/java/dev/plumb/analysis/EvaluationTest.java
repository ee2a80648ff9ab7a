package dev.plumb.analysis;

import static dev.plumb.analysis.Fixture.value;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Computed values against results worked out independently of the engine. */
class EvaluationTest {

    private static Analysis clean(String text) {
        return Fixture.check(text); // no annotations: no diagnostic at all
    }

    private static double si(Analysis a, String name) {
        return value(a, name).value().si();
    }

    @Test
    void repeatedSquaringOfAUnitIsReportedOnceAndNeverWrapsToANumber() {
        // Before the bound, 99·2^31 wrapped to 0 in an int: x32 was dimensionless and x32 + 1 passed.
        Fixture.check("""
            x1 = 1 m^99
            x2 = x1 * x1
            #    ^^^^^^^ math.not-finite: would have a unit with an exponent beyond ±100
            x3 = x2 * x2
            x4 = x3 * x3
            x5 = x4 * x4
            x6 = x5 * x5
            x7 = x6 * x6
            x8 = x7 * x7
            x9 = x8 * x8
            x10 = x9 * x9
            x11 = x10 * x10
            x12 = x11 * x11
            x13 = x12 * x12
            x14 = x13 * x13
            x15 = x14 * x14
            x16 = x15 * x15
            x17 = x16 * x16
            x18 = x17 * x17
            x19 = x18 * x18
            x20 = x19 * x19
            x21 = x20 * x20
            x22 = x21 * x21
            x23 = x22 * x22
            x24 = x23 * x23
            x25 = x24 * x24
            x26 = x25 * x25
            x27 = x26 * x26
            x28 = x27 * x27
            x29 = x28 * x28
            x30 = x29 * x29
            x31 = x30 * x30
            x32 = x31 * x31
            y = x32 + 1
            """);
    }

    @Test
    void aPowerBeyondTheExponentBoundIsTooLargeNotFractional() {
        Fixture.check("""
            p = (1 m^99)^99
            #   ^^^^^^^^^^^ math.not-finite: the result of (1 m^99)^99 would have a unit with an exponent beyond ±100
            q = (1 m^3)^0.5
            #   ^^^^^^^^^^^ unit.fractional-power
            """);
    }

    @Test
    void idealGasAirDensityAtSeaLevel() {
        Analysis a = clean("""
            input T = 15 degC
            input p = 101.325 kPa
            R = 287.05 J/(kg*K)   "specific gas constant of dry air"
            ρ = p / (R * T)
            """);
        // By hand: 101325 / (287.05 × 288.15) = 1.2250123 kg/m³.
        assertEquals(101325.0 / (287.05 * 288.15), si(a, "ρ"), 1e-12);
        // ICAO standard atmosphere, sea level: 1.225 kg/m³ at 15 °C and 101.325 kPa
        // (ICAO Doc 7488/3, Manual of the ICAO Standard Atmosphere, 1993; from memory).
        assertEquals(1.225, si(a, "ρ"), 1.225 * 1e-4);
        assertEquals("1.225 kg/m³", Fixture.shown(a, "ρ"));
    }

    @Test
    void unitConversionsInsideExpressions() {
        Analysis a = clean("""
            v = 60 mph in m/s
            v_k = 60 mph in km/h
            d = 5 in
            d_mm = 5 in in mm
            L = 2 ft + 6 in   in mm
            """);
        // NIST SP 811 (2008), Appendix B: mile = 1609.344 m and hour = 3600 s exactly, so
        // 60 mph = 60 × 1609.344 / 3600 m/s = 26.8224 m/s exactly (from memory).
        assertEquals(26.8224, si(a, "v"), 1e-12);
        assertEquals("26.82 m/s", Fixture.shown(a, "v"));
        assertEquals("96.56 km/h", Fixture.shown(a, "v_k"));
        // NIST SP 811 (2008), Appendix B: inch = 0.0254 m and foot = 0.3048 m exactly (from memory).
        assertEquals(0.127, si(a, "d"), 1e-15);
        assertEquals("5 in", Fixture.shown(a, "d"));
        assertEquals("127 mm", Fixture.shown(a, "d_mm"));
        assertEquals(2 * 0.3048 + 6 * 0.0254, si(a, "L"), 1e-15);
        assertEquals("762 mm", Fixture.shown(a, "L"));
    }

    @Test
    void moreSignificantFiguresOnRequest() {
        Analysis a = new Workspace(new FileSources(), new Settings(6, 1e-6))
            .analyzeText(Fixture.FILE, "v = 60 mph in m/s\n");
        assertEquals("26.8224 m/s", Fixture.shown(a, "v"));
    }

    @Test
    void inAfterANumberIsInchesUnlessAUnitFollows() {
        // `5 in` alone, before a note or a comment is five inches; `5 in mm` shows the plain
        // number 5 in mm, which is a dimension error; `5 in in mm` is five inches shown in mm.
        Analysis a = Fixture.check("""
            a = 5 in
            b = 5 in "bolt length"
            c = 5 in   # a code comment
            e = 2 in^2
            x = 5 in mm
            #        ^^ unit.mismatch: `in mm` shows a length (m), but x is a dimensionless number
            y = 5 in in mm
            """);
        for (String name : List.of("a", "b", "c", "y")) assertEquals(0.127, si(a, name), 1e-15, name);
        assertEquals(2 * 0.0254 * 0.0254, si(a, "e"), 1e-18);
        assertEquals("bolt length", value(a, "b").note());
    }

    @Test
    void temperatureArithmetic() {
        Analysis a = clean("""
            input T = 15 degC
            T_2 = T + 5 K
            ΔT = 30 degC - 10 degC
            T_c = T_2 in degC
            T_f = 50 degF
            T_fk = T_f in K
            """);
        // By definition of the Celsius scale, T/K = t/°C + 273.15 (SI Brochure, 9th ed., 2019; from memory).
        assertEquals(293.15, si(a, "T_2"), 1e-9);
        assertTrue(value(a, "T_2").value().point());
        // 30 °C − 10 °C is a difference of 20 K, not a point on a scale.
        assertEquals(20.0, si(a, "ΔT"), 1e-9);
        assertTrue(value(a, "ΔT").value().difference());
        assertEquals("20 K", Fixture.shown(a, "ΔT"));
        assertEquals("20 °C", Fixture.shown(a, "T_c"));
        // t/°C = (t/°F − 32) / 1.8, so 50 °F = 10 °C = 283.15 K (NIST SP 811 (2008), Appendix B; from memory).
        assertEquals(283.15, si(a, "T_f"), 1e-9);
        assertEquals("50 °F", Fixture.shown(a, "T_f"));
        assertEquals("283.2 K", Fixture.shown(a, "T_fk"));
    }

    @Test
    void aTemperatureWrittenInKelvinShowsItsCelsiusValue() {
        Analysis a = clean("""
            T = 288.15 K in degC
            T_2 = 300 K in degC
            """);
        // T/K = t/°C + 273.15 (SI Brochure, 9th ed., 2019; from memory).
        assertEquals("15 °C", Fixture.shown(a, "T"));
        assertEquals("26.85 °C", Fixture.shown(a, "T_2"));
    }

    @Test
    void equalityHoldsWithinOnePartInAMillion() {
        // Settings.DEFAULT: `==` and `!=` compare with a relative tolerance of 1e-6 (the
        // project's rule, docs/language.md).
        Analysis a = Fixture.check("""
            input L = 2 m
            check L == 2.000001 m
            check L == 1.999999 m
            check L != 2.00001 m
            check L <= 1.999999 m
            check L >= 2.000001 m
            check L == 2.00001 m
            #<^^^^^^^^^^^^^^^^^^^ check.failed: L = 2 m is not ==
            """);
        assertEquals(List.of(true, true, true, true, true, false), passed(a));
    }

    @Test
    void theToleranceComesFromTheSettings() {
        Analysis a = new Workspace(new FileSources(), new Settings(4, 1e-3))
            .analyzeText(Fixture.FILE, "input L = 2 m\ncheck L == 2.001 m\ncheck L != 2.01 m\n");
        assertEquals(List.of(), a.diagnostics());
        assertEquals(List.of(true, true), passed(a));
    }

    @Test
    void chainedChecksHoldOnlyWhenEveryComparisonHolds() {
        Analysis a = Fixture.check("""
            input x = 2
            input Re = 4.2e4
            check 1 < x < 3
            check 1e3 < Re <= 2e5   "flat-plate laminar range"
            check 1 < x < 2
            #<^^^^^^^^^^^^^^ check.failed: check failed: x = 2 is not < 2
            check 3 < x < 1
            #<^^^^^^^^^^^^^^ check.failed: check failed: 3 is not < x = 2; x = 2 is not < 1
            """);
        assertEquals(List.of(true, true, false, false), passed(a));
        assertEquals("1 < 2 < 3", dev.plumb.present.CheckText.detail(((Row.CheckRow) a.rows().get(2))));
    }

    @Test
    void userFunctions() {
        Analysis a = clean("""
            input ρ = 1.225 kg/m^3
            q(rho, v) = 0.5 * rho * v^2        "dynamic pressure"
            F(c, A, v) = c * A * q(ρ, v)       "drag force; uses the document's ρ"
            q_10 = q(ρ, 10 m/s)
            F_10 = F(1.2, 2 m^2, 10 m/s)   in kN
            """);
        // q = ½ρv² (definition of dynamic pressure, common practice): ½ × 1.225 × 10² = 61.25 Pa.
        assertEquals(61.25, si(a, "q_10"), 1e-12);
        // F = c·A·q = 1.2 × 2 × 61.25 = 147 N, by hand.
        assertEquals(147.0, si(a, "F_10"), 1e-12);
        assertEquals("0.147 kN", Fixture.shown(a, "F_10"));
    }

    @Test
    void aStatementContinuesOnMoreDeeplyIndentedLines() {
        Analysis a = clean("""
            input ρ = 1.2 kg/m^3
            F = 0.5 * ρ         # dynamic pressure times area
                * (10 m/s)^2
                  * 2 m^2
              in N
            G = F * 2
            """);
        // 0.5 × 1.2 × 100 × 2 = 120 N, by hand; G is a statement of its own.
        assertEquals(120.0, si(a, "F"), 1e-12);
        assertEquals(240.0, si(a, "G"), 1e-12);
        assertEquals(2, a.rows().stream().filter(r -> r instanceof Row.ValueRow v && !v.input()).count());
    }

    @Test
    void valuesShowInTheUnitTheyWereWrittenIn() {
        Analysis a = clean("""
            input p = 101.325 kPa
            μ = 1.81e-5 Pa·s
            A = 3 m²
            q = p / 1000
            """);
        assertEquals("101.3 kPa", Fixture.shown(a, "p"));
        assertEquals("1.81e-5 Pa·s", Fixture.shown(a, "μ"));
        assertEquals("3 m²", Fixture.shown(a, "A"));
        assertEquals("101.3 Pa", Fixture.shown(a, "q"));
    }

    private static List<Boolean> passed(Analysis a) {
        return a.rows().stream().filter(r -> r instanceof Row.CheckRow).map(r -> ((Row.CheckRow) r).passed()).toList();
    }
}
