package dev.plumb.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.FileSources;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Settings;
import dev.plumb.analysis.Workspace;
import dev.plumb.diagnostics.Code;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/**
 * The pairing of two analyses of one calc, with no repository: how values, checks, findings and
 * library entries are paired and how far each moved. The calc is an invented hoarding panel at a
 * depot gate; the expected changes are worked out by hand beside each assertion.
 */
class ComparisonTest {
    private static final Path FILE = Path.of("/work/depot/hoarding.plumb");

    /** q = ρV²/2 and F = Cd·A·q: before, q = 0.5·1.25·20² = 250 Pa, A = 8 m², F = 1.3·8·250 = 2600 N. */
    private static final String PANEL = """
        title "Hoarding panel at the depot gate"
        input V   = 20 m/s          "design gust"
        input rho = 1.25 kg/m^3     "air"
        input Cd  = 1.3             "flat panel"
        input b   = 4 m
        input h   = 2 m
        A = b * h
        q = 0.5 * rho * V^2   in Pa
        F = Cd * A * q        in kN
        check F <= 5.5 kN "footing working capacity"
        """;

    private static FileDiff diff(String before, String after) {
        return diff(before, after, Comparison.DEFAULT_TOLERANCE);
    }

    private static FileDiff diff(String before, String after, double tolerance) {
        return Comparison.of(FILE, side(before), side(after), tolerance, List.of());
    }

    private static Side side(String text) {
        Analysis a = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, text);
        return Side.of(a, a.diagnostics());
    }

    private static Map<String, ValueChange> byName(List<ValueChange> values) {
        return values.stream().collect(Collectors.toMap(ValueChange::name, Function.identity()));
    }

    @Test
    void aFasterGustMovesTheDynamicPressureAndTheDragByTheSquareOfTheSpeedRatio() {
        FileDiff d = diff(PANEL, PANEL.replace("20 m/s", "30 m/s"));
        // by hand: V 20 → 30 m/s is +50 %; q and F go with V², (30/20)² − 1 = 1.25, so +125 %; A does not move.
        assertEquals(List.of("V"), d.inputs().stream().map(ValueChange::name).toList());
        assertEquals(0.5, d.inputs().get(0).relative(), 1e-12);
        assertEquals(List.of("q", "F"), d.results().stream().map(ValueChange::name).toList(), "equal changes in line order");
        for (ValueChange v : d.results()) assertEquals(1.25, v.relative(), 1e-12, v.name());
        // by hand: F after = 1.3 · 8 m² · 0.5 · 1.25 · 30² Pa = 5850 N, more than 5.5 kN: the check flips.
        assertEquals(5850, byName(d.results()).get("F").after().si(), 1e-9);
        assertEquals(1, d.flipped().size());
        assertEquals(Row.Verdict.PASSED, d.flipped().get(0).before().verdict());
        assertEquals(Row.Verdict.FAILED, d.flipped().get(0).after().verdict());
        assertEquals(List.of(Code.CHECK_FAILED), d.findings().stream().filter(FindingChange::appeared)
            .map(f -> f.finding().code()).toList());
        assertEquals(10, d.findings().get(0).line());
        assertTrue(d.resultsChanged());
    }

    @Test
    void resultsAreOrderedByTheSizeOfTheirChange() {
        // by hand: Cd 1.3 → 1.43 moves F by +10 %; b 4 → 5 m moves A and F by +25 %, so F by 1.25·1.1 − 1 = +37.5 %.
        FileDiff d = diff(PANEL, PANEL.replace("Cd  = 1.3", "Cd  = 1.43").replace("b   = 4 m", "b   = 5 m"));
        assertEquals(List.of("F", "A"), d.results().stream().map(ValueChange::name).toList());
        assertEquals(0.375, d.results().get(0).relative(), 1e-12);
        assertEquals(0.25, d.results().get(1).relative(), 1e-12);
    }

    @Test
    void aChangeWithinTheToleranceIsNoChange() {
        // by hand: 20 → 20.000001 m/s is 5e-8 relative; q and F move by (1 + 5e-8)² − 1 ≈ 1.0e-7.
        String after = PANEL.replace("20 m/s", "20.000001 m/s");
        assertEquals(3, diff(PANEL, after).values().size(), "the default 1e-9 counts it");
        FileDiff loose = diff(PANEL, after, 1e-6);
        assertEquals(List.of(), loose.values());
        assertEquals(FileDiff.Status.UNCHANGED, loose.status());
    }

    @Test
    void aRenamedValueIsPairedWhenItsFormulaIsTheSame() {
        String after = PANEL.replace("q = 0.5", "q_dyn = 0.5").replace("Cd * A * q ", "Cd * A * q_dyn ");
        FileDiff d = diff(PANEL, after);
        assertEquals(List.of(new Rename("q", "q_dyn")), d.renames());
        assertEquals(List.of(), d.added());
        assertEquals(List.of(), d.removed());
        assertEquals(List.of(), d.results(), "same values: nothing moved");
        assertEquals(List.of(), d.checks());
        assertEquals(false, d.resultsChanged());
    }

    @Test
    void renamesAlongAChainArePairedThroughEachOther() {
        // rho becomes rho_air and q, which uses it, q_w: q_w's formula matches q's only once rho is paired.
        String after = PANEL.replace("input rho = ", "input rho_air = ").replace("q = 0.5 * rho *", "q_w = 0.5 * rho_air *")
            .replace("Cd * A * q ", "Cd * A * q_w ");
        FileDiff d = diff(PANEL, after);
        assertEquals(List.of(new Rename("rho", "rho_air"), new Rename("q", "q_w")), d.renames());
        assertEquals(List.of(), d.added());
    }

    @Test
    void aRenamedUnknownIsPairedThoughItsEquationUsesItsName() {
        String before = """
            input W = 400 N
            input k = 2 N*s^2/m^2
            seek V in 1 m/s .. 100 m/s where k * V^2 = W
            P = W * V in W
            """;
        String after = before.replace("seek V in", "seek U in").replace("k * V^2", "k * U^2").replace("W * V in", "W * U in");
        FileDiff d = diff(before, after);
        assertEquals(List.of(new Rename("V", "U")), d.renames());
        assertEquals(List.of(), d.added());
        assertEquals(List.of(), d.results(), "same values: nothing moved");
    }

    @Test
    void renamedUnknownsOfASystemAndStatesOfAMotionArePaired() {
        String system = """
            input T = 500 N
            input W = 400 N
            input c = 2 N*s^2/m^2
            seek V, theta from 1 m/s, 20 deg
                where T * sin(theta) = c * V^2, T * cos(theta) = W
            """;
        FileDiff s = diff(system, system.replace("V, theta", "V, phi").replace("sin(theta)", "sin(phi)")
            .replace("cos(theta)", "cos(phi)"));
        assertEquals(List.of(new Rename("theta", "phi")), s.renames());
        assertEquals(List.of(), s.added());

        String motion = """
            input m = 0.12 kg
            input k = 0.004 kg/m
            evolve v, y from 0 m/s, 0 m over t
                rates g_n - k / m * v^2, v
                until y >= 5 m
            """;
        FileDiff m = diff(motion, motion.replace("evolve v, y", "evolve v, z").replace("until y >=", "until z >="));
        assertEquals(List.of(new Rename("y", "z")), m.renames());
        assertEquals(List.of(), m.added());
        assertEquals(List.of(), m.results(), "same motion: nothing moved");
    }

    @Test
    void aRenameIsNotGuessedWhenTwoValuesShareAFormula() {
        String before = "input a = 2 m\ninput b = 2 m\n";
        FileDiff d = diff(before, "input c = 2 m\ninput e = 2 m\n");
        assertEquals(List.of(), d.renames());
        assertEquals(2, d.added().size());
        assertEquals(2, d.removed().size());
    }

    @Test
    void aValueThatCannotBeComputedIsSaidSoNotCountedAsAHundredPercentChange() {
        FileDiff d = diff(PANEL, PANEL.replace("input h   = 2 m", "input h   = 2 m + 1 s"));
        Map<String, ValueChange> all = byName(d.values());
        for (String name : List.of("h", "A", "F")) {
            assertEquals(ValueChange.Status.NOT_COMPUTED_AFTER, all.get(name).status(), name);
            assertNull(all.get(name).relative(), name);
        }
        assertEquals(List.of("A", "F"), d.results().stream().map(ValueChange::name).toList());
        // The check could not be judged: a flip from pass to not evaluated, with the reason.
        assertEquals(Row.Verdict.VALUE_UNKNOWN, d.flipped().get(0).after().verdict());
        // And back: known again, never "from zero".
        FileDiff back = diff(PANEL.replace("input h   = 2 m", "input h   = 2 m + 1 s"), PANEL);
        assertEquals(ValueChange.Status.NOT_COMPUTED_BEFORE, byName(back.values()).get("F").status());
    }

    @Test
    void aValueMovedFromZeroHasNoRelativeChange() {
        FileDiff d = diff("input e = 0 m\nx = e * 2\n", "input e = 1 mm\nx = e * 2\n");
        ValueChange x = byName(d.results()).get("x");
        assertEquals(ValueChange.Status.CHANGED, x.status());
        assertTrue(x.fromZero());
        assertNull(x.relative());
    }

    @Test
    void aDimensionChangeIsNotARelativeChange() {
        FileDiff d = diff("input a = 2 m\nx = a * 3\n", "input a = 2 m^2\nx = a * 3\n");
        assertEquals(ValueChange.Status.DIMENSION_CHANGED, byName(d.values()).get("x").status());
        assertNull(byName(d.values()).get("x").relative());
    }

    @Test
    void findingsNewAndGoneAreKnownByCodeAndPlaceNotByMessage() {
        // An input nobody uses is a hint; adding one makes it appear, removing it makes it go.
        String extra = PANEL.replace("input h   = 2 m\n", "input h   = 2 m\ninput t = 3 mm   \"sheet thickness\"\n");
        FileDiff added = diff(PANEL, extra);
        assertEquals(List.of(Code.INPUT_UNUSED), added.findings().stream().map(f -> f.finding().code()).toList());
        assertTrue(added.findings().get(0).appeared());
        assertEquals(List.of("t"), added.added().stream().map(ValueChange::name).toList());
        FileDiff gone = diff(extra, PANEL);
        assertEquals(false, gone.findings().get(0).appeared());
        assertEquals(List.of("t"), gone.removed().stream().map(ValueChange::name).toList());
        // A failed check stays the same finding when its numbers move.
        FileDiff moved = diff(PANEL.replace("20 m/s", "30 m/s"), PANEL.replace("20 m/s", "31 m/s"));
        assertEquals(List.of(), moved.findings());
        assertEquals(List.of(), moved.checks());
    }

    @Test
    void checksArePairedByWhatTheyCompareThenByNote() {
        FileDiff tightened = diff(PANEL, PANEL.replace("F <= 5.5 kN", "F <= 2.5 kN"));
        assertEquals(1, tightened.flipped().size(), "the same note pairs a check whose limit changed");
        FileDiff added = diff(PANEL, PANEL + "check A <= 10 m^2\n");
        assertEquals(1, added.checks().size());
        assertTrue(added.checks().get(0).added());
        assertEquals(11, added.checks().get(0).line());
    }

    @Test
    void aTableWhoseRowsChangedIsALibraryEntryThatChanged() {
        String table = """
            table cd_panel(AR)
                title       "Panel drag against aspect ratio, depot tests"
                source      "Depot yard tests, note DY-7 (2025)"
                basis       frontal
                interpolate linear
                AR     Cd
                1      1.18
                5      1.20
            end
            """;
        FileDiff d = diff(table, table.replace("5      1.20", "5      1.22").replace("DY-7", "DY-8"));
        assertEquals(List.of(new EntryChange("cd_panel", "table", EntryChange.Status.CHANGED, List.of("source", "rows"), 1)),
            d.entries());
        assertEquals(List.of(), diff(table, table.replace("AR     Cd", "AR   Cd")).entries(), "spacing is not data");
    }

    @Test
    void aFileThatCannotBeReadAtOneRevisionHasUnknownValuesNotRemovedOnes() {
        Analysis unreadable = Analysis.unreadable(FILE, Code.FILE_NOT_TEXT, "this is not a calc file: it holds a NUL byte");
        Side before = Side.of(unreadable, unreadable.diagnostics());
        FileDiff d = Comparison.of(FILE, before, side(PANEL), Comparison.DEFAULT_TOLERANCE, List.of());
        assertEquals("this is not a calc file: it holds a NUL byte", d.before().unreadable());
        assertEquals(List.of(), d.values());
        assertEquals(FileDiff.Status.CHANGED, d.status());
        assertTrue(d.resultsChanged());
    }

    @Test
    void aNewCalcHasEveryValueAndCheckAdded() {
        FileDiff d = Comparison.of(FILE, Side.absent(), side(PANEL), Comparison.DEFAULT_TOLERANCE, List.of());
        assertEquals(FileDiff.Status.ADDED, d.status());
        assertEquals(List.of("V", "rho", "Cd", "b", "h", "A", "q", "F"), d.added().stream().map(ValueChange::name).toList());
        assertTrue(d.checks().get(0).added());
    }
}
