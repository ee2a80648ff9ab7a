package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.SystemSolution;
import dev.plumb.present.SystemText;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * An unknown of a several-unknown solve as a reviewer checks it. The first unknown's entry shows
 * the system: its equations in symbols, the start values or brackets, each equation with the
 * solution put in and its residual, the method and the iterates; the others show their value and
 * point to the first.
 */
final class SystemBlock {
    /** More iterates than this are summarised. */
    private static final int STEPS_SHOWN = 24;

    private SystemBlock() {
    }

    static String html(Analysis a, Row.ValueRow v, Statement.SeekSystem k, ReportValues values, FormulaMath math) {
        Statement.Equations q = k.system();
        StringBuilder out = new StringBuilder();
        ShownValue root = values.shown(v.value(), v.display());
        if (k.index() > 0) {
            String leader = q.unknowns().get(0).text();
            out.append(Html.element("p", "solve-head", math.symbol(v.name()) + " is solved together with "
                + math.symbol(leader) + " (see " + math.symbol(leader) + ")"));
            out.append(Html.element("p", "root", math.symbol(v.name()) + " = " + math.inlineQuantity(root)));
            return out.toString();
        }
        List<String> symbols = new ArrayList<>();
        for (var u : q.unknowns()) symbols.add(math.symbol(u.text()));
        out.append(Html.element("p", "solve-head", String.join(", ", symbols) + " are solved together so that"));
        for (Statement.Equation e : q.equations()) out.append(Html.formula(math.equation(e.lhs(), e.rhs(), ValueSource.none())));
        List<String> from = new ArrayList<>();
        for (int j = 0; j < q.unknowns().size(); j++) {
            String name = math.symbol(q.unknowns().get(j).text());
            if (q.bracketed() && j < q.lows().size()) {
                from.add(name + " between " + math.inlineFormula(q.lows().get(j)) + " and " + math.inlineFormula(q.highs().get(j)));
            } else if (!q.bracketed() && j < q.starts().size()) {
                from.add(name + " from " + math.inlineFormula(q.starts().get(j)));
            }
        }
        out.append(Html.element("p", "solve-range", "started with " + String.join(", ", from)));
        out.append(Html.element("p", "root", math.symbol(v.name()) + " = " + math.inlineQuantity(root)));
        if (v.solution() == null || v.solution().system() == null) {
            return out.append(Html.element("p", "unknown", "No solution was found: see the findings.")).toString();
        }
        SystemSolution s = v.solution().system();
        List<String> residuals = SystemText.residuals(s);
        for (int i = 0; i < q.equations().size(); i++) {
            Statement.Equation e = q.equations().get(i);
            out.append(Html.formula(math.equation(e.lhs(), e.rhs(), values)));
            out.append(Html.element("p", "solve-summary", "residual " + Html.text(residuals.get(i))));
        }
        out.append(Html.element("p", "solve-summary", Html.text(s.iterations() + " iterations (" + s.method() + "), "
            + s.evaluations() + " evaluations of the equations")));
        out.append(steps(a, s));
        return out.toString();
    }

    private static String steps(Analysis a, SystemSolution s) {
        int sig = a.settings().significantFigures();
        StringBuilder head = new StringBuilder("<tr><th>#</th>");
        for (String u : s.unknowns()) head.append("<th>").append(Html.text(u)).append("</th>");
        for (int i = 0; i < s.residuals().size(); i++) head.append("<th>residual ").append(i + 1).append("</th>");
        head.append("</tr>");
        StringBuilder rows = new StringBuilder();
        List<SystemSolution.Iterate> record = s.record();
        int columns = 1 + s.unknowns().size() + s.residuals().size();
        for (int r = 0; r < record.size(); r++) {
            if (record.size() > STEPS_SHOWN && r == STEPS_SHOWN / 2) {
                rows.append("<tr><td colspan=\"").append(columns).append("\">… ").append(record.size() - STEPS_SHOWN)
                    .append(" more …</td></tr>");
                r = record.size() - STEPS_SHOWN / 2;
            }
            SystemSolution.Iterate it = record.get(r);
            rows.append("<tr><td>").append(it.n()).append("</td>");
            for (int j = 0; j < it.x().size(); j++) {
                rows.append("<td>").append(Html.text(SystemText.unknown(s, j, it.x().get(j), sig))).append("</td>");
            }
            for (int i = 0; i < it.residual().size(); i++) {
                rows.append("<td>").append(Html.text(SystemText.residual(it.residual().get(i),
                    s.residuals().get(i).dimension()))).append("</td>");
            }
            rows.append("</tr>");
        }
        return "<table class=\"steps\"><thead>" + head + "</thead><tbody>" + rows + "</tbody></table>";
    }
}
