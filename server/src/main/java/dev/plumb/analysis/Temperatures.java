package dev.plumb.analysis;

import dev.plumb.analysis.Value.Temperature;

/** What adding or subtracting temperatures gives: point ± difference is a point, point − point a difference. */
final class Temperatures {
    private Temperatures() {
    }

    /** The kind of {@code l + r} or {@code l - r}; the caller has already refused point + point. */
    static Temperature sum(boolean add, Value l, Value r) {
        if (add) {
            if (l.point() || r.point()) return Temperature.POINT;
            return l.difference() && r.difference() ? Temperature.DIFFERENCE : Temperature.EITHER;
        }
        if (l.point() && r.point()) return Temperature.DIFFERENCE;
        if (l.point()) return Temperature.POINT;
        if (r.point()) return Temperature.DIFFERENCE;
        return l.difference() && r.difference() ? Temperature.DIFFERENCE : Temperature.EITHER;
    }

    /** True when a check would compare a point with a difference, which has no meaning. */
    static boolean incomparable(Value a, Value b) {
        return (a.point() && b.difference()) || (a.difference() && b.point());
    }
}
