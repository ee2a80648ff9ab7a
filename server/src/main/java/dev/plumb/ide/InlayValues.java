package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import java.util.ArrayList;
import java.util.List;

/** The values an editor shows inline: one per definition, check and solved `seek`. */
public final class InlayValues {
    private InlayValues() {
    }

    public static List<InlayValue> of(Analysis a) {
        List<InlayValue> out = new ArrayList<>();
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v && !v.input()) {
                String solved = v.solution() == null ? "" : "  (solved, " + v.solution().iterations() + " iterations)";
                out.add(new InlayValue(v.span().end(), "= " + v.shown() + solved, v.name()));
            } else if (r instanceof Row.CheckRow c) {
                String mark = c.passed() == null ? "? not evaluated" : c.passed() ? "✓ " + c.detail() : "✗ " + c.detail();
                out.add(new InlayValue(c.span().end(), mark, "check"));
            }
        }
        return out;
    }
}
