package dev.plumb.analysis;


import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Severity;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Right and wrong uses of a body's and a fluid's density. Which density belongs where is common
 * practice: drag and lift coefficients are defined on the dynamic pressure of the free stream,
 * ½·ρ·V² with the fluid's density, and so is the Reynolds number; the body's density enters its
 * weight, and with the fluid's as the difference ρ_body − ρ_fluid in its buoyant weight (the
 * terminal-velocity balance, e.g. Clift, Grace and Weber (1978), Bubbles, Drops, and Particles,
 * ch. 1 (from memory)).
 */
class BasisDensityTest {
    private static final String CASE = "input rho_w = 1000 kg/m^3   as fluid\ninput rho_s = 2650 kg/m^3   as body\n"
        + "input V = 0.2 m/s\ninput d = 2 mm\ninput mu = 1.0e-3 Pa*s\ninput g = 9.81 m/s^2\n"
        + "Cd = cd_sphere_morrison(400)\nA = sphere_frontal_area(d)\nVol = pi * d^3 / 6\n";

    static Stream<Arguments> uses() {
        return Stream.of(
            // name, the calc after CASE, whether a finding is expected, message fragment
            Arguments.of("drag with the fluid's dynamic pressure",
                "F = Cd * A * 0.5 * rho_w * V^2\n", false, null),
            Arguments.of("drag with the grain's density written out",
                "F = 0.5 * rho_s * V^2 * Cd * A\n", true,
                "Cd (from cd_sphere_morrison) scales the dynamic pressure of the fluid, ½·ρ·V² with the fluid's ρ, "
                    + "but rho_s is tagged body"),
            Arguments.of("drag through a named dynamic pressure of the grain",
                "q = 0.5 * rho_s * V^2\nF = q * A * Cd\n", true, "but rho_s (in q) is tagged body"),
            Arguments.of("drag through two names",
                "q = 0.5 * rho_s * V^2\nq2 = q\nF = Cd * A * q2\n", true, "but rho_s (in q) is tagged body"),
            Arguments.of("the grain's density in the denominator of a terminal speed",
                "V_t = sqrt(2 * rho_w * g * Vol / (rho_s * Cd * A))\n", true, "but rho_s is tagged body"),
            Arguments.of("terminal speed of a heavy grain: its density above, the coefficient below",
                "V_t = sqrt(4 * g * d * rho_s / (3 * Cd * rho_w))\n", false, null),
            Arguments.of("the same written with the reciprocal of the coefficient",
                "V_t = sqrt(4 / 3 * g * d * rho_s * (1 / Cd) / rho_w)\n", false, null),
            Arguments.of("the library's dynamic pressure with the grain's density",
                "q = dynamic_pressure(rho_s, V)\n", true,
                "dynamic_pressure takes rho as the density of the fluid, but rho_s is tagged body"),
            Arguments.of("the library's Reynolds number with the grain's density",
                "Re = reynolds(rho_s, V, d, mu)\n", true,
                "reynolds takes rho as the density of the fluid, but rho_s is tagged body"),
            Arguments.of("the library's Reynolds number with the water's density",
                "Re = reynolds(rho_w, V, d, mu)\n", false, null),
            Arguments.of("weight of the grain",
                "W = rho_s * g * Vol\n", false, null),
            Arguments.of("buoyant weight of the grain",
                "W_b = (rho_s - rho_w) * g * Vol\n", false, null),
            Arguments.of("buoyant weight balanced against drag",
                "seek U in 1 mm/s .. 2 m/s where Cd * A * 0.5 * rho_w * U^2 = (rho_s - rho_w) * g * Vol\n",
                false, null),
            Arguments.of("relative density",
                "s = rho_s / rho_w\nF = Cd * A * s * 0.5 * rho_w * V^2\n", false, null),
            Arguments.of("a plain input density says nothing",
                "input rho_x = 2650 kg/m^3\nF = 0.5 * rho_x * V^2 * Cd * A\n", false, null),
            Arguments.of("a parameter declared for the body given the fluid",
                "correlation settling_factor(rho_p: density as body, rho_f: density as fluid)\n"
                    + "    = (rho_p - rho_f) / rho_f\nend\nk = settling_factor(rho_w, rho_w)\n", true,
                "settling_factor takes rho_p as the density of the body, but rho_w is tagged fluid: pass the density "
                    + "of the body itself"),
            Arguments.of("a parameter declared for the body given the body",
                "correlation settling_factor(rho_p: density as body, rho_f: density as fluid)\n"
                    + "    = (rho_p - rho_f) / rho_f\nend\nk = settling_factor(rho_s, rho_w)\n", false, null),
            Arguments.of("a density tag on something else",
                "x = d   as fluid\n", true, "`as fluid` says whose density a value is, but x is a length"));
    }

    @org.junit.jupiter.api.Test
    void theFixtureMarksTheMistakes() {
        Fixture.checkResource("basis.density.plumb");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("uses")
    void use(String name, String calc, boolean finding, String fragment) {
        Fixture.assertOneFinding(CASE + calc, Code.BASIS_DENSITY, finding ? Severity.WARNING : null, fragment);
    }
}
