package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.assertClean;
import static dev.plumb.stdlib.RangeAssertions.assertOutside;
import static dev.plumb.stdlib.RangeAssertions.n;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Lift of sections and finite wings (stdlib/lift.plumb) against thin-aerofoil theory, Prandtl's
 * lifting line for elliptic loading, Helmbold's and Jones's low-aspect-ratio results and the
 * induced-drag relation, each derived by hand in the comments; the stall bounds warn exactly at
 * their limits; the coefficients meet the planform area without a basis warning, and a frontal or
 * wetted area with one.
 */
class LiftTest {
    private static final double TWO_PI = 2 * Math.PI;
    private static final double DEG = Math.PI / 180;

    private static double si(String expression) {
        return StdlibCheck.si(expression);
    }

    // ---------------------------------------------------------------- thin aerofoil

    @Test
    void thinAirfoilAtFiveDegrees() {
        // Thin-aerofoil theory (Glauert 1926, ch. VII; from memory): cl = 2*pi*alpha, alpha in rad.
        // By hand: 5 deg = 5*pi/180 rad, so cl = 2*pi*5*pi/180 = pi^2/18 = 0.548311...
        assertEquals(Math.PI * Math.PI / 18, si("cl_thin_airfoil(5 deg)"), 1e-15);
        assertEquals(0.5483, si("cl_thin_airfoil(5 deg)"), 0.00005);
    }

    @Test
    void thinAirfoilSlopeIsTwoPiPerRadianAndTheSectionIsSymmetric() {
        // cl/alpha = 2*pi per radian at any angle of the linear range; cl(-alpha) = -cl(alpha).
        for (double deg : new double[] {1, 4, 7.5, 10}) {
            assertEquals(TWO_PI, si("cl_thin_airfoil(" + deg + " deg)") / (deg * DEG), 1e-12, deg + " deg");
            assertEquals(-si("cl_thin_airfoil(" + deg + " deg)"), si("cl_thin_airfoil(-" + deg + " deg)"), 1e-15);
        }
        // An angle in radians is the same angle: 0.1 rad gives 0.2*pi.
        assertEquals(0.2 * Math.PI, si("cl_thin_airfoil(0.1 rad)"), 1e-15);
    }

    @Test
    void thinAirfoilAgreesWithTheExactFlatPlateInItsLinearRange() {
        // The exact potential-flow lift of a flat plate with the Kutta condition is 2*pi*sin(alpha)
        // (Kutta-Joukowski, by conformal mapping of the plate on a circle; common practice).
        // 2*pi*alpha / (2*pi*sin(alpha)) = alpha/sin(alpha): 1.0051 at 10 deg, 1.0013 at 5 deg.
        assertEquals(TWO_PI * Math.sin(10 * DEG), si("cl_thin_airfoil(10 deg)"), 0.0052 * TWO_PI * Math.sin(10 * DEG));
        assertEquals(TWO_PI * Math.sin(5 * DEG), si("cl_thin_airfoil(5 deg)"), 0.0013 * TWO_PI * Math.sin(5 * DEG));
    }

    @Test
    void anAngleWithoutItsUnitIsWarned() {
        // alpha is declared `: angle`: a bare 5 would be 5 rad.
        List<Diagnostic> d = StdlibCheck.diagnostics("cl_thin_airfoil(0.05)");
        assertTrue(d.stream().anyMatch(x -> x.code().id().equals("unit.bare-angle")), d::toString);
    }

    // ---------------------------------------------------------------- finite wings: slope

    @Test
    void liftingLineSlopeOfAnEllipticWingOfAspectRatioEight() {
        // Prandtl's lifting line, elliptic loading (Prandtl 1918; from memory): a = a0/(1 + a0/(pi*AR)).
        // By hand with a0 = 2*pi and AR = 8: a0/(pi*AR) = 2/8, a = 2*pi/1.25 = 8*pi/5 = 5.0265 per rad.
        assertEquals(8 * Math.PI / 5, si("cl_alpha_lifting_line(8, 2 * pi)"), 1e-14);
        assertEquals(5.027, si("cl_alpha_lifting_line(8, 2 * pi)"), 0.0005);
    }

    @ParameterizedTest(name = "AR = {0}, a0 = {1}")
    @CsvSource({"4, 6.2832", "6, 5.7", "8, 6.0", "12, 5.2", "30, 6.5"})
    void liftingLineSlopeSolvesTheEllipticWingRelation(double ar, double a0) {
        // Derivation: with elliptic loading the downwash angle is alpha_i = CL/(pi*AR) across the
        // span, and every section works at alpha - alpha_i: CL = a0*(alpha - CL/(pi*AR)). The
        // slope a = CL/alpha must satisfy a = a0*(1 - a/(pi*AR)).
        double a = si("cl_alpha_lifting_line(" + ar + ", " + a0 + ")");
        assertEquals(a0 * (1 - a / (Math.PI * ar)), a, 1e-12);
    }

    @Test
    void helmboldAtAspectRatioFourByHand() {
        // Helmbold (1942; from memory): a = a0/(sqrt(1 + k^2) + k), k = a0/(pi*AR). With a0 = 2*pi
        // and AR = 4, k = 1/2 and sqrt(5/4) + 1/2 = (1 + sqrt 5)/2, the golden ratio: a = 2*pi/1.618034.
        assertEquals(TWO_PI / ((1 + Math.sqrt(5)) / 2), si("cl_alpha_helmbold(4, 2 * pi)"), 1e-14);
    }

    @ParameterizedTest(name = "AR = {0}")
    @CsvSource({"0.05", "0.1", "0.2"})
    void helmboldTendsToJonesSlenderWingSlope(double ar) {
        // Jones (1946), NACA Rep. 835 (from memory): a slender wing has dCL/dalpha = pi*AR/2.
        // Expanding Helmbold for large k = a0/(pi*AR): sqrt(1 + k^2) + k = 2k(1 + 1/(4k^2) + ...), so
        // a = (pi*AR/2)(1 - 1/(4k^2) + ...): with a0 = 2*pi, k = 2/AR and the relative gap is AR^2/16.
        double jones = Math.PI * ar / 2;
        assertEquals(jones, si("cl_alpha_helmbold(" + ar + ", 2 * pi)"), 1.01 * ar * ar / 16 * jones);
    }

    @Test
    void helmboldReadsBelowTheLiftingLineAndApproachesItForSlenderWings() {
        // Expanding Helmbold for small k: sqrt(1 + k^2) + k = 1 + k + k^2/2 + ..., against 1 + k for
        // the lifting line: Helmbold is lower by about k^2/(2(1 + k)). With a0 = 2*pi, k = 2/AR:
        // 7.3 % at AR = 4 (k = 0.5, exactly 1 - 1.5/1.618034), 0.45 % at AR = 20 (k = 0.1).
        double atFour = si("cl_alpha_helmbold(4, 2 * pi)") / si("cl_alpha_lifting_line(4, 2 * pi)");
        assertEquals(1.5 / ((1 + Math.sqrt(5)) / 2), atFour, 1e-12);
        // AR = 20 is outside Helmbold's range (warned), but its value is still computed.
        double atTwenty = si("cl_alpha_helmbold(20, 2 * pi)") / si("cl_alpha_lifting_line(20, 2 * pi)");
        assertEquals(1 - 0.01 / (2 * 1.1), atTwenty, 1e-4);
    }

    @Test
    void aFinRootedOnAWallWorksAtTwiceItsAspectRatio() {
        // A fin whose root is closed by a wall (a keel fin under a hull) works as a wing of twice
        // its span, with its image in the wall (common practice): AR = (2b)^2/(2S) = 2*b^2/S. By hand,
        // b = 0.8 m, chord 1.2 m: 2*0.64/0.96 = 4/3. Written the way a calc writes it (2 * b^2 is
        // also the shape of both faces of a square plate, which once broke the basis check), it
        // computes, and the lift follows: Helmbold with k = 2*pi/(pi*4/3) = 1.5.
        var a = StdlibCheck.analyze("input b = 0.8 m\ninput c = 1.2 m\nS = wing_planform_area(b, c)\n"
            + "AR = 2 * b^2 / S\nCL = cl_wing_helmbold(5 deg, AR, 2 * pi)\n");
        assertTrue(RangeAssertions.errors(a.diagnostics()).isEmpty(), a.diagnostics()::toString);
        double ar = a.rows().stream().filter(r -> r instanceof dev.plumb.analysis.Row.ValueRow v && v.name().equals("AR"))
            .mapToDouble(r -> ((dev.plumb.analysis.Row.ValueRow) r).value().si()).findFirst().orElseThrow();
        assertEquals(4.0 / 3, ar, 1e-15);
        double cl = a.rows().stream().filter(r -> r instanceof dev.plumb.analysis.Row.ValueRow v && v.name().equals("CL"))
            .mapToDouble(r -> ((dev.plumb.analysis.Row.ValueRow) r).value().si()).findFirst().orElseThrow();
        assertEquals(TWO_PI / (Math.sqrt(1 + 1.5 * 1.5) + 1.5) * 5 * DEG, cl, 1e-14);
    }

    // ---------------------------------------------------------------- finite wings: lift

    @Test
    void wingLiftIsTheSlopeTimesTheAngle() {
        // By hand: AR = 8, a0 = 2*pi, alpha = 5 deg: CL = (8*pi/5)*(5*pi/180) = 8*pi^2/180 = 0.43865.
        assertEquals(8 * Math.PI * Math.PI / 180, si("cl_wing_lifting_line(5 deg, 8, 2 * pi)"), 1e-14);
        // Helmbold, AR = 2, a0 = 2*pi: k = 1, a = 2*pi/(sqrt 2 + 1); at 6 deg CL = a*6*pi/180.
        assertEquals(TWO_PI / (Math.sqrt(2) + 1) * 6 * DEG, si("cl_wing_helmbold(6 deg, 2, 2 * pi)"), 1e-14);
    }

    @Test
    void inducedDragIsTheLiftTiltedBackByTheDownwash() {
        // Derivation for elliptic loading: the lift vector is tilted back by alpha_i, and the
        // sections work at alpha_eff = CL/a0, so alpha_i = alpha - CL/a0 and CDi = CL*alpha_i. The
        // lifting-line lift and cd_induced with e = 1 are separate entries and must agree.
        for (double deg : new double[] {2, 5, 9}) {
            double cl = si("cl_wing_lifting_line(" + deg + " deg, 7, 5.9)");
            double alphaI = deg * DEG - cl / 5.9;
            assertEquals(cl * alphaI, si("cd_induced(" + cl + ", 7, 1)"), 1e-12, deg + " deg");
        }
    }

    // ---------------------------------------------------------------- induced drag, polar

    @Test
    void inducedDragAtLiftHalfOnAnEllipticWingOfAspectRatioEight() {
        // CDi = CL^2/(pi*e*AR) (Prandtl 1918; from memory). By hand: 0.25/(8*pi) = 0.0099472.
        assertEquals(0.25 / (8 * Math.PI), si("cd_induced(0.5, 8, 1)"), 1e-17);
        assertEquals(0.00995, si("cd_induced(0.5, 8, 1)"), 0.000005);
        // A span efficiency of 0.8 raises it by 1/0.8: 0.0124340.
        assertEquals(0.25 / (8 * Math.PI * 0.8), si("cd_induced(0.5, 8, 0.8)"), 1e-17);
    }

    @Test
    void dragPolarIsTheZeroLiftDragPlusTheInducedDrag() {
        // CD = CD0 + CL^2/(pi*e*AR) (Oswald 1933; from memory). By hand: 0.012 + 0.36/(pi*6*0.85).
        assertEquals(0.012 + 0.36 / (Math.PI * 6 * 0.85), si("cd_polar(0.012, 0.6, 6, 0.85)"), 1e-16);
        for (double cl : new double[] {0, 0.3, 0.9}) {
            assertEquals(0.02 + si("cd_induced(" + cl + ", 5, 0.9)"), si("cd_polar(0.02, " + cl + ", 5, 0.9)"), 1e-16);
        }
        // At zero lift only the zero-lift drag remains.
        assertEquals(0.02, si("cd_polar(0.02, 0, 5, 0.9)"), 0.0);
    }

    // ---------------------------------------------------------------- planform basis

    private static final String WING = "input V = 20 m/s\ninput rho = 1.2 kg/m^3   as fluid\ninput b = 6 m\n"
        + "input c = 1.5 m\nq = dynamic_pressure(rho, V)\n";

    @Test
    void liftCoefficientsMeetThePlanformAreaQuietly() {
        RangeAssertions.assertCleanDocument(WING + "CL = cl_wing_lifting_line(6 deg, b / c, 2 * pi)\n"
            + "S = wing_planform_area(b, c)\nL = CL * S * q\nCD = cd_polar(0.01, CL, b / c, 0.9)\nD = CD * S * q\n");
        RangeAssertions.assertCleanDocument(WING + "CL = cl_thin_airfoil(4 deg)\nL = lift_force(CL, wing_planform_area(b, c), q)\n");
        // A slope times an angle is still a planform coefficient.
        RangeAssertions.assertCleanDocument(WING + "CL = cl_alpha_helmbold(2, 2 * pi) * 5 deg\nL = CL * wing_planform_area(b, c) * q\n");
    }

    @Test
    void aLiftCoefficientOnAFrontalOrWettedAreaIsWarned() {
        RangeAssertions.assertOneWarning(WING + "CL = cl_thin_airfoil(4 deg)\nA = plate_face_area(b, c)\nL = CL * A * q\n",
            "basis.area", "planform");
        RangeAssertions.assertOneWarning(WING + "CL = cl_wing_helmbold(4 deg, 2, 2 * pi)\nA = plate_wetted_area(b, c)\n"
            + "L = CL * A * q\n", "basis.area", "planform");
        RangeAssertions.assertOneWarning(WING + "CD = cd_induced(0.5, 4, 0.9)\nA = b * c   as frontal\nD = CD * A * q\n",
            "basis.area", "planform");        // The repair names the planform area, not the frontal one: one face of the wing, span times chord.
        RangeAssertions.assertOneWarning(WING + "CL = cl_thin_airfoil(4 deg)\nA = 2 * b * c\nL = CL * A * q\n",
            "basis.area", "the planform area of a wing or plate is one face");
    }

    // ---------------------------------------------------------------- ranges

    @Test
    void sectionLiftWarnsPastItsLinearRangeAndNotAtItsEdges() {
        assertClean("cl_thin_airfoil(10 deg)");
        assertClean("cl_thin_airfoil(-10 deg)");
        assertOutside("cl_thin_airfoil(10.1 deg)", "cl_thin_airfoil", n(10.1, 10.1 * DEG), n(10, 10 * DEG));
        assertOutside("cl_thin_airfoil(-10.1 deg)", "cl_thin_airfoil", n(-10.1, -10.1 * DEG), n(-10, -10 * DEG));
        // Past stall, in radians too: 0.2 rad is 11.5 deg.
        assertOutside("cl_thin_airfoil(0.2 rad)", "cl_thin_airfoil", n(11.46, 0.2), n(10, 10 * DEG));
    }

    @Test
    void wingLiftWarnsWhenTheSectionsLeaveTheirLinearRange() {
        // AR = 8, a0 = 2*pi: alpha_eff = alpha/1.25, so the edge alpha_eff = 10 deg is alpha = 12.5 deg.
        assertClean("cl_wing_lifting_line(12.5 deg, 8, 2 * pi)");
        assertClean("cl_wing_lifting_line(-12.5 deg, 8, 2 * pi)");
        // 12.6 deg: alpha_eff = 10.08 deg, 0.8 % above the limit.
        assertOutside("cl_wing_lifting_line(12.6 deg, 8, 2 * pi)", "cl_wing_lifting_line", n(10.08, 10.08 * DEG),
            n(10, 10 * DEG));
        assertOutside("cl_wing_lifting_line(-12.6 deg, 8, 2 * pi)", "cl_wing_lifting_line", n(-10.08, -10.08 * DEG),
            n(-10, -10 * DEG));
        assertClean("cl_wing_helmbold(10 deg, 2, 2 * pi)");
        assertClean("cl_wing_helmbold(-10 deg, 2, 2 * pi)");
        assertOutside("cl_wing_helmbold(10.1 deg, 2, 2 * pi)", "cl_wing_helmbold", n(10.1, 10.1 * DEG), n(10, 10 * DEG));
        assertOutside("cl_wing_helmbold(-10.1 deg, 2, 2 * pi)", "cl_wing_helmbold", n(-10.1, -10.1 * DEG), n(-10, -10 * DEG));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "cl_alpha_lifting_line(%s, 2 * pi)            | lo",
        "cl_wing_lifting_line(3 deg, %s, 2 * pi)      | lo",
        "cl_alpha_helmbold(%s, 2 * pi)                | hi",
        "cl_wing_helmbold(3 deg, %s, 2 * pi)          | hi"})
    void aspectRatioEdgeIsAtFour(String template, String side) {
        String call = template.strip();
        String name = call.substring(0, call.indexOf('('));
        assertClean(String.format(call, "4"));
        boolean low = side.strip().equals("lo");
        double outside = low ? 3.96 : 4.04;
        Diagnostic w = assertOutside(String.format(call, outside), name, outside, 4);
        // Where the lifting line ends, Helmbold's form covers the wing, and the other way round.
        String other = name.replace(low ? "lifting_line" : "helmbold", low ? "helmbold" : "lifting_line");
        assertTrue(RangeAssertions.names(w.message(), other), w::message);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"'cl_alpha_lifting_line(8, %s)'", "'cl_alpha_helmbold(2, %s)'", "'cl_wing_lifting_line(3 deg, 8, %s)'",
        "'cl_wing_helmbold(3 deg, 2, %s)'"})
    void sectionSlopeEdgesAreFiveAndSixAndAHalf(String template) {
        String name = template.substring(0, template.indexOf('('));
        assertClean(String.format(template, "5"));
        assertClean(String.format(template, "6.5"));
        assertOutside(String.format(template, "4.95"), name, 4.95, 5);
        assertOutside(String.format(template, "6.56"), name, 6.56, 6.5);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"'cd_induced(0.6, 6, %s)'", "'cd_polar(0.01, 0.6, 6, %s)'"})
    void spanEfficiencyAboveOneIsWarned(String template) {
        String name = template.substring(0, template.indexOf('('));
        assertClean(String.format(template, "1"));
        assertClean(String.format(template, "0.3"));
        assertOutside(String.format(template, "1.01"), name, 1.01, 1);
    }
}
