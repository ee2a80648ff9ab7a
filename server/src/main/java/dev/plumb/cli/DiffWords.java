package dev.plumb.cli;

import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.compare.CheckChange;
import dev.plumb.compare.FileDiff;
import dev.plumb.compare.ValueChange;
import dev.plumb.present.CheckText;
import dev.plumb.present.UsedValues;
import dev.plumb.present.ValueText;
import dev.plumb.units.Unit;
import java.util.Locale;

/** How the value diff reads for people, shared by its text and Markdown writers (and the JSON's "shown" fields). */
final class DiffWords {
    private DiffWords() {
    }

    /** The value at the earlier revision, in the unit the later one shows it in where both have one dimension. */
    static String before(ValueChange v, int digits) {
        return pair(v, digits)[0];
    }

    static String after(ValueChange v, int digits) {
        return pair(v, digits)[1];
    }

    /**
     * Both values in one unit, to {@code digits} significant figures or more, until they read
     * differently: a change the tolerance counts must not print as "1.204 → 1.204".
     */
    private static String[] pair(ValueChange v, int digits) {
        Value b = v.before();
        Value a = v.after();
        Unit shared = v.afterUnit() != null ? v.afterUnit() : v.beforeUnit();
        boolean same = b != null && a != null && b.known() && a.known() && b.dimension().equals(a.dimension());
        Unit ub = same ? shared : v.beforeUnit();
        Unit ua = same ? shared : v.afterUnit();
        String sb = shown(b, ub, digits);
        String sa = shown(a, ua, digits);
        for (int d = digits + 1; same && v.status() == ValueChange.Status.CHANGED && sb.equals(sa) && d <= 15; d++) {
            sb = shown(b, ub, d);
            sa = shown(a, ua, d);
        }
        return new String[] {sb, sa};
    }

    private static String shown(Value v, Unit unit, int digits) {
        if (v == null) return "—";
        if (!v.known()) return "? (not computed)";
        return ValueText.of(v, unit, digits);
    }

    /** "+9.677 %", "from zero", "not computed at the later revision", … */
    static String change(ValueChange v) {
        return switch (v.status()) {
            case CHANGED -> v.relative() == null ? "from zero" : percent(v.relative());
            case UNCHANGED -> "unchanged";
            case NOT_COMPUTED_BEFORE -> "not computed before";
            case NOT_COMPUTED_AFTER -> "not computed now";
            case DIMENSION_CHANGED -> "dimension changed";
            case ADDED -> "added";
            case REMOVED -> "removed";
        };
    }

    /** A tolerance as people write it: 1e-9, 0.001. */
    static String tolerance(double t) {
        String s = java.math.BigDecimal.valueOf(t).stripTrailingZeros().toString();
        return s.replace("E", "e").replace("e+", "e");
    }

    /** A relative change as a signed percentage to four significant figures. */
    static String percent(double relative) {
        return String.format(Locale.ROOT, "%+.4g %%", relative * 100);
    }

    /** The value's name, with its former name and where a used value comes from. */
    static String name(FileDiff f, ValueChange v) {
        String out = v.formerName() == null ? v.name() : v.formerName() + " → " + v.name();
        if (v.usedFrom() != null && f.after().exists()) out += " (from " + UsedValues.relative(f.after().analysis(), v.usedFrom()) + ")";
        else if (v.usedFrom() != null) out += " (from " + v.usedFrom().getFileName() + ")";
        return out;
    }

    /** "✓ pass: 3.62 kN <= 4 kN", "—" for a check that does not exist at that revision. */
    static String verdict(Row.CheckRow c) {
        if (c == null) return "—";
        return CheckText.mark(c) + " " + CheckText.word(c) + ": " + CheckText.detail(c);
    }

    /** "✓ → ✗" for a flipped check, "new ✗" or "removed ✓" otherwise. */
    static String marks(CheckChange c) {
        if (c.added()) return "new " + CheckText.mark(c.after());
        if (c.removed()) return "removed " + CheckText.mark(c.before());
        return CheckText.mark(c.before()) + " → " + CheckText.mark(c.after());
    }

    static String plural(long n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    /** What changed in a calc, in a few words: "1 check flipped, 2 inputs and 5 results changed". */
    static String summary(FileDiff f) {
        if (f.status() == FileDiff.Status.ADDED) return "new calc";
        if (f.status() == FileDiff.Status.REMOVED) return "calc removed";
        java.util.List<String> parts = new java.util.ArrayList<>();
        if (f.before().unreadable() != null && f.after().unreadable() == null) parts.add("readable again");
        if (f.after().unreadable() != null && f.before().unreadable() == null) parts.add("cannot be read now");
        if (!f.flipped().isEmpty()) parts.add(plural(f.flipped().size(), "check") + " flipped");
        long added = f.checks().stream().filter(CheckChange::added).count();
        long removed = f.checks().stream().filter(CheckChange::removed).count();
        if (added > 0) parts.add(plural(added, "check") + " added");
        if (removed > 0) parts.add(plural(removed, "check") + " removed");
        if (!f.inputs().isEmpty()) parts.add(plural(f.inputs().size(), "input") + " changed");
        if (!f.results().isEmpty()) parts.add(plural(f.results().size(), "result") + " changed");
        if (!f.added().isEmpty()) parts.add(plural(f.added().size(), "value") + " added");
        if (!f.removed().isEmpty()) parts.add(plural(f.removed().size(), "value") + " removed");
        if (!f.renames().isEmpty()) parts.add(plural(f.renames().size(), "value") + " renamed");
        long fresh = f.findings().stream().filter(x -> x.appeared()).count();
        long gone = f.findings().size() - fresh;
        if (fresh > 0) parts.add(plural(fresh, "finding") + " new");
        if (gone > 0) parts.add(plural(gone, "finding") + " gone");
        if (!f.entries().isEmpty()) parts.add(plural(f.entries().size(), "library entry", "library entries") + " changed");
        if (!f.changedUses().isEmpty()) parts.add(plural(f.changedUses().size(), "used file") + " changed");
        return parts.isEmpty() ? "no change" : String.join(", ", parts);
    }

    private static String plural(long n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }
}
