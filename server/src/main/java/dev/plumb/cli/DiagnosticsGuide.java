package dev.plumb.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;

/**
 * The guide to the diagnostic codes (docs/diagnostics.md, shipped in the jar), one section per
 * code: what a machine-readable report needs to explain a finding's rule.
 */
final class DiagnosticsGuide {
    /**
     * @param summary the section's first paragraph, on one line
     * @param fix the paragraph that starts with "**Fix:**", on one line (empty when there is none)
     * @param markdown the whole section below its heading
     */
    record Section(String summary, String fix, String markdown) {
        /** The summary's first sentence. */
        String firstSentence() {
            int end = summary.indexOf(". ");
            return end < 0 ? summary : summary.substring(0, end + 1);
        }
    }

    private static final Map<String, Section> SECTIONS = read();

    private DiagnosticsGuide() {
    }

    /** The section of a code, or null when the guide has none (a test keeps every code in it). */
    static Section of(String code) {
        return SECTIONS.get(code);
    }

    private static Map<String, Section> read() {
        Map<String, Section> out = new HashMap<>();
        String text;
        try (InputStream in = DiagnosticsGuide.class.getResourceAsStream("/docs/diagnostics.md")) {
            if (in == null) return out;
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            return out;
        }
        for (String part : text.split("\n## ")) {
            int eol = part.indexOf('\n');
            if (eol < 0) continue;
            String id = part.substring(0, eol).strip();
            String body = part.substring(eol + 1).strip();
            String summary = "";
            String fix = "";
            for (String paragraph : body.split("\n\\s*\n")) {
                String line = paragraph.strip().replaceAll("\\s*\n\\s*", " ");
                if (line.startsWith("**Fix:**")) fix = line.substring("**Fix:**".length()).strip();
                else if (summary.isEmpty() && !line.startsWith("**") && !line.startsWith("```") && !line.startsWith(">")) {
                    summary = line;
                }
            }
            out.put(id, new Section(summary, fix, body));
        }
        return out;
    }
}
