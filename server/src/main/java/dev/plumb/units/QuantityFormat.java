package dev.plumb.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/**
 * Writes numbers for people: a fixed count of significant figures, trailing zeros dropped,
 * plain notation from 0.001 up to a million and e-notation ("1.849e-5", "2.5e6") outside.
 *
 * <p>Rounding is half-up on the shortest decimal that reads back as the same double, so
 * 1.0005 to four figures is "1.001", as a person rounding the printed digits would get.
 */
public final class QuantityFormat {

    private static final BigDecimal PLAIN_LOW = new BigDecimal("0.001");
    private static final BigDecimal PLAIN_HIGH = new BigDecimal("1000000");
    /** A double carries 17 significant digits at most. */
    private static final int MAX_SIG = 17;

    private QuantityFormat() {
    }

    /** The SI value written in {@code unit}, e.g. "1.204 kg/m³", "15 °C", "12%", "0.45". */
    public static String format(double si, Unit unit, int sig) {
        return join(number(unit.fromSi(si), sig), unit.symbol());
    }

    /** A number and a unit symbol as they are written together: "12 m", "12%", "12°", "12" for no unit. */
    public static String join(String number, String symbol) {
        if (symbol.isEmpty()) {
            return number;
        }
        return sitsTight(symbol) ? number + symbol : number + " " + symbol;
    }

    /**
     * As {@link #format(double, Unit, int)}; a temperature difference ({@code difference}) on an
     * offset scale (°C, °F) is written without the offset: a rise of 5 K reads "5 °C", not "-268 °C".
     */
    public static String format(double si, Unit unit, int sig, boolean difference) {
        if (difference && unit.isOffsetScale()) {
            unit = new Unit(unit.symbol(), unit.factor(), 0, unit.dimension(), false);
        }
        return format(si, unit, sig);
    }

    /** Percent and the angle degree follow the number without a space; other symbols do not. */
    private static boolean sitsTight(String symbol) {
        return symbol.equals("%") || symbol.equals("°");
    }

    /** Just the number, to {@code sig} significant figures (clamped to 1..17). */
    public static String number(double value, int sig) {
        if (Double.isNaN(value)) {
            return "NaN";
        }
        if (Double.isInfinite(value)) {
            return value > 0 ? "∞" : "-∞";
        }
        if (value == 0) {
            return "0";
        }
        int digits = Math.max(1, Math.min(MAX_SIG, sig));
        BigDecimal rounded = BigDecimal.valueOf(value)
                .round(new MathContext(digits, RoundingMode.HALF_UP))
                .stripTrailingZeros();
        BigDecimal magnitude = rounded.abs();
        if (magnitude.compareTo(PLAIN_LOW) >= 0 && magnitude.compareTo(PLAIN_HIGH) < 0) {
            return rounded.toPlainString();
        }
        int exponent = rounded.precision() - rounded.scale() - 1;
        String mantissa = rounded.movePointLeft(exponent).toPlainString();
        return mantissa + "e" + exponent;
    }
}
