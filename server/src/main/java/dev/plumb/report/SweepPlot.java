package dev.plumb.report;

import static dev.plumb.report.CurvePlot.BOTTOM;
import static dev.plumb.report.CurvePlot.LEFT;
import static dev.plumb.report.CurvePlot.RIGHT;
import static dev.plumb.report.CurvePlot.TOP;
import static dev.plumb.report.CurvePlot.WIDTH;

import dev.plumb.analysis.Row;
import dev.plumb.analysis.Value;
import dev.plumb.present.SweepText;
import dev.plumb.units.Unit;
import java.util.ArrayList;
import java.util.List;

/**
 * A sweep in the report: its table, and for each shown result an inline SVG plot against the
 * swept value (in a grid, one line per value of the second, named in a legend beside the plot). Each row is a point: filled where every check passes and every correlation is in
 * its range, an open ring where a correlation lies outside its range, a cross where a check fails
 * (shapes, not colours, so the marks survive black-and-white printing). Log axes where the values
 * span decades.
 */
final class SweepPlot {
    private static final int HEIGHT = 220;
    /** The width a grid's legend adds on the right. */
    private static final int LEGEND = 130;
    /** The dash patterns of a grid's lines, in turn: solid, dashed, dotted, dash-dot. */
    private static final String[] DASHES = {"", "6 3", "1.5 2.5", "6 2 1.5 2"};

    private SweepPlot() {
    }

    static String html(Row.SweepRow w, int digits) {
        StringBuilder out = new StringBuilder();
        out.append(Html.element("p", "sweep-title", Html.text(SweepText.title(w))));
        out.append(table(w, digits));
        List<Unit> units = SweepText.units(w);
        for (int i = 0; i < w.columns().size(); i++) {
            String svg = svg(w, i, units);
            if (svg != null) out.append(Html.element("figure", "plot", svg));
        }
        if (!w.lines().isEmpty()) {
            out.append(Html.element("p", "caption", Html.text("● every check passes and every correlation is inside its "
                + "range; ○ a correlation is outside its stated range; × a check fails.")));
        }
        return Html.element("div", "sweep", out.toString());
    }

    private static String table(Row.SweepRow w, int digits) {
        List<Unit> units = SweepText.units(w);
        StringBuilder rows = new StringBuilder("<tr>");
        for (String h : SweepText.header(w)) rows.append(Html.element("th", null, Html.text(h)));
        rows.append("</tr>");
        for (Row.SweepLine l : w.lines()) {
            String kind = l.anyFails() ? "fail" : !l.outside().isEmpty() ? "outside" : null;
            rows.append(kind == null ? "<tr>" : "<tr class=\"" + kind + "\">");
            for (String c : SweepText.cells(w, l, units, digits)) rows.append(Html.element("td", null, Html.text(c)));
            rows.append("</tr>");
        }
        return Html.element("table", "sweep-table", rows.toString());
    }

    /** The plot of one shown result; null when fewer than two of its values are known. */
    static String svg(Row.SweepRow w, int column, List<Unit> units) {
        List<double[]> points = new ArrayList<>();
        List<Row.SweepLine> lines = new ArrayList<>();
        for (Row.SweepLine l : w.lines()) {
            Value y = l.results().get(column);
            if (y.known() && Double.isFinite(y.si())) {
                points.add(new double[] {l.given().si(), y.si()});
                lines.add(l);
            }
        }
        if (points.size() < 2) return null;
        double x0 = Double.POSITIVE_INFINITY, x1 = Double.NEGATIVE_INFINITY;
        double y0 = Double.POSITIVE_INFINITY, y1 = Double.NEGATIVE_INFINITY;
        for (double[] p : points) {
            x0 = Math.min(x0, p[0]);
            x1 = Math.max(x1, p[0]);
            y0 = Math.min(y0, p[1]);
            y1 = Math.max(y1, p[1]);
        }
        if (x0 == x1) return null;
        if (y0 == y1) {
            y1 += Math.abs(y1) * 0.1 + 1e-12;
            y0 -= Math.abs(y0) * 0.1 + 1e-12;
        }
        boolean xLog = x0 > 0 && x1 / x0 > 30;
        boolean yLog = y0 > 0 && y1 / y0 > 30;
        CurvePlot.Axis xa = new CurvePlot.Axis(x0, x1, xLog, LEFT, WIDTH - RIGHT);
        CurvePlot.Axis ya = new CurvePlot.Axis(y0, y1, yLog, HEIGHT - BOTTOM, TOP);
        Unit xUnit = units.get(0);
        Unit yUnit = units.get(column + 1);
        String yName = w.columns().get(column).name();
        StringBuilder s = new StringBuilder();
        // A grid's legend stands to the right of the plot, where no line can run under it.
        int width = WIDTH + (w.across() == null ? 0 : LEGEND);
        s.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"sweep-plot\" viewBox=\"0 0 ").append(width).append(' ')
            .append(HEIGHT).append("\" width=\"").append(width).append("\" height=\"").append(HEIGHT)
            .append("\" role=\"img\" aria-label=\"").append(Html.text(yName + " against " + w.varied())).append("\">");
        s.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"").append(WIDTH - LEFT - RIGHT)
            .append("\" height=\"").append(HEIGHT - BOTTOM - TOP).append("\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>");
        for (double t : xa.ticks()) {
            s.append(CurvePlot.line(xa.at(t), HEIGHT - BOTTOM, xa.at(t), HEIGHT - BOTTOM + 4));
            s.append(CurvePlot.text(xa.at(t), HEIGHT - BOTTOM + 15, "middle", CurvePlot.number(from(xUnit, t))));
        }
        for (double t : ya.ticks()) {
            s.append(CurvePlot.line(LEFT - 4, ya.at(t), LEFT, ya.at(t)));
            s.append(CurvePlot.text(LEFT - 6, ya.at(t) + 3.5, "end", CurvePlot.number(from(yUnit, t))));
        }
        s.append(CurvePlot.text((LEFT + WIDTH - RIGHT) / 2.0, HEIGHT - 6, "middle", label(w.varied(), xUnit)));
        s.append("<text x=\"12\" y=\"").append(CurvePlot.fmt((TOP + HEIGHT - BOTTOM) / 2.0)).append("\" text-anchor=\"middle\" "
            + "transform=\"rotate(-90 12 ").append(CurvePlot.fmt((TOP + HEIGHT - BOTTOM) / 2.0)).append(")\">")
            .append(Html.text(label(yName, yUnit))).append("</text>");
        // One line per value of a grid's second value (one line in all for a one-way sweep), told
        // apart by its dashes and named at its end: shapes, not colours, survive printing.
        java.util.Map<Double, List<double[]>> runs = new java.util.LinkedHashMap<>();
        java.util.Map<Double, Value> acrossOf = new java.util.HashMap<>();
        for (int i = 0; i < points.size(); i++) {
            Value a = lines.get(i).across();
            double key = a == null ? Double.NaN : a.si();
            runs.computeIfAbsent(key, k -> new ArrayList<>()).add(points.get(i));
            if (a != null) acrossOf.put(key, a);
        }
        Unit acrossUnit = SweepText.acrossUnit(w, units);
        int k = 0;
        for (var e : runs.entrySet()) {
            List<String> run = new ArrayList<>();
            for (double[] p : e.getValue()) run.add(CurvePlot.fmt(xa.at(p[0])) + "," + CurvePlot.fmt(ya.at(p[1])));
            String dashes = DASHES[k++ % DASHES.length];
            s.append("<polyline class=\"result\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"1.4\"")
                .append(dashes.isEmpty() ? "" : " stroke-dasharray=\"" + dashes + "\"").append(" points=\"")
                .append(String.join(" ", run)).append("\"/>");
            Value a = acrossOf.get(e.getKey());
            if (a != null) {
                double y = TOP + 8 + 14 * (k - 1);
                double x = WIDTH - RIGHT + 10;
                s.append("<line class=\"legend\" x1=\"").append(CurvePlot.fmt(x)).append("\" y1=\"").append(CurvePlot.fmt(y))
                    .append("\" x2=\"").append(CurvePlot.fmt(x + 22)).append("\" y2=\"").append(CurvePlot.fmt(y))
                    .append("\" stroke=\"#1b1b1b\" stroke-width=\"1.4\"")
                    .append(dashes.isEmpty() ? "" : " stroke-dasharray=\"" + dashes + "\"").append("/>");
                s.append(CurvePlot.text(x + 26, y + 3.5, "start", w.across().name() + " = "
                    + SweepText.number(a, acrossUnit, 3) + (acrossUnit == null || acrossUnit.symbol().isEmpty() ? ""
                    : " " + acrossUnit.symbol())));
            }
        }
        for (int i = 0; i < points.size(); i++) s.append(mark(lines.get(i), xa.at(points.get(i)[0]), ya.at(points.get(i)[1])));
        return s.append("</svg>").toString();
    }

    /** A row's point: ● fine, ○ outside a range, × a check fails (both when both). */
    private static String mark(Row.SweepLine l, double x, double y) {
        StringBuilder m = new StringBuilder();
        if (!l.outside().isEmpty()) {
            m.append("<circle class=\"point outside\" cx=\"").append(CurvePlot.fmt(x)).append("\" cy=\"").append(CurvePlot.fmt(y))
                .append("\" r=\"5\" fill=\"#fff\" stroke=\"#8a1c1c\" stroke-width=\"1.6\"/>");
        }
        if (l.anyFails()) {
            m.append("<g class=\"point fails\">")
                .append(CurvePlot.line(x - 5, y - 5, x + 5, y + 5).replace("#1b1b1b", "#8a1c1c").replace("0.8\"", "2\""))
                .append(CurvePlot.line(x - 5, y + 5, x + 5, y - 5).replace("#1b1b1b", "#8a1c1c").replace("0.8\"", "2\""))
                .append("</g>");
        }
        if (m.length() == 0) {
            m.append("<circle class=\"point inside\" cx=\"").append(CurvePlot.fmt(x)).append("\" cy=\"").append(CurvePlot.fmt(y))
                .append("\" r=\"3\" fill=\"#1b1b1b\"/>");
        }
        return m.toString();
    }

    private static double from(Unit unit, double si) {
        return unit == null ? si : unit.fromSi(si);
    }

    private static String label(String name, Unit unit) {
        return unit == null || unit.symbol().isEmpty() ? name : name + " in " + unit.symbol();
    }
}
