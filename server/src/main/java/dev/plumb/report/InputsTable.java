package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.present.UsedValues;

/** Every input of the calc in one table — its own and those of the files it uses — with source notes and tags. */
final class InputsTable {
    private InputsTable() {
    }

    static String html(Analysis a, ReportValues values, FormulaMath math, CalcReport.Changes changes) {
        StringBuilder rows = new StringBuilder();
        for (Row r : a.rows()) {
            if (r instanceof Row.ValueRow v && v.input()) {
                rows.append(row(math, v.name(), v.value(), values.shown(v.value(), v.display()),
                    dev.plumb.present.ValueText.spread(v), v.note(), v.basis(), null, ChangesBlock.of(changes, v.name())));
            }
        }
        for (UsedValues.Used u : UsedValues.of(a)) {
            rows.append(row(math, u.name(), u.binding().value(), values.shown(u.binding().value(), u.binding().display()), "",
                u.binding().note(), u.binding().basis(), UsedValues.relative(a, u.file()), ChangesBlock.of(changes, u.name())));
        }
        if (rows.length() == 0) return "";
        return "<section class=\"inputs\"><h2>Input values and their sources</h2><table><thead><tr><th>Symbol</th><th>Value</th>"
            + "<th>Source</th><th>Tag</th></tr></thead><tbody>" + rows + "</tbody></table></section>";
    }

    /** @param spread the input's tolerance as shown beside its value ("" for none) */
    private static String row(FormulaMath math, String name, dev.plumb.analysis.Value v, ShownValue value, String spread,
                              String note, String tag, String file, String change) {
        String source = Html.text(note == null ? "" : note)
            + (file == null ? "" : (note == null ? "" : " ") + Html.element("span", "from-file", "from " + Html.text(file)));
        return "<tr" + (change == null ? "" : " class=\"changed\"") + Data.of(name, v, value) + "><td class=\"symbol\">"
            + math.symbol(name) + "</td><td class=\"value\">" + math.inlineQuantity(value) + Html.text(spread)
            + ChangesBlock.mark(change)
            + "</td><td class=\"source\">" + source + "</td><td class=\"tag\">" + Html.text(tag == null ? "" : tag) + "</td></tr>";
    }
}
