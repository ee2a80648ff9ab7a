package dev.plumb.stdlib;

import static dev.plumb.stdlib.RangeAssertions.n;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The ICAO standard atmosphere of the standard library against the published tables. */
class AtmosphereTest {

    private static double at(String function, double metres) {
        return StdlibCheck.si(function + "(" + metres + " m)");
    }

    @ParameterizedTest(name = "H = {0} m")
    @CsvSource({
        // ICAO Doc 7488/3 (1993), Manual of the ICAO Standard Atmosphere, Table 1, by
        // geopotential altitude H: T (K), p (Pa), ρ (kg/m³) (from memory; 6 significant figures).
        "0,     288.15, 101325,  1.22500",
        "1000,  281.65, 89874.6, 1.11164",
        "5000,  255.65, 54019.9, 0.736116",
        "11000, 216.65, 22632.1, 0.363918",
        "15000, 216.65, 12044.6, 0.193674",
        "20000, 216.65, 5474.89, 0.0880349",
    })
    void icaoTableByGeopotentialAltitude(double h, double t, double p, double rho) {
        assertEquals(t, at("isa_temperature", h), 0.005);
        assertEquals(p, at("isa_pressure", h), p * 2e-5);
        assertEquals(rho, at("isa_density", h), rho * 2e-5);
    }

    /** US Standard Atmosphere 1976, eq. 18: H = r0·Z/(r0 + Z), r0 = 6 356 766 m (from memory). */
    private static double geopotential(double geometric) {
        double r0 = 6_356_766.0;
        return r0 * geometric / (r0 + geometric);
    }

    @ParameterizedTest(name = "Z = {0} m")
    @CsvSource({
        // US Standard Atmosphere 1976 (NOAA/NASA/USAF), Table I, by geometric altitude Z:
        // T (K), p (Pa), ρ (kg/m³), μ (Pa·s), 5 significant figures (from memory; T, p, ρ at 1, 5
        // and 11 km as reprinted in Kutz (ed.), Mechanical Engineers' Handbook, vol. 4, Table 6).
        "0,     288.150, 1.01325e5, 1.2250,    1.7894e-5",
        "1000,  281.651, 8.9876e4,  1.1117,    1.7579e-5",
        "5000,  255.676, 5.4048e4,  7.3643e-1, 1.6282e-5",
        "11000, 216.774, 2.2700e4,  3.6480e-1, 1.4223e-5",
        "15000, 216.650, 1.2111e4,  1.9476e-1, 1.4216e-5",
        "20000, 216.650, 5.5293e3,  8.8910e-2, 1.4216e-5",
    })
    void usStandardAtmosphereByGeometricAltitude(double z, double t, double p, double rho, double mu) {
        double h = geopotential(z);
        assertEquals(t, at("isa_temperature", h), 0.0015);
        assertEquals(p, at("isa_pressure", h), p * 1e-4);
        assertEquals(rho, at("isa_density", h), rho * 1e-4);
        assertEquals(mu, at("isa_viscosity", h), mu * 1e-4);
    }

    @Test
    void theLayersMeetAtTheTropopause() {
        // The standard atmosphere is continuous in T, p and ρ at 11 km (by construction of the
        // ICAO layers): the two pieces agree within the change over 1 mm.
        for (String f : new String[] {"isa_temperature", "isa_pressure", "isa_density", "isa_viscosity"}) {
            double below = at(f, 10_999.999);
            double above = at(f, 11_000.001);
            assertEquals(below, above, Math.abs(below) * 1e-6, f);
        }
    }

    @Test
    void pressureAndDensityObeyTheHydrostaticEquation() {
        // The atmosphere is in hydrostatic balance, dp/dH = -ρ·g0 with g0 = 9.80665 m/s² (ICAO
        // Doc 7488/3; geopotential altitude makes g constant), and an ideal gas, p = ρ·R·T
        // with R = 287.05287 J/(kg·K). Checked by central differences in both layers.
        double g0 = 9.80665, r = 287.05287, dh = 1.0;
        for (double h : new double[] {-3000, 500, 4000, 9000, 13000, 18000}) {
            double dpdh = (at("isa_pressure", h + dh) - at("isa_pressure", h - dh)) / (2 * dh);
            double rho = at("isa_density", h);
            assertEquals(-rho * g0, dpdh, rho * g0 * 1e-6, "hydrostatic at " + h + " m");
            double p = at("isa_pressure", h);
            double t = at("isa_temperature", h);
            assertEquals(p, rho * r * t, p * 1e-9, "ideal gas at " + h + " m");
        }
    }

    @Test
    void temperatureFallsAtTheStandardLapseRate() {
        // ICAO Doc 7488/3: -6.5 K per km of geopotential altitude up to 11 km, constant above.
        assertEquals(-6.5, at("isa_temperature", 3000) - at("isa_temperature", 2000), 1e-9);
        assertEquals(0.0, at("isa_temperature", 18000) - at("isa_temperature", 12000), 1e-9);
    }

    @Test
    void viscosityFollowsTheAirViscosityOfTheStandardTemperature() {
        for (double h : new double[] {0, 7000, 16000}) {
            double t = at("isa_temperature", h);
            assertEquals(StdlibCheck.si("air_viscosity(" + t + " K)"), at("isa_viscosity", h), 1e-12);
        }
    }

    @Test
    void unitsOfAltitudeConvert() {
        // 36 089.24 ft is 11 000 m exactly (1 ft = 0.3048 m): the tropopause, 216.65 K.
        assertEquals(216.65, StdlibCheck.si("isa_temperature(36089.24 ft)"), 1e-4);
    }

    @Test
    void range() {
        for (String f : new String[] {"isa_temperature", "isa_pressure", "isa_density", "isa_viscosity"}) {
            RangeAssertions.assertClean(f + "(-5 km)");
            RangeAssertions.assertClean(f + "(20 km)");
            RangeAssertions.assertOutsideShowing(f + "(-5.1 km)", f, n(-5.1, -5100), n(-5, -5000));
            RangeAssertions.assertOutsideShowing(f + "(20.5 km)", f, n(20.5, 20500), n(20, 20000));
        }
    }

    @Test
    void altitudeMustBeALength() {
        var d = StdlibCheck.diagnostics("isa_pressure(101325 Pa)");
        org.junit.jupiter.api.Assertions.assertTrue(
            d.stream().anyMatch(x -> x.code().id().equals("unit.mismatch")), () -> "" + d);
    }
}
