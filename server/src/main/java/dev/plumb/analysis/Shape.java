package dev.plumb.analysis;

import java.util.Map;
import java.util.TreeMap;

/**
 * The algebraic shape of a product of lengths and numbers, such as π·d·L: a numeric factor times
 * named lengths with their exponents. Canonical, so π·d·L, L·d·π and (d·π)·L are one shape; this
 * is what lets the basis check recognise a lateral surface or a circle in any written order.
 */
record Shape(double factor, Map<String, Integer> lengths) {
    Shape {
        lengths = Map.copyOf(lengths);
    }

    static Shape number(double n) {
        return new Shape(n, Map.of());
    }

    static Shape length(String symbol) {
        return new Shape(1, Map.of(symbol, 1));
    }

    Shape times(Shape o, int sign) {
        // Most products scale by a plain number: no lengths to merge.
        if (o.lengths.isEmpty()) return new Shape(sign > 0 ? factor * o.factor : factor / o.factor, lengths);
        if (lengths.isEmpty() && sign > 0) return new Shape(factor * o.factor, o.lengths);
        Map<String, Integer> merged = new TreeMap<>(lengths);
        o.lengths.forEach((k, e) -> merged.merge(k, sign * e, Integer::sum));
        merged.values().removeIf(e -> e == 0);
        return new Shape(sign > 0 ? factor * o.factor : factor / o.factor, merged);
    }

    Shape pow(int n) {
        Map<String, Integer> raised = new TreeMap<>();
        lengths.forEach((k, e) -> raised.put(k, e * n));
        return new Shape(Math.pow(factor, n), raised);
    }

    Shape negate() {
        return new Shape(-factor, lengths);
    }

    /** The kinds of area the basis check recognises. */
    enum Kind {
        LATERAL_SURFACE("the lateral surface of a cylinder (π·d·L)", "wetted"),
        SPHERE_SURFACE("the surface of a sphere (π·d²)", "wetted"),
        BOTH_FACES("both faces of a plate (2·b·L)", "wetted"),
        CIRCLE("a circle's area (π·d²/4)", "frontal"),
        RECTANGLE("a rectangle (b·h, e.g. the projected area d·L)", "frontal");

        final String words;
        final String basis;

        Kind(String words, String basis) {
            this.words = words;
            this.basis = basis;
        }
    }

    /** What area this shape is, when it is one we know; null otherwise. */
    Kind kind() {
        int total = lengths.values().stream().mapToInt(Integer::intValue).sum();
        boolean allPositive = lengths.values().stream().allMatch(e -> e > 0);
        if (total != 2 || !allPositive) return null;
        boolean square = lengths.size() == 1;
        if (square && near(factor, Math.PI)) return Kind.SPHERE_SURFACE;
        if (square && near(factor, Math.PI / 4)) return Kind.CIRCLE;
        if (!square && near(factor, Math.PI)) return Kind.LATERAL_SURFACE;
        if (near(factor, 2)) return Kind.BOTH_FACES;
        if (near(factor, 1)) return Kind.RECTANGLE;
        return null;
    }

    /** The frontal area of the same body, in the same names: d * L for π·d·L, pi * d^2 / 4 for π·d². */
    String frontalFormula() {
        Kind k = kind();
        if (k == null || lengths.keySet().stream().anyMatch(n -> n.startsWith("#"))) return null;
        java.util.List<String> names = new java.util.ArrayList<>(lengths.keySet());
        names.sort(String.CASE_INSENSITIVE_ORDER);
        return switch (k) {
            // Both faces of a square plate, 2·b², have one name: one face is b².
            case LATERAL_SURFACE, BOTH_FACES -> names.size() == 1 ? names.get(0) + "^2"
                : names.get(0) + " * " + names.get(1);
            case SPHERE_SURFACE -> "pi * " + names.get(0) + "^2 / 4";
            default -> null;
        };
    }

    private static boolean near(double a, double b) {
        return Math.abs(a - b) <= 1e-9 * Math.abs(b);
    }
}
