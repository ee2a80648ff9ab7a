package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

/** Constants and functions every document can use. */
final class Builtins {
    /** Filled once, then read-only. */
    private static final Map<String, Binding> ALL = java.util.Collections.unmodifiableMap(build());

    private static Map<String, Binding> build() {
        Map<String, Binding> all = new LinkedHashMap<>();
        // pi: the ratio of a circle's circumference to its diameter, to double precision.
        constant(all, "pi", Math.PI, Dimension.NONE);
        // g_n: standard acceleration of gravity, 9.80665 m/s² exactly, adopted by the
        // 3rd CGPM (1901); NIST SP 330 (2019), section 5.3 (from memory).
        constant(all, "g_n", 9.80665, Dimension.of(1, 0, -2, 0, 0, 0, 0));

        function(all, "sqrt", 1, 1, "sqrt(x)");
        function(all, "exp", 1, 1, "exp(x)  x dimensionless");
        function(all, "ln", 1, 1, "ln(x)  natural logarithm, x dimensionless");
        function(all, "log10", 1, 1, "log10(x)  x dimensionless");
        function(all, "abs", 1, 1, "abs(x)");
        function(all, "min", 1, Integer.MAX_VALUE, "min(a, b, …)  same dimension");
        function(all, "max", 1, Integer.MAX_VALUE, "max(a, b, …)  same dimension");
        function(all, "sin", 1, 1, "sin(angle)");
        function(all, "cos", 1, 1, "cos(angle)");
        function(all, "tan", 1, 1, "tan(angle)");
        function(all, "asin", 1, 1, "asin(x)  gives radians");
        function(all, "acos", 1, 1, "acos(x)  gives radians");
        function(all, "atan", 1, 1, "atan(x)  gives radians");
        function(all, "atan2", 2, 2, "atan2(y, x)  same dimension, gives radians");
        return all;
    }

    private Builtins() {
    }

    private static void constant(Map<String, Binding> all, String name, double si, Dimension d) {
        all.put(name, new Binding.ValueBinding(null, Span.NONE, Value.of(si, d), DisplayUnits.defaultFor(d), null, false, null, null));
    }

    private static void function(Map<String, Binding> all, String name, int min, int max, String signature) {
        all.put(name, new Binding.BuiltinFunction(name, min, max, signature));
    }

    static Binding lookup(String name) {
        return ALL.get(name);
    }

    static boolean isBuiltin(String name) {
        return ALL.containsKey(name);
    }

    static Collection<String> names() {
        return ALL.keySet();
    }
}
