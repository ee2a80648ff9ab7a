package dev.plumb.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

/**
 * Units the unit library does not know, with their factors to SI from NIST SP 811 (2008),
 * "Guide for the Use of the International System of Units" (Thompson and Taylor), Appendix
 * B.8 (factors listed alphabetically). The figures are quoted from memory of that table, not
 * read from a copy; NistFactorsTest checks each against the same figures. Where NIST's rounded
 * figure follows from an exact definition in terms of other units (psi = lbf/in², slug =
 * lbf·s²/ft), the definition is used so that "psi" and "lbf/in^2" agree to the last bit; the
 * NIST figure is cited beside it and checked in a test.
 *
 * <p>Every factor below is computed in decimal from these exact definitions: the foot
 * (0.3048 m), the inch (0.0254 m), the avoirdupois pound (0.453 592 37 kg), standard gravity
 * (9.806 65 m/s²) and the standard atmosphere (101 325 Pa). "Conventional" mercury and water
 * columns use the densities NIST's conventional entries assume: 13 595.1 kg/m³ and
 * 1000 kg/m³.
 */
final class TradeUnits {

    /** Pound-force in newtons: 0.453 592 37 kg × 9.806 65 m/s², both exact (NIST SP 811 B.8). */
    private static final String POUND_FORCE_N = "4.4482216152605";
    private static final String POUND_KG = "0.45359237";
    private static final String FOOT_M = "0.3048";
    private static final String SQUARE_FOOT_M2 = "0.09290304";
    private static final String SQUARE_INCH_M2 = "0.00064516";
    private static final String CUBIC_FOOT_M3 = "0.028316846592";
    private static final String STANDARD_GRAVITY = "9.80665";
    /** Density of conventional mercury, kg/m³ (NIST SP 811 B.8, inch/millimetre of mercury). */
    private static final String MERCURY = "13595.1";
    /** Density of conventional water, kg/m³ (NIST SP 811 B.8, inch/foot of water). */
    private static final String WATER = "1000";

    private TradeUnits() {
    }

    static List<AtomDefinition> all() {
        Dimension pressure = Dimension.of(-1, 1, -2, 0, 0, 0, 0);
        Dimension force = Dimension.of(1, 1, -2, 0, 0, 0, 0);
        Dimension forcePerLength = Dimension.of(0, 1, -2, 0, 0, 0, 0);
        Dimension energy = Dimension.of(2, 1, -2, 0, 0, 0, 0);
        Dimension volume = Dimension.of(3, 0, 0, 0, 0, 0, 0);
        Dimension volumeFlow = Dimension.of(3, 0, -1, 0, 0, 0, 0);
        Dimension perTime = Dimension.of(0, 0, -1, 0, 0, 0, 0);
        Dimension dynamicViscosity = Dimension.of(-1, 1, -1, 0, 0, 0, 0);
        Dimension kinematicViscosity = Dimension.of(2, 0, -1, 0, 0, 0, 0);
        return List.of(
                // --- mass ---
                // slug → kg: 1.459 390 E+01 (B.8); defined as lbf·s²/ft.
                AtomDefinition.of("slug", "slug", ratio(POUND_FORCE_N, FOOT_M), Dimension.MASS),
                // ounce (avoirdupois) (oz) → kg: 2.834 952 E-02 (B.8); 1/16 lb exactly.
                AtomDefinition.of("oz", "avoirdupois ounce", ratio(POUND_KG, "16"),
                        Dimension.MASS),
                // ton, short (2000 lb) → kg: 9.071 847 E+02 (B.8); 2000 lb exactly.
                AtomDefinition.of("ton", "short ton", exact(times("2000", POUND_KG)),
                        Dimension.MASS),
                // ton, metric (t) → kg: 1.0 E+03, exact (B.8). No prefixes: "kt" would read as
                // a kilotonne where people mean a knot.
                AtomDefinition.of("t", "tonne", 1.0e3, Dimension.MASS),
                // --- force and force per length ---
                // kip (1 kip = 1000 lbf) → N: 4.448 222 E+03 (B.8).
                AtomDefinition.of("kip", "kip", exact(times("1000", POUND_FORCE_N)), force)
                        .alias("kipf"),
                // dyne (dyn) → N: 1.0 E-05, exact (B.8).
                AtomDefinition.of("dyn", "dyne", 1.0e-5, force),
                // pound-force per foot (lbf/ft) → N/m: 1.459 390 E+01 (B.8).
                AtomDefinition.of("plf", "pound-force per linear foot",
                        ratio(POUND_FORCE_N, FOOT_M), forcePerLength),
                // kip per foot → N/m: 1000 × B.8's pound-force per foot.
                AtomDefinition.of("klf", "kip per linear foot",
                        ratio(times("1000", POUND_FORCE_N), FOOT_M), forcePerLength),
                // --- pressure ---
                // psi (lbf/in²) → Pa: 6.894 757 E+03 (B.8).
                AtomDefinition.of("psi", "pound-force per square inch",
                        ratio(POUND_FORCE_N, SQUARE_INCH_M2), pressure),
                // psia: an absolute pressure in psi, the same factor. Its gauge twin (psig) is
                // refused in UnitExpressionParser: it needs an atmospheric pressure.
                AtomDefinition.of("psia", "pound-force per square inch, absolute",
                        ratio(POUND_FORCE_N, SQUARE_INCH_M2), pressure),
                // kip per square inch (ksi) → Pa: 6.894 757 E+06 (B.8).
                AtomDefinition.of("ksi", "kip per square inch",
                        ratio(times("1000", POUND_FORCE_N), SQUARE_INCH_M2), pressure),
                // pound-force per square foot (lbf/ft²) → Pa: 4.788 026 E+01 (B.8).
                AtomDefinition.of("psf", "pound-force per square foot",
                        ratio(POUND_FORCE_N, SQUARE_FOOT_M2), pressure),
                // kip per square foot → Pa: 1000 × B.8's pound-force per square foot.
                AtomDefinition.of("ksf", "kip per square foot",
                        ratio(times("1000", POUND_FORCE_N), SQUARE_FOOT_M2), pressure),
                // atmosphere, standard (atm) → Pa: 1.013 25 E+05, exact (B.8).
                AtomDefinition.of("atm", "standard atmosphere", 1.01325e5, pressure),
                // bar → Pa: 1.0 E+05, exact (B.8). Takes prefixes for mbar.
                AtomDefinition.of("bar", "bar", 1.0e5, pressure).withPrefixes(),
                // torr (Torr) → Pa: 1.333 224 E+02 (B.8); 101 325/760 Pa by definition.
                AtomDefinition.of("Torr", "torr", ratio("101325", "760"), pressure).alias("torr"),
                // millimeter of mercury, conventional (mmHg) → Pa: 1.333 224 E+02 (B.8).
                AtomDefinition.of("mmHg", "conventional millimetre of mercury",
                        exact(times(MERCURY, STANDARD_GRAVITY, "0.001")), pressure),
                // inch of mercury, conventional (inHg) → Pa: 3.386 389 E+03 (B.8).
                AtomDefinition.of("inHg", "conventional inch of mercury",
                        exact(times(MERCURY, STANDARD_GRAVITY, "0.0254")), pressure),
                // millimeter of water, conventional (mmH2O) → Pa: 9.806 65 E+00, exact (B.8).
                AtomDefinition.of("mmH2O", "conventional millimetre of water",
                        exact(times(WATER, STANDARD_GRAVITY, "0.001")), pressure),
                // inch of water, conventional (inH2O) → Pa: 2.490 889 E+02 (B.8).
                AtomDefinition.of("inH2O", "conventional inch of water",
                        exact(times(WATER, STANDARD_GRAVITY, "0.0254")), pressure),
                // foot of water, conventional (ftH2O) → Pa: 2.989 067 E+03 (B.8).
                AtomDefinition.of("ftH2O", "conventional foot of water",
                        exact(times(WATER, STANDARD_GRAVITY, FOOT_M)), pressure),
                // --- energy ---
                // British thermal unit_IT (Btu_IT) → J: 1.055 056 E+03 (B.8); exactly
                // 4.1868 J/(g·K) × 453.592 37 g × (1/1.8) K.
                AtomDefinition.of("BTU", "International Table British thermal unit",
                        ratio(times("4.1868", "453.59237"), "1.8"), energy).alias("Btu"),
                // kilocalorie_IT (kcal_IT) → J: 4.1868 E+03, exact (B.8).
                AtomDefinition.of("kcal", "International Table kilocalorie", 4.1868e3, energy),
                // watt hour (W·h) → J: 3.6 E+03, exact (B.8); kWh, MWh, GWh by prefix.
                AtomDefinition.of("Wh", "watt hour", 3.6e3, energy).withPrefixes(),
                // --- volume and flow ---
                // gallon [U.S.] (gal) → m³: 3.785 412 E-03 (B.8); 231 in³ exactly.
                AtomDefinition.of("gal", "US liquid gallon",
                        exact(times("231", "0.0254", "0.0254", "0.0254")), volume),
                // gallon [U.S.] per minute (gpm) → m³/s: 6.309 020 E-05 (B.8).
                AtomDefinition.of("gpm", "US gallon per minute",
                        ratio(times("231", "0.0254", "0.0254", "0.0254"), "60"), volumeFlow),
                // cubic foot per minute (ft³/min) → m³/s: 4.719 474 E-04 (B.8).
                AtomDefinition.of("cfm", "cubic foot per minute", ratio(CUBIC_FOOT_M3, "60"),
                        volumeFlow),
                // cubic foot per second (ft³/s) → m³/s: 2.831 685 E-02 (B.8).
                AtomDefinition.of("cfs", "cubic foot per second", exact(CUBIC_FOOT_M3),
                        volumeFlow),
                // --- time and rotation ---
                // The Julian year, 365.25 d exactly (the mean of the four-year leap cycle; the
                // astronomers' year "a"). NIST B.8 lists the 365-day year, 3.1536 E+07 s.
                AtomDefinition.of("yr", "Julian year", exact(times("365.25", "86400")),
                        Dimension.TIME),
                // revolution per minute (rpm) → rad/s: 1.047 198 E-01 (B.8). An angular speed:
                // 2π rad per minute. The radian is a plain number, so rpm is 0.1047 s⁻¹, not
                // 1/60 Hz: a revolution frequency in Hz is the value divided by 2π.
                AtomDefinition.of("rpm", "revolution per minute (angular speed)",
                        2 * Math.PI / 60, perTime),
                // --- viscosity ---
                // poise (P) → Pa·s: 1.0 E-01, exact (B.8).
                AtomDefinition.of("P", "poise", 1.0e-1, dynamicViscosity),
                // centipoise (cP) → Pa·s: 1.0 E-03, exact (B.8). Listed whole: the poise takes
                // no prefixes, since a lone "P" must not swallow the peta prefix of "PW", "PJ".
                AtomDefinition.of("cP", "centipoise", 1.0e-3, dynamicViscosity),
                // stokes (St) → m²/s: 1.0 E-04, exact (B.8).
                AtomDefinition.of("St", "stokes", 1.0e-4, kinematicViscosity),
                // centistokes (cSt) → m²/s: 1.0 E-06, exact (B.8).
                AtomDefinition.of("cSt", "centistokes", 1.0e-6, kinematicViscosity));
    }

    /** numerator / denominator in decimal arithmetic, rounded once to a double. */
    private static double ratio(String numerator, String denominator) {
        return new BigDecimal(numerator)
                .divide(new BigDecimal(denominator), MathContext.DECIMAL128)
                .doubleValue();
    }

    /** The exact decimal product, as a decimal string. */
    private static String times(String... factors) {
        BigDecimal p = BigDecimal.ONE;
        for (String f : factors) {
            p = p.multiply(new BigDecimal(f));
        }
        return p.toPlainString();
    }

    /** An exact decimal, rounded once to a double. */
    private static double exact(String decimal) {
        return new BigDecimal(decimal).doubleValue();
    }
}
