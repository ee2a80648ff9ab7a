package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** docs/diagnostics.md documents every code, and its examples give the messages it quotes. */
class DiagnosticsDocTest {
    /** Codes whose example needs several files, a file that is not text (see UseTest), or a long run (BudgetTest). */
    private static final Set<Code> NOT_RUNNABLE = Set.of(Code.SYNTAX_NESTING, Code.FILE_NOT_TEXT, Code.FILE_UNREADABLE,
        Code.USE_NOT_FOUND, Code.USE_CYCLE, Code.USE_OUTSIDE_WORKSPACE, Code.USE_HAS_ERRORS, Code.LIMIT_MEMORY, Code.LIMIT_BUDGET,
        // Needs a run with Monte Carlo samples asked for: MonteCarloTest checks the page's example.
        Code.TOLERANCE_SAMPLES_FAILED);

    /** One "## code" section of the page. */
    record Section(String heading, String body) {
    }



    private static Map<String, Section> sections() throws IOException {
        String page = Files.readString(dev.plumb.RepoRoot.get().resolve("docs/diagnostics.md"), StandardCharsets.UTF_8);
        Map<String, Section> out = new LinkedHashMap<>();
        String[] parts = page.split("(?m)^## ");
        for (int i = 1; i < parts.length; i++) {
            int eol = parts[i].indexOf('\n');
            String heading = parts[i].substring(0, eol).strip();
            out.put(heading, new Section(heading, parts[i].substring(eol + 1)));
        }
        return out;
    }

    @Test
    void everyCodeHasAHeading() throws IOException {
        Set<String> headings = sections().keySet();
        List<String> missing = Arrays.stream(Code.values()).map(Code::id).filter(id -> !headings.contains(id)).toList();
        assertEquals(List.of(), missing, "codes without a '## code' heading in docs/diagnostics.md");
    }

    @Test
    void everyHeadingIsACodeInTheOrderOfTheEnum() throws IOException {
        List<String> codes = Arrays.stream(Code.values()).map(Code::id).toList();
        assertEquals(codes, new ArrayList<>(sections().keySet()));
    }

    @Test
    void everySectionGivesItsSeverityAnExampleAMessageAndAFix() throws IOException {
        for (Section s : sections().values()) {
            Code code = Arrays.stream(Code.values()).filter(c -> c.id().equals(s.heading())).findFirst().orElseThrow();
            assertTrue(s.body().contains("**Severity:** " + code.severity().label() + "\n"), s.heading() + ": severity");
            assertTrue(s.body().contains("```"), s.heading() + ": example");
            assertFalse(quotedMessages(s).isEmpty(), s.heading() + ": message quoted as '> …'");
            assertTrue(s.body().contains("**Fix:**"), s.heading() + ": fix");
        }
    }

    @Test
    void everyRunnableExampleGivesTheMessageItQuotes() throws IOException {
        List<String> wrong = new ArrayList<>();
        for (Section s : sections().values()) {
            Code code = Arrays.stream(Code.values()).filter(c -> c.id().equals(s.heading())).findFirst().orElseThrow();
            String example = block(s.body(), "```plumb\n");
            if (NOT_RUNNABLE.contains(code)) {
                if (example != null) wrong.add(s.heading() + ": its example cannot run; show it as ```text");
                continue;
            }
            if (example == null) {
                wrong.add(s.heading() + ": no ```plumb example");
                continue;
            }
            List<String> messages = Fixture.analyze(example).diagnostics().stream()
                .filter(d -> d.code() == code).map(Diagnostic::message).toList();
            String quoted = quotedMessages(s).get(0);
            if (!messages.contains(quoted)) {
                wrong.add(s.heading() + ": the page quotes\n    " + quoted + "\n  the engine says\n    "
                    + String.join("\n    ", messages));
            }
        }
        assertEquals("", String.join("\n", wrong));
    }

    private static String block(String body, String fence) {
        int start = body.indexOf(fence);
        if (start < 0) return null;
        int from = start + fence.length();
        return body.substring(from, body.indexOf("```", from));
    }

    private static List<String> quotedMessages(Section s) {
        return s.body().lines().filter(l -> l.startsWith("> ")).map(l -> l.substring(2)).collect(Collectors.toList());
    }
}
