package dev.plumb.report;

import java.util.List;

/** The contents page of a folder's reports: each calc's title, its state and a link to its page. */
public final class ContentsPage {
    /** One calc: the link to its report (relative to the contents page), its title and status line. */
    public record Entry(String link, String title, String path, String status, boolean clean) {
    }

    private ContentsPage() {
    }

    public static String html(String heading, List<Entry> entries) {
        StringBuilder rows = new StringBuilder();
        for (Entry e : entries) {
            rows.append("<tr><td>").append(e.clean() ? "✓" : "⚠").append("</td><td><a href=\"")
                .append(Html.text(e.link().replace("\"", "%22"))).append("\">").append(Html.text(e.title()))
                .append("</a><br><code>").append(Html.text(e.path())).append("</code></td><td>")
                .append(Html.text(e.status())).append("</td></tr>");
        }
        String body = "<header class=\"title-block\">" + Html.element("h1", null, Html.text(heading)) + "</header>"
            + "<section><h2>Contents</h2><table><thead><tr><th></th><th>Calc</th><th>State</th></tr></thead><tbody>" + rows
            + "</tbody></table></section>" + Html.element("footer", "caution", Html.element("p", null,
                Html.text(dev.plumb.present.Caution.TEXT)));
        return ReportPage.page(heading, null, body);
    }

    /** The entry of one calc's report. */
    public static Entry entry(dev.plumb.analysis.Analysis a, List<dev.plumb.diagnostics.Diagnostic> findings, String link,
                              String path) {
        return new Entry(link, a.headers().getOrDefault("title", path), path, TitleBlock.status(a, findings),
            TitleBlock.clean(a, findings));
    }
}
