package dev.plumb.analysis;

import dev.plumb.diagnostics.EditDistance;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;

/** Close spellings of a mistyped name, best first. */
final class Suggestions {
    private Suggestions() {
    }

    static List<String> closest(String typed, Collection<String> known, int max) {
        record Scored(String name, int distance) {
        }
        List<Scored> scored = new ArrayList<>();
        int limit = Math.max(1, typed.length() / 3 + 1);
        for (String k : known) {
            int d = k.equalsIgnoreCase(typed) ? 0 : EditDistance.between(typed.toLowerCase(), k.toLowerCase());
            if (d <= limit) scored.add(new Scored(k, d));
        }
        scored.sort(Comparator.comparingInt(Scored::distance).thenComparing(Scored::name));
        return scored.stream().limit(max).map(Scored::name).toList();
    }

    /** " (did you mean 'a' or 'b'?)" or "". */
    static String didYouMean(List<String> options) {
        if (options.isEmpty()) return "";
        return " (did you mean " + String.join(" or ", options.stream().map(o -> "'" + o + "'").toList()) + "?)";
    }
}
