package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Severity;
import java.util.ArrayList;
import java.util.List;

/** The head of the page: what the calc is, who wrote and checked it, where it comes from, and its state. */
final class TitleBlock {
    private TitleBlock() {
    }

    static String html(Analysis a, List<Diagnostic> findings, CalcReport.Context context) {
        StringBuilder out = new StringBuilder("<header class=\"title-block\">");
        out.append(Html.element("h1", null, Html.text(a.headers().getOrDefault("title", context.path()))));
        out.append("<dl>");
        field(out, "Author", a.headers().get("author"));
        field(out, "Reviewer", a.headers().get("reviewer"));
        field(out, "Revision", a.headers().get("revision"));
        field(out, "File", context.path());
        field(out, "Source", context.revision() == null ? "not in a git repository" : context.revision());
        field(out, "Report made", context.made());
        field(out, "Laminar–turbulent transition", a.headers().get("transition"));
        out.append("</dl>");
        out.append(Html.element("p", "status " + (clean(a, findings) ? "clean" : "open"), Html.text(status(a, findings))));
        return out.append("</header>").toString();
    }

    private static void field(StringBuilder out, String label, String value) {
        if (value == null || value.isBlank()) return;
        out.append("<dt>").append(Html.text(label)).append("</dt><dd>").append(Html.text(value)).append("</dd>");
    }

    /** True when every check passed and no finding is open but hints. */
    static boolean clean(Analysis a, List<Diagnostic> findings) {
        boolean checksPass = a.rows().stream().noneMatch(r -> r instanceof Row.CheckRow c && c.verdict() != Row.Verdict.PASSED);
        boolean open = findings.stream().anyMatch(d -> d.accepted().isEmpty() && d.severity() != Severity.HINT);
        return checksPass && !open;
    }

    /** "12 checks: 11 passed, 1 failed, 0 not evaluated · findings: 1 error, 2 warnings open; 1 accepted". */
    static String status(Analysis a, List<Diagnostic> findings) {
        int passed = 0;
        int failed = 0;
        int unjudged = 0;
        for (Row r : a.rows()) {
            if (!(r instanceof Row.CheckRow c)) continue;
            if (c.verdict() == Row.Verdict.PASSED) passed++;
            else if (c.passed() == Boolean.FALSE) failed++;
            else unjudged++;
        }
        int errors = 0;
        int warnings = 0;
        int hints = 0;
        int accepted = 0;
        for (Diagnostic d : findings) {
            if (!d.accepted().isEmpty()) accepted++;
            else if (d.severity() == Severity.ERROR) errors++;
            else if (d.severity() == Severity.WARNING) warnings++;
            else hints++;
        }
        List<String> open = new ArrayList<>();
        open.add(count(errors, "error"));
        open.add(count(warnings, "warning"));
        open.add(count(hints, "hint"));
        return count(passed + failed + unjudged, "check") + ": " + passed + " passed, " + failed + " failed, " + unjudged
            + " not evaluated · findings open: " + String.join(", ", open) + " · accepted: " + accepted;
    }

    private static String count(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }
}
