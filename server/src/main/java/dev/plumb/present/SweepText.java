package dev.plumb.present;

import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import java.util.ArrayList;
import java.util.List;

/**
 * How a sweep's table reads: a header of names with their units in brackets, the numbers in
 * those units, and for each row the checks' marks (✓ ✗ ?, readable without colour) and the
 * definitions whose correlation lies outside its stated range there. Shared by `plumb eval`, the
 * editor's hover and the report.
 */
public final class SweepText {
    private SweepText() {
    }

    /** "sweep V: 7 rows" (and what stopped it, or its note). */
    public static String title(Row.SweepRow s) {
        String rows = s.lines().size() + (s.lines().size() == 1 ? " row" : " rows");
        String stopped = s.stopped() ? ", stopped by the run's budget (see the finding)" : "";
        String none = s.lines().isEmpty() && !s.stopped() ? " (no values: see the finding)" : "";
        String varied = s.across() == null ? s.varied() : s.varied() + " × " + s.across().name();
        return "sweep " + varied + ": " + rows + stopped + none + (s.note() == null ? "" : "  " + s.note());
    }

    /** The unit a column's numbers are in: its own, else the SI unit of the first known value's dimension; null when none is known. */
    public static Unit unitOf(Unit unit, List<Value> values) {
        if (unit != null) return unit;
        for (Value v : values) if (v.known()) return DisplayUnits.defaultFor(v.dimension());
        return null;
    }

    /** "V [m/s]", "Re" (a plain number has no bracket). */
    public static String heading(String name, Unit unit) {
        return unit == null || unit.symbol().isEmpty() ? name : name + " [" + unit.symbol() + "]";
    }

    /**
     * Each column's unit: the swept value's first, then each shown result's, and last, in a grid,
     * the second swept value's (see {@link #acrossUnit}).
     */
    public static List<Unit> units(Row.SweepRow s) {
        List<Unit> out = new ArrayList<>();
        out.add(unitOf(s.unit(), s.lines().stream().map(Row.SweepLine::given).toList()));
        for (int i = 0; i < s.columns().size(); i++) {
            int k = i;
            out.add(unitOf(s.columns().get(i).unit(), s.lines().stream().map(l -> l.results().get(k)).toList()));
        }
        if (s.across() != null) out.add(unitOf(s.across().unit(), s.lines().stream().map(Row.SweepLine::across).toList()));
        return out;
    }

    /** The unit of a grid's second value, from {@link #units}; null in a one-way sweep. */
    public static Unit acrossUnit(Row.SweepRow s, List<Unit> units) {
        return s.across() == null ? null : units.get(units.size() - 1);
    }

    /** The header cells: the swept value (both, in a grid), the results, then "checks" (when the calc has any) and "range". */
    public static List<String> header(Row.SweepRow s) {
        List<Unit> units = units(s);
        List<String> out = new ArrayList<>();
        out.add(heading(s.varied(), units.get(0)));
        if (s.across() != null) out.add(heading(s.across().name(), acrossUnit(s, units)));
        for (int i = 0; i < s.columns().size(); i++) out.add(heading(s.columns().get(i).name(), units.get(i + 1)));
        if (!s.checks().isEmpty()) out.add("checks");
        if (anyOutside(s)) out.add("range");
        return out;
    }

    /** One row's cells, numbers in the header's units ("?" where a value could not be computed). */
    public static List<String> cells(Row.SweepRow s, Row.SweepLine line, List<Unit> units, int digits) {
        List<String> out = new ArrayList<>();
        out.add(number(line.given(), units.get(0), digits));
        if (s.across() != null) out.add(number(line.across(), acrossUnit(s, units), digits));
        for (int i = 0; i < line.results().size(); i++) out.add(number(line.results().get(i), units.get(i + 1), digits));
        if (!s.checks().isEmpty()) out.add(checks(s, line));
        if (anyOutside(s)) out.add(line.outside().isEmpty() ? "" : "outside: " + String.join(", ", line.outside()));
        return out;
    }

    /**
     * "✓" when every check passes, "✗ F_D <= 400 N" naming the failing ones ("✗ F_D <= 400 N at its
     * bounds" for one that holds for the values but not within their spreads), "?" when one could not
     * be judged.
     */
    public static String checks(Row.SweepRow s, Row.SweepLine line) {
        List<String> failing = new ArrayList<>();
        for (int i = 0; i < line.verdicts().size(); i++) {
            if (line.verdicts().get(i) == Row.Verdict.FAILED) failing.add(s.checks().get(i));
            if (line.verdicts().get(i) == Row.Verdict.FAILS_AT_BOUND) failing.add(s.checks().get(i) + " at its bounds");
        }
        if (!failing.isEmpty()) return "✗ " + String.join("; ", failing);
        return line.allPass() ? "✓" : "? not judged";
    }

    /**
     * The sweep in a few words, for an editor's inline value: "7 rows, all checks pass", "7 rows, 2
     * fail a check, 1 outside a range".
     */
    public static String summary(Row.SweepRow s) {
        int rows = s.lines().size();
        long failing = s.lines().stream().filter(l -> !"✓".equals(checks(s, l)) && !checks(s, l).startsWith("?")).count();
        long unjudged = s.lines().stream().filter(l -> checks(s, l).startsWith("?")).count();
        long outside = s.lines().stream().filter(l -> !l.outside().isEmpty()).count();
        List<String> parts = new ArrayList<>();
        parts.add(rows + (rows == 1 ? " row" : " rows"));
        if (!s.checks().isEmpty()) parts.add(failing == 0 && unjudged == 0 ? "all checks pass" : failing + " fail a check");
        if (unjudged > 0) parts.add(unjudged + " not judged");
        if (outside > 0) parts.add(outside + " outside a range");
        if (s.stopped()) parts.add("stopped by the run's budget");
        return String.join(", ", parts);
    }

    /** Whether any row lies outside a correlation's range. */
    public static boolean anyOutside(Row.SweepRow s) {
        return s.lines().stream().anyMatch(l -> !l.outside().isEmpty());
    }

    /** A number in a unit, without the unit (the header carries it). */
    public static String number(Value v, Unit unit, int digits) {
        return ValueText.parts(v, unit, digits).number();
    }

    /** The table as aligned lines of text: the header, then one line per row. */
    public static List<String> table(Row.SweepRow s, int digits) {
        List<Unit> units = units(s);
        List<List<String>> grid = new ArrayList<>();
        grid.add(header(s));
        for (Row.SweepLine l : s.lines()) grid.add(cells(s, l, units, digits));
        int columns = grid.get(0).size();
        int[] widths = new int[columns];
        for (List<String> r : grid) {
            for (int i = 0; i < columns; i++) widths[i] = Math.max(widths[i], r.get(i).codePointCount(0, r.get(i).length()));
        }
        List<String> out = new ArrayList<>();
        for (List<String> r : grid) {
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < columns; i++) {
                String cell = r.get(i);
                b.append(cell);
                if (i < columns - 1) b.append(" ".repeat(widths[i] - cell.codePointCount(0, cell.length()) + 2));
            }
            out.add(b.toString().stripTrailing());
        }
        return out;
    }
}
