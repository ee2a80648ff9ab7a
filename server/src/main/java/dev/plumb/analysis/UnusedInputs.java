package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Statement;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** A lint: an input that no value, function or check uses is worth a hint. */
final class UnusedInputs {
    private static final Pattern WORD = Pattern.compile("[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private UnusedInputs() {
    }

    /**
     * @param used the names the resolver saw used
     * @param all every statement of the document, broken ones included
     */
    static void report(Set<String> used, List<Statement> all, Iterable<Statement> defining, String text,
                       Reporter reporter) {
        Set<String> mentioned = new HashSet<>(used);
        // A line with a syntax error still mentions the names it meant to use, even when it
        // defines none (`check c >` keeps the input c from looking unused).
        for (Statement s : all) {
            if (s instanceof Statement.Broken b) {
                Matcher m = WORD.matcher(text.substring(b.span().start(), Math.min(b.span().end(), text.length())));
                while (m.find()) mentioned.add(m.group());
            }
        }
        for (Statement s : defining) {
            if (s instanceof Statement.Definition d && d.input() && !mentioned.contains(d.name().text())) {
                reporter.report(Code.INPUT_UNUSED, d.name().span(), "input " + d.name().text()
                    + " is not used by any value or check: use it, or remove it");
            }
        }
    }
}
