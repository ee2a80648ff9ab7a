package dev.plumb.analysis;

import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * One output column of a table, ready to read: the argument and values in SI, interpolated
 * linearly or log–log with Commons Math; outside the rows it extrapolates with the end slope.
 */
final class TableData {
    private final double[] x;
    private final double[] y;
    private final boolean logLog;
    private final PolynomialSplineFunction spline;
    final Dimension argument;
    final Dimension result;
    final Unit argumentUnit;

    TableData(double[] x, double[] y, boolean logLog, Dimension argument, Dimension result, Unit argumentUnit) {
        this.x = x.clone();
        this.y = y.clone();
        this.logLog = logLog;
        this.argument = argument;
        this.result = result;
        this.argumentUnit = argumentUnit;
        this.spline = new LinearInterpolator().interpolate(logLog ? log(x) : x, logLog ? log(y) : y);
    }

    private static double[] log(double[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) out[i] = Math.log(v[i]);
        return out;
    }

    double first() {
        return x[0];
    }

    double last() {
        return x[x.length - 1];
    }

    boolean covers(double at) {
        return at >= first() && at <= last();
    }

    /** The column's value at {@code at} (SI); NaN for a non-positive argument of a log–log table. */
    double at(double at) {
        if (logLog && at <= 0) return Double.NaN;
        double u = logLog ? Math.log(at) : at;
        double v;
        if (spline.isValidPoint(u)) {
            v = spline.value(u);
        } else {
            // Extrapolate along the first or last segment (interpolators refuse points outside).
            int i = u < spline.getKnots()[0] ? 0 : x.length - 2;
            double[] knots = spline.getKnots();
            double y0 = logLog ? Math.log(y[i]) : y[i];
            double y1 = logLog ? Math.log(y[i + 1]) : y[i + 1];
            v = y0 + (y1 - y0) * (u - knots[i]) / (knots[i + 1] - knots[i]);
        }
        return logLog ? Math.exp(v) : v;
    }
}
