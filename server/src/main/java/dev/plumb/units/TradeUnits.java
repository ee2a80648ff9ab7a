package dev.plumb.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

/**
 * Units the unit library does not know, with their factors to SI from NIST SP 811 (2008),
 * "Guide for the Use of the International System of Units" (Thompson and Taylor), Appendix
 * B.8 (factors listed alphabetically). The figures are quoted from memory of that table, not
 * read from a copy; NistFactorsTest checks each against the same figures. Where NIST's rounded figure follows from an exact definition in terms of
 * other units (psi = lbf/in², slug = lbf·s²/ft), the definition is used so that "psi" and
 * "lbf/in^2" agree to the last bit; the NIST figure is cited beside it and checked in a test.
 */
final class TradeUnits {

    /** Pound-force in newtons: 0.453 592 37 kg × 9.806 65 m/s², both exact (NIST SP 811 B.8). */
    private static final String POUND_FORCE_N = "4.4482216152605";

    private TradeUnits() {
    }

    static List<AtomDefinition> all() {
        Dimension pressure = Dimension.of(-1, 1, -2, 0, 0, 0, 0);
        Dimension dynamicViscosity = Dimension.of(-1, 1, -1, 0, 0, 0, 0);
        Dimension kinematicViscosity = Dimension.of(2, 0, -1, 0, 0, 0, 0);
        return List.of(
                // slug → kg: 1.459 390 E+01 (B.8); defined as lbf·s²/ft, ft = 0.3048 m exactly.
                AtomDefinition.of("slug", ratio(POUND_FORCE_N, "0.3048"), Dimension.MASS),
                // psi (lbf/in²) → Pa: 6.894 757 E+03 (B.8); in² = 0.000 645 16 m² exactly.
                AtomDefinition.of("psi", ratio(POUND_FORCE_N, "0.00064516"), pressure),
                // atmosphere, standard (atm) → Pa: 1.013 25 E+05, exact (B.8).
                AtomDefinition.of("atm", 1.01325e5, pressure),
                // bar → Pa: 1.0 E+05, exact (B.8). Takes prefixes for mbar.
                AtomDefinition.of("bar", 1.0e5, pressure).withPrefixes(),
                // poise (P) → Pa·s: 1.0 E-01, exact (B.8).
                AtomDefinition.of("P", 1.0e-1, dynamicViscosity),
                // centipoise (cP) → Pa·s: 1.0 E-03, exact (B.8). Listed whole: the poise takes
                // no prefixes, since a lone "P" must not swallow the peta prefix of "PW", "PJ".
                AtomDefinition.of("cP", 1.0e-3, dynamicViscosity),
                // stokes (St) → m²/s: 1.0 E-04, exact (B.8).
                AtomDefinition.of("St", 1.0e-4, kinematicViscosity),
                // centistokes (cSt) → m²/s: 1.0 E-06, exact (B.8).
                AtomDefinition.of("cSt", 1.0e-6, kinematicViscosity));
    }

    /** numerator / denominator in decimal arithmetic, rounded once to a double. */
    private static double ratio(String numerator, String denominator) {
        return new BigDecimal(numerator)
                .divide(new BigDecimal(denominator), MathContext.DECIMAL128)
                .doubleValue();
    }
}
