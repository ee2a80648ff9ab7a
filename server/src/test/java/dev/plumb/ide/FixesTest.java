package dev.plumb.ide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Span;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Quick fixes and refactors as edits: each check names the action at the cursor ($0) and the
 * text it must leave. The repairs come from the findings' own data, never from their wording.
 */
class FixesTest {

    /** Applies the action titled {@code title} at the cursor and compares the text it leaves. */
    private static void check(String marked, String title, String expected) {
        Marked m = Marked.of(marked);
        List<Fixes.Action> actions = Fixes.at(m.analysis(), new Span(m.cursor(), m.cursor()));
        Fixes.Action action = actions.stream().filter(x -> x.title().equals(title)).findFirst()
            .orElseThrow(() -> new AssertionError("no action '" + title + "' among "
                + actions.stream().map(Fixes.Action::title).toList()));
        assertEquals(expected, Formatter.apply(m.analysis().text(), action.edits()));
    }

    private static List<String> titles(String marked) {
        Marked m = Marked.of(marked);
        return Fixes.at(m.analysis(), new Span(m.cursor(), m.cursor())).stream().map(Fixes.Action::title).toList();
    }

    @Test
    void aMissingOperatorGetsItsStar() {
        check("input b = 2 m\ninput h = 3 m\nA = b $0h\n", "Insert '*'", "input b = 2 m\ninput h = 3 m\nA = b * h\n");
    }

    @Test
    void aCloseSpellingOfAUnitOrANameIsOffered() {
        check("L = 3 mt$0r\n", "Change to 'm' (metre, a length)", "L = 3 m\n");
        check("input speed = 3 m/s\nq = 0.5 * 1.2 kg/m^3 * spe$0ed2^2\n", "Change to 'speed'",
            "input speed = 3 m/s\nq = 0.5 * 1.2 kg/m^3 * speed^2\n");
    }

    @Test
    void aUnitOfAnotherSizeOrKindSaysSoInItsTitle() {
        List<String> offered = titles("p = 3 mp$0a\n");
        // mPa is 0.001 Pa and MPa 1e6 Pa: the titles tell the two apart before either is taken.
        assertTrue(offered.contains("Change to 'mPa' (millipascal, a pressure: 1 mPa = 0.001 Pa)"),
            offered.toString());
        assertTrue(offered.contains("Change to 'MPa' (megapascal, a pressure: 1 MPa = 1e6 Pa)"),
            offered.toString());
        assertTrue(offered.contains("Change to 'mph' (mile per hour, a velocity: 1 mph = 0.44704 m/s)"),
            offered.toString());
    }

    @Test
    void aWrongDisplayUnitIsReplacedByOneOfTheValuesDimension() {
        check("F = 2 N in m$0m\n", "Show it in N", "F = 2 N in N\n");
    }

    @Test
    void aCorrelationOutsideItsRangeOffersTheOnesThatCoverIt() {
        String calc = "Cd = cd_sphere_st$0okes(50)\n";
        List<String> offered = titles(calc);
        assertTrue(offered.contains("Use cd_sphere_sn, valid here"), offered.toString());
        check(calc, "Use cd_sphere_sn, valid here", "Cd = cd_sphere_sn(50)\n");
    }

    @Test
    void aWettedShapeWithAFrontalCoefficientOffersTheFrontalFormula() {
        check("""
            input d = 0.1 m
            input L = 2 m
            q = 500 Pa
            Cd = cd_cylinder(1e4)
            A_side = pi * d * L
            F = Cd * A_$0side * q
            """, "Use the frontal area d * L for A_side", """
            input d = 0.1 m
            input L = 2 m
            q = 500 Pa
            Cd = cd_cylinder(1e4)
            A_side = d * L
            F = Cd * A_side * q
            """);
    }

    @Test
    void aBodysDensityWhereTheFluidsBelongsOffersTheFluids() {
        check("""
            input rho_w = 1000 kg/m^3   as fluid
            input rho_s = 2650 kg/m^3   as body
            q = dynamic_pressure(rho_$0s, 2 m/s)
            W = (rho_s - rho_w) * 9.81 m/s^2
            """, "Use rho_w (tagged fluid)", """
            input rho_w = 1000 kg/m^3   as fluid
            input rho_s = 2650 kg/m^3   as body
            q = dynamic_pressure(rho_w, 2 m/s)
            W = (rho_s - rho_w) * 9.81 m/s^2
            """);
    }

    @Test
    void showInSetsOrReplacesTheUnitWhereItIsWritten() {
        check("F = 2000 N$0   as frontal \"x\"\n", "Show F in kN", "F = 2000 N in kN   as frontal \"x\"\n");
        check("F = 2 kN in l$0bf\n", "Show F in SI (N)", "F = 2 kN in N\n");
    }

    @Test
    void onlyRepairsThatKeepTheMeaningArePreferred() {
        // A missing `*` or a former spelling keeps what was written; a close unit spelling may
        // change a value 1000-fold (mPa and MPa), so an editor must not apply it on its own.
        assertTrue(preferred("input b = 2 m\nA = b $0b\n", "Insert '*'"));
        assertTrue(preferred("x = 2\nfind y wi$0thin 1 .. 3 so that y = x\n", "Write it as `seek …`"));
        Marked m = Marked.of("p = 3 mp$0a\n");
        List<Fixes.Action> offered = Fixes.at(m.analysis(), new Span(m.cursor(), m.cursor()));
        assertTrue(offered.size() >= 2, offered.toString());
        assertTrue(offered.stream().noneMatch(Fixes.Action::preferred), offered.toString());
    }

    @Test
    void aSpellingFixNeverMakesADefinitionUseItself() {
        // `speed = spede * 2`: 'speed' is the closest name, but offering it would make a circle.
        List<String> offered = titles("input sped = 3 m/s\nspeed = spe$0de * 2\n");
        assertTrue(offered.contains("Change to 'sped'"), offered.toString());
        assertTrue(offered.stream().noneMatch(t -> t.equals("Change to 'speed'")), offered.toString());
    }

    private static boolean preferred(String marked, String title) {
        Marked m = Marked.of(marked);
        return Fixes.at(m.analysis(), new Span(m.cursor(), m.cursor())).stream()
            .filter(a -> a.title().equals(title)).findFirst().orElseThrow().preferred();
    }

    @Test
    void aFindingInsideAFunctionBodyOffersNoEditOfTheCall() {
        // The range warning of the library call inside f is shown at f's call; its repair would
        // edit the body, so none is offered at the call.
        List<String> offered = titles("f(Re) = cd_sphere_stokes(Re)\nCd = f$0(50)\n");
        assertTrue(offered.stream().noneMatch(t -> t.startsWith("Use ")), offered.toString());
    }
}
