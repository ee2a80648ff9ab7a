package dev.plumb.report;

/**
 * The page around a report's body: inline CSS of our own, print first (A4 or US Letter, the
 * calc's title and revision in the top margin, page numbers at the foot), no scripts, no fetches.
 */
final class ReportPage {
    private ReportPage() {
    }

    static String page(String title, String revision, String body) {
        String margin = cssString(title) ;
        String rev = revision == null || revision.isBlank() ? "" : cssString("Revision " + revision);
        return "<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">"
            + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">"
            + "<meta name=\"generator\" content=\"Plumb\">"
            + "<title>" + Html.text(title) + "</title><style>" + STYLE
            + "@page { @top-left { content: " + margin + "; font: 8pt sans-serif; color: #5b5b5b; } @top-right { content: "
            + (rev.isEmpty() ? "\"\"" : rev) + "; font: 8pt sans-serif; color: #5b5b5b; } }</style></head><body><main>" + body + "</main></body></html>\n";
    }

    /** A CSS string literal: quotes, backslashes, '<', '>' and hidden characters escaped (the text sits inside a style element). */
    static String cssString(String s) {
        StringBuilder out = new StringBuilder("\"");
        s.codePoints().forEach(cp -> {
            if (cp == '"' || cp == '\\' || cp == '<' || cp == '>' || XmlText.hidden(cp)) {
                out.append('\\').append(Integer.toHexString(cp)).append(' ');
            } else {
                out.appendCodePoint(cp);
            }
        });
        return out.append('"').toString();
    }

    private static final String STYLE = """
        :root { --ink: #1b1b1b; --quiet: #5b5b5b; --rule: #c9c9c9; --bad: #8a1c1c; --good: #1d5c2e; }
        @page { margin: 22mm 18mm 20mm 18mm;
          @bottom-right { content: "page " counter(page) " of " counter(pages); font: 8pt sans-serif; color: #5b5b5b; }
          @bottom-left { content: "Plumb calc report"; font: 8pt sans-serif; color: #5b5b5b; } }
        @page :left { margin-left: 18mm; }
        html { color: var(--ink); background: #fff; }
        body { margin: 0; font: 10.5pt/1.45 "DejaVu Sans", "Helvetica Neue", Arial, sans-serif; }
        main { max-width: 180mm; margin: 0 auto; padding: 12mm 0; }
        math { font-family: "STIX Two Math", "Cambria Math", "Latin Modern Math", "DejaVu Math TeX Gyre", math; }
        /* Formulas are set flush left in their own line (block math would be centred): a reviewer reads down the left edge. */
        math[display="block"] { display: math; math-style: normal; }
        .formula { margin: 0.3em 0 0.3em 1.2em; }
        h1 { font-size: 17pt; margin: 0 0 0.4em; font-weight: 600; }
        h2 { font-size: 12.5pt; margin: 1.4em 0 0.5em; padding-bottom: 0.15em; border-bottom: 1.5px solid var(--ink);
          break-after: avoid; }
        h3 { font-size: 10.5pt; margin: 0.9em 0 0.3em; break-after: avoid; }
        .title-block dl { display: grid; grid-template-columns: max-content 1fr; gap: 0.1em 1.2em; margin: 0 0 0.6em; }
        .title-block dt { color: var(--quiet); }
        .title-block dd { margin: 0; }
        .status { font-weight: 600; padding: 0.3em 0; border-top: 1px solid var(--rule); border-bottom: 1px solid var(--rule); }
        .status.open::before { content: "⚠ "; }
        .status.clean::before { content: "✓ "; }
        .narrative { margin: 0.5em 0; }
        .inputs-here { margin: 0.4em 0; }
        .changes { border: 1.5px solid var(--ink); padding: 0 0.8em 0.4em; margin: 1em 0; break-inside: avoid; }
        .change { font-weight: 600; white-space: nowrap; }
        .changed-from { margin: 0.1em 0 0 1.2em; }
        .definition.changed { border-left: 4px double var(--ink); }
        .values-used, .root { margin: 0.2em 0 0.2em 1.2em; }
        table { border-collapse: collapse; width: 100%; font-size: 9.5pt; }
        th { text-align: left; font-weight: 600; border-bottom: 1px solid var(--ink); padding: 0.2em 0.5em 0.2em 0; }
        td { border-bottom: 1px solid var(--rule); padding: 0.25em 0.5em 0.25em 0; vertical-align: baseline; }
        tr { break-inside: avoid; }
        .from-file { color: var(--quiet); font-style: italic; }
        .definition, .check, .function { break-inside: avoid; margin: 0.6em 0 0.8em; padding-left: 0.6em;
          border-left: 2px solid var(--rule); }
        .meta, .detail, .note, .solve-range, .solve-summary { color: var(--quiet); font-size: 9.5pt; margin: 0.15em 0 0 1.2em; }
        .unknown, .broken { color: var(--bad); font-weight: 600; margin: 0.2em 0 0 1.2em; }
        .tag { font-variant: small-caps; }
        .steps { width: auto; margin: 0.3em 0 0 1.2em; font-size: 8.5pt; }
        .check .mark { font-weight: 700; }
        .check.pass { border-left-color: var(--good); }
        .check.fail, .check.unjudged { border-left: 4px double var(--bad); }
        .check.fail .mark, .check.unjudged .mark { color: var(--bad); }
        .library .outside { color: var(--bad); font-weight: 600; }
        .library ul.calls { list-style: none; padding-left: 0; }
        .plot { margin: 0.3em 0 0.8em; break-inside: avoid; color: var(--ink); font-weight: normal; }
        .plot svg { font: 9px "DejaVu Sans", Arial, sans-serif; max-width: 100%; height: auto; }
        .plot figcaption { font-size: 9pt; color: var(--quiet); }
        .findings li { margin: 0.25em 0; }
        .findings .where, .findings .severity { font-weight: 600; }
        .findings .reason { margin: 0.1em 0 0; color: var(--quiet); }
        .cite { color: inherit; text-decoration: none; }
        .caution { margin-top: 2em; padding-top: 0.5em; border-top: 1.5px solid var(--ink); font-size: 9.5pt; }
        code { font-family: "DejaVu Sans Mono", monospace; font-size: 0.92em; }
        @media screen { body { background: #f4f4f2; } main { background: #fff; padding: 14mm 16mm; margin: 8mm auto;
          box-shadow: 0 0 0 1px #ddd; } }
        @media print { main { max-width: none; padding: 0; } a { color: inherit; text-decoration: none; } }
        """;
}
