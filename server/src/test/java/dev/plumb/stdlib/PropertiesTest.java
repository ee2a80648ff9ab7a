package dev.plumb.stdlib;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Air, water and Re_crit from the standard library against published values. */
class PropertiesTest {

    // ---------------------------------------------------------------- Re_crit

    @Test
    void criticalReynoldsNumberIsTheCommonFlatPlateValue() {
        // 5e5: the usual critical Reynolds number of a flat-plate boundary layer, common practice.
        assertEquals(5e5, StdlibCheck.si("Re_crit"), 0.0);
    }

    @Test
    void aDocumentMayShadowReCrit() {
        Analysis a = StdlibCheck.analyze("Re_crit = 3e5\nx = 2 * Re_crit\n");
        assertTrue(RangeAssertions.errors(a.diagnostics()).isEmpty(), () -> "" + a.diagnostics());
        double x = a.rows().stream()
            .filter(r -> r instanceof Row.ValueRow v && v.name().equals("x"))
            .mapToDouble(r -> ((Row.ValueRow) r).value().si())
            .findFirst().orElseThrow();
        assertEquals(6e5, x, 0.0);
    }

    // ---------------------------------------------------------------- air density

    @Test
    void airDensityAtTheStandardSeaLevel() {
        // US Standard Atmosphere 1976 (NOAA/NASA/USAF), Table I, sea level: 1.2250 kg/m³ at
        // 288.15 K and 101325 Pa; ICAO Doc 7488/3 (1993) the same.
        assertEquals(1.2250, StdlibCheck.si("air_density(15 degC, 101.325 kPa)"), 1.2250 * 1e-4);
    }

    @Test
    void airDensityAtTheNormalConditions() {
        // Density of dry air at 0 °C and 101.325 kPa, 1.2929 kg/m³ (measured; the normal density
        // of DIN 1343, from memory). The ideal gas is 0.06 % lower (compressibility Z ≈ 0.9994).
        assertEquals(1.2929, StdlibCheck.si("air_density(0 degC, 1 atm)"), 1.2929 * 1e-3);
    }

    @Test
    void airDensityScalesWithPressureOverTemperature() {
        // Ideal gas (Boyle and Charles): ρ ∝ p/T. Doubling p and T leaves ρ unchanged; halving T doubles it.
        double base = StdlibCheck.si("air_density(400 K, 200 kPa)");
        assertEquals(base, StdlibCheck.si("air_density(800 K, 400 kPa)"), base * 1e-12);
        assertEquals(2 * base, StdlibCheck.si("air_density(200 K, 200 kPa)"), base * 1e-12);
    }

    @Test
    void airDensityRange() {
        RangeAssertions.assertClean("air_density(200 K, 101325 Pa)");
        RangeAssertions.assertClean("air_density(1000 K, 101325 Pa)");
        RangeAssertions.assertClean("air_density(288.15 K, 1 Pa)");
        RangeAssertions.assertClean("air_density(288.15 K, 1 MPa)");
        RangeAssertions.assertOutsideShowing("air_density(199 K, 101325 Pa)", "air_density", RangeAssertions.n(199), RangeAssertions.n(200));
        RangeAssertions.assertOutsideShowing("air_density(1010 K, 101325 Pa)", "air_density", RangeAssertions.n(1010), RangeAssertions.n(1000));
        RangeAssertions.assertOutsideShowing("air_density(288.15 K, 0.99 Pa)", "air_density", RangeAssertions.n(0.99), RangeAssertions.n(1));
        RangeAssertions.assertOutsideShowing("air_density(288.15 K, 1.01 MPa)", "air_density",
            RangeAssertions.n(1.01e6, 1.01, 1010), RangeAssertions.n(1e6, 1, 1000));
    }

    @Test
    void parametersCarryDimensions() {
        // air_density(T: temperature, p: pressure): a length where the temperature belongs is refused.
        List<Diagnostic> d = StdlibCheck.diagnostics("air_density(15 m, 101325 Pa)");
        assertTrue(d.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + d);
        List<Diagnostic> v = StdlibCheck.diagnostics("air_viscosity(101325 Pa)");
        assertTrue(v.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + v);
    }

    // ---------------------------------------------------------------- air viscosity

    @ParameterizedTest(name = "{0} K: {1} Pa·s")
    @CsvSource({
        // US Standard Atmosphere 1976 (NOAA/NASA/USAF), Table I: sea level (288.150 K) and the
        // isothermal layer (216.650 K); 255.676 K is the temperature at 5000 m geometric altitude.
        "288.15,  1.7894e-5",
        "216.65,  1.4216e-5",
        "255.676, 1.6282e-5",
    })
    void airViscosityAgainstTheStandardAtmosphereTable(double kelvin, double expected) {
        double mu = StdlibCheck.si("air_viscosity(" + kelvin + " K)");
        // Table values are given to 5 significant figures.
        assertEquals(expected, mu, expected * 1e-4);
    }

    @ParameterizedTest(name = "{0} K: {1} µPa·s")
    @CsvSource({
        // CRC Handbook of Chemistry and Physics, "Viscosity of gases", air at 100 kPa: 13.3, 18.5,
        // 23.1, 27.1, 30.8 µPa·s at 200, 300, 400, 500, 600 K; the table states uncertainties
        // usually below 3 %. Sutherland's law is stated to ±2 % (White, Viscous Fluid Flow,
        // Table 1-2, from memory); both together allow 2.5 % here.
        "200, 13.3",
        "300, 18.5",
        "400, 23.1",
        "500, 27.1",
        "600, 30.8",
    })
    void airViscosityAgainstAHandbookTable(double kelvin, double microPascalSeconds) {
        double mu = StdlibCheck.si("air_viscosity(" + kelvin + " K)");
        assertEquals(microPascalSeconds * 1e-6, mu, microPascalSeconds * 1e-6 * 0.025);
    }

    @Test
    void airViscosityAtTheSutherlandReferencePoint() {
        // US Standard Atmosphere 1976, eq. 51: μ = β T^1.5/(T + S), β = 1.458e-6 kg/(m·s·K^½),
        // S = 110.4 K. At 273.15 K that is 1.71608e-5 Pa·s (White's Table 1-2: 1.716e-5 Pa·s).
        double expected = 1.458e-6 * Math.pow(273.15, 1.5) / (273.15 + 110.4);
        assertEquals(expected, StdlibCheck.si("air_viscosity(0 degC)"), expected * 1e-5);
        assertEquals(1.716e-5, StdlibCheck.si("air_viscosity(0 degC)"), 1e-4 * 1.716e-5);
        // And the same law away from the reference point: 1976 form evaluated here at 1500 K.
        double hot = 1.458e-6 * Math.pow(1500, 1.5) / (1500 + 110.4);
        assertEquals(hot, StdlibCheck.si("air_viscosity(1500 K)"), hot * 1e-5);
    }

    @Test
    void airViscosityRange() {
        RangeAssertions.assertClean("air_viscosity(170 K)");
        RangeAssertions.assertClean("air_viscosity(1900 K)");
        RangeAssertions.assertOutsideShowing("air_viscosity(169 K)", "air_viscosity", RangeAssertions.n(169), RangeAssertions.n(170));
        RangeAssertions.assertOutsideShowing("air_viscosity(1910 K)", "air_viscosity", RangeAssertions.n(1910), RangeAssertions.n(1900));
    }

    // ---------------------------------------------------------------- air kinematic viscosity

    @Test
    void airKinematicViscosityAtTheStandardSeaLevel() {
        // US Standard Atmosphere 1976, Table I, sea level: ν = 1.4607e-5 m²/s.
        assertEquals(1.4607e-5, StdlibCheck.si("air_nu(288.15 K, 101325 Pa)"), 1.4607e-5 * 1e-4);
    }

    @Test
    void airKinematicViscosityIsViscosityOverDensity() {
        // ν = μ/ρ by definition, at a point away from the reference conditions.
        double nu = StdlibCheck.si("air_nu(350 K, 250 kPa)");
        double mu = StdlibCheck.si("air_viscosity(350 K)");
        double rho = StdlibCheck.si("air_density(350 K, 250 kPa)");
        assertEquals(mu / rho, nu, nu * 1e-12);
    }

    @Test
    void airKinematicViscosityRange() {
        RangeAssertions.assertClean("air_nu(200 K, 101325 Pa)");
        RangeAssertions.assertClean("air_nu(1000 K, 101325 Pa)");
        RangeAssertions.assertClean("air_nu(288.15 K, 1 Pa)");
        RangeAssertions.assertClean("air_nu(288.15 K, 1 MPa)");
        RangeAssertions.assertOutsideShowing("air_nu(199 K, 101325 Pa)", "air_nu", RangeAssertions.n(199), RangeAssertions.n(200));
        RangeAssertions.assertOutsideShowing("air_nu(1010 K, 101325 Pa)", "air_nu", RangeAssertions.n(1010), RangeAssertions.n(1000));
        RangeAssertions.assertOutsideShowing("air_nu(288.15 K, 0.99 Pa)", "air_nu", RangeAssertions.n(0.99), RangeAssertions.n(1));
        RangeAssertions.assertOutsideShowing("air_nu(288.15 K, 1.01 MPa)", "air_nu",
            RangeAssertions.n(1.01e6, 1.01, 1010), RangeAssertions.n(1e6, 1, 1000));
    }

    // ---------------------------------------------------------------- water

    /**
     * Density of air-free water at 101.325 kPa, Kell, G. S. (1975), J. Chem. Eng. Data 20,
     * 97-105, 0-150 °C (from memory). It agrees with IAPWS-95 to about 1e-5; the
     * 1.3 kPa between 0.1 MPa and 101.325 kPa changes ρ by 6e-7.
     */
    static double kellDensity(double celsius) {
        double t = celsius;
        return (999.83952 + 16.945176 * t - 7.9870401e-3 * t * t - 46.170461e-6 * t * t * t
            + 105.56302e-9 * Math.pow(t, 4) - 280.54253e-12 * Math.pow(t, 5)) / (1 + 16.879850e-3 * t);
    }

    /**
     * Density of water, Tanaka, M. et al. (2001), Metrologia 38, 301-309, eq. 1 (the CIPM
     * table, 0-40 °C, air-free SMOW at 101.325 kPa; from memory).
     */
    static double tanakaDensity(double celsius) {
        double a1 = -3.983035, a2 = 301.797, a3 = 522528.9, a4 = 69.34881, a5 = 999.974950;
        double t = celsius;
        return a5 * (1 - (t + a1) * (t + a1) * (t + a2) / (a3 * (t + a4)));
    }

    private static final double[] H0 = {1.67752, 2.20462, 0.6366564, -0.241605};
    private static final double[][] H = {
        // H[i][j], i = 0..5 rows, j = 0..6 columns
        {5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0},
        {8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0},
        {-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0},
        {-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3},
        {0, 0, -2.57040e-1, 0, 0, 8.72102e-3, 0},
        {0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4},
    };

    /**
     * Viscosity of water in Pa·s, IAPWS Release on the IAPWS Formulation 2008 for the Viscosity
     * of Ordinary Water Substance, eq. 10-12 and Tables 1-2 (μ0·μ1; the critical enhancement μ2
     * is 1 away from the critical point); coefficients from memory, checked below against the
     * release's own verification values.
     */
    static double iapws2008Viscosity(double kelvin, double density) {
        double tb = kelvin / 647.096, rb = density / 322.0;
        double sum0 = 0;
        for (int i = 0; i < 4; i++) sum0 += H0[i] / Math.pow(tb, i);
        double mu0 = 100 * Math.sqrt(tb) / sum0;
        double outer = 0;
        for (int i = 0; i < 6; i++) {
            double inner = 0;
            for (int j = 0; j < 7; j++) inner += H[i][j] * Math.pow(rb - 1, j);
            outer += Math.pow(1 / tb - 1, i) * inner;
        }
        double mu1 = Math.exp(rb * outer);
        return mu0 * mu1 * 1e-6;
    }

    @Test
    void theIapwsViscosityHelperReproducesTheReleaseVerificationValues() {
        // IAPWS 2008 viscosity release, Table 4 (verification values without the critical
        // enhancement; from memory): 889.735100 µPa·s at 298.15 K and 998 kg/m³,
        // 1437.649467 at 298.15 K and 1200 kg/m³, 307.883622 at 373.15 K and 1000 kg/m³.
        assertEquals(889.735100e-6, iapws2008Viscosity(298.15, 998), 1e-12);
        assertEquals(1437.649467e-6, iapws2008Viscosity(298.15, 1200), 1e-12);
        assertEquals(307.883622e-6, iapws2008Viscosity(373.15, 1000), 1e-12);
    }

    @Test
    void theDensityFormulasAgreeWithEachOther() {
        // Kell (1975) and Tanaka et al. (2001) are independent fits; both within 2e-5 over 0-40 °C.
        for (double t = 0; t <= 40; t += 2.5) {
            assertEquals(tanakaDensity(t), kellDensity(t), 0.02, "at " + t + " °C");
        }
    }

    @ParameterizedTest(name = "{0} °C")
    @CsvSource({"2.5", "12.5", "17.5", "22.5", "37.5", "47.5", "62.5", "77.5", "87.5", "97.5"})
    void waterBetweenTheTableRows(double celsius) {
        double rho = StdlibCheck.si("water.rho(" + celsius + " degC)");
        double mu = StdlibCheck.si("water.mu(" + celsius + " degC)");
        double nu = StdlibCheck.si("water_nu(" + celsius + " degC)");
        double rhoRef = kellDensity(celsius);
        double muRef = iapws2008Viscosity(celsius + 273.15, rhoRef);
        // Density: Kell (1975) above; linear interpolation between 5 °C rows adds at most 6e-5.
        assertEquals(rhoRef, rho, rhoRef * 1e-4, "rho");
        // Viscosity: IAPWS 2008 above; linear interpolation of a convex curve between 5 °C rows
        // reads high by at most 0.6 % (at 2.5 °C), 0.3 % above 20 °C.
        double allowed = celsius < 20 ? 0.006 : 0.003;
        assertEquals(muRef, mu, muRef * allowed, "mu");
        assertEquals(muRef / rhoRef, nu, muRef / rhoRef * allowed, "nu");
    }

    @Test
    void tanakaDensityBetweenTheRowsBelow40C() {
        // CIPM table formula, Tanaka et al. (2001), at points between the rows.
        for (double t : new double[] {2.5, 7.5, 12.5, 17.5, 22.5, 27.5, 32.5, 37.5}) {
            double rho = StdlibCheck.si("water.rho(" + t + " degC)");
            assertEquals(tanakaDensity(t), rho, 0.1, "at " + t + " °C");
        }
    }

    @Test
    void waterAtTheFamiliarPoints() {
        // 20 °C: 998.21 kg/m³, 1.0016 mPa·s; 25 °C: 997.05 kg/m³, 0.8900 mPa·s (IAPWS-95 and the
        // IAPWS 2008 viscosity at 0.1 MPa, as widely tabulated, e.g. CRC Handbook; from memory).
        assertEquals(998.21, StdlibCheck.si("water.rho(20 degC)"), 0.01);
        assertEquals(1.0016e-3, StdlibCheck.si("water.mu(20 degC)"), 0.0002e-3);
        assertEquals(997.05, StdlibCheck.si("water.rho(25 degC)"), 0.01);
        assertEquals(0.8900e-3, StdlibCheck.si("water.mu(25 degC)"), 0.0002e-3);
        // The maximum density, 999.97 kg/m³ near 4 °C (Tanaka et al. 2001: 999.9750 at 3.98 °C).
        assertEquals(999.97, StdlibCheck.si("water.rho(5 degC)"), 0.01);
    }

    @Test
    void waterAtTheEndsOfItsTable() {
        // IAPWS-95 at 0.1 MPa: 999.84 kg/m³ at 0 °C and 958.6 kg/m³ just below boiling
        // (saturated liquid at 0.1 MPa, 99.61 °C: 958.6 kg/m³, IAPWS-95 saturation table;
        // from memory). Viscosity: 1.792 and 0.2828 mPa·s (IAPWS 2008).
        assertEquals(kellDensity(0), StdlibCheck.si("water.rho(0 degC)"), 0.01);
        assertEquals(958.6, StdlibCheck.si("water.rho(99.6 degC)"), 0.1);
        assertEquals(iapws2008Viscosity(273.15, kellDensity(0)), StdlibCheck.si("water.mu(0 degC)"), 1e-7);
        assertEquals(iapws2008Viscosity(372.75, 958.64), StdlibCheck.si("water.mu(99.6 degC)"), 1e-7);
    }

    @Test
    void waterRange() {
        for (String f : new String[] {"water.rho", "water.mu", "water_nu"}) {
            RangeAssertions.assertClean(f + "(0 degC)");
            RangeAssertions.assertClean(f + "(99.6 degC)");
            // Beyond the rows: extrapolated, and warned like a range violation.
            // 272.15 K is -1 °C (a minus sign before a °C reading would negate the absolute value).
            RangeAssertions.assertOutsideShowing(f + "(272.15 K)", f.startsWith("water.") ? "water" : f,
                RangeAssertions.n(-1, 272.15), RangeAssertions.n(0, 273.15));
            RangeAssertions.assertOutsideShowing(f + "(100 degC)", f.startsWith("water.") ? "water" : f,
                RangeAssertions.n(100, 373.15), RangeAssertions.n(99.6, 372.75));
        }
    }

    @Test
    void waterRefusesANonTemperature() {
        List<Diagnostic> d = StdlibCheck.diagnostics("water.rho(20 m)");
        assertTrue(d.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + d);
    }
}
