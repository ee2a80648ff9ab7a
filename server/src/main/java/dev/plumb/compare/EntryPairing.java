package dev.plumb.compare;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Correlation and table blocks of one file paired by name, and which of their parts differ.
 * The parts are compared as written (spacing aside), because a block's data are its text.
 */
final class EntryPairing {
    private EntryPairing() {
    }

    static List<EntryChange> pair(Analysis before, Analysis after) {
        Map<String, Map<String, String>> old = blocks(before);
        Map<String, Map<String, String>> now = blocks(after);
        List<EntryChange> out = new ArrayList<>();
        now.forEach((name, parts) -> {
            Map<String, String> was = old.get(name);
            String kind = parts.get("kind");
            int line = Integer.parseInt(parts.get("line"));
            if (was == null) {
                out.add(new EntryChange(name, kind, EntryChange.Status.ADDED, List.of(), line));
                return;
            }
            List<String> differ = new ArrayList<>();
            parts.forEach((part, text) -> {
                if (!part.equals("line") && !text.equals(was.getOrDefault(part, ""))) differ.add(part);
            });
            was.keySet().stream().filter(p -> !parts.containsKey(p)).forEach(differ::add);
            if (!differ.isEmpty()) out.add(new EntryChange(name, kind, EntryChange.Status.CHANGED, differ, line));
        });
        old.forEach((name, parts) -> {
            if (!now.containsKey(name)) {
                out.add(new EntryChange(name, parts.get("kind"), EntryChange.Status.REMOVED, List.of(),
                    Integer.parseInt(parts.get("line"))));
            }
        });
        return out;
    }

    /** Each block's parts in words → their text without spacing, plus its kind and line. */
    private static Map<String, Map<String, String>> blocks(Analysis a) {
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        if (a == null) return out;
        String text = a.text();
        for (Statement s : a.syntax().statements()) {
            Map<String, String> parts = new LinkedHashMap<>();
            String name;
            if (s instanceof Statement.Correlation c) {
                name = c.name().text();
                parts.put("kind", "correlation");
                parts.put("parameters", String.join(",", c.params().stream().map(Statement.Param::written).toList()));
                common(parts, text, c.title(), c.source(), c.family(), c.basis(), c.flow(), c.valid(), c.domain(), c.accuracy());
                if (c.regime() != null) parts.put("regime", c.regime().text());
                StringBuilder pieces = new StringBuilder();
                for (Statement.Piece p : c.pieces()) pieces.append(spaceless(text, p.span())).append(';');
                parts.put("formula", pieces.toString());
            } else if (s instanceof Statement.Table t) {
                name = t.name().text();
                parts.put("kind", "table");
                parts.put("parameters", t.param().written());
                common(parts, text, t.title(), t.source(), t.family(), t.basis(), t.flow(), t.valid(), t.domain(), t.accuracy());
                if (t.interpolate() != null) parts.put("interpolation", t.interpolate().text());
                StringBuilder columns = new StringBuilder();
                for (Statement.Column col : t.columns()) {
                    columns.append(col.name().text()).append(col.unit() == null ? "" : "[" + col.unit().text() + "]").append(',');
                }
                parts.put("columns", columns.toString());
                StringBuilder rows = new StringBuilder();
                for (Statement.Row r : t.rows()) rows.append(r.numbers()).append(';');
                parts.put("rows", rows.toString());
            } else {
                continue;
            }
            parts.put("line", String.valueOf(a.lines().line(s.span().start())));
            out.putIfAbsent(name, parts);
        }
        return out;
    }

    private static void common(Map<String, String> parts, String text, String title, String source, Ident family,
                               Ident basis, Ident flow, List<Statement.Bound> valid, List<Statement.Bound> domain,
                               Expr accuracy) {
        if (title != null) parts.put("title", title);
        if (source != null) parts.put("source", source);
        if (family != null) parts.put("family", family.text());
        if (basis != null) parts.put("basis", basis.text() + (flow == null ? "" : " " + flow.text()));
        parts.put("valid range", bounds(text, valid));
        if (!domain.isEmpty()) parts.put("domain", bounds(text, domain));
        if (accuracy != null) parts.put("accuracy", spaceless(text, accuracy.span()));
    }

    private static String bounds(String text, List<Statement.Bound> bounds) {
        StringBuilder out = new StringBuilder();
        for (Statement.Bound b : bounds) out.append(spaceless(text, b.span())).append(';');
        return out.toString();
    }

    private static String spaceless(String text, Span span) {
        int start = Math.min(span.start(), text.length());
        return text.substring(start, Math.min(Math.max(span.end(), start), text.length())).replaceAll("\\s+", "");
    }
}
