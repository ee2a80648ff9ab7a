package dev.plumb.compare;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Pairs the checks of one calc at two revisions. A check has no name: it is known by what it
 * compares (renamed values followed), else by its note when that is unique on both sides.
 */
final class CheckPairing {
    private CheckPairing() {
    }

    /** Flipped, added and removed checks, in the later revision's order, then the removed ones. */
    static List<CheckChange> pair(Analysis before, Analysis after, Map<String, String> renamed) {
        List<Row.CheckRow> old = checks(before);
        List<Row.CheckRow> now = checks(after);
        Map<Row.CheckRow, Row.CheckRow> partner = new HashMap<>();
        // By what they compare, the earlier side's names renamed; the n-th of equal keys with the n-th.
        Map<String, List<Row.CheckRow>> oldByKey = byKey(before, old, renamed);
        Map<String, List<Row.CheckRow>> nowByKey = byKey(after, now, Map.of());
        oldByKey.forEach((key, rows) -> {
            List<Row.CheckRow> match = nowByKey.getOrDefault(key, List.of());
            for (int i = 0; i < Math.min(rows.size(), match.size()); i++) partner.put(match.get(i), rows.get(i));
        });
        // Then by note, where one unpaired check on each side carries it.
        Map<String, List<Row.CheckRow>> oldByNote = byNote(old, partner.values());
        Map<String, List<Row.CheckRow>> nowByNote = byNote(now, partner.keySet());
        oldByNote.forEach((note, rows) -> {
            List<Row.CheckRow> match = nowByNote.get(note);
            if (rows.size() == 1 && match != null && match.size() == 1) partner.put(match.get(0), rows.get(0));
        });
        List<CheckChange> out = new ArrayList<>();
        for (Row.CheckRow n : now) {
            Row.CheckRow o = partner.get(n);
            if (o == null || o.verdict() != n.verdict()) out.add(new CheckChange(o, n, after.lines().line(n.span().start())));
        }
        for (Row.CheckRow o : old) {
            if (!partner.containsValue(o)) out.add(new CheckChange(o, null, before.lines().line(o.span().start())));
        }
        return out;
    }

    private static List<Row.CheckRow> checks(Analysis a) {
        if (a == null) return List.of();
        return a.rows().stream().filter(Row.CheckRow.class::isInstance).map(Row.CheckRow.class::cast).toList();
    }

    private static Map<String, List<Row.CheckRow>> byKey(Analysis a, List<Row.CheckRow> rows, Map<String, String> rename) {
        Map<Integer, Statement.Check> statements = new HashMap<>();
        if (a != null) {
            for (Statement s : a.syntax().statements()) {
                if (s instanceof Statement.Check c) statements.put(c.span().start(), c);
            }
        }
        Map<String, List<Row.CheckRow>> out = new LinkedHashMap<>();
        for (Row.CheckRow r : rows) {
            Statement.Check c = statements.get(r.span().start());
            String key = c == null ? r.source().replaceAll("\\s+", "") : FormulaKey.ofCheck(a.text(), c, rename);
            out.computeIfAbsent(key, k -> new ArrayList<>()).add(r);
        }
        return out;
    }

    private static Map<String, List<Row.CheckRow>> byNote(List<Row.CheckRow> rows, java.util.Collection<Row.CheckRow> paired) {
        Map<String, List<Row.CheckRow>> out = new LinkedHashMap<>();
        for (Row.CheckRow r : rows) {
            if (r.note() != null && !paired.contains(r)) out.computeIfAbsent(r.note(), k -> new ArrayList<>()).add(r);
        }
        return out;
    }
}
