package dev.plumb.present;

import dev.plumb.analysis.Row;

/** How a check's outcome reads: its sides' values with the comparisons, or why it was not judged. */
public final class CheckText {
    private CheckText() {
    }

    /** "1 m < 2 m", or "not evaluated: …" for a check that was not judged. */
    public static String detail(Row.CheckRow c) {
        return switch (c.verdict()) {
            case PASSED, FAILED -> sides(c);
            case FAILS_AT_BOUND -> sides(c) + " for the values, not at their bounds";
            case STOPPED -> "not evaluated: stopped, see the finding";
            case VALUE_UNKNOWN -> "not evaluated: a value it needs is unknown";
            case DIMENSIONS_DIFFER -> "not evaluated: the sides differ in dimension";
            case POINT_AND_DIFFERENCE -> "not evaluated: a point is compared with a difference";
        };
    }

    /** A mark that reads without colour: ✓, ✗ or ?. */
    public static String mark(Row.CheckRow c) {
        return c.verdict() == Row.Verdict.PASSED ? "✓" : c.passed() == Boolean.FALSE ? "✗" : "?";
    }

    /** "pass", "fail" or "not evaluated". */
    public static String word(Row.CheckRow c) {
        return c.verdict() == Row.Verdict.PASSED ? "pass" : c.verdict() == Row.Verdict.FAILED ? "fail"
            : c.verdict() == Row.Verdict.FAILS_AT_BOUND ? "fail at bound" : "not evaluated";
    }

    private static String sides(Row.CheckRow c) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < c.values().size(); i++) {
            if (i > 0) out.append(' ').append(c.comparators().get(i - 1).symbol()).append(' ');
            out.append(ValueText.of(c.values().get(i), c.unit(), c.digits()));
            // A check with spread shows each side's: "0.54 kN·m ± 0.078 kN·m <= 1.5 kN·m".
            if (i < c.spreads().size() && c.spreads().get(i) > 0) {
                dev.plumb.analysis.Value v = c.values().get(i);
                out.append(" ± ").append(ValueText.of(new dev.plumb.analysis.Value(c.spreads().get(i), v.dimension(),
                    dev.plumb.analysis.Value.Temperature.DIFFERENCE), c.unit(), 2));
            }
        }
        return out.toString();
    }
}
