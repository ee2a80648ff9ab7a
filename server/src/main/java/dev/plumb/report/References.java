package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The sources of the library entries and tables a calc calls, each numbered once, in the order
 * the page first cites it ([n] where used), and listed at the end.
 */
final class References {
    /** Entry name → its source text. */
    private final Map<String, String> sourceOf;
    /** Source text → its number. */
    private final Map<String, Integer> numbers;

    private References(Map<String, String> sourceOf, Map<String, Integer> numbers) {
        this.sourceOf = sourceOf;
        this.numbers = numbers;
    }

    static References of(Analysis a) {
        Map<String, String> sourceOf = new LinkedHashMap<>();
        Map<String, Integer> numbers = new LinkedHashMap<>();
        for (Analysis.CallSite c : a.calls()) {
            String source = source(a.scope().lookup(c.name()));
            if (source != null && !source.isBlank()) sourceOf.put(c.name(), source);
        }
        return new References(sourceOf, numbers);
    }

    static String source(Binding b) {
        if (b instanceof Binding.CorrelationBinding c) return c.def().source();
        if (b instanceof Binding.TableBinding t) return t.def().source();
        return null;
    }

    /** " [2]" after a use of an entry with a source; "" otherwise. */
    String cite(String entry) {
        String source = sourceOf.get(entry);
        if (source == null) return "";
        int n = numbers.computeIfAbsent(source, k -> numbers.size() + 1);
        return " <a class=\"cite\" href=\"#ref-" + n + "\">[" + n + "]</a>";
    }

    String html() {
        if (numbers.isEmpty()) return "";
        List<String> items = new ArrayList<>();
        numbers.forEach((source, n) -> items.add("<li id=\"ref-" + n + "\" value=\"" + n + "\">" + Html.text(source) + "</li>"));
        return "<section class=\"references\"><h2>References</h2><ol>" + String.join("", items) + "</ol></section>";
    }
}
