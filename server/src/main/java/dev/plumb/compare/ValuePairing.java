package dev.plumb.compare;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.present.UsedValues;
import dev.plumb.syntax.Statement;
import dev.plumb.units.Unit;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Pairs the values of one calc at two revisions by identity (the name in the file), then pairs
 * what is left when a value was renamed but its formula is the same, and says how each pair
 * moved.
 */
final class ValuePairing {
    /** A value as one revision has it. */
    private record Entry(String name, ValueChange.Kind kind, Path usedFrom, Value value, Unit display, int line,
                         Statement statement) {
    }

    /**
     * The pairs, in the later revision's order, then what was removed; {@code renamed} maps each
     * renamed value's earlier name to its later one.
     */
    record Paired(List<ValueChange> changes, List<Rename> renames, Map<String, String> renamed) {
    }

    private ValuePairing() {
    }

    /** Either analysis may be null (the file does not exist at that revision, or could not be read). */
    static Paired pair(Analysis before, Analysis after, double tolerance) {
        Map<String, Entry> old = entries(before);
        Map<String, Entry> now = entries(after);
        Map<String, String> renamed = renames(before, after, old, now);
        List<ValueChange> out = new ArrayList<>();
        List<Rename> renames = new ArrayList<>();
        Map<String, String> formerOf = new HashMap<>();
        renamed.forEach((o, n) -> formerOf.put(n, o));
        for (Entry n : now.values()) {
            String former = formerOf.get(n.name());
            Entry o = former != null ? old.get(former) : old.get(n.name());
            if (former != null) renames.add(new Rename(former, n.name()));
            ValueChange c = change(o, n, former, tolerance);
            if (c != null && (c.reported() || former != null)) out.add(c);
        }
        for (Entry o : old.values()) {
            if (!now.containsKey(o.name()) && !renamed.containsKey(o.name())) out.add(change(o, null, null, tolerance));
        }
        return new Paired(out, renames, renamed);
    }

    /** Old name → new name, for values whose name changed and whose formula did not. */
    private static Map<String, String> renames(Analysis before, Analysis after, Map<String, Entry> old,
                                               Map<String, Entry> now) {
        Map<String, String> rename = new LinkedHashMap<>();
        if (before == null || after == null) return rename;
        List<Entry> gone = old.values().stream().filter(e -> e.statement() != null && !now.containsKey(e.name())).toList();
        List<Entry> come = now.values().stream().filter(e -> e.statement() != null && !old.containsKey(e.name())).toList();
        // A renamed value's formula may use other renamed values: repeat until nothing new pairs.
        boolean more = true;
        while (more) {
            more = false;
            Map<String, List<Entry>> goneByKey = byKey(before.text(), gone, rename, rename);
            Map<String, List<Entry>> comeByKey = byKey(after.text(), come, rename, Map.of());
            for (var k : goneByKey.entrySet()) {
                List<Entry> match = comeByKey.get(k.getKey());
                // Only a pairing that cannot be mistaken: one candidate on each side.
                if (match == null || match.size() != 1 || k.getValue().size() != 1) continue;
                rename.put(k.getValue().get(0).name(), match.get(0).name());
                more = true;
            }
        }
        return rename;
    }

    private static Map<String, List<Entry>> byKey(String text, List<Entry> entries, Map<String, String> done,
                                                  Map<String, String> rename) {
        Map<String, List<Entry>> out = new LinkedHashMap<>();
        for (Entry e : entries) {
            if (done.containsKey(e.name()) || done.containsValue(e.name())) continue;
            String key = FormulaKey.of(text, e.statement(), rename);
            if (key != null) out.computeIfAbsent(key, k -> new ArrayList<>()).add(e);
        }
        return out;
    }

    /** The calc's own values in source order, then the values it takes from used files. */
    private static Map<String, Entry> entries(Analysis a) {
        Map<String, Entry> out = new LinkedHashMap<>();
        if (a == null) return out;
        for (Row r : a.rows()) {
            if (!(r instanceof Row.ValueRow v) || out.containsKey(v.name())) continue;
            ValueChange.Kind kind = v.input() ? ValueChange.Kind.INPUT : ValueChange.Kind.RESULT;
            out.put(v.name(), new Entry(v.name(), kind, null, v.value(), v.display(), a.lines().line(v.span().start()),
                v.statement()));
        }
        for (UsedValues.Used u : UsedValues.of(a)) {
            out.putIfAbsent(u.name(), new Entry(u.name(), ValueChange.Kind.USED, u.file(), u.binding().value(),
                u.binding().display(), 0, null));
        }
        return out;
    }

    /** How a value moved; null for one that is unknown at both revisions and not renamed. */
    private static ValueChange change(Entry o, Entry n, String former, double tolerance) {
        Entry shown = n != null ? n : o;
        Value b = o == null ? null : o.value();
        Value a = n == null ? null : n.value();
        ValueChange.Status status;
        Double relative = null;
        if (o == null) {
            status = ValueChange.Status.ADDED;
        } else if (n == null) {
            status = ValueChange.Status.REMOVED;
        } else if (!b.known() && !a.known()) {
            if (former == null) return null;
            status = ValueChange.Status.UNCHANGED;
        } else if (!b.known()) {
            status = ValueChange.Status.NOT_COMPUTED_BEFORE;
        } else if (!a.known()) {
            status = ValueChange.Status.NOT_COMPUTED_AFTER;
        } else if (!b.dimension().equals(a.dimension())) {
            status = ValueChange.Status.DIMENSION_CHANGED;
        } else if (b.si() == 0) {
            status = a.si() == 0 ? ValueChange.Status.UNCHANGED : ValueChange.Status.CHANGED;
        } else {
            double r = (a.si() - b.si()) / Math.abs(b.si());
            status = Math.abs(r) > tolerance ? ValueChange.Status.CHANGED : ValueChange.Status.UNCHANGED;
            if (status == ValueChange.Status.CHANGED) relative = r;
        }
        return new ValueChange(shown.name(), former, shown.kind(), shown.usedFrom(), b, o == null ? null : o.display(), a,
            n == null ? null : n.display(), status, relative, shown.line());
    }
}
