package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.diagnostics.Diagnostic;
import java.util.List;

/** Every open finding with its place, then the findings a reviewer accepted, each with the reason. */
final class FindingsBlock {
    private FindingsBlock() {
    }

    static String html(Analysis a, List<Diagnostic> findings) {
        List<Diagnostic> open = findings.stream().filter(d -> !d.isAccepted()).toList();
        List<Diagnostic> accepted = findings.stream().filter(Diagnostic::isAccepted).toList();
        StringBuilder out = new StringBuilder("<section class=\"findings\"><h2>Findings</h2>");
        if (open.isEmpty()) out.append(Html.element("p", null, "No open findings."));
        else out.append(list(a, open, false));
        if (!accepted.isEmpty()) {
            out.append(Html.element("h3", null, "Accepted by the reviewer")).append(list(a, accepted, true));
        }
        return out.append("</section>").toString();
    }

    private static String list(Analysis a, List<Diagnostic> ds, boolean withReason) {
        StringBuilder out = new StringBuilder("<ul>");
        for (Diagnostic d : ds) {
            String where = "line " + a.lines().line(d.span().start());
            String severity = d.severity().name().toLowerCase(java.util.Locale.ROOT);
            out.append("<li class=\"").append(severity).append("\">")
                .append(Html.element("span", "where", Html.text(where))).append(' ')
                .append(Html.element("span", "severity", Html.text(severity))).append(' ')
                .append(Html.element("code", null, Html.text(d.code().id()))).append(": ")
                .append(Html.text(d.message()));
            if (withReason) out.append(Html.element("p", "reason", "Reason: " + Html.text(d.accepted())));
            out.append("</li>");
        }
        return out.append("</ul>").toString();
    }
}
