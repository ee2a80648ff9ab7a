package dev.plumb.units;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import javax.measure.IncommensurableException;
import javax.measure.UnconvertibleException;
import javax.measure.UnitConverter;
import systems.uom.common.Imperial;
import systems.uom.common.USCustomary;
import tech.units.indriya.function.Calculus;
import tech.units.indriya.function.RationalNumber;
import tech.units.indriya.unit.Units;

/**
 * The units whose knowledge comes from the unit library (Indriya and systems-common). Each is
 * read once: its factor and offset to the SI system unit, computed in the library's exact
 * arithmetic and then rounded to a double, and its base-dimension exponents. A running Plumb
 * reads them from the table the build made of this list ({@link LibraryUnitTable}).
 */
final class LibraryUnits {

    /** The library's base dimensions, in the order of our base indices. */
    private static final List<javax.measure.Dimension> BASES = List.of(
            Units.METRE.getDimension(), Units.KILOGRAM.getDimension(),
            Units.SECOND.getDimension(), Units.AMPERE.getDimension(),
            Units.KELVIN.getDimension(), Units.MOLE.getDimension(),
            Units.CANDELA.getDimension());

    private LibraryUnits() {
    }

    static List<AtomDefinition> all() {
        List<AtomDefinition> out = new ArrayList<>();
        // SI base units; the kilogram enters as the gram so that prefixes give kg, mg, µg.
        out.add(read("m", "metre", Units.METRE).withPrefixes());
        out.add(read("g", "gram", Units.GRAM).withPrefixes());
        out.add(read("s", "second", Units.SECOND).withPrefixes());
        out.add(read("A", "ampere", Units.AMPERE).withPrefixes());
        out.add(read("K", "kelvin", Units.KELVIN).withPrefixes());
        out.add(read("mol", "mole", Units.MOLE).withPrefixes());
        out.add(read("cd", "candela", Units.CANDELA).withPrefixes());
        // SI derived units with special names.
        out.add(read("rad", "radian", Units.RADIAN).withPrefixes());
        out.add(read("sr", "steradian", Units.STERADIAN));
        out.add(read("Hz", "hertz", Units.HERTZ).withPrefixes());
        out.add(read("N", "newton", Units.NEWTON).withPrefixes());
        out.add(read("Pa", "pascal", Units.PASCAL).withPrefixes());
        out.add(read("J", "joule", Units.JOULE).withPrefixes());
        out.add(read("W", "watt", Units.WATT).withPrefixes());
        out.add(read("C", "coulomb", Units.COULOMB).withPrefixes());
        out.add(read("V", "volt", Units.VOLT).withPrefixes());
        out.add(read("F", "farad", Units.FARAD).withPrefixes());
        out.add(read("\u03A9", "ohm", Units.OHM).alias("\u2126", "ohm").withPrefixes()); // Ω, ohm sign
        out.add(read("S", "siemens", Units.SIEMENS).withPrefixes());
        out.add(read("Wb", "weber", Units.WEBER).withPrefixes());
        out.add(read("T", "tesla", Units.TESLA).withPrefixes());
        out.add(read("H", "henry", Units.HENRY).withPrefixes());
        out.add(read("lm", "lumen", Units.LUMEN).withPrefixes());
        out.add(read("lx", "lux", Units.LUX).withPrefixes());
        out.add(read("Bq", "becquerel", Units.BECQUEREL).withPrefixes());
        out.add(read("Gy", "gray", Units.GRAY).withPrefixes());
        out.add(read("Sv", "sievert", Units.SIEVERT).withPrefixes());
        out.add(read("kat", "katal", Units.KATAL).withPrefixes());
        out.add(read("°C", "degree Celsius", Units.CELSIUS).alias("degC"));
        // Units accepted for use with the SI. Time units take no prefixes: "min" must stay
        // minutes and "h", "d" must stay hour and day.
        out.add(read("min", "minute", Units.MINUTE));
        out.add(read("h", "hour", Units.HOUR));
        out.add(read("d", "day", Units.DAY).alias("day"));
        out.add(read("L", "litre", Units.LITRE).alias("l").withPrefixes());
        out.add(read("°", "degree of angle", USCustomary.DEGREE_ANGLE).alias("deg"));
        out.add(read("%", "percent", Units.PERCENT));
        // US customary and imperial units.
        out.add(read("ft", "foot", USCustomary.FOOT));
        out.add(read("in", "inch", USCustomary.INCH));
        out.add(read("yd", "yard", USCustomary.YARD));
        out.add(read("mi", "mile", USCustomary.MILE));
        out.add(read("nmi", "nautical mile", USCustomary.NAUTICAL_MILE));
        out.add(read("mph", "mile per hour", USCustomary.MILE_PER_HOUR));
        out.add(read("kn", "knot", USCustomary.KNOT).alias("knot"));
        out.add(read("lb", "avoirdupois pound", USCustomary.POUND));
        out.add(read("lbm", "avoirdupois pound", USCustomary.POUND));
        out.add(read("lbf", "pound-force", Imperial.POUND_FORCE));
        out.add(read("kgf", "kilogram-force", Imperial.KILOGRAM_FORCE));
        out.add(read("hp", "horsepower", USCustomary.HORSEPOWER));
        out.add(read("°F", "degree Fahrenheit", USCustomary.FAHRENHEIT).alias("degF"));
        out.add(read("°R", "degree Rankine", USCustomary.RANKINE).alias("degR"));
        return out;
    }

    /** Reads one library unit into plain numbers. */
    static AtomDefinition read(String canonical, String name, javax.measure.Unit<?> unit) {
        UnitConverter toSystem = toSystemUnit(unit);
        var numbers = Calculus.currentNumberSystem();
        Number zero = toSystem.convert(RationalNumber.of(0));
        Number one = toSystem.convert(RationalNumber.of(1));
        double factor = numbers.subtract(one, zero).doubleValue();
        double offset = zero.doubleValue();
        AtomUnit atom = new AtomUnit(canonical, name, factor, offset, dimensionOf(unit));
        return new AtomDefinition(List.of(canonical), atom, false);
    }

    private static UnitConverter toSystemUnit(javax.measure.Unit<?> unit) {
        try {
            return unit.getConverterToAny(unit.getSystemUnit());
        } catch (IncommensurableException | UnconvertibleException e) {
            throw new IllegalStateException("the unit library cannot convert " + unit, e);
        }
    }

    /** The library's dimension as exponents of our seven base dimensions. */
    static Dimension dimensionOf(javax.measure.Unit<?> unit) {
        javax.measure.Dimension d = unit.getDimension();
        Map<? extends javax.measure.Dimension, Integer> parts = d.getBaseDimensions();
        int[] e = new int[Dimension.BASE_COUNT];
        if (parts == null) {
            // The library answers null when the dimension is itself a base dimension.
            e[baseIndex(d)] = 1;
        } else {
            parts.forEach((base, power) -> e[baseIndex(base)] += power);
        }
        return Dimension.of(e[0], e[1], e[2], e[3], e[4], e[5], e[6]);
    }

    private static int baseIndex(javax.measure.Dimension base) {
        int i = BASES.indexOf(base);
        if (i < 0) {
            throw new IllegalStateException("not an SI base dimension: " + base);
        }
        return i;
    }
}
