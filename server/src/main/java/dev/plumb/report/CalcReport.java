package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.present.Caution;
import java.util.ArrayList;
import java.util.List;

/**
 * The printed calc: one self-contained HTML page (inline CSS, MathML, no scripts, no network)
 * that a reviewer reads, prints and signs. In the calc's own order: the title block and status,
 * the opening prose, the inputs, then each section with its prose, definitions (formula, the
 * formula with the values put in, the result), solved values, checks; then the library entries
 * the calc relies on, the findings, the references and the caution.
 */
public final class CalcReport {
    /**
     * What the page says about where it comes from.
     *
     * @param path the calc's path as the reader knows it
     * @param made the date the report was made (ISO 8601)
     * @param revision the version-control line ("commit 1a2b3c4, uncommitted changes"), or null
     */
    public record Context(String path, String made, String revision, Changes changes) {
        public Context(String path, String made, String revision) {
            this(path, made, revision, null);
        }
    }

    /**
     * What changed since an earlier revision, worded by the caller: the revision compared with, each
     * changed value's former reading ("was 34 m/s, +11.76 %") by name, and the checks whose
     * verdict flipped ("✓ → ✗ line 57: …").
     */
    public record Changes(String against, java.util.Map<String, String> values, List<String> flipped) {
        public Changes {
            values = java.util.Map.copyOf(values);
            flipped = List.copyOf(flipped);
        }
    }

    private CalcReport() {
    }

    /** The page of one calc; {@code findings} are its findings as the whole run settled them. */
    public static String html(Analysis a, List<Diagnostic> findings, Context context) {
        ReportValues values = new ReportValues(a);
        FormulaMath math = new FormulaMath();
        References references = References.of(a);
        StringBuilder body = new StringBuilder();
        body.append(TitleBlock.html(a, findings, context));
        List<Row> rows = a.rows();
        int i = 0;
        List<String> prose = new ArrayList<>();
        while (i < rows.size() && rows.get(i) instanceof Row.NarrativeRow n) {
            prose.add(n.text());
            i++;
        }
        body.append(Narrative.html(prose));
        body.append(ChangesBlock.html(context.changes()));
        body.append(InputsTable.html(a, values, math, context.changes()));
        CalcBody.Writer writer = new CalcBody.Writer(a, values, math, references, body, context.changes());
        for (; i < rows.size(); i++) writer.row(rows.get(i));
        writer.finish();
        body.append(LibraryBlock.html(a, references, dev.plumb.units.UnitRegistry.standard()));
        body.append(FindingsBlock.html(a, findings));
        body.append(references.html());
        body.append(Html.element("footer", "caution", Html.element("p", null, Html.text(Caution.TEXT))));
        return ReportPage.page(a.headers().getOrDefault("title", context.path()), a.headers().get("revision"), body.toString());
    }
}
