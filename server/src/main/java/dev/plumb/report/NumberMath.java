package dev.plumb.report;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A number as text, as the calc wrote it or as the report's caller formatted it, typeset: a minus
 * sign as the typographic one, E notation as a power of ten ({@code 3.64e-7} is 3.64×10⁻⁷, and
 * {@code 1e6} is 10⁶), a leading zero before a bare decimal point. Text that is no number
 * ({@code ?} for a value that could not be computed, {@code ∞}) is shown as it is.
 */
final class NumberMath {
    private static final Pattern NUMBER =
        Pattern.compile("([-−]?)(\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE]([-−+]?)(\\d+))?");

    private NumberMath() {
    }

    static Fragment of(String text) {
        Matcher m = NUMBER.matcher(text);
        if (!m.matches()) return other(text);
        boolean negative = !m.group(1).isEmpty();
        String mantissa = m.group(2).startsWith(".") ? "0" + m.group(2) : m.group(2);
        Fragment magnitude = m.group(4) == null ? Fragment.atom(MathElements.mn(mantissa))
            : scaled(mantissa, m.group(3), m.group(4));
        if (!negative) return magnitude;
        return new Fragment(MathElements.row(MathElements.mo("−"), magnitude.markup()), Fragment.UNARY, true);
    }

    /** Mantissa × 10 to the exponent; a mantissa of one is left out. */
    private static Fragment scaled(String mantissa, String sign, String digits) {
        String exponent = digits.replaceFirst("^0+(?=\\d)", "");
        boolean negative = sign.equals("-") || sign.equals("−");
        String power = negative ? MathElements.row(MathElements.mo("−"), MathElements.mn(exponent)) : MathElements.mn(exponent);
        String tenToThe = MathElements.sup(MathElements.mn("10"), power);
        if (mantissa.matches("1(\\.0*)?")) return new Fragment(tenToThe, Fragment.POWER, false);
        return new Fragment(MathElements.row(MathElements.mn(mantissa), MathElements.mo("×"), tenToThe), Fragment.SCALED, false);
    }

    private static Fragment other(String text) {
        if (text.equals("∞")) return Fragment.atom(MathElements.mn(text));
        if ((text.startsWith("-") || text.startsWith("−")) && text.substring(1).equals("∞")) {
            return new Fragment(MathElements.row(MathElements.mo("−"), MathElements.mn("∞")), Fragment.UNARY, true);
        }
        return Fragment.atom(MathElements.mtext(text));
    }
}
