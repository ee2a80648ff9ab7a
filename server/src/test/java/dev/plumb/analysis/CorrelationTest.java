package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The correlation and table language: formulas, pieces, interpolation, declarations, files. */
class CorrelationTest {

    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    private static double si(Analysis a, String name) {
        return Fixture.value(a, name).value().si();
    }

    @Test
    void piecesAreTriedInOrder() {
        Analysis a = Fixture.analyze("""
            correlation k(r)
                = 1 when r < 1
                = 2 when 1 <= r < 3
                = 3 otherwise
            end
            a = k(0.5)
            b = k(1)
            c = k(10)
            """);
        assertEquals(List.of(), codes(a));
        assertEquals(1, si(a, "a"));
        assertEquals(2, si(a, "b"));
        assertEquals(3, si(a, "c"));
    }

    @Test
    void parametersWithUnitsAndHelperConstants() {
        // Ideal gas: 101325 Pa / (287.05 J/(kg·K) × 288.15 K) = 1.225012 kg/m³, worked by hand.
        Analysis a = Fixture.analyze("""
            R_gas = 287.05 J/(kg*K)
            correlation rho_gas(T: temperature, p: pressure)
                valid 200 K <= T <= 400 K
                = p / (R_gas * T)
            end
            rho = rho_gas(15 degC, 101.325 kPa)
            bad = rho_gas(15 m, 1 bar)
            """);
        assertEquals(1.225012, si(a, "rho"), 1e-6);
        assertEquals(List.of(Code.UNIT_MISMATCH), codes(a));
        assertTrue(a.diagnostics().get(0).message().contains("rho_gas takes T as a temperature (K), but 15 m is a length"));
    }

    @Test
    void aFormulaMayContinueOnADeeperLine() {
        Analysis a = Fixture.analyze("""
            correlation f(x)
                = 2 * x
                      + 1
            end
            y = f(3)
            """);
        assertEquals(List.of(), codes(a));
        assertEquals(7, si(a, "y"));
    }

    @Test
    void linearTableInterpolatesAndExtrapolatesWithTheEndSlope() {
        Analysis a = Fixture.analyze("""
            table k(r)
                interpolate linear
                r     k
                1     0.9
                3     0.5
            end
            mid = k(2)
            beyond = k(4)
            """);
        // Between (1, 0.9) and (3, 0.5): 0.7 at 2; the same line gives 0.3 at 4 (by hand).
        assertEquals(0.7, si(a, "mid"), 1e-12);
        assertEquals(0.3, si(a, "beyond"), 1e-12);
        assertEquals(List.of(Code.RANGE_OUTSIDE), codes(a));
    }

    @Test
    void logLogTableFollowsAPowerLaw() {
        Analysis a = Fixture.analyze("""
            table c(Re)
                interpolate loglog
                Re     C
                1      1
                100    0.01
            end
            x = c(10)
            """);
        // Through (1, 1) and (100, 0.01) log-log is C = 1/Re, so 0.1 at Re = 10 (by hand).
        assertEquals(0.1, si(a, "x"), 1e-12);
    }

    @Test
    void tableColumnsCarryTheirUnits() {
        Analysis a = Fixture.analyze("""
            table fluid(T: temperature)
                T in degC   rho in kg/m^3   mu in mPa*s
                10        1000          1.3
                20        998           1.0
            end
            r = fluid.rho(15 degC)
            m = fluid.mu(15 degC)
            wrong = fluid.rho(3 m)
            """);
        assertEquals(999, si(a, "r"), 1e-9);
        assertEquals(1.15e-3, si(a, "m"), 1e-12);
        assertEquals("999 kg/m³", Fixture.shown(a, "r"));
        // `3 m` is three metres, though the calc has a value m: said once, as a hint.
        assertEquals(List.of(Code.UNIT_MISMATCH, Code.UNIT_ALSO_A_NAME), codes(a));
    }

    @Test
    void aCorrelationsResultCarriesItsBasisAndAccuracy() {
        Analysis a = Fixture.analyze("""
            correlation cd_post(Re)
                basis frontal
                accuracy 8 %
                = 1.1
            end
            Cd = cd_post(1e5)
            """);
        Origin origin = Fixture.value(a, "Cd").origin();
        assertEquals(new Origin("cd_post", "frontal", 0.08), origin);
    }

    @Test
    void aMissingEndIsReportedAndTheRestStillCounts() {
        Analysis a = Fixture.analyze("""
            correlation f(x)
                = 2 * x
            y = 3
            check y == 3
            """);
        assertEquals(List.of(Code.SYNTAX_ERROR), codes(a));
        assertTrue(a.diagnostics().get(0).message().contains("correlation f is not closed"));
        assertEquals(3, si(a, "y"));
    }

    @Test
    void tableRowsMustFitTheHeaderAndAscend() {
        Analysis a = Fixture.analyze("""
            table t(x)
                x   y
                1   2
                3   4   5
                3   1
                2   0
            end
            """);
        List<String> messages = a.diagnostics().stream().map(Diagnostic::message).toList();
        assertEquals(2, messages.size(), messages.toString());
        assertTrue(messages.get(0).contains("this row has 3 numbers but the header names 2 columns"));
        assertTrue(messages.get(1).contains("rows must ascend in x: 2 comes after 3"));
    }

    @Test
    void blockLinesOutsideABlockAreExplained() {
        Analysis a = Fixture.analyze("source \"Hoerner 1965\"\n= 3\nend\n");
        List<String> messages = a.diagnostics().stream().map(Diagnostic::message).toList();
        assertEquals(3, messages.size());
        assertTrue(messages.get(0).contains("`source` belongs inside"));
        assertTrue(messages.get(1).contains("a formula line `= …` belongs inside"));
        assertTrue(messages.get(2).contains("`end` without a `correlation` or `table`"));
    }

    @Test
    void aFirmsOwnCorrelationInItsOwnFileGetsTheSameChecks(@TempDir Path dir) throws IOException {
        Files.createDirectories(dir.resolve(".git"));
        Files.writeString(dir.resolve("our-data.plumb"), """
            correlation cd_mast_section(Re)
                source "wind-tunnel tests of section M4, test report TR-118"
                valid 2e4 <= Re <= 3e5
                = 0.95
            end
            """);
        Path calc = dir.resolve("mast.plumb");
        Files.writeString(calc, "use \"our-data.plumb\"\nCd = cd_mast_section(6e5)\n");
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyze(calc);
        assertEquals(List.of(Code.RANGE_OUTSIDE), codes(a));
        assertTrue(a.diagnostics().get(0).message().startsWith("cd_mast_section is valid for 2e4 <= Re <= 3e5, but Re = "
            + "600000 here: 2 times the upper limit"), a.diagnostics().get(0).message());
        assertEquals(2, a.lines().line(a.diagnostics().get(0).span().start()), "reported at the call, in the calc");
    }

    @Test
    void rangeWarningsInsideAFunctionPointAtTheCall() {
        Analysis a = Fixture.analyze("""
            correlation cd_strut(Re)
                valid Re <= 2e5
                = 0.12
            end
            force(Re, q) = cd_strut(Re) * q
            F = force(1e6, 100 Pa)
            """);
        assertEquals(List.of(Code.RANGE_OUTSIDE), codes(a));
        assertTrue(a.diagnostics().get(0).message().startsWith("in force(…): cd_strut is valid for Re <= 2e5"));
        assertEquals(6, a.lines().line(a.diagnostics().get(0).span().start()));
    }

    @Test
    void aCriticalReynoldsNumberFromTheSettingsReplacesTheLibrarysOnly() {
        String calc = "Cf = cf_plate_blasius_avg(4e5)\n";
        Settings early = new Settings(4, 1e-6, 3e5);
        Analysis a = new Workspace(new FileSources(), early).analyzeText(Fixture.FILE, calc);
        assertEquals(List.of(Code.RANGE_REGIME), codes(a));
        assertTrue(a.diagnostics().get(0).message().contains("Re_crit = 300000"));
        Analysis own = new Workspace(new FileSources(), early).analyzeText(Fixture.FILE, "transition Re = 6e5\n" + calc);
        assertEquals(List.of(), codes(own), "the calc's own transition wins over the settings");
    }

    @Test
    void aTransitionStatementWrittenWronglySaysHowToWriteIt() {
        Analysis word = Fixture.analyze("transition Rey = 3e5\n");
        assertEquals(List.of(Code.SYNTAX_ERROR), codes(word));
        assertTrue(word.diagnostics().get(0).message().contains("transition Re = 3e5"), word.diagnostics().toString());
        assertEquals(List.of(Code.MATH_DOMAIN), codes(Fixture.analyze("transition Re = 0\n")));
        Analysis twice = Fixture.analyze("transition Re = 3e5\ntransition Re = 1e6\n");
        assertEquals(List.of(Code.NAME_DUPLICATE), codes(twice));
        assertEquals(2, twice.lines().line(twice.diagnostics().get(0).span().start()), "the second one is reported");
        assertEquals("Re = 300000", twice.headers().get("transition"), "the first one counts");
    }

    @Test
    void aCalcsTransitionStatementMovesTheRegimeThresholdAndAValueNamedReCritDoesNot() {
        String blasius = """
            correlation cf_lam(Re)
                regime laminar
                = 1.328 / sqrt(Re)
            end
            """;
        assertEquals(List.of(), codes(Fixture.analyze(blasius + "Cf = cf_lam(4e5)\n")));
        Analysis early = Fixture.analyze(blasius + "transition Re = 3e5 \"rough leading edge\"\nCf = cf_lam(4e5)\n");
        assertEquals(List.of(Code.RANGE_REGIME), codes(early));
        assertTrue(early.diagnostics().get(0).message().contains("Re_crit = 300000"));
        assertEquals("Re = 300000, rough leading edge", early.headers().get("transition"));
        // A value that happens to be named Re_crit moves nothing, and is pointed out.
        Analysis named = Fixture.analyze(blasius + "Re_crit = 3e5\nCf = cf_lam(4e5)\n");
        assertEquals(List.of(Code.RANGE_TRANSITION_NAME), codes(named));
    }
}
