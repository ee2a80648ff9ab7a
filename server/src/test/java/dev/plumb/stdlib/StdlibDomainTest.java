package dev.plumb.stdlib;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The physical domains the library's `domain` lines state: outside them a call is an error
 * (math.domain) and its value unknown, so nothing downstream is computed from it. The domains
 * are facts of the trade, not fitted limits: a Reynolds number, a length that builds an area, a
 * density, a viscosity and an absolute temperature are positive (common practice).
 */
class StdlibDomainTest {

    /** One error, math.domain, naming the domain line; the value is not computed. */
    static void assertOutsideDomain(String call, String domain) {
        Analysis a = StdlibCheck.analyze("x = " + call + "\n");
        List<Diagnostic> all = a.diagnostics();
        assertEquals(1, all.size(), () -> call + ": " + all);
        Diagnostic d = all.get(0);
        assertEquals("math.domain", d.code().id(), d::toString);
        assertTrue(d.message().contains("is defined only for " + domain), d::toString);
        assertFalse(((Row.ValueRow) a.rows().get(0)).value().known(), call + " must be unknown");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "cd_sphere_sn(-100)                          | Re > 0",
        "cd_sphere_clift_gauvin(-1e3)                | Re > 0",
        "cd_sphere_brown_lawler(-1e3)                | Re > 0",
        "cd_sphere_morrison(-1e5)                    | Re > 0",
        "cd_cylinder_subcritical(-1e4)               | Re > 0",
        "cd_cylinder(-1e4)                           | Re > 0",
        "cd_cube(-1e5)                               | Re > 0",
        "cd_disk(-1e5)                               | Re > 0",
        "cf_plate_turb_avg(-1e6)                     | Re > 0",
        "cf_plate_prandtl_schlichting(-1e6)          | Re > 0",
        "dynamic_pressure(-1.2 kg/m^3, 20 m/s)       | rho > 0 kg/m^3",
        "reynolds(1.2 kg/m^3, 20 m/s, 0 m, 1.8e-5 Pa*s) | L > 0 m",
        "reynolds_nu(2 m/s, 0.1 m, -1e-6 m^2/s)      | nu > 0 m^2/s",
        "air_density(20 K - 300 K, 101 kPa)          | T > 0 K",
        "air_viscosity(-10 K)                        | T > 0 K",
        "air_nu(288 K, -5 kPa)                       | p > 0 Pa",
        "sphere_frontal_area(0 m)                    | d > 0 m",
        "cylinder_projected_area(0.3 m, -2 m)        | L > 0 m",
        "cylinder_lateral_area(-0.3 m, 2 m)          | d > 0 m",
        "plate_wetted_area(1 m, 0 m)                 | L > 0 m",
        "box_wetted_area(2 m, 1 m, -1 m)             | h > 0 m",
        "wing_planform_area(10 m, -1 m)              | chord > 0 m",
        "cf_plate_blasius_avg(-1e4)                  | Re > 0",
        "cf_plate_mixed(-1e6)                        | Re > 0",
        "cf_plate_ps_mixed_3e6(-1e6)                 | Re > 0",
        "cf_ittc1957(-1e7)                           | Re > 0",
        "cd_plate_normal(2, -5e4)                    | Re > 0",
        "cd_plate_normal(-2, 5e4)                    | AR > 0",
        "cd_cone(30 deg, -5e4)                       | Re > 0",
        "cylinder_length_factor(-3, 5e4)             | L_over_d > 0",
        "drag_force(1.2, -1 m^2, 500 Pa)             | A >= 0 m^2",
        "lift_force(0.8, 2 m^2, -500 Pa)             | q >= 0 Pa",
        "water.rho(-300 degC)                        | T > 0 K",
        "cl_alpha_lifting_line(0, 2 * pi)            | AR > 0",
        "cl_alpha_helmbold(2, -6)                    | a0 > 0",
        "cl_wing_lifting_line(5 deg, -8, 2 * pi)     | AR > 0",
        "cl_wing_helmbold(5 deg, 2, 0)               | a0 > 0",
        "cd_induced(0.5, 8, 0)                       | e > 0",
        "cd_polar(-0.01, 0.5, 8, 0.9)                | CD0 >= 0",
        "cd_polar(0.01, 0.5, 0, 0.9)                 | AR > 0",
        "ks_admissible(0 m/s, 1e-6 m^2/s)            | V > 0 m/s",
        "ks_admissible(2 m/s, -1e-6 m^2/s)           | nu > 0 m^2/s",
        "cf_plate_rough_local(-1e3, 1e7)             | x_over_ks > 0",
        "cf_plate_rough_local(1e3, 0)                | Re_x > 0",
        "cf_plate_rough_avg(-5, 1e7)                 | L_over_ks > 0",
        "cf_plate_rough_avg(1e4, -1e8)               | Re > 0",
        "seawater_density(20 degC, -1 g/kg)          | S >= 0",
        "seawater_viscosity(-300 degC, 35 g/kg)      | T > 0 K",
        "seawater_nu(20 degC, -0.5 %)                | S >= 0",
        "water_vapour_pressure(-10 K)                | 0 K < T <= 647.096 K",
        "water_vapour_pressure(650 K)                | 0 K < T <= 647.096 K",
        "moist_air_density(20 degC, 101 kPa, 1.2)    | 0 <= RH <= 1",
        "moist_air_density(20 degC, 101 kPa, -0.1)   | 0 <= RH <= 1",
        "moist_air_density(20 degC, 0 kPa, 0.5)      | p > 0 Pa",
        "moist_air_density_cipm(20 degC, 101 kPa, 80) | 0 <= RH <= 1"})
    void outsideTheDomainIsAnErrorAndUnknown(String call, String domain) {
        assertOutsideDomain(call.strip(), domain.strip());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"cd_sphere(1e-3)", "cd_cylinder_subcritical(1e-3)", "sphere_frontal_area(1 mm)",
        "reynolds(1.2 kg/m^3, 0 m/s, 0.1 m, 1.8e-5 Pa*s)"})
    void insideTheDomainIsComputed(String call) {
        // Small but positive is inside the domain (a zero speed gives Re = 0, which is no error in
        // itself: only a correlation that needs Re > 0 refuses it).
        Analysis a = StdlibCheck.analyze("x = " + call + "\n");
        assertTrue(a.diagnostics().stream().noneMatch(d -> d.code().id().equals("math.domain")), a.diagnostics()::toString);
        assertTrue(((Row.ValueRow) a.rows().get(0)).value().known(), call);
    }
}
