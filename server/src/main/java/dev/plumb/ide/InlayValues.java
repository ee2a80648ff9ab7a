package dev.plumb.ide;

import dev.plumb.present.ValueText;
import dev.plumb.present.CheckText;
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
                out.add(new InlayValue(v.span().end(), "= " + ValueText.of(a, v) + solved, v.name()));
            } else if (r instanceof Row.CheckRow c) {
                String mark = c.passed() == null ? "? not evaluated" : CheckText.mark(c) + " " + CheckText.detail(c);
                out.add(new InlayValue(c.span().end(), mark, "check"));
            }
        }
        return out;
    }
}
