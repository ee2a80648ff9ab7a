package dev.plumb.units;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Common names and preferred SI symbols of the dimensions met in drag, lift and skin-friction
 * work. Where two quantities share a dimension (energy and moment, frequency and angular
 * velocity) one name is chosen here; callers that know better say so themselves.
 */
final class DimensionNames {

    /** A named dimension and the SI unit it is shown in. */
    record Entry(String name, String symbol) {
    }

    private static final Map<Dimension, Entry> TABLE = build();

    private DimensionNames() {
    }

    private static Map<Dimension, Entry> build() {
        Map<Dimension, Entry> t = new LinkedHashMap<>();
        // exponents: length, mass, time, current, temperature, amount, luminous
        put(t, Dimension.NONE, "dimensionless number", "");
        put(t, Dimension.LENGTH, "length", "m");
        put(t, Dimension.MASS, "mass", "kg");
        put(t, Dimension.TIME, "time", "s");
        put(t, Dimension.CURRENT, "electric current", "A");
        put(t, Dimension.TEMPERATURE, "temperature", "K");
        put(t, Dimension.AMOUNT, "amount of substance", "mol");
        put(t, Dimension.LUMINOUS, "luminous intensity", "cd");
        put(t, Dimension.of(2, 0, 0, 0, 0, 0, 0), "area", "m²");
        put(t, Dimension.of(3, 0, 0, 0, 0, 0, 0), "volume", "m³");
        put(t, Dimension.of(-1, 0, 0, 0, 0, 0, 0), "reciprocal length", "1/m");
        put(t, Dimension.of(0, 0, -1, 0, 0, 0, 0), "frequency", "Hz");
        put(t, Dimension.of(1, 0, -1, 0, 0, 0, 0), "velocity", "m/s");
        put(t, Dimension.of(1, 0, -2, 0, 0, 0, 0), "acceleration", "m/s²");
        put(t, Dimension.of(1, 1, -2, 0, 0, 0, 0), "force", "N");
        put(t, Dimension.of(-1, 1, -2, 0, 0, 0, 0), "pressure", "Pa");
        // In drag work this dimension is mostly an overturning or bending moment, so N·m.
        put(t, Dimension.of(2, 1, -2, 0, 0, 0, 0), "moment or energy", "N·m");
        put(t, Dimension.of(2, 1, -3, 0, 0, 0, 0), "power", "W");
        put(t, Dimension.of(-3, 1, 0, 0, 0, 0, 0), "density", "kg/m³");
        put(t, Dimension.of(-1, 1, -1, 0, 0, 0, 0), "dynamic viscosity", "Pa·s");
        put(t, Dimension.of(2, 0, -1, 0, 0, 0, 0), "kinematic viscosity", "m²/s");
        put(t, Dimension.of(0, 1, -2, 0, 0, 0, 0), "force per length", "N/m");
        put(t, Dimension.of(0, 1, -1, 0, 0, 0, 0), "mass flow rate", "kg/s");
        put(t, Dimension.of(3, 0, -1, 0, 0, 0, 0), "volume flow rate", "m³/s");
        put(t, Dimension.of(-2, 1, -1, 0, 0, 0, 0), "mass flux", "kg/(m²·s)");
        put(t, Dimension.of(1, 1, -1, 0, 0, 0, 0), "momentum", "kg·m/s");
        put(t, Dimension.of(2, 0, -2, 0, 0, 0, 0), "specific energy", "J/kg");
        put(t, Dimension.of(0, 1, -3, 0, 0, 0, 0), "heat flux", "W/m²");
        put(t, Dimension.of(0, 1, -3, 0, -1, 0, 0), "heat transfer coefficient", "W/(m²·K)");
        put(t, Dimension.of(1, 1, -3, 0, -1, 0, 0), "thermal conductivity", "W/(m·K)");
        put(t, Dimension.of(2, 0, -2, 0, -1, 0, 0), "specific heat capacity", "J/(kg·K)");
        put(t, Dimension.of(2, 1, -2, 0, -1, 0, 0), "entropy", "J/K");
        put(t, Dimension.of(0, 1, 0, 0, 0, -1, 0), "molar mass", "kg/mol");
        put(t, Dimension.of(0, 0, 1, 1, 0, 0, 0), "electric charge", "C");
        put(t, Dimension.of(2, 1, -3, -1, 0, 0, 0), "voltage", "V");
        put(t, Dimension.of(2, 1, -3, -2, 0, 0, 0), "electric resistance", "Ω");
        return Map.copyOf(t);
    }

    private static void put(Map<Dimension, Entry> t, Dimension d, String name, String symbol) {
        t.put(d, new Entry(name, symbol));
    }

    static Entry lookup(Dimension d) {
        return TABLE.get(d);
    }

    static String nameOf(Dimension d) {
        Entry e = TABLE.get(d);
        return e == null ? null : e.name();
    }

    static String describe(Dimension d) {
        Entry e = TABLE.get(d);
        if (e == null) {
            return "a quantity in " + d.siUnits();
        }
        String article = startsWithVowel(e.name()) ? "an " : "a ";
        return e.symbol().isEmpty()
                ? article + e.name()
                : article + e.name() + " (" + e.symbol() + ")";
    }

    private static boolean startsWithVowel(String word) {
        return "aeiou".indexOf(word.charAt(0)) >= 0;
    }
}
