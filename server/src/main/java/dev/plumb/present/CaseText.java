package dev.plumb.present;

import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.units.Dimension;
import dev.plumb.units.QuantityFormat;
import java.util.ArrayList;
import java.util.List;

/**
 * How a case reads: its name and the values it sets, then each value it changes beside the base
 * value, with the ratio to the base. Shared by `plumb eval`, its JSON, hover and the report.
 */
public final class CaseText {
    private CaseText() {
    }

    /** "case storm: V = 45 m/s, T = -10 °C" (and its note). */
    public static String title(Row.CaseRow c, int digits) {
        List<String> set = new ArrayList<>();
        for (Row.CaseValue v : c.given()) set.add(v.name() + " = " + ValueText.of(v.value(), v.display(), digits));
        return "case " + c.name() + ": " + String.join(", ", set) + (c.note() == null ? "" : "  " + c.note());
    }

    /**
     * "×1.452": the value under the case over the base value; "" where a ratio says nothing (a value
     * unknown, a base of zero, a temperature on a scale with an offset, where a ratio of readings
     * is no ratio of anything).
     */
    public static String ratio(Row.CaseValue v, int digits) {
        Double r = ratioOf(v);
        return r == null ? "" : "×" + QuantityFormat.number(r, digits);
    }

    /** The ratio as a number, or null where {@link #ratio} is "". */
    public static Double ratioOf(Row.CaseValue v) {
        Value a = v.base();
        Value b = v.value();
        if (!a.known() || !b.known() || a.si() == 0 || !a.dimension().equals(b.dimension())) return null;
        if (a.dimension().equals(Dimension.TEMPERATURE) && (a.point() || b.point())) return null;
        return b.si() / a.si();
    }

    /**
     * The case in a few words, for an editor's inline value: its last changed value (most calcs end
     * on their result) with the ratio, and how its checks came out: "M_base 0.8259 kN·m ×1.517,
     * checks pass".
     */
    public static String summary(Row.CaseRow c, int digits) {
        List<String> parts = new ArrayList<>();
        if (!c.changed().isEmpty()) {
            Row.CaseValue last = c.changed().get(c.changed().size() - 1);
            String ratio = ratio(last, digits);
            parts.add(last.name() + " " + ValueText.of(last.value(), last.display(), digits) + (ratio.isEmpty() ? "" : " " + ratio));
        }
        long failing = c.checks().stream().filter(k -> Boolean.FALSE.equals(k.passed())).count();
        long unjudged = c.checks().stream().filter(k -> k.passed() == null).count();
        if (!c.checks().isEmpty()) {
            parts.add(failing > 0 ? failing + (failing == 1 ? " check fails" : " checks fail")
                : unjudged > 0 ? unjudged + " not judged" : "checks pass");
        }
        return parts.isEmpty() ? "changes nothing" : String.join(", ", parts);
    }

    /** The changed values as aligned lines: name, base → case, ratio. */
    public static List<String> lines(Row.CaseRow c, int digits) {
        int nameWidth = 0;
        int baseWidth = 0;
        int hereWidth = 0;
        for (Row.CaseValue v : c.changed()) {
            nameWidth = Math.max(nameWidth, width(v.name()));
            baseWidth = Math.max(baseWidth, width(ValueText.of(v.base(), v.display(), digits)));
            hereWidth = Math.max(hereWidth, width(ValueText.of(v.value(), v.display(), digits)));
        }
        List<String> out = new ArrayList<>();
        for (Row.CaseValue v : c.changed()) {
            out.add((pad(v.name(), nameWidth) + "  " + pad(ValueText.of(v.base(), v.display(), digits), baseWidth) + " → "
                + pad(ValueText.of(v.value(), v.display(), digits), hereWidth) + "  " + ratio(v, digits)).stripTrailing());
        }
        return out;
    }

    private static int width(String s) {
        return s.codePointCount(0, s.length());
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(0, width - width(s)));
    }
}
