package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.assertClean;
import static dev.plumb.stdlib.RangeAssertions.assertOutside;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Diagnostic;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Rough flat plates (stdlib/rough-surfaces.plumb) against Schlichting's published laws, against
 * each other (the average law is the mean of the local one), against Nikuradse's regime limits
 * ks+ = 5 and 70, and the smooth laws of flat-plate.plumb; the range edges, the fully-rough one
 * included, warn exactly at their limits.
 */
class RoughSurfacesTest {

    private static double si(String expression) {
        return StdlibCheck.si(expression);
    }

    /** Schlichting's local law for a fully rough plate (Boundary-Layer Theory, 7th ed., ch. XXI; from memory). */
    private static double localLaw(double xOverKs) {
        return Math.pow(2.87 + 1.58 * Math.log10(xOverKs), -2.5);
    }

    /** Schlichting's average law for a fully rough plate (same chapter; White, Fluid Mechanics, eq. 7.48b; from memory). */
    private static double averageLaw(double lOverKs) {
        return Math.pow(1.89 + 1.62 * Math.log10(lOverKs), -2.5);
    }

    /** The Reynolds number V*L/nu at which the station L/ks reaches ks+ = 70 (see fullyRoughLimitIsNikuradses). */
    private static double fullyRoughFrom(double lOverKs) {
        return 70 * lOverKs / Math.sqrt(localLaw(lOverKs) / 2);
    }

    // ---------------------------------------------------------------- the published laws

    @Test
    void averageAtTenThousandSandGrainsLong() {
        // Schlichting's average law at L/ks = 1e4: by hand 1.89 + 1.62*4 = 8.37, Cf = 8.37^-2.5
        // = 1/(70.0569*2.893095) = 0.0049339.
        assertEquals(Math.pow(8.37, -2.5), si("cf_plate_rough_avg(1e4, 1e8)"), 1e-17);
        assertEquals(0.00493, si("cf_plate_rough_avg(1e4, 1e8)"), 0.000005);
    }

    @ParameterizedTest(name = "x/ks = {0}")
    @CsvSource({"200", "1000", "1e4", "1e5", "1e6"})
    void bothLawsAsPublished(double ratio) {
        double re = 2 * fullyRoughFrom(ratio);
        assertEquals(localLaw(ratio), si("cf_plate_rough_local(" + ratio + ", " + re + ")"), 1e-15);
        assertEquals(averageLaw(ratio), si("cf_plate_rough_avg(" + ratio + ", " + re + ")"), 1e-15);
    }

    @ParameterizedTest(name = "L/ks = {0}")
    @CsvSource({"1e4", "1e5", "1e6"})
    void averageIsTheMeanOfTheLocalLaw(double lOverKs) {
        // The two laws are separate fits to one computation, and must agree: Cf(L) is the mean of
        // cf(x) over the plate, Cf = (1/L) * integral cf dx = (ks/L) * integral cf d(x/ks). The local
        // law has no meaning in the first few grain heights; taking cf there as its value at
        // x = ks changes the mean by less than 0.15 % for L/ks >= 1e4. Simpson's rule in
        // u = ln(x/ks) from x = ks to L, with the first ks added as cf(ks)*ks. The fits agree to
        // 0.2 % at 1e4, 0.4 % at 1e5 and 0.8 % at 1e6: 1 % is asserted.
        int n = 4000;
        double top = Math.log(lOverKs);
        double h = top / n;
        double sum = 0;
        for (int i = 0; i <= n; i++) {
            double u = i * h;
            double f = localLaw(Math.exp(u)) * Math.exp(u);
            sum += (i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2) * f;
        }
        double mean = (sum * h / 3 + localLaw(1)) / lOverKs;
        double library = si("cf_plate_rough_avg(" + lOverKs + ", " + 2 * fullyRoughFrom(lOverKs) + ")");
        assertEquals(mean, library, 0.01 * mean);
    }

    @Test
    void roughnessOnlyAddsFriction() {
        // At the least Reynolds number at which a plate of L/ks = 2e3 is fully rough, 2.70e6, the
        // rough plate's friction is above that of a smooth plate turbulent from the leading edge
        // (Prandtl-Schlichting, flat-plate.plumb): 0.00710 against 0.00374 (common practice: a
        // rough wall never drags less than a smooth one at the same Re).
        double re = fullyRoughFrom(2e3);
        double rough = si("cf_plate_rough_avg(2e3, " + re + ")");
        double smooth = si("cf_plate_prandtl_schlichting(" + re + ")");
        assertTrue(rough > 1.5 * smooth, rough + " vs " + smooth);
    }

    // ---------------------------------------------------------------- Nikuradse's regimes

    @Test
    void fullyRoughLimitIsNikuradses() {
        // ks+ = ks*u_tau/nu with u_tau = V*sqrt(cf/2) and V*ks/nu = Re/(L/ks): at L/ks = 1e4 and
        // cf = 9.19^-2.5 = 0.0039058, sqrt(cf/2) = 0.044192, so ks+ = 70 needs V*ks/nu = 1584.0
        // and Re = 1.5840e7 (by hand). Nikuradse (1933): fully rough from ks+ = 70 (from memory).
        assertEquals(1.5840e7, fullyRoughFrom(1e4), 0.0001e7);
        assertEquals(70, si("ks_plus_rough(1e4, " + fullyRoughFrom(1e4) + ")"), 1e-9);
    }

    @Test
    void admissibleRoughnessIsAHundredViscousLengths() {
        // Schlichting, ch. XXI (from memory): U*k_adm/nu = 100. By hand, 2 m/s in water of
        // nu = 1e-6 m^2/s: k_adm = 100*1e-6/2 = 5e-5 m = 50 um; in air of 1.5e-5 m^2/s at 30 m/s:
        // 100*1.5e-5/30 = 5e-5 m too; at 3 kn (1 kn = 1852/3600 m/s exactly, NIST SP 811 (2008)
        // B.8; from memory) in sea water of 1.1e-6 m^2/s: 1.1e-4/1.543333 = 7.1274e-5 m.
        assertEquals(5e-5, si("ks_admissible(2 m/s, 1e-6 m^2/s)"), 1e-18);
        assertEquals(5e-5, si("ks_admissible(30 m/s, 1.5e-5 m^2/s)"), 1e-18);
        assertEquals(1.1e-4 / (3 * 1852.0 / 3600), si("ks_admissible(3 kn, 1.1e-6 m^2/s)"), 1e-18);
    }

    @ParameterizedTest(name = "Re_x = {0}")
    @CsvSource({"5e5", "1e6", "3e6", "1e7"})
    void admissibleRoughnessKeepsASmoothPlateBelowNikuradsesSmoothLimit(double reX) {
        // Derivation: at k = k_adm, ks+ = (V*k_adm/nu)*sqrt(cf/2) = 100*sqrt(cf/2). Nikuradse's
        // smooth limit is ks+ = 5 (Nikuradse 1933; Schlichting ch. XX; from memory), reached at
        // cf = 0.005. The smooth plate's local cf (1/7-power law, flat-plate.plumb) is below that
        // over its range, so the criterion keeps the surface smooth there: ks+ = 4.6 at Re_x = 5e5, 3.4 at 1e7.
        double cf = si("cf_plate_turb_local(" + reX + ")");
        double ksPlus = si("ks_admissible(1 m/s, 1e-6 m^2/s)") * 1 / 1e-6 * Math.sqrt(cf / 2);
        assertTrue(ksPlus <= 5 && ksPlus > 3, "ks+ = " + ksPlus);
    }

    // ---------------------------------------------------------------- ranges

    @ParameterizedTest(name = "{0}")
    @CsvSource({"cf_plate_rough_local", "cf_plate_rough_avg"})
    void lengthOverRoughnessEdges(String name) {
        assertClean(name + "(200, 1e7)");
        assertClean(name + "(1e6, 1e10)");
        assertOutside(name + "(198, 1e7)", name, 198, 200);
        assertOutside(name + "(1.01e6, 1e10)", name, 1.01e6, 1e6);
    }

    @ParameterizedTest(name = "{0} at {1}")
    @CsvSource({"cf_plate_rough_local, 1e3", "cf_plate_rough_local, 1e5", "cf_plate_rough_avg, 300",
        "cf_plate_rough_avg, 1e4"})
    void notFullyRoughIsWarnedFromExactlyTheLimit(String name, double ratio) {
        double re = fullyRoughFrom(ratio);
        assertClean(name + "(" + ratio + ", " + re + ")");
        // 1 % lower in Re: ks+ = 69.3, 1 % below the limit.
        Diagnostic w = assertOutside(name + "(" + ratio + ", " + 0.99 * re + ")", name, 69.3, 70);
        assertTrue(w.message().contains("ks_plus_rough"), w::message);
    }

    @Test
    void aSmoothLawOnARoughPlateIsCaughtByACheckAgainstTheAdmissibleRoughness() {
        // The pattern docs/language.md gives: check the roughness before using a smooth-plate law.
        // 0.2 mm of paint on a hull at 3 m/s in sea water is far above 100*nu/V = 40 um.
        var a = StdlibCheck.analyze("input V = 3 m/s\ninput nu = 1.2e-6 m^2/s\ninput ks = 0.2 mm\n"
            + "check ks <= ks_admissible(V, nu) \"smooth-plate law below\"\n");
        assertTrue(a.diagnostics().stream().anyMatch(d -> d.code().id().equals("check.failed")), a.diagnostics()::toString);
    }
}
