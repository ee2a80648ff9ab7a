package dev.plumb.units;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.measure.MetricPrefix;

/**
 * The SI prefixes, read from the unit library, plus the two other spellings of micro that
 * people type: the Greek letter mu (U+03BC) and the ASCII "u".
 */
final class SiPrefixes {

    /** A prefix spelling and its power of ten. */
    record Prefix(String spelling, String canonical, String name, int exponent) {

        /** factor × 10^exponent, computed in decimal so "mg" is exactly 1e-6 as a double. */
        double apply(double factor) {
            return new BigDecimal(Double.toString(factor)).scaleByPowerOfTen(exponent).doubleValue();
        }
    }

    private static final String MICRO_SIGN = "µ"; // U+00B5, the library's spelling
    private static final String GREEK_MU = "μ";   // U+03BC

    private SiPrefixes() {
    }

    static List<Prefix> all() {
        List<Prefix> out = new ArrayList<>();
        for (MetricPrefix p : MetricPrefix.values()) {
            String name = p.name().toLowerCase(Locale.ROOT); // KILO → kilo
            out.add(new Prefix(p.getSymbol(), p.getSymbol(), name, p.getExponent()));
            if (p.getSymbol().equals(MICRO_SIGN)) {
                out.add(new Prefix(GREEK_MU, MICRO_SIGN, name, p.getExponent()));
                out.add(new Prefix("u", MICRO_SIGN, name, p.getExponent()));
            }
        }
        return List.copyOf(out);
    }
}
