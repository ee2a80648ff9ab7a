package dev.plumb.analysis;

import dev.plumb.diagnostics.Span;
import dev.plumb.units.Dimension;
import dev.plumb.units.DisplayUnits;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

/** Constants and functions every document can use. */
final class Builtins {
    private static final Map<String, Binding> ALL = new LinkedHashMap<>();

    static {
        // pi: the ratio of a circle's circumference to its diameter, to double precision.
        constant("pi", Math.PI, Dimension.NONE);
        // g_n: standard acceleration of gravity, 9.80665 m/s² exactly, adopted by the
        // 3rd CGPM (1901); NIST SP 330 (2019), section 5.3 (from memory).
        constant("g_n", 9.80665, Dimension.of(1, 0, -2, 0, 0, 0, 0));

        function("sqrt", 1, 1, "sqrt(x)");
        function("exp", 1, 1, "exp(x)  x dimensionless");
        function("ln", 1, 1, "ln(x)  natural logarithm, x dimensionless");
        function("log10", 1, 1, "log10(x)  x dimensionless");
        function("abs", 1, 1, "abs(x)");
        function("min", 1, Integer.MAX_VALUE, "min(a, b, …)  same dimension");
        function("max", 1, Integer.MAX_VALUE, "max(a, b, …)  same dimension");
        function("sin", 1, 1, "sin(angle)");
        function("cos", 1, 1, "cos(angle)");
        function("tan", 1, 1, "tan(angle)");
        function("asin", 1, 1, "asin(x)  gives radians");
        function("acos", 1, 1, "acos(x)  gives radians");
        function("atan", 1, 1, "atan(x)  gives radians");
        function("atan2", 2, 2, "atan2(y, x)  same dimension, gives radians");
    }

    private Builtins() {
    }

    private static void constant(String name, double si, Dimension d) {
        ALL.put(name, new Binding.ValueBinding(null, Span.NONE, Value.of(si, d), DisplayUnits.defaultFor(d), null, false, null));
    }

    private static void function(String name, int min, int max, String signature) {
        ALL.put(name, new Binding.BuiltinFunction(name, min, max, signature));
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
