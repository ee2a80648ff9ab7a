package dev.plumb.units;

import java.util.Arrays;

/**
 * Exponents of the seven SI base dimensions, immutable. Dimension checks in the engine are a
 * comparison of seven small integers, so this type stays a plain value with no unit knowledge.
 */
public final class Dimension {

    /** Number of SI base dimensions; indices run in the order of the constants below. */
    public static final int BASE_COUNT = 7;

    public static final Dimension NONE = of(0, 0, 0, 0, 0, 0, 0);
    public static final Dimension LENGTH = of(1, 0, 0, 0, 0, 0, 0);
    public static final Dimension MASS = of(0, 1, 0, 0, 0, 0, 0);
    public static final Dimension TIME = of(0, 0, 1, 0, 0, 0, 0);
    public static final Dimension CURRENT = of(0, 0, 0, 1, 0, 0, 0);
    public static final Dimension TEMPERATURE = of(0, 0, 0, 0, 1, 0, 0);
    public static final Dimension AMOUNT = of(0, 0, 0, 0, 0, 1, 0);
    public static final Dimension LUMINOUS = of(0, 0, 0, 0, 0, 0, 1);

    /**
     * The largest exponent magnitude a dimension holds. Beyond it no formula means anything, and
     * bounding it keeps the arithmetic exact: repeated squaring would otherwise wrap an int around
     * to a small, even zero, exponent and make a nonsense result look dimensionless.
     */
    public static final int MAX_EXPONENT = 100;

    /**
     * What any arithmetic whose exponents pass {@link #MAX_EXPONENT} yields, and every operation on
     * it yields again: equal to no real dimension, never dimensionless. The engine reports the
     * operation that made it ({@link #outOfRange()}).
     */
    public static final Dimension OUT_OF_RANGE = new Dimension(new int[BASE_COUNT], true);

    private final int[] exponents;
    private final boolean outOfRange;

    private Dimension(int[] exponents, boolean outOfRange) {
        this.exponents = exponents;
        this.outOfRange = outOfRange;
    }

    public static Dimension of(int length, int mass, int time, int current, int temperature,
                               int amount, int luminous) {
        return bounded(new long[] {length, mass, time, current, temperature, amount, luminous});
    }

    /** The dimension of these exponents, or {@link #OUT_OF_RANGE} when one is beyond the bound. */
    private static Dimension bounded(long[] e) {
        int[] out = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            if (Math.abs(e[i]) > MAX_EXPONENT) return OUT_OF_RANGE;
            out[i] = (int) e[i];
        }
        return new Dimension(out, false);
    }

    /** Whether an exponent went beyond {@link #MAX_EXPONENT} on the way here. */
    public boolean outOfRange() {
        return outOfRange;
    }

    /** Exponent of one base dimension; {@code baseIndex} runs 0..6 in the order of the constants. */
    public int exponent(int baseIndex) {
        return exponents[baseIndex];
    }

    public Dimension times(Dimension o) {
        if (outOfRange || o.outOfRange) return OUT_OF_RANGE;
        // Most products in a calc scale by a plain number: nothing to add up.
        if (o.isDimensionless()) return this;
        if (isDimensionless()) return o;
        long[] e = new long[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = (long) exponents[i] + o.exponents[i];
        }
        return bounded(e);
    }

    public Dimension divide(Dimension o) {
        if (outOfRange || o.outOfRange) return OUT_OF_RANGE;
        if (o.isDimensionless()) return this;
        long[] e = new long[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = (long) exponents[i] - o.exponents[i];
        }
        return bounded(e);
    }

    public Dimension pow(int n) {
        if (outOfRange) return OUT_OF_RANGE;
        long[] e = new long[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = (long) exponents[i] * n;
        }
        return bounded(e);
    }

    /** The n-th root, or null when some exponent is not a multiple of n (e.g. the root of m³). */
    public Dimension root(int n) {
        if (n == 0) {
            return null;
        }
        if (outOfRange) return OUT_OF_RANGE;
        int[] e = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            if (exponents[i] % n != 0) {
                return null;
            }
            e[i] = exponents[i] / n;
        }
        return new Dimension(e, false);
    }

    public boolean isDimensionless() {
        if (outOfRange) return false;
        for (int e : exponents) {
            if (e != 0) {
                return false;
            }
        }
        return true;
    }

    /** Coherent SI base units, e.g. "kg·m/s²", "m²", "1/s"; "" when dimensionless. */
    public String siUnits() {
        return outOfRange ? "(a unit with an exponent beyond ±" + MAX_EXPONENT + ")" : BaseUnitSymbols.compose(this);
    }

    /** Words with an article for messages: "a force (N)", otherwise "a quantity in kg·m²/s³". */
    public String describe() {
        return outOfRange ? "a quantity whose unit has an exponent beyond ±" + MAX_EXPONENT : DimensionNames.describe(this);
    }

    /** The common name ("force", "length", …), or null when this dimension has none. */
    public String name() {
        return outOfRange ? null : DimensionNames.nameOf(this);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Dimension d && outOfRange == d.outOfRange && Arrays.equals(exponents, d.exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents) + (outOfRange ? 1 : 0);
    }

    @Override
    public String toString() {
        return isDimensionless() ? "1" : siUnits();
    }
}
