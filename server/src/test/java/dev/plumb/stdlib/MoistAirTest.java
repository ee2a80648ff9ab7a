package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.assertClean;
import static dev.plumb.stdlib.RangeAssertions.assertOutside;
import static dev.plumb.stdlib.RangeAssertions.assertOutsideShowing;
import static dev.plumb.stdlib.RangeAssertions.n;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Diagnostic;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Moist air and the saturation pressure of water (stdlib/properties.plumb) against the CIPM-2007
 * equation for the density of moist air, computed here, and the IAPWS saturation table.
 */
class MoistAirTest {

    private static double si(String expression) {
        return StdlibCheck.si(expression);
    }

    /**
     * CIPM-2007: Picard, A., Davis, R. S., Gläser, M. and Fujii, K. (2008), Revised formula for the
     * density of moist air (CIPM-2007), Metrologia 45, 149-155, eq. A1.1-A1.5, x_CO2 = 0.0004.
     * Constants from memory; checkedAgainstOutsideValues confirms the vapour pressure and the dry
     * density they give. T in K, p in Pa, h relative humidity 0-1.
     */
    static double cipm2007(double kelvin, double pascal, double h) {
        double t = kelvin - 273.15;
        double r = 8.314472, ma = 28.96546e-3, mv = 18.01528e-3;
        double f = 1.00062 + 3.14e-8 * pascal + 5.6e-7 * t * t;
        double xv = h * f * saturationCipm(kelvin) / pascal;
        double z = 1 - pascal / kelvin * (1.58123e-6 - 2.9331e-8 * t + 1.1043e-10 * t * t + (5.707e-6 - 2.051e-8 * t) * xv
            + (1.9898e-4 - 2.376e-6 * t) * xv * xv) + Math.pow(pascal / kelvin, 2) * (1.83e-11 - 0.765e-8 * xv * xv);
        return pascal * ma / (z * r * kelvin) * (1 - xv * (1 - mv / ma));
    }

    /** The saturation vapour pressure of CIPM-2007 (Davis, R. S. (1992), Metrologia 29, 67-70), in Pa. */
    static double saturationCipm(double kelvin) {
        return Math.exp(1.2378847e-5 * kelvin * kelvin - 1.9121316e-2 * kelvin + 33.93711047 - 6.3431645e3 / kelvin);
    }

    @Test
    void theCipmHelperAgainstOutsideValues() {
        // Saturation pressure at 20 degC: 2.3392 kPa (IAPWS-95 saturation table; from memory).
        assertEquals(2339.2, saturationCipm(293.15), 0.2);
        // Dry air at 0 degC and 101.325 kPa: 1.2929 kg/m^3 (the normal density of DIN 1343, from
        // memory, as in PropertiesTest); the equation gives 1.29305.
        assertEquals(1.2929, cipm2007(273.15, 101325, 0), 0.0002 * 1.2929);
        // The compressibility of dry air at 20 degC and 1 atm is 0.9996 (common practice): the
        // ideal-gas density with the same molar mass is 0.04 % lower than CIPM-2007.
        double ideal = 101325 * 28.96546e-3 / (8.314472 * 293.15);
        assertEquals(0.9996, ideal / cipm2007(293.15, 101325, 0), 0.00005);
    }

    // ---------------------------------------------------------------- CIPM-2007 entry

    @ParameterizedTest(name = "{0} degC, {1} Pa, RH {2}")
    @CsvSource({"15, 60000, 0", "20, 101325, 0.5", "22.5, 95000, 1", "27, 110000, 0.8", "18, 80000, 0.3"})
    void cipmEntryIsTheEquation(double celsius, double pascal, double h) {
        // The library's entry and the helper above each write out the CIPM-2007 equations (Picard
        // et al. 2008) on their own: the two must agree to rounding.
        double expected = cipm2007(celsius + 273.15, pascal, h);
        assertEquals(expected, si("moist_air_density_cipm(" + celsius + " degC, " + pascal + " Pa, " + h + ")"), 1e-12 * expected);
    }

    // ---------------------------------------------------------------- the ideal-gas mixture

    @Test
    void aHotHumidSiteIsNotDryAir() {
        // 30 degC, 101.325 kPa, 80 % RH. CIPM-2007, by the helper: 1.15001 kg/m^3, 1.26 % below
        // the same equation's dry air (1.16472); by hand, x_v = 0.8*1.0043*4246.8/101325 = 0.03368
        // and 1 - x_v*(1 - 18.015/28.965) = 0.98727, 1.27 % lower before the small change of Z.
        double cipmMoist = cipm2007(303.15, 101325, 0.8);
        double cipmDry = cipm2007(303.15, 101325, 0);
        assertEquals(-0.0126, cipmMoist / cipmDry - 1, 0.0001);
        double moist = si("moist_air_density(30 degC, 101.325 kPa, 80 %)");
        double dry = si("air_density(30 degC, 101.325 kPa)");
        // The library's drop from its own dry air agrees with CIPM-2007's within 0.03 points.
        assertEquals(cipmMoist / cipmDry - 1, moist / dry - 1, 0.0003);
        assertEquals(cipmMoist, moist, 0.001 * cipmMoist);
    }

    @Test
    void withinItsAccuracyOfCipm2007() {
        // Stated accuracy 0.1 %. Inside CIPM-2007's range the gap is at most 0.05 %; over 0-50
        // degC, with CIPM-2007 extrapolated, 0.07 % (both at 110 kPa and saturation).
        for (int c = 0; c <= 50; c += 5) {
            for (double p : new double[] {60e3, 85e3, 110e3}) {
                for (double h : new double[] {0, 0.5, 1}) {
                    double cipm = cipm2007(c + 273.15, p, h);
                    double lib = si("moist_air_density(" + c + " degC, " + p + " Pa, " + h + ")");
                    boolean inside = c >= 15 && c <= 27;
                    assertEquals(cipm, lib, (inside ? 0.0005 : 0.0007) * cipm, c + " degC, " + p + " Pa, " + h);
                }
            }
        }
    }

    @Test
    void dryLimitIsTheDryAirDensity() {
        // RH = 0 leaves the dry-air ideal gas with the same R_d as air_density.
        assertEquals(si("air_density(12 degC, 92 kPa)"), si("moist_air_density(12 degC, 92 kPa, 0)"), 1e-15);
    }

    @Test
    void humidityOnlyLowersTheDensity() {
        double previous = Double.MAX_VALUE;
        for (int rh = 0; rh <= 100; rh += 10) {
            double rho = si("moist_air_density(35 degC, 100 kPa, " + rh + " %)");
            assertTrue(rho < previous, rh + " %");
            previous = rho;
        }
    }

    // ---------------------------------------------------------------- saturation pressure

    @ParameterizedTest(name = "{0} K: {1} Pa")
    @CsvSource({
        // IAPWS-95 saturation table (Wagner and Pruss 2002, J. Phys. Chem. Ref. Data 31, 387-535;
        // from memory): the triple point 273.16 K, 611.657 Pa; 298.15 K, 3.1699 kPa; 373.15 K,
        // 0.101418 MPa. Asserted to one unit in the table's last digit: the table rounds, and the
        // 1992 release's equation is a fit of its own.
        "273.16, 611.657, 0.001",
        "298.15, 3169.9,  0.1",
        "373.15, 101418,  1",
    })
    void saturationPressureAgainstTheIapwsTable(double kelvin, double pascal, double unit) {
        assertEquals(pascal, si("water_vapour_pressure(" + kelvin + " K)"), unit);
    }

    @Test
    void saturationPressureEndsAtTheCriticalPoint() {
        // tau = 0 at T_c = 647.096 K: the equation gives p_c = 22.064 MPa exactly (IAPWS critical
        // point; from memory).
        assertEquals(22.064e6, si("water_vapour_pressure(647.096 K)"), 1e-6);
    }

    @Test
    void bothSaturationFormulasAgree() {
        // Davis (1992), used inside CIPM-2007, and Wagner and Pruss (1993) are independent fits:
        // within 0.005 % from 15 to 40 degC.
        for (int c = 15; c <= 40; c += 5) {
            double davis = saturationCipm(c + 273.15);
            assertEquals(davis, si("water_vapour_pressure(" + c + " degC)"), 5e-5 * davis, c + " degC");
        }
    }

    // ---------------------------------------------------------------- ranges

    @Test
    void mixtureRangeEdges() {
        assertClean("moist_air_density(0 degC, 101 kPa, 0.5)");
        assertClean("moist_air_density(50 degC, 101 kPa, 0.5)");
        assertClean("moist_air_density(20 degC, 60 kPa, 1)");
        assertClean("moist_air_density(20 degC, 110 kPa, 0)");
        assertOutsideShowing("moist_air_density(272.15 K, 101 kPa, 0.5)", "moist_air_density", n(-1, 272.15), n(0, 273.15));
        assertOutsideShowing("moist_air_density(51 degC, 101 kPa, 0.5)", "moist_air_density", n(51, 324.15), n(50, 323.15));
        assertOutside("moist_air_density(20 degC, 59.4 kPa, 0.5)", "moist_air_density", n(59.4, 59400), n(60, 60000));
        assertOutside("moist_air_density(20 degC, 111.1 kPa, 0.5)", "moist_air_density", n(111.1, 111100), n(110, 110000));
    }

    @Test
    void cipmRangeEdgesOfferTheMixture() {
        assertClean("moist_air_density_cipm(15 degC, 101 kPa, 0.5)");
        assertClean("moist_air_density_cipm(27 degC, 101 kPa, 0.5)");
        assertClean("moist_air_density_cipm(20 degC, 60 kPa, 0.5)");
        assertClean("moist_air_density_cipm(20 degC, 110 kPa, 0.5)");
        assertOutsideShowing("moist_air_density_cipm(14 degC, 101 kPa, 0.5)", "moist_air_density_cipm", n(14, 287.15),
            n(15, 288.15));
        Diagnostic w = assertOutsideShowing("moist_air_density_cipm(28 degC, 101 kPa, 0.5)", "moist_air_density_cipm",
            n(28, 301.15), n(27, 300.15));
        // The hot site is covered by the ideal-gas mixture, which the warning names.
        assertTrue(RangeAssertions.names(w.message(), "moist_air_density"), w::message);
        assertOutside("moist_air_density_cipm(20 degC, 59.4 kPa, 0.5)", "moist_air_density_cipm", n(59.4, 59400), n(60, 60000));
        assertOutside("moist_air_density_cipm(20 degC, 111.1 kPa, 0.5)", "moist_air_density_cipm", n(111.1, 111100),
            n(110, 110000));
    }

    @Test
    void saturationRangeEdges() {
        assertClean("water_vapour_pressure(273.16 K)");
        assertClean("water_vapour_pressure(647.096 K)");
        assertOutsideShowing("water_vapour_pressure(273.15 K)", "water_vapour_pressure", n(273.15, 273.2), n(273.16));
    }
}
