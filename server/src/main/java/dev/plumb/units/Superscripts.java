package dev.plumb.units;

/** Unicode superscript digits, both for reading exponents like "m³" and for writing them. */
final class Superscripts {

    private static final String DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    static final char MINUS = '⁻';

    private Superscripts() {
    }

    /** The digit value of a superscript digit, or -1 when {@code c} is not one. */
    static int digitValue(char c) {
        return DIGITS.indexOf(c);
    }

    static boolean isDigit(char c) {
        return digitValue(c) >= 0;
    }

    /** "²" for 2, "⁻¹" for -1. */
    static String of(int exponent) {
        StringBuilder out = new StringBuilder();
        if (exponent < 0) {
            out.append(MINUS);
        }
        for (char c : Integer.toString(Math.abs(exponent)).toCharArray()) {
            out.append(DIGITS.charAt(c - '0'));
        }
        return out.toString();
    }
}
