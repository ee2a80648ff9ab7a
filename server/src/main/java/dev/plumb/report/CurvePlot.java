package dev.plumb.report;

import dev.plumb.analysis.EntryCurve;
import dev.plumb.analysis.Value;
import dev.plumb.present.ValueText;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.QuantityFormat;
import dev.plumb.units.Unit;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A library entry drawn around its call, as inline SVG: the curve, its stated range as a hatched
 * band (it survives black-and-white printing), and the call's point — a filled dot inside the
 * range, an open ring with a cross outside it — with log axes where the range spans decades.
 */
final class CurvePlot {
    /** The report's plots share one frame: width, and the margins around the plotting area (in SVG units). */
    static final int WIDTH = 420;
    static final int LEFT = 62;
    static final int RIGHT = 14;
    static final int TOP = 12;
    static final int BOTTOM = 40;
    private static final int HEIGHT = 220;

    private CurvePlot() {
    }

    static String svg(EntryCurve c) {
        Unit xUnit = c.xUnit() != null ? c.xUnit() : DisplayUnits.defaultFor(c.xDimension());
        Unit yUnit = DisplayUnits.defaultFor(c.yDimension());
        double x0 = c.xs()[0];
        double x1 = c.xs()[c.xs().length - 1];
        double yMin = Double.POSITIVE_INFINITY;
        double yMax = Double.NEGATIVE_INFINITY;
        for (double y : c.ys()) {
            if (Double.isFinite(y)) {
                yMin = Math.min(yMin, y);
                yMax = Math.max(yMax, y);
            }
        }
        yMin = Math.min(yMin, c.y());
        yMax = Math.max(yMax, c.y());
        boolean yLog = yMin > 0 && yMax / yMin > 30;
        if (yMax == yMin) {
            yMax += Math.abs(yMax) * 0.1 + 1e-12;
            yMin -= Math.abs(yMin) * 0.1 + 1e-12;
        }
        Axis xa = new Axis(x0, x1, c.logarithmic(), LEFT, WIDTH - RIGHT);
        Axis ya = new Axis(yMin, yMax, yLog, HEIGHT - BOTTOM, TOP);
        StringBuilder s = new StringBuilder();
        s.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"curve\" viewBox=\"0 0 ").append(WIDTH).append(' ')
            .append(HEIGHT).append("\" width=\"").append(WIDTH).append("\" height=\"").append(HEIGHT)
            .append("\" role=\"img\" aria-label=\"").append(Html.text(c.entry() + " against " + c.parameter())).append("\">");
        s.append("<defs><pattern id=\"hatch\" width=\"6\" height=\"6\" patternUnits=\"userSpaceOnUse\" "
            + "patternTransform=\"rotate(45)\"><line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"6\" stroke=\"#b8b8b8\" "
            + "stroke-width=\"2\"/></pattern></defs>");
        double bandFrom = Double.isNaN(c.low()) ? x0 : Math.max(c.low(), x0);
        double bandTo = Double.isNaN(c.high()) ? x1 : Math.min(c.high(), x1);
        s.append(rect(xa.at(bandFrom), TOP, xa.at(bandTo) - xa.at(bandFrom), HEIGHT - BOTTOM - TOP, "band"));
        s.append("<rect x=\"").append(LEFT).append("\" y=\"").append(TOP).append("\" width=\"").append(WIDTH - LEFT - RIGHT)
            .append("\" height=\"").append(HEIGHT - BOTTOM - TOP).append("\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>");
        for (double t : xa.ticks()) {
            s.append(line(xa.at(t), HEIGHT - BOTTOM, xa.at(t), HEIGHT - BOTTOM + 4));
            s.append(text(xa.at(t), HEIGHT - BOTTOM + 15, "middle", number(xUnit.fromSi(t))));
        }
        for (double t : ya.ticks()) {
            s.append(line(LEFT - 4, ya.at(t), LEFT, ya.at(t)));
            s.append(text(LEFT - 6, ya.at(t) + 3.5, "end", number(yUnit.fromSi(t))));
        }
        s.append(text((LEFT + WIDTH - RIGHT) / 2.0, HEIGHT - 6, "middle", c.parameter()
            + (xUnit.symbol().isEmpty() ? "" : " in " + xUnit.symbol())));
        s.append("<text x=\"12\" y=\"").append(fmt((TOP + HEIGHT - BOTTOM) / 2.0)).append("\" text-anchor=\"middle\" "
            + "transform=\"rotate(-90 12 ").append(fmt((TOP + HEIGHT - BOTTOM) / 2.0)).append(")\">")
            .append(Html.text(c.entry() + (yUnit.symbol().isEmpty() ? "" : " in " + yUnit.symbol()))).append("</text>");
        s.append(polyline(c, xa, ya));
        double px = xa.at(c.x());
        double py = ya.at(c.y());
        if (c.inside()) {
            s.append("<circle class=\"point inside\" cx=\"").append(fmt(px)).append("\" cy=\"").append(fmt(py))
                .append("\" r=\"4.5\" fill=\"#1b1b1b\"/>");
        } else {
            s.append("<g class=\"point outside\"><circle cx=\"").append(fmt(px)).append("\" cy=\"").append(fmt(py))
                .append("\" r=\"6\" fill=\"#fff\" stroke=\"#8a1c1c\" stroke-width=\"2\"/>")
                .append(line(px - 4, py - 4, px + 4, py + 4).replace("#1b1b1b", "#8a1c1c"))
                .append(line(px - 4, py + 4, px + 4, py - 4).replace("#1b1b1b", "#8a1c1c")).append("</g>");
        }
        return s.append("</svg>").toString();
    }

    /** The words under a plot: where the call's point sits. */
    static String caption(EntryCurve c) {
        Unit xUnit = c.xUnit() != null ? c.xUnit() : DisplayUnits.defaultFor(c.xDimension());
        String at = c.parameter() + " = " + ValueText.of(Value.of(c.x(), c.xDimension()), xUnit, 4);
        String range = (Double.isNaN(c.low()) ? "" : number(xUnit.fromSi(c.low())) + " ≤ ") + c.parameter()
            + (Double.isNaN(c.high()) ? "" : " ≤ " + number(xUnit.fromSi(c.high())));
        return "At this call " + at + (c.inside() ? ": inside the stated range " : ": OUTSIDE the stated range ") + range
            + " (hatched).";
    }

    private static String polyline(EntryCurve c, Axis xa, Axis ya) {
        StringBuilder out = new StringBuilder();
        List<String> run = new ArrayList<>();
        for (int i = 0; i <= c.xs().length; i++) {
            boolean ok = i < c.xs().length && Double.isFinite(c.ys()[i]) && (!ya.log || c.ys()[i] > 0);
            if (ok) {
                run.add(fmt(xa.at(c.xs()[i])) + "," + fmt(ya.at(c.ys()[i])));
            } else if (!run.isEmpty()) {
                out.append("<polyline class=\"entry\" fill=\"none\" stroke=\"#1b1b1b\" stroke-width=\"1.6\" points=\"")
                    .append(String.join(" ", run)).append("\"/>");
                run.clear();
            }
        }
        return out.toString();
    }

    private static String rect(double x, double y, double w, double h, String cssClass) {
        return "<rect class=\"" + cssClass + "\" x=\"" + fmt(x) + "\" y=\"" + fmt(y) + "\" width=\"" + fmt(Math.max(0, w))
            + "\" height=\"" + fmt(h) + "\" fill=\"url(#hatch)\" stroke=\"#b8b8b8\" stroke-width=\"0.6\"/>";
    }

    static String line(double x1, double y1, double x2, double y2) {
        return "<line x1=\"" + fmt(x1) + "\" y1=\"" + fmt(y1) + "\" x2=\"" + fmt(x2) + "\" y2=\"" + fmt(y2)
            + "\" stroke=\"#1b1b1b\" stroke-width=\"0.8\"/>";
    }

    static String text(double x, double y, String anchor, String words) {
        return "<text x=\"" + fmt(x) + "\" y=\"" + fmt(y) + "\" text-anchor=\"" + anchor + "\">" + Html.text(words) + "</text>";
    }

    static String number(double v) {
        return QuantityFormat.number(v, 3);
    }

    static String fmt(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** One axis: SI values to page coordinates, linear or logarithmic, with a few round ticks. */
    record Axis(double from, double to, boolean log, double pageFrom, double pageTo) {
        double at(double v) {
            double f = log ? (Math.log10(v) - Math.log10(from)) / (Math.log10(to) - Math.log10(from)) : (v - from) / (to - from);
            return pageFrom + f * (pageTo - pageFrom);
        }

        List<Double> ticks() {
            List<Double> out = new ArrayList<>();
            if (log) {
                for (int e = (int) Math.ceil(Math.log10(from)); e <= Math.floor(Math.log10(to)); e++) out.add(Math.pow(10, e));
                return out;
            }
            double raw = (to - from) / 5;
            double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
            double step = raw / magnitude < 1.5 ? magnitude : raw / magnitude < 3.5 ? 2 * magnitude
                : raw / magnitude < 7.5 ? 5 * magnitude : 10 * magnitude;
            for (double t = Math.ceil(from / step) * step; t <= to + step * 1e-9; t += step) out.add(Math.abs(t) < step * 1e-9 ? 0 : t);
            return out;
        }
    }
}
