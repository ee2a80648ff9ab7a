package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.assertInRange;
import static dev.plumb.stdlib.RangeAssertions.assertNotOffered;
import static dev.plumb.stdlib.RangeAssertions.assertOutside;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Diagnostic;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Circular cylinder in cross-flow (stdlib/cylinder.plumb): the subcritical fit, the table through
 * the drag crisis and the finite-length factor, checked against measurements, theory and each
 * other.
 */
class CylinderDragTest {

    private static double cd(String expression) {
        return StdlibCheck.si(expression);
    }

    private static void assertWithin(double expected, double actual, double relative, String what) {
        assertEquals(expected, actual, Math.abs(expected) * relative, what);
    }

    /**
     * Lamb, H. (1911), On the uniform motion of a sphere through a viscous fluid, Phil. Mag. (6)
     * 21, 112-121: Oseen-flow drag of a circular cylinder, Cd = 8 pi / (Re (1/2 - gamma -
     * ln(Re/8))), diameter Reynolds number, valid for Re << 1 (from memory).
     */
    private static double lamb(double re) {
        double eulerGamma = 0.5772156649;
        return 8 * Math.PI / (re * (0.5 - eulerGamma - Math.log(re / 8)));
    }

    /** The simple fit Cd = 1 + 10 Re^(-2/3) (White, Viscous Fluid Flow), which levels off at 1.0. */
    private static double simpleFit(double re) {
        return 1 + 10 * Math.pow(re, -2.0 / 3);
    }

    // ---------------------------------------------------------------- the subcritical plateau

    @ParameterizedTest
    @CsvSource({"2e4", "5e4", "1e5", "2e5"})
    void subcriticalFitGivesTheMeasuredPlateau(double re) {
        // Common practice (handbook value): a long smooth cylinder has Cd of about 1.2 for
        // Re of about 1e4 to 2e5. The fit gives 1.14 to 1.18 there.
        assertEquals(1.2, cd("cd_cylinder_subcritical(" + re + ")"), 0.07, "at Re = " + re);
    }

    @Test
    void subcriticalFitIsNotTheWeakSimpleFit() {
        // The simple fit 1 + 10 Re^(-2/3) sits at about 1.0 near 1e4 to 1e5, short of the measured
        // 1.2; the chosen fit must stay at least 10 % above it there.
        for (double re : new double[] {2e4, 5e4, 1e5}) {
            assertTrue(simpleFit(re) < 1.02, "the simple fit stays near 1.0");
            assertTrue(cd("cd_cylinder_subcritical(" + re + ")") > 1.10 * simpleFit(re), "at Re = " + re);
        }
        // It still rises above 1.05 by Re = 1e4 (measured: about 1.1 to 1.2, common practice).
        assertTrue(cd("cd_cylinder_subcritical(1e4)") > 1.05);
    }

    @ParameterizedTest
    @CsvSource({"0.01", "0.1"})
    void subcriticalFitAgainstLambsCreepingFlowSolution(double re) {
        // Lamb (1911): the fit lies 3 % (Re = 0.1) to 13 % (Re = 0.01) above the asymptotic
        // theory, as the measured points at such Re do (from memory); allow 15 %.
        assertWithin(lamb(re), cd("cd_cylinder_subcritical(" + re + ")"), 0.15, "at Re = " + re);
    }

    @ParameterizedTest
    @CsvSource({"10", "20", "50", "100", "200", "500", "1e3", "2e3", "5e3", "1e4", "2e4", "1e5", "2e5"})
    void subcriticalFitAndTableAgree(String re) {
        // Two independent sources: the Sucker-Brauer fit and Wieselsberger's measured curve
        // agree within 8 % over 10 <= Re <= 2e5 (largest gap about 6 %, at Re = 50).
        assertWithin(cd("cd_cylinder(" + re + ")"), cd("cd_cylinder_subcritical(" + re + ")"), 0.08, "at Re = " + re);
    }

    // ---------------------------------------------------------------- the drag crisis

    @Test
    void tableThroughTheDragCrisis() {
        // Common practice: about 1.2 before the crisis.
        assertEquals(1.2, cd("cd_cylinder(1e5)"), 0.05);
        // Roshko (1961), introduction: supercritical measurements lie between 0.2 and 0.4.
        for (String re : new String[] {"5e5", "7e5", "1e6"}) {
            double v = cd("cd_cylinder(" + re + ")");
            assertTrue(v >= 0.2 && v <= 0.4, "supercritical at " + re + ": " + v);
        }
        // Roshko (1961), abstract: Cd rises to 0.7 at R = 3.5e6 and then stays constant up to
        // R close to 1e7.
        assertWithin(0.7, cd("cd_cylinder(3.5e6)"), 1e-9, "3.5e6");
        assertWithin(0.7, cd("cd_cylinder(6e6)"), 1e-9, "6e6");
        assertWithin(0.7, cd("cd_cylinder(1e7)"), 1e-9, "1e7");
        // Common practice: the crisis cuts Cd by a factor of about 4 (1.2 to 0.3).
        assertTrue(cd("cd_cylinder(2e5)") / cd("cd_cylinder(5e5)") >= 3);
    }

    @Test
    void tableInterpolatesLogLog() {
        // Between two rows, log-log interpolation at the geometric mean of the arguments gives
        // the geometric mean of the values: between (2e5, 1.2) and (5e5, 0.3) that is
        // sqrt(1.2 * 0.3) = 0.6 at sqrt(1e11).
        assertWithin(0.6, cd("cd_cylinder(316227.766017)"), 1e-6, "mid-crisis");
        // Between (1e6, 0.3) and (3.5e6, 0.7): 0.3 * (2e6/1e6)^(ln(0.7/0.3)/ln(3.5)).
        double expected = 0.3 * Math.pow(2, Math.log(0.7 / 0.3) / Math.log(3.5));
        assertWithin(expected, cd("cd_cylinder(2e6)"), 1e-9, "2e6");
    }

    // ---------------------------------------------------------------- finite length

    @ParameterizedTest
    @CsvSource({"1, 0.63", "2, 0.68", "5, 0.74", "10, 0.82", "20, 0.91", "40, 0.98"})
    void lengthFactorReproducesWieselsbergersFiniteCylinders(double lOverD, double measured) {
        // Wieselsberger's finite cylinders at Re of about 8.8e4, absolute Cd, with 1.20 for the
        // infinite cylinder (Goldstein 1938; Hoerner 1965). All rows except L/d = 20 are
        // confirmed in Matthews, Aeronautical Engineer's Data Book, Fig. 5.13(b); 0.91 at 20 is
        // from memory. Factor times 1.20 must give the measured value.
        assertWithin(measured, 1.20 * cd("cylinder_length_factor(" + lOverD + ", 8.8e4)"), 0.001, "L/d = " + lOverD);
    }

    @Test
    void lengthFactorAppliedToTheLongCylinder() {
        // A cylinder with L/d = 5 at Re = 8.8e4, the conditions of the measurement: 0.74
        // (Matthews, Fig. 5.13(b)).
        assertWithin(0.74, cd("cylinder_length_factor(5, 8.8e4) * cd_cylinder(8.8e4)"), 0.03, "L/d = 5");
    }

    @Test
    void lengthFactorGrowsTowardOne() {
        // Common practice: end effects fade as the cylinder gets longer; the factor rises
        // monotonically and stays below 1.
        double previous = 0;
        for (double lOverD = 1; lOverD <= 40; lOverD *= 1.25) {
            double k = cd("cylinder_length_factor(" + lOverD + ", 8.8e4)");
            assertTrue(k > previous && k < 1, "L/d = " + lOverD + ": " + k);
            previous = k;
        }
    }

    // ---------------------------------------------------------------- ranges

    @ParameterizedTest
    @CsvSource({
        "cd_cylinder_subcritical(1e-4)", "cd_cylinder_subcritical(2e5)",
        "cd_cylinder(10)", "cd_cylinder(1e7)",
        "'cylinder_length_factor(1, 8.8e4)'", "'cylinder_length_factor(40, 8.8e4)'"})
    void noWarningAtEitherEndOfARange(String call) {
        assertInRange(call);
    }

    @Test
    void subcriticalFitOutsideItsRange() {
        // Above: the table through the crisis covers 3e5.
        assertOutside("cd_cylinder_subcritical(3e5)", "cd_cylinder_subcritical", 3e5, 2e5, "cd_cylinder");
        // Below: nothing in the library covers Re = 5e-5 for a cylinder.
        Diagnostic w = assertOutside("cd_cylinder_subcritical(5e-5)", "cd_cylinder_subcritical", 5e-5, 1e-4);
        assertNotOffered(w, "cd_cylinder");
    }

    @Test
    void tableOutsideItsRowsIsExtrapolationAndWarned() {
        // Below the first row (Re = 10): the subcritical fit covers Re = 5.
        assertOutside("cd_cylinder(5)", "cd_cylinder", 5, 10, "cd_cylinder_subcritical");
        // Above the last row (Re = 1e7): nothing covers it.
        Diagnostic w = assertOutside("cd_cylinder(2e7)", "cd_cylinder", 2e7, 1e7);
        assertNotOffered(w, "cd_cylinder_subcritical");
    }

    @Test
    void lengthFactorOutsideItsRows() {
        assertOutside("cylinder_length_factor(0.5, 8.8e4)", "cylinder_length_factor", 0.5, 1);
        assertOutside("cylinder_length_factor(60, 8.8e4)", "cylinder_length_factor", 60, 40);
    }

    @Test
    void lengthFactorIsSubcriticalOnly() {
        // Wieselsberger's finite cylinders were measured at Re of about 8.8e4, subcritical
        // (Goldstein 1938; Hoerner 1965, ch. 3; from memory). Past the drag crisis, which
        // Achenbach (1968, J. Fluid Mech. 34) and Roshko (1961, J. Fluid Mech. 10) put between
        // 2e5 and 5e5 (from memory), the factor is not known: a call there warns with the numbers.
        assertOutside("cylinder_length_factor(10, 4e5)", "cylinder_length_factor", 4e5, 2e5);
        assertOutside("cylinder_length_factor(10, 5e3)", "cylinder_length_factor", 5e3, 1e4);
        assertInRange("cylinder_length_factor(10, 1e4)");
        assertInRange("cylinder_length_factor(10, 2e5)");
    }

    @Test
    void oneFreeEndRuleIsInTheTitle() {
        // A cylinder on a wall with one free end counts as a free-ended cylinder of twice its
        // length, L/d = 2*H/d (its image in the wall; common practice). Hover shows the title.
        String title = ((dev.plumb.analysis.Binding.CorrelationBinding) dev.plumb.analysis.Stdlib.get().entries()
            .get("cylinder_length_factor")).def().title();
        assertTrue(title.contains("one free end") && title.contains("2*H/d"), title);
    }
}
