package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

/**
 * What may be typed at the cursor: units after a number or after `in`, tags after `as`, else
 * names in scope (with their values), functions and correlations (with parameter snippets) and
 * statement words.
 */
public final class Completion {
    public static final int LIMIT = 200;
    private static final List<String> STATEMENT_WORDS = List.of("input", "check", "section", "use", "seek", "correlation",
        "table", "title", "author", "reviewer", "revision", "accept", "transition", "sweep", "case");
    /** The words `as` takes, with what each says. */
    private static final List<String[]> TAGS = List.of(
        new String[] {"frontal", "area: projected on a plane normal to the flow"},
        new String[] {"wetted", "area: the surface the flow runs over"},
        new String[] {"planform", "area: the plan area of a wing or plate"},
        new String[] {"fluid", "density: the fluid's (dynamic pressure, forces, Reynolds number)"},
        new String[] {"body", "density: the body's own (its weight)"});

    private Completion() {
    }

    public static List<CompletionEntry> at(Analysis a, int offset) {
        String text = a.text();
        offset = Math.max(0, Math.min(offset, text.length()));
        int start = offset;
        while (start > 0 && isUnitChar(text.charAt(start - 1))) start--;
        String prefix = text.substring(start, offset);
        if (unitExpected(text, start)) return units(prefix);
        int wordStart = offset;
        while (wordStart > 0 && isNameChar(text.charAt(wordStart - 1))) wordStart--;
        String word = text.substring(wordStart, offset);
        List<CompletionEntry> out = new ArrayList<>();
        if (afterWord(text, wordStart, "as")) {
            for (String[] tag : TAGS) {
                if (matches(tag[0], word)) out.add(new CompletionEntry(tag[0], CompletionEntry.Kind.KEYWORD, tag[1], tag[0], false));
            }
            return out;
        }
        if (lineStartsAt(text, wordStart)) {
            for (String k : STATEMENT_WORDS) {
                if (matches(k, word)) out.add(new CompletionEntry(k, CompletionEntry.Kind.KEYWORD, "statement", k + " ", false));
            }
            if (matches("seek", word)) {
                out.add(new CompletionEntry("seek … in … where …", CompletionEntry.Kind.KEYWORD,
                    "solve for a value in a range", "seek ${1:x} in ${2:low} .. ${3:high} where ${4:lhs} = ${5:rhs}", true));
                out.add(new CompletionEntry("seek … from … where …", CompletionEntry.Kind.KEYWORD,
                    "solve for a value from a start value", "seek ${1:x} from ${2:start} where ${3:lhs} = ${4:rhs}", true));
            }
            if (matches("evolve", word)) {
                out.add(new CompletionEntry("evolve … over … rates … until …", CompletionEntry.Kind.KEYWORD,
                    "follow states in time from start values", "evolve ${1:v} from ${2:start} over ${3:t} rates ${4:rate} "
                        + "until ${5:condition}", true));
            }
        }
        for (String name : new TreeSet<>(a.scope().visibleNames())) {
            if (!matches(name, word)) continue;
            out.add(entry(name, a.scope().lookup(name)));
            if (out.size() >= LIMIT) break;
        }
        return out;
    }

    private static CompletionEntry entry(String name, Binding b) {
        if (b instanceof Binding.ValueBinding v) {
            String detail = v.value().known() ? dev.plumb.units.QuantityFormat.format(v.value().si(),
                v.display() != null ? v.display() : dev.plumb.units.DisplayUnits.defaultFor(v.value().dimension()), 4) : "?";
            return new CompletionEntry(name, v.file() == null ? CompletionEntry.Kind.CONSTANT
                : v.input() ? CompletionEntry.Kind.INPUT : CompletionEntry.Kind.VALUE, detail, name, false);
        }
        List<String> params = Signatures.parameters(b);
        StringBuilder snippet = new StringBuilder(name).append('(');
        for (int i = 0; i < params.size(); i++) {
            if (i > 0) snippet.append(", ");
            snippet.append("${").append(i + 1).append(':').append(params.get(i).split(":")[0].strip()).append('}');
        }
        snippet.append(')');
        CompletionEntry.Kind kind = b instanceof Binding.CorrelationBinding ? CompletionEntry.Kind.CORRELATION
            : b instanceof Binding.TableBinding ? CompletionEntry.Kind.TABLE : CompletionEntry.Kind.FUNCTION;
        return new CompletionEntry(name, kind, Signatures.label(name, b), snippet.toString(), true);
    }

    private static List<CompletionEntry> units(String prefix) {
        List<CompletionEntry> out = new ArrayList<>();
        // Short spellings first (m, s, kg, kN …), and one of each look-alike (the ohm sign U+2126 is skipped).
        List<String> symbols = new ArrayList<>(UnitRegistry.standard().symbols());
        symbols.sort(java.util.Comparator.comparingInt(String::length).thenComparing(String.CASE_INSENSITIVE_ORDER));
        for (String symbol : symbols) {
            if (symbol.startsWith(prefix) && !symbol.isEmpty() && symbol.indexOf('\u2126') < 0) {
                out.add(new CompletionEntry(symbol, CompletionEntry.Kind.UNIT, "unit", symbol, false));
                if (out.size() >= LIMIT) break;
            }
        }
        return out;
    }

    /** After a number (and optional blanks) or after the word `in`, a unit is expected. */
    private static boolean unitExpected(String text, int start) {
        int i = start;
        while (i > 0 && (text.charAt(i - 1) == ' ' || text.charAt(i - 1) == '\t')) i--;
        if (i > 0 && Character.isDigit(text.charAt(i - 1))) return true;
        return afterWord(text, start, "in") && !SEEK_RANGE.matcher(lineBefore(text, start)).matches();
    }

    /** {@code seek NAME in }: a value follows that `in`, not a unit. */
    private static final java.util.regex.Pattern SEEK_RANGE =
        java.util.regex.Pattern.compile("\\s*seek\\s+[\\p{L}_][\\p{L}\\p{Nd}_]*\\s+in\\s*");

    private static String lineBefore(String text, int offset) {
        int lineStart = text.lastIndexOf('\n', offset - 1) + 1;
        return text.substring(lineStart, offset);
    }

    /** Whether blanks and then {@code word}, standing alone, come just before {@code start}. */
    private static boolean afterWord(String text, int start, String word) {
        int i = start;
        while (i > 0 && (text.charAt(i - 1) == ' ' || text.charAt(i - 1) == '\t')) i--;
        int w = i - word.length();
        return i < start && w >= 0 && text.startsWith(word, w) && (w == 0 || !isNameChar(text.charAt(w - 1)));
    }

    private static boolean lineStartsAt(String text, int i) {
        int j = i;
        while (j > 0 && (text.charAt(j - 1) == ' ' || text.charAt(j - 1) == '\t')) j--;
        return j == 0 || text.charAt(j - 1) == '\n' || text.charAt(j - 1) == '\r';
    }

    private static boolean matches(String candidate, String typed) {
        return candidate.toLowerCase(Locale.ROOT).startsWith(typed.toLowerCase(Locale.ROOT));
    }

    private static boolean isNameChar(char c) {
        return Character.isLetterOrDigit(c) || c == '_' || c == '.';
    }

    private static boolean isUnitChar(char c) {
        return Character.isLetter(c) || c == '°' || c == '%' || c == '/' || c == '^' || c == '*' || c == '·';
    }
}
