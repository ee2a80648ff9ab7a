package dev.plumb.report;

import java.util.List;

/** The calc's prose: each `#` line kept, a blank `#` line ending a paragraph; never a line lost. */
final class Narrative {
    private Narrative() {
    }

    static String html(List<String> lines) {
        if (lines.isEmpty()) return "";
        StringBuilder out = new StringBuilder();
        StringBuilder paragraph = new StringBuilder();
        for (String line : lines) {
            String text = line.strip();
            if (text.isEmpty()) {
                flush(out, paragraph);
                continue;
            }
            if (paragraph.length() > 0) paragraph.append('\n');
            paragraph.append(Html.text(text));
        }
        flush(out, paragraph);
        return out.toString();
    }

    private static void flush(StringBuilder out, StringBuilder paragraph) {
        if (paragraph.length() == 0) return;
        out.append(Html.element("p", "narrative", paragraph.toString()));
        paragraph.setLength(0);
    }
}
