package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.bench.ChainCalc;
import dev.plumb.bench.GeneratedCalc;
import dev.plumb.ide.HoverText;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The correctness guard of incremental evaluation: after each of thousands of random edits of
 * real calcs (the samples, every diagnostics fixture, long generated ones), an analysis that takes
 * values over from the one before ({@link Workspace#analyzeEdit}) equals a fresh analysis of the
 * same text — rows and values, findings, correlation calls, and the hover at every row — while
 * taking over many values, so the comparison is not an empty one.
 */
class IncrementalEvaluationTest {
    private static final Pattern NUMBER = Pattern.compile("(?<![\\p{L}_\\d.])\\d+(\\.\\d+)?");
    private static final Pattern NAME = Pattern.compile("(?<![\\p{L}_\\d])[\\p{L}_][\\p{L}_\\d]*");
    private static final String[] NUMBERS = {"0", "1", "2.5", "1e3", "0.001", "42", "7"};
    private static final String[] PIECES = {" ", "\n", "x", "+ 1", " * 2", " m", " in kN", "(", ")", "# note\n", "input ",
        "check ", "\"why\"", "^2", " as frontal", "y = 3 m\n"};
    private static final int EDITS_PER_CALC = 45;

    @TempDir
    Path dir;

    @Test
    void editsThenReuseEqualAFreshAnalysis() throws IOException {
        List<Path> calcs = new ArrayList<>(dev.plumb.RepoRoot.calcs());
        Path generated = dir.resolve("generated.plumb");
        Files.writeString(generated, GeneratedCalc.of(200));
        calcs.add(generated);
        Path chain = dir.resolve("chain.plumb");
        Files.writeString(chain, ChainCalc.plumb(150));
        calcs.add(chain);

        Random random = new Random(20261202L);
        int edits = 0;
        long takenOver = 0;
        long evaluated = 0;
        for (Path calc : calcs) {
            String text = Files.readString(calc);
            // As the language server does: used files' analyses kept between runs.
            ImportMemory memory = new ImportMemory();
            Analysis last = new Workspace(new FileSources(), Settings.DEFAULT, memory).analyzeEdit(calc, text, null, () -> false);
            List<String> history = new ArrayList<>(List.of(text));
            for (int i = 0; i < EDITS_PER_CALC; i++) {
                text = edit(text, history, random);
                history.add(text);
                Analysis incremental = new Workspace(new FileSources(), Settings.DEFAULT, memory)
                    .analyzeEdit(calc, text, last, () -> false);
                Analysis fresh = new Workspace(new FileSources(), Settings.DEFAULT).analyzeText(calc, text);
                assertSame(fresh, incremental, calc.getFileName() + " after " + (i + 1) + " edits:\n" + text
                    + "\n----- from:\n" + history.get(history.size() - 2));
                takenOver += incremental.graph().reusable().takenOver();
                evaluated += incremental.rows().stream().filter(r -> r instanceof Row.ValueRow).count();
                last = incremental;
                edits++;
            }
        }
        assertTrue(edits >= 2_000, "thousands of edits: " + edits);
        // Most edits change a few lines of a calc: most values should have been taken over.
        assertTrue(takenOver > evaluated / 3, "taken over " + takenOver + " of " + evaluated + " values");
    }

    private static void assertSame(Analysis fresh, Analysis incremental, String where) {
        assertSameItems(fresh.rows(), incremental.rows(), where);
        assertSameItems(fresh.diagnostics(), incremental.diagnostics(), where);
        assertSameItems(fresh.calls(), incremental.calls(), where);
        for (Row r : fresh.rows()) {
            int at = r.span().start();
            assertEquals(HoverText.at(fresh, at), HoverText.at(incremental, at), where + "\nhover at " + at);
        }
    }

    /** The first item that differs, with the text after it: one line to read instead of two long lists. */
    private static <T> void assertSameItems(List<T> fresh, List<T> incremental, String where) {
        for (int i = 0; i < Math.min(fresh.size(), incremental.size()); i++) {
            assertEquals(fresh.get(i), incremental.get(i), "item " + i + " of " + where);
        }
        assertEquals(fresh.size(), incremental.size(), where);
    }

    /** One random edit: a number, a name, a line or a piece of text changed, or an earlier text restored. */
    private static String edit(String text, List<String> history, Random random) {
        switch (random.nextInt(7)) {
            case 0, 1 -> {
                List<int[]> numbers = matches(NUMBER.matcher(text));
                if (!numbers.isEmpty()) {
                    int[] n = numbers.get(random.nextInt(numbers.size()));
                    return text.substring(0, n[0]) + NUMBERS[random.nextInt(NUMBERS.length)] + text.substring(n[1]);
                }
                return text;
            }
            case 2 -> {
                List<int[]> names = matches(NAME.matcher(text));
                if (names.size() > 1) {
                    int[] a = names.get(random.nextInt(names.size()));
                    int[] b = names.get(random.nextInt(names.size()));
                    return text.substring(0, a[0]) + text.substring(b[0], b[1]) + text.substring(a[1]);
                }
                return text;
            }
            case 3 -> {
                String[] lines = text.split("\n", -1);
                int k = random.nextInt(lines.length);
                List<String> out = new ArrayList<>(List.of(lines));
                if (random.nextBoolean()) out.remove(k);
                else out.add(k, lines[k]);
                return String.join("\n", out);
            }
            case 4 -> {
                return history.get(Math.max(0, history.size() - 1 - random.nextInt(4)));
            }
            default -> {
                int at = random.nextInt(text.length() + 1);
                int end = Math.min(text.length(), at + random.nextInt(3));
                return text.substring(0, at) + PIECES[random.nextInt(PIECES.length)] + text.substring(end);
            }
        }
    }

    private static List<int[]> matches(Matcher m) {
        List<int[]> out = new ArrayList<>();
        while (m.find()) out.add(new int[] {m.start(), m.end()});
        return out;
    }
}
