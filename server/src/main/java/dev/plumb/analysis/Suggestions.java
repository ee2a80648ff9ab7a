package dev.plumb.analysis;

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
            int d = k.equalsIgnoreCase(typed) ? 0 : distance(typed.toLowerCase(), k.toLowerCase());
            if (d <= limit) scored.add(new Scored(k, d));
        }
        scored.sort(Comparator.comparingInt(Scored::distance).thenComparing(Scored::name));
        return scored.stream().limit(max).map(Scored::name).toList();
    }

    /** Optimal string alignment distance (Levenshtein plus adjacent swaps). */
    static int distance(String a, String b) {
        int[][] d = new int[a.length() + 1][b.length() + 1];
        for (int i = 0; i <= a.length(); i++) d[i][0] = i;
        for (int j = 0; j <= b.length(); j++) d[0][j] = j;
        for (int i = 1; i <= a.length(); i++) {
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                d[i][j] = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
                }
            }
        }
        return d[a.length()][b.length()];
    }

    /** " (did you mean 'a' or 'b'?)" or "". */
    static String didYouMean(List<String> options) {
        if (options.isEmpty()) return "";
        return " (did you mean " + String.join(" or ", options.stream().map(o -> "'" + o + "'").toList()) + "?)";
    }
}
