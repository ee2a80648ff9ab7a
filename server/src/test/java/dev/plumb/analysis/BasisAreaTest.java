package dev.plumb.analysis;


import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Severity;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Right and wrong pairings of coefficients and reference areas. Which area belongs to which
 * coefficient is common practice: bluff-body drag coefficients are referred to the frontal
 * (projected) area — π·d²/4 for a sphere, d·L for a cylinder in cross-flow — skin-friction
 * coefficients to the wetted area, and wing coefficients to the planform area.
 */
class BasisAreaTest {
    private static final String AIR = "input rho = 1.2 kg/m^3\ninput V = 20 m/s\nq = 0.5 * rho * V^2\n"
        + "input d = 0.3 m\ninput L = 2 m\ninput b = 1.5 m\ninput h = 0.8 m\n";

    static Stream<Arguments> pairings() {
        return Stream.of(
            // name, the calc after AIR, expected severity (null: no finding), message fragment
            Arguments.of("sphere with its frontal area",
                "Cd = cd_sphere(1e4)\nA = pi * d^2 / 4\nF = Cd * A * q\n", null, null),
            Arguments.of("sphere with its surface",
                "Cd = cd_sphere(1e4)\nA = pi * d^2\nF = Cd * A * q\n", Severity.WARNING,
                "Cd (from cd_sphere) is referenced to frontal area, but A has the shape of the surface of a sphere (π·d²), "
                    + "a wetted area: for a sphere use the frontal area π·d²/4"),
            Arguments.of("sphere with the library's frontal area",
                "Cd = cd_sphere(1e4)\nA = sphere_frontal_area(d)\nF = Cd * A * q\n", null, null),
            Arguments.of("sphere with the library's surface area",
                "Cd = cd_sphere(1e4)\nA = sphere_surface_area(d)\nF = Cd * A * q\n", Severity.WARNING,
                "Cd (from cd_sphere) is referenced to frontal area, but A is tagged wetted: use the frontal area"),
            Arguments.of("cylinder in cross-flow with d·L",
                "Cd = cd_cylinder(1e5)\nA = d * L\nF = Cd * A * q\n", null, null),
            Arguments.of("cylinder in cross-flow with its lateral surface",
                "Cd = cd_cylinder(1e5)\nA_side = pi * d * L\nF = Cd * A_side * q\n", Severity.WARNING,
                "A_side has the shape of the lateral surface of a cylinder (π·d·L), a wetted area: for a cylinder in "
                    + "cross-flow use the projected area d·L"),
            Arguments.of("lateral surface through names and in another order",
                "Cd = cd_cylinder(1e5)\ncirc = pi * d\nA_side = L * circ\nF = q * A_side * Cd\n", Severity.WARNING,
                "A_side has the shape of the lateral surface of a cylinder"),
            Arguments.of("dynamic pressure written out",
                "Cd = cd_cylinder(1e5)\nF = 0.5 * rho * V^2 * Cd * pi * d * L\n", Severity.WARNING,
                "the shape of the lateral surface of a cylinder"),
            // A flat product a*b*c*d parses left-nested, so the lateral surface π·d·L is spread over
            // several nodes mixed with the coefficient and q; it is judged on the whole product.
            Arguments.of("coefficient called in a flat product with the lateral surface",
                "F2 = cd_cylinder_subcritical(1e4) * pi * d * L * q\n", Severity.WARNING,
                "cd_cylinder_subcritical is referenced to frontal area, but the area in "
                    + "cd_cylinder_subcritical(1e4) * pi * d… has the shape of the lateral surface of a cylinder"),
            Arguments.of("the same force with the surface in brackets",
                "F2 = cd_cylinder_subcritical(1e4) * (pi * d * L) * q\n", Severity.WARNING,
                "has the shape of the lateral surface of a cylinder (π·d·L), a wetted area"),
            Arguments.of("flat product, q and the call first",
                "F2 = q * cd_cylinder_subcritical(1e4) * pi * d * L\n", Severity.WARNING,
                "has the shape of the lateral surface of a cylinder (π·d·L), a wetted area: for a cylinder in "
                    + "cross-flow use the projected area d·L (here `d * L`)"),
            Arguments.of("flat product, the call last",
                "F2 = pi * d * L * q * cd_cylinder(1e5)\n", Severity.WARNING,
                "has the shape of the lateral surface of a cylinder"),
            Arguments.of("flat product, lengths scattered",
                "F2 = L * cd_cylinder(1e5) * q * d * pi\n", Severity.WARNING,
                "has the shape of the lateral surface of a cylinder"),
            Arguments.of("flat product with the dynamic pressure written out",
                "F2 = 0.5 * rho * V^2 * cd_cylinder(1e5) * pi * d * L\n", Severity.WARNING,
                "has the shape of the lateral surface of a cylinder"),
            Arguments.of("flat product with the projected area",
                "F2 = cd_cylinder_subcritical(1e4) * d * L * q\n", null, null),
            Arguments.of("flat product with a sphere's frontal circle",
                "F2 = cd_sphere(1e4) * pi * d^2 / 4 * q\n", null, null),
            Arguments.of("flat product, a sphere's circle after q",
                "F2 = q * cd_sphere(1e4) * pi * d^2 / 4\n", null, null),
            Arguments.of("flat product with a plain number of unknown meaning",
                "F2 = cd_cylinder(1e5) * sqrt(2) * d * L * q\n", null, null),
            // A cylinder's drag in cross-flow is referred to its projected area d·L; its end π·d²/4
            // faces the flow only when the flow runs along the axis (common practice).
            Arguments.of("cross-flow cylinder with the library's projected area",
                "Cd = cd_cylinder(1e5)\nA = cylinder_projected_area(d, L)\nF = Cd * A * q\n", null, null),
            Arguments.of("cross-flow cylinder with the library's end area",
                "Cd = cd_cylinder(1e5)\nA = cylinder_end_area(d)\nF = Cd * A * q\n", Severity.WARNING,
                "Cd (from cd_cylinder) is referenced to frontal area in cross-flow (axis across the stream), but A is "
                    + "the frontal area in axial flow (along the axis): use the projected area d·L, "
                    + "cylinder_projected_area(d, L)"),
            Arguments.of("cross-flow fit and end area, both called in place",
                "F = cd_cylinder_subcritical(1e4) * cylinder_end_area(d) * q\n", Severity.WARNING,
                "cd_cylinder_subcritical is referenced to frontal area in cross-flow"),
            Arguments.of("cross-flow cylinder with a circle written out",
                "Cd = cd_cylinder(1e5)\nA = pi * d^2 / 4\nF = Cd * A * q\n", Severity.WARNING,
                "A has the shape of a circle's area (π·d²/4), the end of a cylinder, which faces axial flow: use the "
                    + "projected area d·L, cylinder_projected_area(d, L)"),
            Arguments.of("cross-flow cylinder with d·L tagged frontal by hand",
                "Cd = cd_cylinder(1e5)\nA = d * L   as frontal\nF = Cd * A * q\n", null, null),
            Arguments.of("a sphere's coefficient states no direction: the end area of a rod is a circle too",
                "Cd = cd_sphere(1e4)\nA = cylinder_end_area(d)\nF = Cd * A * q\n", null, null),
            Arguments.of("an axial coefficient with the end area",
                "correlation cd_rod_axial(LD)\n    basis frontal axial\n    = 0.82\nend\n"
                    + "Cd = cd_rod_axial(4)\nA = cylinder_end_area(d)\nF = Cd * A * q\n", null, null),
            Arguments.of("an axial coefficient with the projected area",
                "correlation cd_rod_axial(LD)\n    basis frontal axial\n    = 0.82\nend\n"
                    + "Cd = cd_rod_axial(4)\nA = cylinder_projected_area(d, L)\nF = Cd * A * q\n", Severity.WARNING,
                "Cd (from cd_rod_axial) is referenced to frontal area in axial flow (along the axis), but A is the "
                    + "frontal area in cross-flow (axis across the stream): use the end area π·d²/4, cylinder_end_area(d)"),
            Arguments.of("two projected areas added stay cross-flow",
                "Cd = cd_cylinder(1e5)\nA = 2 * cylinder_projected_area(d, L) + cylinder_projected_area(d, h)\n"
                    + "F = Cd * A * q\n", null, null),
            Arguments.of("plate normal to the flow, tagged frontal",
                "Cd = cd_plate_normal(b / h, 1e5)\nA = b * h   as frontal\nF = Cd * A * q\n", null, null),
            Arguments.of("plate normal to the flow, tagged wetted",
                "Cd = cd_plate_normal(b / h, 1e5)\nA = 2 * b * h   as wetted\nF = Cd * A * q\n", Severity.WARNING,
                "Cd (from cd_plate_normal) is referenced to frontal area, but A is tagged wetted"),
            Arguments.of("plate parallel to the flow, both faces",
                "Cf = cf_plate_mixed(2e6)\nS = 2 * b * L\nF = Cf * S * q\n", null, null),
            Arguments.of("plate parallel to the flow, one face only",
                "Cf = cf_plate_mixed(2e6)\nS = b * L\nF = Cf * S * q\n", Severity.HINT,
                "S is one rectangle: if the flow wets both faces of a plate, the wetted area is 2·b·L"),
            Arguments.of("skin friction on a frontal circle",
                "Cf = cf_plate_mixed(2e6)\nA = pi * d^2 / 4\nF = Cf * A * q\n", Severity.WARNING,
                "has the shape of a circle's area (π·d²/4), a frontal area: use the surface the flow runs over"),
            Arguments.of("box sides with skin friction",
                "Cf = cf_plate_mixed(2e6)\nS = box_wetted_area(L, b, h)\nF = Cf * S * q\n", null, null),
            Arguments.of("box sides with a bluff-body coefficient",
                "Cd = cd_cube(1e5)\nS = box_wetted_area(L, b, h)\nF = Cd * S * q\n", Severity.WARNING,
                "Cd (from cd_cube) is referenced to frontal area, but S is tagged wetted"),
            Arguments.of("wing lift on its planform",
                "correlation cl_sail(alpha)\n    basis planform\n    = 2 * pi * alpha\nend\n"
                    + "CL = cl_sail(0.1)\nA = wing_planform_area(L, b)\nF_L = CL * A * q\n", null, null),
            Arguments.of("wing lift on a wetted area",
                "correlation cl_sail(alpha)\n    basis planform\n    = 2 * pi * alpha\nend\n"
                    + "CL = cl_sail(0.1)\nA = plate_wetted_area(L, b)\nF_L = CL * A * q\n", Severity.WARNING,
                "CL (from cl_sail) is referenced to planform area, but A is tagged wetted: use the planform area"),
            Arguments.of("through a function of the user's",
                "drag(C, A, p) = C * A * p\nCd = cd_sphere(1e4)\nF = drag(Cd, pi * d^2, q)\n", Severity.WARNING,
                "in drag(…): C (from cd_sphere) is referenced to frontal area"),
            Arguments.of("an area solved by find keeps its tag",
                "seek S in 0.01 m^2 .. 10 m^2 where 2 * S = 3 m^2   as wetted\nCd = cd_sphere(1e4)\nF = Cd * S * q\n",
                Severity.WARNING, "Cd (from cd_sphere) is referenced to frontal area, but S is tagged wetted"),
            Arguments.of("a plain input coefficient says nothing",
                "input Cd = 1.2\nA = pi * d * L\nF = Cd * A * q\n", null, null),
            Arguments.of("a tag on something that is not an area",
                "F = 3 N   as frontal\n", Severity.WARNING, "`as frontal` tags areas, but F is a force"));
    }

    @org.junit.jupiter.api.Test
    void theFixtureMarksTheMistake() {
        Fixture.checkResource("basis.area.plumb");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("pairings")
    void pairing(String name, String calc, Severity severity, String fragment) {
        Fixture.assertOneFinding(AIR + calc, Code.BASIS_AREA, severity, fragment);
    }
}
