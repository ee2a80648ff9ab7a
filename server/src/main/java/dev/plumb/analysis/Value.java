package dev.plumb.analysis;

import dev.plumb.units.Dimension;

/**
 * A computed quantity: its SI magnitude as a double, its dimension, for temperatures whether it
 * is a point on a scale or a difference (see {@link Temperature}), and whether it is an angle.
 * Angles are dimensionless (rad is 1), so {@code angle} is the only record that a value was
 * written with an angle unit or came from an inverse trigonometric function: a parameter
 * declared {@code : angle} warns when it is missing (a bare 30 would be 30 rad).
 * {@link #UNKNOWN} stands for a value that could not be computed; its error is already reported,
 * so everything built on it stays quiet.
 */
public record Value(double si, Dimension dimension, Temperature temperature, BasisNotes notes, boolean angle) {
    public static final Value UNKNOWN = new Value(Double.NaN, null, Temperature.EITHER);

    public Value(double si, Dimension dimension, Temperature temperature) {
        this(si, dimension, temperature, BasisNotes.NONE);
    }

    public Value(double si, Dimension dimension, Temperature temperature, BasisNotes notes) {
        this(si, dimension, temperature, notes, false);
    }

    /** The same quantity with other basis notes. */
    Value noted(BasisNotes n) {
        return new Value(si, dimension, temperature, n == null ? BasisNotes.NONE : n, angle);
    }

    /** The same quantity, marked as an angle or not. */
    Value asAngle(boolean isAngle) {
        return isAngle == angle || !known() ? this : new Value(si, dimension, temperature, notes, isAngle);
    }

    /**
     * What a temperature-dimensioned value stands for. °C and °F readings are points; the
     * difference of two points is a difference; a value in K or °R may be either (288 K is a
     * point, 5 K usually a difference), so it is never the cause of an error.
     */
    public enum Temperature { EITHER, POINT, DIFFERENCE }

    public static Value of(double si, Dimension dimension) {
        return new Value(si, dimension, Temperature.EITHER);
    }

    public static Value number(double n) {
        return new Value(n, Dimension.NONE, Temperature.EITHER);
    }

    public boolean known() {
        return dimension != null;
    }

    public boolean dimensionless() {
        return dimension != null && dimension.isDimensionless();
    }

    public boolean point() {
        return temperature == Temperature.POINT;
    }

    public boolean difference() {
        return temperature == Temperature.DIFFERENCE;
    }
}
