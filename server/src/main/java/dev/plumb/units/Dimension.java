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

    private final int[] exponents;

    private Dimension(int[] exponents) {
        this.exponents = exponents;
    }

    public static Dimension of(int length, int mass, int time, int current, int temperature,
                               int amount, int luminous) {
        return new Dimension(new int[] {length, mass, time, current, temperature, amount, luminous});
    }

    /** Exponent of one base dimension; {@code baseIndex} runs 0..6 in the order of the constants. */
    public int exponent(int baseIndex) {
        return exponents[baseIndex];
    }

    public Dimension times(Dimension o) {
        int[] e = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = exponents[i] + o.exponents[i];
        }
        return new Dimension(e);
    }

    public Dimension divide(Dimension o) {
        int[] e = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = exponents[i] - o.exponents[i];
        }
        return new Dimension(e);
    }

    public Dimension pow(int n) {
        int[] e = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            e[i] = exponents[i] * n;
        }
        return new Dimension(e);
    }

    /** The n-th root, or null when some exponent is not a multiple of n (e.g. the root of m³). */
    public Dimension root(int n) {
        if (n == 0) {
            return null;
        }
        int[] e = new int[BASE_COUNT];
        for (int i = 0; i < BASE_COUNT; i++) {
            if (exponents[i] % n != 0) {
                return null;
            }
            e[i] = exponents[i] / n;
        }
        return new Dimension(e);
    }

    public boolean isDimensionless() {
        for (int e : exponents) {
            if (e != 0) {
                return false;
            }
        }
        return true;
    }

    /** Coherent SI base units, e.g. "kg·m/s²", "m²", "1/s"; "" when dimensionless. */
    public String siUnits() {
        return BaseUnitSymbols.compose(this);
    }

    /** Words with an article for messages: "a force (N)", otherwise "a quantity in kg·m²/s³". */
    public String describe() {
        return DimensionNames.describe(this);
    }

    /** The common name ("force", "length", …), or null when this dimension has none. */
    public String name() {
        return DimensionNames.nameOf(this);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Dimension d && Arrays.equals(exponents, d.exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents);
    }

    @Override
    public String toString() {
        return isDimensionless() ? "1" : siUnits();
    }
}
