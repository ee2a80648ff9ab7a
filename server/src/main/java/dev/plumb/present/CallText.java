package dev.plumb.present;

import dev.plumb.analysis.Analysis;
import java.util.ArrayList;
import java.util.List;

/** How a library call reads in hover and listings: its arguments and where they sit in the entry's range. */
public final class CallText {
    /** Arguments read to four figures: enough to place them in a range. */
    private static final int FIGURES = 4;

    private CallText() {
    }

    /** "Re = 3e5, k = 0.1". */
    public static String arguments(Analysis.CallSite c) {
        List<String> parts = new ArrayList<>();
        for (Analysis.Argument a : c.arguments()) parts.add(a.name() + " = " + ValueText.of(a.value(), a.unit(), FIGURES));
        return String.join(", ", parts);
    }

    /** "inside its range, 1e3 ≤ Re ≤ 2e5", "outside: …", "beyond the table's rows (extrapolated), …". */
    public static String standing(Analysis.CallSite c) {
        return switch (c.standing()) {
            case INSIDE -> "inside its range, " + c.range();
            case OUTSIDE -> String.join("; ", c.breaches().stream().map(b -> "outside: " + b).toList());
            case OUTSIDE_DOMAIN -> String.join("; ", c.breaches());
            case NO_RANGE -> "no stated range";
            case TABLE_INSIDE -> "inside the table, " + c.range();
            case TABLE_BEYOND -> "beyond the table's rows (extrapolated), " + c.range();
        };
    }
}
