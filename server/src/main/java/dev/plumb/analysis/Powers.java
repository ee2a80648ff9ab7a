package dev.plumb.analysis;

import dev.plumb.units.Dimension;

/** Dimension of a power {@code x^n}: defined only when every exponent stays whole. */
final class Powers {
    private Powers() {
    }

    /** The dimension of base^n, or null when some exponent would be fractional. */
    static Dimension raise(Dimension base, double n) {
        if (base.isDimensionless()) return Dimension.NONE;
        int[] e = new int[Dimension.BASE_COUNT];
        for (int i = 0; i < e.length; i++) {
            double raised = base.exponent(i) * n;
            long whole = Math.round(raised);
            if (Math.abs(raised - whole) > 1e-9 || Math.abs(whole) > 100) return null;
            e[i] = (int) whole;
        }
        return Dimension.of(e[0], e[1], e[2], e[3], e[4], e[5], e[6]);
    }
}
