package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * Data-driven diagnostics tests: a fixture is a calc whose expected diagnostics are written in
 * it, as annotation lines under the line they point at.
 *
 * <pre>
 * input L = 2 m
 * F = L + 3 N
 * #   ^^^^^^^ unit.mismatch: adding a force (N) to a length (m)
 * </pre>
 *
 * <ul>
 *   <li>An annotation line starts with {@code #} in column 0, so the engine reads it as
 *       narrative. Then come the marks, one or more spaces, the code, and optionally
 *       {@code : fragment}; the fragment must occur in the message. A fragment may skip
 *       part of the message with {@code " ... "}: its parts must then occur in this order.</li>
 *   <li>The marks point at the nearest line above that is not itself an annotation. Columns are
 *       characters (code points) counted from the start of the line, the {@code #} being column 0;
 *       the helper converts them to the engine's UTF-16 offsets.</li>
 *   <li>Column 0 is hidden under the {@code #}: an annotation that starts {@code #<} has all its
 *       marks shifted one column left, so {@code #<} marks column 0 and {@code #<^^} columns 0–2.</li>
 *   <li>A single mark ({@code ^} or {@code #<}) stands for a range of at most one character at that
 *       column: it matches a zero-width diagnostic there (such as "found the end of the line", drawn
 *       one past the last character) as well as a one-character one. Two or more marks must match
 *       exactly.</li>
 *   <li>Every diagnostic counts, hints ({@code input.unused}) included, and the severity must be
 *       the one its code declares. A diagnostic that spans several lines cannot be annotated:
 *       assert it directly.</li>
 * </ul>
 *
 * {@link #check(String)} asserts that annotations and diagnostics match one to one; on failure it
 * lists what is missing and what is unexpected and prints the fixture annotated with what the
 * engine actually reported, ready to compare.
 */
final class Fixture {
    /** Where single-document fixtures are analysed; nothing is read from there. */
    static final Path FILE = Path.of("fixture.plumb").toAbsolutePath();

    /** A line that is meant as an annotation: '#', then '<' or blanks and a caret. */
    private static final Pattern LOOKS_LIKE = Pattern.compile("^#(<|[ \\t]*\\^)");
    private static final Pattern ANNOTATION =
        Pattern.compile("^#(?<shift><?)(?<pad> *)(?<marks>\\^*)\\s+(?<code>[a-z]+\\.[a-z-]+)\\s*(?::\\s*(?<fragment>.*))?$");
    private static final Map<String, Code> CODES =
        Arrays.stream(Code.values()).collect(Collectors.toMap(Code::id, Function.identity()));

    private Fixture() {
    }

    /** One expected diagnostic: a range in UTF-16 offsets; {@code loose} for a single mark. */
    record Expected(int line, String source, Code code, int start, int end, boolean loose, String fragment) {
        boolean matches(Diagnostic d) {
            if (d.code() != code || d.severity() != code.severity()) return false;
            if (!containsInOrder(d.message(), fragment)) return false;
            if (d.span().start() != start) return false;
            return loose ? d.span().end() == start || d.span().end() == end : d.span().end() == end;
        }
    }

    /** Whether the message holds the fragment's parts, separated by " ... ", in this order. */
    static boolean containsInOrder(String message, String fragment) {
        int from = 0;
        for (String part : fragment.split(" \\.\\.\\. ", -1)) {
            int at = message.indexOf(part, from);
            if (at < 0) return false;
            from = at + part.length();
        }
        return true;
    }

    /** Analyses a fixture as one unsaved document and checks its annotations. */
    static Analysis check(String fixture) {
        Analysis a = analyze(fixture);
        check(fixture, a.diagnostics());
        return a;
    }

    /** Checks a fixture file under src/test/resources/diagnostics/. */
    static Analysis checkResource(String name) {
        return check(resource(name));
    }

    /** Checks an analysis against the annotations in its own text (for files on disk). */
    static void check(Analysis analysis) {
        check(analysis.text(), analysis.diagnostics());
    }

    static Analysis analyze(String text) {
        return new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(FILE, text);
    }

    /**
     * The calc has no error or warning but of {@code code}, and of that exactly one finding of
     * {@code severity} whose message contains {@code fragment}; none at all when severity is null.
     */
    static void assertOneFinding(String calc, Code code, Severity severity, String fragment) {
        Analysis a = analyze(calc);
        List<Diagnostic> found = a.diagnostics().stream().filter(d -> d.code() == code).toList();
        List<Diagnostic> others = a.diagnostics().stream()
            .filter(d -> d.code() != code && d.severity() != Severity.HINT).toList();
        assertEquals(List.of(), others, "the calc itself is clean");
        if (severity == null) {
            assertEquals(List.of(), found);
            return;
        }
        assertEquals(1, found.size(), found.toString());
        assertEquals(severity, found.get(0).severity());
        assertTrue(found.get(0).message().contains(fragment), found.get(0).message());
    }

    /** The result row of a defined value, by name. */
    static Row.ValueRow value(Analysis a, String name) {
        return a.rows().stream()
            .filter(r -> r instanceof Row.ValueRow v && v.name().equals(name))
            .map(r -> (Row.ValueRow) r)
            .findFirst()
            .orElseThrow(() -> new AssertionError("no value row " + name));
    }

    /** The value as people read it (its display unit, the analysis's significant figures). */
    static String shown(Analysis a, String name) {
        return dev.plumb.present.ValueText.of(a, value(a, name));
    }

    static String resource(String name) {
        String path = "/diagnostics/" + name;
        try (InputStream in = Fixture.class.getResourceAsStream(path)) {
            if (in == null) throw new IllegalArgumentException("no fixture " + path + " on the test class path");
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Asserts that {@code actual} and the annotations of {@code text} match one to one. */
    static void check(String text, List<Diagnostic> actual) {
        List<Expected> expected = new ArrayList<>(annotations(text));
        List<Diagnostic> unmatched = new ArrayList<>(actual);
        List<Expected> missing = new ArrayList<>();
        // The most specific annotations take their diagnostic first.
        expected.sort(Comparator.comparingInt((Expected e) -> e.fragment().length()).reversed());
        for (Expected e : expected) {
            Diagnostic hit = unmatched.stream().filter(e::matches).findFirst().orElse(null);
            if (hit == null) missing.add(e);
            else unmatched.remove(hit);
        }
        if (missing.isEmpty() && unmatched.isEmpty()) return;
        missing.sort(Comparator.comparingInt(Expected::start));
        fail(diff(text, missing, unmatched, actual));
    }

    // ---- reading annotations -----------------------------------------------------------

    static List<Expected> annotations(String text) {
        List<Expected> out = new ArrayList<>();
        String[] lines = text.split("\r\n|\r|\n", -1);
        int[] starts = new int[lines.length];
        for (int i = 1; i < lines.length; i++) {
            int previousEnd = starts[i - 1] + lines[i - 1].length();
            starts[i] = previousEnd + lineBreakLength(text, previousEnd);
        }
        int target = -1;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (!LOOKS_LIKE.matcher(line).find()) {
                target = i;
                continue;
            }
            Matcher m = ANNOTATION.matcher(line);
            if (!m.matches() || (m.group("shift").isEmpty() && m.group("marks").isEmpty())
                || (!m.group("shift").isEmpty() && !m.group("pad").isEmpty())) {
                throw new IllegalArgumentException("line " + (i + 1) + ": malformed annotation, write "
                    + "`#   ^^^ code: message fragment` or `#<^^ code: …` for column 0: " + line);
            }
            if (target < 0) throw new IllegalArgumentException("line " + (i + 1) + ": annotation with no line above it");
            Code code = CODES.get(m.group("code"));
            if (code == null) throw new IllegalArgumentException("line " + (i + 1) + ": no diagnostic code " + m.group("code"));
            boolean shifted = !m.group("shift").isEmpty();
            int firstColumn = shifted ? 0 : 1 + m.group("pad").length();
            int marks = m.group("marks").length() + (shifted ? 1 : 0);
            String source = lines[target];
            int width = source.codePointCount(0, source.length());
            boolean loose = marks == 1;
            if (firstColumn + (loose ? 0 : marks) > width) {
                throw new IllegalArgumentException("line " + (i + 1) + ": the marks reach past the end of line "
                    + (target + 1) + " (" + width + " characters): " + source);
            }
            int start = starts[target] + source.offsetByCodePoints(0, firstColumn);
            int lastColumn = Math.min(width, firstColumn + marks);
            int end = starts[target] + source.offsetByCodePoints(0, lastColumn);
            String fragment = m.group("fragment") == null ? "" : m.group("fragment").strip();
            out.add(new Expected(target + 1, source, code, start, end, loose, fragment));
        }
        return out;
    }

    private static int lineBreakLength(String text, int at) {
        if (at >= text.length()) return 0;
        return text.startsWith("\r\n", at) ? 2 : 1;
    }

    // ---- reporting ---------------------------------------------------------------------

    private static String diff(String text, List<Expected> missing, List<Diagnostic> unexpected, List<Diagnostic> actual) {
        StringBuilder b = new StringBuilder("the diagnostics differ from the fixture's annotations\n");
        if (!missing.isEmpty()) {
            b.append("\nannotated but not reported:\n");
            for (Expected e : missing) {
                b.append("  line ").append(e.line()).append(": ").append(e.source()).append('\n')
                    .append("    ").append(e.code()).append(" [").append(e.start()).append(',').append(e.end())
                    .append(e.loose() ? " or zero-width" : "").append(") containing \"").append(e.fragment()).append("\"\n");
            }
        }
        if (!unexpected.isEmpty()) {
            b.append("\nreported but not annotated:\n");
            for (Diagnostic d : unexpected) b.append("  ").append(describe(text, d)).append('\n');
        }
        b.append("\nthe fixture annotated with what the engine reported:\n\n").append(annotate(text, actual));
        return b.toString();
    }

    private static String describe(String text, Diagnostic d) {
        int start = Math.min(d.span().start(), text.length());
        int end = Math.min(d.span().end(), text.length());
        return d.code() + " (" + d.severity().label() + ") [" + start + "," + end + ") '" + text.substring(start, end)
            + "': " + d.message();
    }

    /** The fixture without its annotation lines, with the diagnostics written as annotations. */
    static String annotate(String text, List<Diagnostic> diagnostics) {
        StringBuilder b = new StringBuilder();
        int lineStart = 0;
        for (String line : text.split("\n", -1)) {
            int lineEnd = lineStart + line.length();
            if (!LOOKS_LIKE.matcher(line).find()) {
                b.append(line).append('\n');
                for (Diagnostic d : diagnostics) {
                    int s = d.span().start();
                    if (s >= lineStart && s <= lineEnd) b.append(annotation(line, lineStart, d)).append('\n');
                }
            }
            lineStart = lineEnd + 1;
        }
        return b.toString();
    }

    private static String annotation(String line, int lineStart, Diagnostic d) {
        String clean = line.endsWith("\r") ? line.substring(0, line.length() - 1) : line;
        int from = d.span().start() - lineStart;
        int to = Math.min(d.span().end() - lineStart, clean.length());
        int column = clean.codePointCount(0, Math.min(from, clean.length()));
        int marks = Math.max(1, to > from ? clean.codePointCount(from, to) : 1);
        String more = d.span().end() - lineStart > clean.length() ? " (runs on past this line)" : "";
        String head = column == 0 ? "#<" + "^".repeat(marks - 1) : "#" + " ".repeat(column - 1) + "^".repeat(marks);
        return head + " " + d.code() + ": " + d.message() + more;
    }
}
