package dev.plumb.units;

/**
 * Writes a dimension as a product of coherent SI base units: "kg·m²/s³", "1/s", "kg/(m·s)".
 * Mass comes first because that is how the base-unit forms of N, Pa and J are usually written.
 */
final class BaseUnitSymbols {

    /** Base-unit symbols by base index (length, mass, time, current, temperature, amount, luminous). */
    private static final java.util.List<String> SYMBOLS = java.util.List.of("m", "kg", "s", "A", "K", "mol", "cd");
    /** Writing order of the base indices: kg before m, then the rest as SI lists them. */
    private static final java.util.List<Integer> ORDER = java.util.List.of(1, 0, 2, 3, 4, 5, 6);

    private BaseUnitSymbols() {
    }

    /** The dimension in base units; "" when dimensionless. */
    static String compose(Dimension d) {
        String numerator = product(d, 1);
        String denominator = product(d, -1);
        if (denominator.isEmpty()) {
            return numerator;
        }
        boolean severalBelow = countFactors(d, -1) > 1;
        return (numerator.isEmpty() ? "1" : numerator) + "/"
                + (severalBelow ? "(" + denominator + ")" : denominator);
    }

    private static String product(Dimension d, int sign) {
        StringBuilder out = new StringBuilder();
        for (int i : ORDER) {
            int e = d.exponent(i) * sign;
            if (e <= 0) {
                continue;
            }
            if (out.length() > 0) {
                out.append('·');
            }
            out.append(SYMBOLS.get(i));
            if (e != 1) {
                out.append(Superscripts.of(e));
            }
        }
        return out.toString();
    }

    private static int countFactors(Dimension d, int sign) {
        int n = 0;
        for (int i = 0; i < Dimension.BASE_COUNT; i++) {
            if (d.exponent(i) * sign > 0) {
                n++;
            }
        }
        return n;
    }
}
