package dev.plumb.report;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Row;
import dev.plumb.analysis.Trajectory;
import dev.plumb.present.TrajectoryText;
import dev.plumb.syntax.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * A motion as a reviewer checks it. The time's entry shows the whole motion: each state's start
 * value and rate in symbols, the stop condition, where it stopped, how the correlations' arguments
 * ranged, the trajectory table and a plot of each drawn state (all, unless `draw` chose) against time; each state's entry shows
 * its value at the stop and points to the time's.
 */
final class MotionBlock {
    private MotionBlock() {
    }

    static String html(Analysis a, Row.ValueRow v, Statement.Evolve k, ReportValues values, FormulaMath math) {
        Statement.Motion m = k.motion();
        StringBuilder out = new StringBuilder();
        ShownValue here = values.shown(v.value(), v.display());
        String time = math.symbol(m.time().text());
        if (k.index() > 0) {
            out.append(Html.element("p", "solve-head", math.symbol(v.name()) + " is a state of the motion over " + time
                + " (see " + time + "), at its stop"));
            out.append(Html.element("p", "root", math.symbol(v.name()) + " = " + math.inlineQuantity(here)));
            return out.toString();
        }
        List<String> states = new ArrayList<>();
        for (var s : m.states()) states.add(math.symbol(s.text()));
        out.append(Html.element("p", "solve-head", "The motion of " + String.join(", ", states) + " over " + time
            + ", from " + time + " = 0:"));
        for (int j = 0; j < m.states().size() && j < m.starts().size() && j < m.rates().size(); j++) {
            String s = math.symbol(m.states().get(j).text());
            out.append(Html.element("p", "rate", s + " starts at " + math.inlineFormula(m.starts().get(j)) + "; d" + s + "/d"
                + time + " = " + math.inlineFormula(m.rates().get(j))));
        }
        out.append(Html.element("p", "solve-range", "until " + math.inlineFormula(m.stopLeft()) + " "
            + Html.text(shown(m.stop())) + " " + math.inlineFormula(m.stopRight())));
        out.append(Html.element("p", "root", time + " = " + math.inlineQuantity(here)));
        Trajectory t = a.trajectory(v.name());
        if (t == null) return out.append(Html.element("p", "unknown", "The motion did not run to its stop: see the findings."))
            .toString();
        out.append(Html.element("p", "solve-summary", Html.text(TrajectoryText.summary(t) + " (Dormand–Prince 8(5,3), "
            + t.evaluations() + " evaluations of the rates)")));
        for (String visited : t.visited()) out.append(Html.element("p", "visited", Html.text("over the motion, " + visited)));
        out.append(table(a, t));
        for (int j : t.drawn()) {
            out.append("<figure class=\"plot\">").append(TrajectoryPlot.svg(t, j)).append("<figcaption>")
                .append(Html.text(t.names().get(j) + " against " + t.names().get(0) + "; the dot is the stop."))
                .append("</figcaption></figure>");
        }
        return out.toString();
    }

    /** The comparison as typeset: ≥ and ≤ rather than their ASCII spellings. */
    private static String shown(dev.plumb.syntax.Comparator c) {
        return switch (c) {
            case GE -> "≥";
            case LE -> "≤";
            case EQ -> "=";
            default -> c.symbol();
        };
    }

    private static String table(Analysis a, Trajectory t) {
        int sig = a.settings().significantFigures();
        StringBuilder head = new StringBuilder("<tr>");
        for (String h : TrajectoryText.heads(t)) head.append("<th>").append(Html.text(h)).append("</th>");
        head.append("</tr>");
        StringBuilder rows = new StringBuilder();
        for (int i = 0; i < t.times().length; i++) {
            rows.append("<tr>");
            for (int j = 0; j < t.names().size(); j++) {
                rows.append("<td>").append(Html.text(TrajectoryText.cell(t, i, j, sig))).append("</td>");
            }
            rows.append("</tr>");
        }
        return "<table class=\"trajectory\"><thead>" + head + "</thead><tbody>" + rows + "</tbody></table>";
    }
}
