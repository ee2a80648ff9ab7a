package dev.plumb.compare;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Diagnostic;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Findings new and gone between two revisions. A finding is known by its code and what it is on:
 * the definition (renamed values followed), else the text it points at. Its message is not part
 * of that, because a range warning's numbers move whenever an input does.
 */
final class FindingPairing {
    private FindingPairing() {
    }

    static List<FindingChange> pair(Side before, Side after, Map<String, String> renamed) {
        Map<String, List<Diagnostic>> old = byKey(before, renamed);
        Map<String, List<Diagnostic>> now = byKey(after, Map.of());
        List<FindingChange> out = new ArrayList<>();
        now.forEach((key, list) -> {
            int had = old.getOrDefault(key, List.of()).size();
            for (Diagnostic d : list.subList(Math.min(had, list.size()), list.size())) out.add(at(after, d, true));
        });
        old.forEach((key, list) -> {
            int has = now.getOrDefault(key, List.of()).size();
            for (Diagnostic d : list.subList(Math.min(has, list.size()), list.size())) out.add(at(before, d, false));
        });
        return out;
    }

    private static FindingChange at(Side side, Diagnostic d, boolean appeared) {
        int offset = Math.min(d.span().start(), side.analysis().text().length());
        return new FindingChange(d, appeared, side.analysis().lines().line(offset), side.analysis().lines().column(offset));
    }

    private static Map<String, List<Diagnostic>> byKey(Side side, Map<String, String> renamed) {
        Map<String, List<Diagnostic>> out = new LinkedHashMap<>();
        if (!side.exists()) return out;
        Analysis a = side.analysis();
        Map<Diagnostic, String> owner = new java.util.IdentityHashMap<>();
        for (String name : a.graph().names()) {
            for (Diagnostic d : a.graph().findings(name)) owner.putIfAbsent(d, renamed.getOrDefault(name, name));
        }
        for (Diagnostic d : side.findings()) {
            String on = owner.get(d);
            if (on == null) on = ownerByEquality(a, d, renamed);
            String key = d.code().id() + "\u0000" + (on != null ? "name:" + on : "text:" + anchorText(a, d));
            out.computeIfAbsent(key, k -> new ArrayList<>()).add(d);
        }
        return out;
    }

    /** The definition a finding is on when the kept list holds an equal (not the same) object. */
    private static String ownerByEquality(Analysis a, Diagnostic d, Map<String, String> renamed) {
        for (String name : a.graph().names()) {
            if (a.graph().findings(name).contains(d)) return renamed.getOrDefault(name, name);
        }
        return null;
    }

    /** What the finding points at, or its whole line when it points between characters. */
    private static String anchorText(Analysis a, Diagnostic d) {
        String text = a.text();
        int start = Math.min(d.span().start(), text.length());
        int end = Math.min(Math.max(d.span().end(), start), text.length());
        if (end == start) {
            int lineStart = start == 0 ? 0 : text.lastIndexOf('\n', start - 1) + 1;
            int lineEnd = text.indexOf('\n', start);
            start = lineStart;
            end = lineEnd < 0 ? text.length() : lineEnd;
        }
        return text.substring(start, end).replaceAll("\\s+", "");
    }
}
