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
        return of(a, 0, Integer.MAX_VALUE);
    }

    /**
     * The values of the rows that end within {@code from..to} (offsets): an editor asks for the
     * lines it shows, and only those are worded.
     */
    public static List<InlayValue> of(Analysis a, int from, int to) {
        List<InlayValue> out = new ArrayList<>();
        for (Row r : a.rows()) {
            if (r.span().end() < from || r.span().end() > to) continue;
            if (r instanceof Row.ValueRow v && !v.input()) {
                String solved = v.solution() == null ? "" : "  (solved, " + v.solution().iterations() + " iterations)";
                // The unknowns of one several-unknown solve share its line: each says whose value it is.
                String lead = v.statement() instanceof dev.plumb.syntax.Statement.SeekSystem ? v.name() + " = " : "= ";
                // The short form of a spread: the relative one, or the absolute one where a relative one says nothing.
                String spread = ValueText.relative(v).isEmpty() ? ValueText.spread(v) : " " + ValueText.relative(v);
                out.add(new InlayValue(v.span().end(), lead + ValueText.of(a, v) + spread + solved, v.name()));
            } else if (r instanceof Row.SweepRow w) {
                out.add(new InlayValue(w.span().end(), "= " + dev.plumb.present.SweepText.summary(w), w.varied()));
            } else if (r instanceof Row.CaseRow k) {
                out.add(new InlayValue(k.span().end(), "→ " + dev.plumb.present.CaseText.summary(k,
                    a.settings().significantFigures()), k.name()));
            } else if (r instanceof Row.CheckRow c) {
                String mark = c.passed() == null ? "? not evaluated" : CheckText.mark(c) + " " + CheckText.detail(c);
                out.add(new InlayValue(c.span().end(), mark, "check"));
            }
        }
        return out;
    }
}
