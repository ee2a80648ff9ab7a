package dev.plumb.analysis;

import dev.plumb.units.Dimension;

/**
 * Dimension of a power {@code x^n}: defined only when every exponent stays whole, and
 * {@link Dimension#OUT_OF_RANGE} (reported as too large, not as fractional) when one grows past
 * {@link Dimension#MAX_EXPONENT}.
 */
final class Powers {
    private Powers() {
    }

    /** The dimension of base^n, or null when some exponent would be fractional. */
    static Dimension raise(Dimension base, double n) {
        if (base.outOfRange()) return Dimension.OUT_OF_RANGE;
        if (base.isDimensionless()) return Dimension.NONE;
        int[] e = new int[Dimension.BASE_COUNT];
        for (int i = 0; i < e.length; i++) {
            double raised = base.exponent(i) * n;
            if (Math.abs(raised) > Dimension.MAX_EXPONENT + 0.5) return Dimension.OUT_OF_RANGE;
            long whole = Math.round(raised);
            if (Math.abs(raised - whole) > 1e-9) return null;
            e[i] = (int) whole;
        }
        return Dimension.of(e[0], e[1], e[2], e[3], e[4], e[5], e[6]);
    }
}
