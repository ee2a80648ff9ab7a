package dev.plumb.analysis;

import dev.plumb.units.Dimension;

/**
 * A computed quantity: its SI magnitude as a double and its dimension. {@code absolute} marks a
 * point on a temperature scale (from °C or °F), which may not be added to another such point.
 * {@link #UNKNOWN} stands for a value that could not be computed; its error is already reported,
 * so everything built on it stays quiet.
 */
public record Value(double si, Dimension dimension, boolean absolute) {
    public static final Value UNKNOWN = new Value(Double.NaN, null, false);

    public static Value of(double si, Dimension dimension) {
        return new Value(si, dimension, false);
    }

    public static Value number(double n) {
        return new Value(n, Dimension.NONE, false);
    }

    public boolean known() {
        return dimension != null;
    }

    public boolean dimensionless() {
        return dimension != null && dimension.isDimensionless();
    }
}
