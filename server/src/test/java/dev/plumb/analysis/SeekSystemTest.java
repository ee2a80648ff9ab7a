package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.syntax.Statement;
import java.util.List;
import org.junit.jupiter.api.Test;

/** `seek` with several unknowns: equilibria against closed forms, and the solver's findings. */
class SeekSystemTest {
    private static List<Code> codes(Analysis a) {
        return a.diagnostics().stream().map(Diagnostic::code).toList();
    }

    private static double si(Analysis a, String name) {
        return Fixture.value(a, name).value().si();
    }

    @Test
    void aTetheredBodyLeansUntilItsCableCarriesDragAndWeight() {
        // By hand: a body held by a cable in a steady current, the cable at θ from the vertical
        // with tension T. Horizontal balance T sin θ = D, vertical T cos θ = W. Dividing, tan θ = D/W;
        // squaring and adding, T = √(D² + W²). Here D = 120 N, W = 300 N (an invented case):
        // θ = atan(0.4), T = √(14,400 + 90,000) N = √104,400 N.
        Analysis a = Fixture.analyze("input D = 120 N\ninput W = 300 N\n"
            + "seek T, theta from 100 N, 10 deg\n    where T * sin(theta) = D, T * cos(theta) = W\n");
        assertEquals(List.of(), codes(a));
        assertEquals(Math.atan(0.4), si(a, "theta"), 1e-12);
        assertEquals(Math.sqrt(104_400), si(a, "T"), Math.sqrt(104_400) * 1e-12);
        assertEquals("21.8°", Fixture.shown(a, "theta"));
    }

    @Test
    void theDragDependsOnTheUnknownSpeedAndIsReEvaluatedPerTrial() {
        // A towed body of known net weight W, drag area Cd·A = 0.05 m², in sea water (an invented
        // case): the speed V and the cable angle θ from the vertical for a measured tension T.
        // By hand: T cos θ = W gives θ = acos(W/T); T sin θ = ½ ρ V² Cd A gives
        // V = √(2 T sin θ / (ρ Cd A)).
        double rho = 1025;
        double tension = 500;
        double weight = 400;
        double cdA = 0.05;
        Analysis a = Fixture.analyze("input rho = 1025 kg/m^3\ninput CdA = 0.05 m^2\ninput W = 400 N\ninput T = 500 N\n"
            + "seek V, theta from 1 m/s, 20 deg\n    where T * sin(theta) = drag, T * cos(theta) = W\n"
            + "drag = 0.5 * rho * V^2 * CdA\n"
            + "power = drag * V   in W\n");
        assertEquals(List.of(), codes(a));
        double theta = Math.acos(weight / tension);
        double v = Math.sqrt(2 * tension * Math.sin(theta) / (rho * cdA));
        assertEquals(theta, si(a, "theta"), 1e-12);
        assertEquals(v, si(a, "V"), v * 1e-10);
        // The dependent is evaluated in its place with the solved speed.
        assertEquals(tension * Math.sin(theta), si(a, "drag"), 1e-8);
        assertEquals(tension * Math.sin(theta) * v, si(a, "power"), 1e-7);
        // The dependency graph: the second unknown follows the first; drag uses V.
        assertTrue(a.graph().uses("theta").contains("V"), a.graph().uses("theta").toString());
        assertTrue(a.graph().dependents("V").contains("power"));
    }

    @Test
    void eachUnknownIsAStatementOfItsOwnSharingTheSystem() {
        Analysis a = Fixture.analyze("seek a, b, c from 1, 1, 1 where a + b = 3, b + c = 5, a + c = 4\n");
        assertEquals(List.of(), codes(a));
        // By hand: adding all three, a + b + c = 6; so c = 3, a = 1, b = 2.
        assertEquals(1, si(a, "a"), 1e-12);
        assertEquals(2, si(a, "b"), 1e-12);
        assertEquals(3, si(a, "c"), 1e-12);
        List<Statement> statements = a.syntax().statements();
        assertEquals(3, statements.size());
        for (int i = 0; i < 3; i++) {
            Statement.SeekSystem k = (Statement.SeekSystem) statements.get(i);
            assertEquals(i, k.index());
            assertEquals(statements.get(0).span(), k.span());
        }
        SystemSolution s = Fixture.value(a, "a").solution().system();
        assertNotNull(s);
        assertEquals("Newton", s.method());
        assertEquals(3, s.residuals().size());
        for (SystemSolution.Residual r : s.residuals()) assertTrue(Math.abs(r.si()) < 1e-9, r.toString());
        // Linear: a Newton step with a difference Jacobian (exact but for rounding) lands on the
        // solution; a second at most removes the rounding.
        assertTrue(s.iterations() <= 2, s.iterations() + " iterations");
    }

    @Test
    void aOneUnknownSeekIsTheStatementItWas() {
        Analysis a = Fixture.analyze("seek x from 1 where x^2 = 2\n");
        assertTrue(a.syntax().statements().get(0) instanceof Statement.Seek);
        assertNull(Fixture.value(a, "x").solution().system());
        assertEquals(Math.sqrt(2), si(a, "x"), 1e-12);
    }

    @Test
    void eachEquationIsCheckedForDimensions() {
        Analysis a = Fixture.analyze("input W = 300 N\nseek T, L from 1 N, 1 m where T = W, T = L\n");
        assertTrue(codes(a).contains(Code.UNIT_MISMATCH), codes(a).toString());
        assertFalse(Fixture.value(a, "T").value().known());
        assertFalse(Fixture.value(a, "L").value().known());
    }

    @Test
    void aSolutionInsideTheBracketsIsTaken() {
        // The same tether as above, bracketed: θ = atan(0.4) ≈ 21.8°, T ≈ 323 N lie inside.
        Analysis a = Fixture.analyze("input D = 120 N\ninput W = 300 N\n"
            + "seek T, theta in 100 N .. 500 N, 0 deg .. 60 deg\n    where T * sin(theta) = D, T * cos(theta) = W\n");
        assertEquals(List.of(), codes(a));
        assertEquals(Math.atan(0.4), si(a, "theta"), 1e-12);
    }

    @Test
    void aSystemWithNoRootNearItsStartSaysWhereTheSearchEnded() {
        // x³ − 2x + 2 = 0 from x = 0 is the classic Newton two-cycle (0 → 1 → 0 …); its only real
        // root is near −1.769, beyond a hump of |F| whose bottom is at 3x² = 2, x = √(2/3) = 0.8165
        // (by hand), where F = 0.9113 > 0. The line search stops Newton there, Levenberg–Marquardt
        // cannot leave the local minimum either: the finding says so, with the point and residual.
        Analysis a = Fixture.analyze("seek x, y from 0, 0 where x^3 - 2 * x + 2 = 0, y = x\n");
        assertEquals(List.of(Code.SOLVE_NOT_CONVERGED), codes(a));
        String message = a.diagnostics().get(0).message();
        assertTrue(message.contains("x = 0.8165") && message.contains("0.9113 in `x^3 - 2 * x + 2 = 0`")
            && message.contains("x moved farthest"), message);
        assertFalse(Fixture.value(a, "x").value().known());
    }

    @Test
    void theFindingsOfTheFixtures() {
        Fixture.checkResource("solve.count-mismatch.plumb");
        Fixture.checkResource("solve.singular.plumb");
        Fixture.checkResource("solve.outside-bracket.plumb");
        Fixture.checkResource("solve.not-converged.system.plumb");
    }

    @Test
    void aSecondDefinitionOfAnUnknownLeavesTheSystemUnsolvedAndTheOtherValueAlone() {
        Analysis a = Fixture.analyze("b = 5\nseek a, b from 1, 1 where a + b = 3, a - b = 1\n");
        assertTrue(codes(a).contains(Code.NAME_DUPLICATE), codes(a).toString());
        assertEquals(5, si(a, "b"), 0);
        assertFalse(Fixture.value(a, "a").value().known());
    }

    @Test
    void anUnknownWrittenTwiceIsADuplicateAndNothingIsSolved() {
        Analysis a = Fixture.analyze("seek a, a from 1, 2 where a = 1, a = 2\n");
        assertEquals(List.of(Code.NAME_DUPLICATE), codes(a));
        assertFalse(Fixture.value(a, "a").value().known());
    }
}
