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
            case STOPPED -> "not evaluated: stopped, see the finding";
            case VALUE_UNKNOWN -> "not evaluated: a value it needs is unknown";
            case DIMENSIONS_DIFFER -> "not evaluated: the sides differ in dimension";
            case POINT_AND_DIFFERENCE -> "not evaluated: a point is compared with a difference";
        };
    }

    /** A mark that reads without colour: ✓, ✗ or ?. */
    public static String mark(Row.CheckRow c) {
        return c.verdict() == Row.Verdict.PASSED ? "✓" : c.verdict() == Row.Verdict.FAILED ? "✗" : "?";
    }

    /** "pass", "fail" or "not evaluated". */
    public static String word(Row.CheckRow c) {
        return c.verdict() == Row.Verdict.PASSED ? "pass" : c.verdict() == Row.Verdict.FAILED ? "fail" : "not evaluated";
    }

    private static String sides(Row.CheckRow c) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < c.values().size(); i++) {
            if (i > 0) out.append(' ').append(c.comparators().get(i - 1).symbol()).append(' ');
            out.append(ValueText.of(c.values().get(i), c.unit(), c.digits()));
        }
        return out.toString();
    }
}
