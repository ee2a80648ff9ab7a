package dev.plumb.report;

import static dev.plumb.report.CurvePlot.BOTTOM;
import static dev.plumb.report.CurvePlot.LEFT;
import static dev.plumb.report.CurvePlot.RIGHT;
import static dev.plumb.report.CurvePlot.TOP;
import static dev.plumb.report.CurvePlot.WIDTH;

import dev.plumb.analysis.Trajectory;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * One state of a motion against time, as inline SVG: the trajectory sampled by the engine, linear
 * axes with round ticks in the units the values are shown in, and the stop marked with a dot.
 */
final class TrajectoryPlot {
    private static final int HEIGHT = 200;

    private TrajectoryPlot() {
    }

    /** State {@code j} (1 the first state) against the time. */
    static String svg(Trajectory t, int j) {
        double[] ts = t.plotTimes();
        double[] ys = new double[ts.length];
        for (int i = 0; i < ts.length; i++) ys[i] = t.plotRows()[i][j - 1];
        double yMin = Double.POSITIVE_INFINITY;
        double yMax = Double.NEGATIVE_INFINITY;
        for (double y : ys) {
            if (Double.isFinite(y)) {
                yMin = Math.min(yMin, y);
                yMax = Math.max(yMax, y);
            }
        }
        if (!(yMax > yMin)) {
            double pad = Math.abs(yMax) * 0.1 + 1e-12;
            yMax += pad;
            yMin -= pad;
        }
        double end = ts[ts.length - 1] > 0 ? ts[ts.length - 1] : 1;
        CurvePlot.Axis xa = new CurvePlot.Axis(0, end, false, LEFT, WIDTH - RIGHT);
        CurvePlot.Axis ya = new CurvePlot.Axis(yMin, yMax, false, HEIGHT - BOTTOM, TOP);
        Unit tUnit = t.units().get(0);
        Unit yUnit = t.units().get(j);
        String name = t.names().get(j);
        String time = t.names().get(0);
        StringBuilder s = new StringBuilder();
        s.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"trajectory\" viewBox=\"0 0 ").append(WIDTH).append(' ')
            .append(HEIGHT).append("\" width=\"").append(WIDTH).append("\" height=\"").append(HEIGHT)
            .append("\" role=\"img\" aria-label=\"").append(Html.text(name + " against " + time)).append("\">");
        s.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"").append(WIDTH - LEFT - RIGHT)
            .append("\" height=\"").append(HEIGHT - BOTTOM - TOP).append("\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>");
        for (double tick : xa.ticks()) {
            s.append(line(xa.at(tick), HEIGHT - BOTTOM, xa.at(tick), HEIGHT - BOTTOM + 4));
            s.append(text(xa.at(tick), HEIGHT - BOTTOM + 15, "middle", number(tUnit.fromSi(tick))));
        }
        for (double tick : ya.ticks()) {
            s.append(line(LEFT - 4, ya.at(tick), LEFT, ya.at(tick)));
            s.append(text(LEFT - 6, ya.at(tick) + 3.5, "end", number(yUnit.fromSi(tick))));
        }
        s.append(text((LEFT + WIDTH - RIGHT) / 2.0, HEIGHT - 6, "middle", time + (tUnit.symbol().isEmpty() ? "" : " in "
            + tUnit.symbol())));
        double mid = (TOP + HEIGHT - BOTTOM) / 2.0;
        s.append("<text x=\"12\" y=\"").append(fmt(mid)).append("\" text-anchor=\"middle\" transform=\"rotate(-90 12 ")
            .append(fmt(mid)).append(")\">").append(Html.text(name + (yUnit.symbol().isEmpty() ? "" : " in " + yUnit.symbol())))
            .append("</text>");
        List<String> points = new ArrayList<>();
        for (int i = 0; i < ts.length; i++) {
            if (Double.isFinite(ys[i])) points.add(fmt(xa.at(ts[i])) + "," + fmt(ya.at(ys[i])));
        }
        s.append("<polyline class=\"state\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"1.6\" points=\"")
            .append(String.join(" ", points)).append("\"/>");
        double lastY = ys[ys.length - 1];
        if (Double.isFinite(lastY)) {
            s.append("<circle class=\"stop\" cx=\"").append(fmt(xa.at(ts[ts.length - 1]))).append("\" cy=\"")
                .append(fmt(ya.at(lastY))).append("\" r=\"4\" fill=\"#1b1b1b\"/>");
        }
        return s.append("</svg>").toString();
    }

    private static String line(double x1, double y1, double x2, double y2) {
        return "<line x1=\"" + fmt(x1) + "\" y1=\"" + fmt(y1) + "\" x2=\"" + fmt(x2) + "\" y2=\"" + fmt(y2)
            + "\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>";
    }

    private static String text(double x, double y, String anchor, String words) {
        return "<text x=\"" + fmt(x) + "\" y=\"" + fmt(y) + "\" text-anchor=\"" + anchor + "\">" + Html.text(words) + "</text>";
    }

    private static String number(double v) {
        return QuantityFormat.number(v, 3);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }
}
