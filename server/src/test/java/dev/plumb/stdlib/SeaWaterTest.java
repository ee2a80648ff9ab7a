package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.assertClean;
import static dev.plumb.stdlib.RangeAssertions.assertOutside;
import static dev.plumb.stdlib.RangeAssertions.assertOutsideShowing;
import static dev.plumb.stdlib.RangeAssertions.n;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Sea water (Sharqawy, Lienhard and Zubair 2010, in stdlib/properties.plumb) against the
 * one-atmosphere equation of state of sea water EOS-80, a naval-architecture property table, the
 * ITTC value at 15 degC, and, at zero salinity, the library's IAPWS-based water table.
 */
class SeaWaterTest {

    private static double si(String expression) {
        return StdlibCheck.si(expression);
    }

    /**
     * Density of sea water at one atmosphere, EOS-80: Millero, F. J. and Poisson, A. (1981),
     * International one-atmosphere equation of state of seawater, Deep-Sea Research 28A, 625-629;
     * UNESCO (1981), Tech. Pap. Mar. Sci. 36 and 38. t in degC (IPTS-68), S practical salinity.
     * Coefficients from memory, confirmed by the published check values below. Valid 0-40 degC,
     * S 0-42.
     */
    static double eos80(double t68, double sp) {
        double t = t68;
        double water = 999.842594 + 6.793952e-2 * t - 9.095290e-3 * t * t + 1.001685e-4 * Math.pow(t, 3)
            - 1.120083e-6 * Math.pow(t, 4) + 6.536332e-9 * Math.pow(t, 5);
        double a = 8.24493e-1 - 4.0899e-3 * t + 7.6438e-5 * t * t - 8.2467e-7 * Math.pow(t, 3) + 5.3875e-9 * Math.pow(t, 4);
        double b = -5.72466e-3 + 1.0227e-4 * t - 1.6546e-6 * t * t;
        double c = 4.8314e-4;
        return water + a * sp + b * Math.pow(sp, 1.5) + c * sp * sp;
    }

    /** EOS-80 at an ITS-90 temperature and a reference-composition salinity in g/kg. */
    static double eos80Its90(double celsius, double gramsPerKilogram) {
        // t68 = 1.00024 t90 (Saunders, P. (1990), The International Temperature Scale of 1990,
        // WOCE Newsletter 10; from memory). S_A = (35.16504/35) S_P (Millero, F. J. et al. (2008),
        // The composition of Standard Seawater and the definition of the Reference-Composition
        // Salinity Scale, Deep-Sea Research I 55, 50-72; from memory).
        return eos80(1.00024 * celsius, gramsPerKilogram * 35 / 35.16504);
    }

    @Test
    void theEos80HelperReproducesThePublishedCheckValues() {
        // Check values of the one-atmosphere equation (Millero and Poisson 1981; reprinted in Gill,
        // A. E. (1982), Atmosphere-Ocean Dynamics, Appendix A3.1): (S, t) = (0, 5): 999.96675,
        // (0, 25): 997.04796, (35, 5): 1027.67547, (35, 25): 1023.34306 kg/m^3.
        assertEquals(999.96675, eos80(5, 0), 5e-6);
        assertEquals(997.04796, eos80(25, 0), 5e-6);
        assertEquals(1027.67547, eos80(5, 35), 5e-6);
        assertEquals(1023.34306, eos80(25, 35), 5e-6);
    }

    @Test
    void standardSeaWaterAtFifteenDegrees() {
        // About 1026 kg/m^3 at 15 degC and 35 g/kg. By hand from eq. 8: the pure-water part
        // 999.9 + 0.3051 - 1.38645 + 0.07631 - 0.00236 = 998.8926, the salt part 28.07 - 1.05053
        // + 0.13206 - 0.00361 - 0.0000044 = 27.1479; sum 1026.0405.
        assertEquals(1026.0405, si("seawater_density(15 degC, 35 g/kg)"), 0.0001);
        // EOS-80 gives 1025.85 there: 0.019 % apart, inside the stated 0.1 %.
        double eos = eos80Its90(15, 35);
        assertEquals(eos, si("seawater_density(15 degC, 35 g/kg)"), 0.001 * eos);
        // Kinematic viscosity: ITTC (1963) tabulates 1.18831e-6 m^2/s for sea water at 15 degC,
        // 3.5 % salinity (ITTC Recommended Procedure 7.5-02-01-03, Fresh water and seawater
        // properties; from memory). The correlation gives 1.18891e-6 (0.05 % higher); its stated
        // accuracy is 1.5 %.
        assertEquals(1.18831e-6, si("seawater_nu(15 degC, 35 g/kg)"), 0.015 * 1.18831e-6);
        assertEquals(1.19e-6, si("seawater_nu(15 degC, 35 g/kg)"), 0.005e-6);
    }

    @Test
    void densityAgreesWithEos80OverItsWholeRange() {
        // Sharqawy et al. state 0.1 % for eq. 8. Against EOS-80 over EOS-80's own range (0-40
        // degC, S_P 0-42), on a 1 degC by 1 g/kg grid, the largest gap is 0.052 %.
        for (int t = 0; t <= 40; t += 4) {
            for (int s = 0; s <= 42; s += 6) {
                double eos = eos80Its90(t, s);
                double lib = si("seawater_density(" + t + " degC, " + s + " g/kg)");
                assertEquals(eos, lib, 0.001 * eos, t + " degC, " + s + " g/kg");
            }
        }
    }

    @ParameterizedTest(name = "{0} degC")
    @CsvSource({
        // Introduction to Naval Architecture (E. C. Tupper), ch. 5, Table 5.1, water properties,
        // salt water of 3.5 % salinity: density in kg/m^3 and kinematic viscosity in 1e-6 m^2/s
        // (read from a copy of the page).
        "0,  1028.0, 1.828",
        "10, 1026.9, 1.354",
        "20, 1024.7, 1.054",
        "30, 1021.7, 0.849",
    })
    void againstANavalArchitectureTable(double celsius, double rho, double nuMillionths) {
        // Density to the correlation's 0.1 % (the table's last digit is 0.005 %); kinematic
        // viscosity to its 1.5 % (the largest gap, 1.41 %, is at 0 degC).
        assertEquals(rho, si("seawater_density(" + celsius + " degC, 35 g/kg)"), 0.001 * rho);
        assertEquals(nuMillionths * 1e-6, si("seawater_nu(" + celsius + " degC, 35 g/kg)"), 0.015 * nuMillionths * 1e-6);
    }

    @ParameterizedTest(name = "{0} degC")
    @CsvSource({"0", "5", "15", "25", "40", "60", "80", "99.6"})
    void withoutSaltItIsFreshWater(double celsius) {
        // At S = 0 the correlations are their pure-water fits (to IAPWS-95 and IAPWS 2008).
        // The library's water table holds IAPWS values at its rows (PropertiesTest checks them):
        // density within 0.021 %, viscosity within 0.13 % at these rows.
        double rho = si("water.rho(" + celsius + " degC)");
        double mu = si("water.mu(" + celsius + " degC)");
        assertEquals(rho, si("seawater_density(" + celsius + " degC, 0)"), 0.0003 * rho);
        assertEquals(mu, si("seawater_viscosity(" + celsius + " degC, 0)"), 0.0015 * mu);
    }

    @Test
    void salinityMayBeWrittenInAnyDimensionlessUnit() {
        double gPerKg = si("seawater_viscosity(12 degC, 35 g/kg)");
        assertEquals(gPerKg, si("seawater_viscosity(12 degC, 3.5 %)"), 1e-18);
        assertEquals(gPerKg, si("seawater_viscosity(12 degC, 0.035)"), 1e-18);
    }

    @Test
    void kinematicViscosityIsViscosityOverDensity() {
        double nu = si("seawater_nu(22 degC, 38 g/kg)");
        assertEquals(si("seawater_viscosity(22 degC, 38 g/kg)") / si("seawater_density(22 degC, 38 g/kg)"), nu, 1e-18);
    }

    // ---------------------------------------------------------------- ranges

    @ParameterizedTest(name = "{0}")
    @CsvSource({"seawater_density, 160", "seawater_viscosity, 150", "seawater_nu, 150"})
    void rangeEdges(String name, double sMax) {
        assertClean(name + "(0 degC, 35 g/kg)");
        assertClean(name + "(180 degC, 35 g/kg)");
        assertClean(name + "(20 degC, 0)");
        assertClean(name + "(20 degC, " + sMax + " g/kg)");
        // 272.15 K is -1 degC.
        assertOutsideShowing(name + "(272.15 K, 35 g/kg)", name, n(-1, 272.15), n(0, 273.15));
        assertOutsideShowing(name + "(181 degC, 35 g/kg)", name, n(181, 454.15), n(180, 453.15));
        double over = sMax + 1;
        assertOutside(name + "(20 degC, " + over + " g/kg)", name, n(over, over / 1000), n(sMax, sMax / 1000));
    }
}
