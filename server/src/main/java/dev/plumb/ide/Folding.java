package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import java.util.ArrayList;
import java.util.List;

/** Folding ranges: each section to the line before the next, and each correlation or table block. */
public final class Folding {
    /** A foldable range of 0-based lines. */
    public record Fold(int startLine, int endLine, String kind) {
    }

    private Folding() {
    }

    public static List<Fold> of(Analysis a) {
        List<Fold> out = new ArrayList<>();
        Integer sectionStart = null;
        int lastLine = 0;
        for (Row r : a.rows()) {
            int first = a.lines().lineIndex(r.span().start());
            int last = a.lines().lineIndex(Math.max(r.span().start(), r.span().end() - 1));
            if (r instanceof Row.SectionRow) {
                if (sectionStart != null && lastLine > sectionStart) out.add(new Fold(sectionStart, lastLine, "region"));
                sectionStart = first;
            }
            if (r instanceof Row.FunctionRow f && f.kind() != Row.Callable.FUNCTION && last > first) {
                out.add(new Fold(first, last, "region"));
            }
            lastLine = Math.max(lastLine, last);
        }
        if (sectionStart != null && lastLine > sectionStart) out.add(new Fold(sectionStart, lastLine, "region"));
        return out;
    }
}
