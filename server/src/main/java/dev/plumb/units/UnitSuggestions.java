package dev.plumb.units;

import dev.plumb.diagnostics.EditDistance;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Close known spellings for an unknown unit atom: first a spelling that differs only in case
 * ("kpa" → "kPa"), then a unit written out as a word ("meter" → "m"), then spellings within a
 * small edit distance, unprefixed units before prefixed ones.
 */
final class UnitSuggestions {

    static final int MAX = 3;
    /** Longer text is no mistyped unit; skip the edit-distance scan for it. */
    private static final int LONGEST_WORTH_MATCHING = 16;

    /** Words and abbreviations people write for units, mapped to our spelling. */
    private static final Map<String, String> WORDS = Map.ofEntries(
            Map.entry("meter", "m"), Map.entry("metre", "m"), Map.entry("meters", "m"),
            Map.entry("metres", "m"), Map.entry("sec", "s"), Map.entry("second", "s"),
            Map.entry("seconds", "s"), Map.entry("hr", "h"), Map.entry("hour", "h"),
            Map.entry("hours", "h"), Map.entry("minute", "min"), Map.entry("minutes", "min"),
            Map.entry("mins", "min"), Map.entry("days", "d"),
            Map.entry("year", "yr"), Map.entry("years", "yr"), Map.entry("tonne", "t"),
            Map.entry("tonnes", "t"), Map.entry("kips", "kip"), Map.entry("gallon", "gal"),
            Map.entry("gallons", "gal"), Map.entry("ounce", "oz"), Map.entry("ounces", "oz"),
            Map.entry("gram", "g"), Map.entry("kilogram", "kg"), Map.entry("kilo", "kg"),
            Map.entry("newton", "N"), Map.entry("pascal", "Pa"), Map.entry("joule", "J"),
            Map.entry("watt", "W"), Map.entry("kelvin", "K"), Map.entry("degk", "K"),
            Map.entry("celsius", "°C"), Map.entry("centigrade", "°C"),
            Map.entry("fahrenheit", "°F"), Map.entry("rankine", "°R"),
            Map.entry("degree", "°"), Map.entry("degrees", "°"), Map.entry("percent", "%"),
            Map.entry("liter", "L"), Map.entry("litre", "L"), Map.entry("inch", "in"),
            Map.entry("inches", "in"), Map.entry("foot", "ft"), Map.entry("feet", "ft"),
            Map.entry("mile", "mi"), Map.entry("miles", "mi"), Map.entry("knots", "kn"),
            Map.entry("pound", "lb"), Map.entry("lbs", "lb"), Map.entry("poise", "P"),
            Map.entry("centipoise", "cP"), Map.entry("stokes", "St"),
            Map.entry("centistokes", "cSt"), Map.entry("kph", "km/h"), Map.entry("kmh", "km/h"),
            Map.entry("ohms", "Ω"), Map.entry("slugs", "slug"));

    private final List<String> pool;
    private final Set<String> unprefixed;

    /**
     * @param spellings every known spelling
     * @param unprefixed the spellings that are not a prefix plus a unit, preferred on ties
     */
    UnitSuggestions(Set<String> spellings, Set<String> unprefixed) {
        // Look-alike spellings (Greek mu, the ohm sign) would only repeat a suggestion.
        this.pool = spellings.stream().filter(s -> s.indexOf('\u03BC') < 0 && s.indexOf('\u2126') < 0)
                .toList();
        this.unprefixed = Set.copyOf(unprefixed);
    }

    /** Close known units for {@code unknown}, each told by its name, kind and size. */
    List<UnitResult.Suggestion> suggest(String unknown, AtomTable atoms) {
        return spellings(unknown).stream()
                .map(s -> new UnitResult.Suggestion(s, describe(s, atoms)))
                .toList();
    }

    private String describe(String spelling, AtomTable atoms) {
        AtomUnit atom = atoms.find(spelling);
        if (atom != null) {
            return describe(atom);
        }
        // A compound offered for a word ("kph" → "km/h"): its kind and size.
        Unit unit = ((UnitResult.Ok) UnitExpressionParser.parse(spelling, atoms, this)).unit();
        return kindAndSize(unit.symbol(), unit.factor(), unit.dimension());
    }

    /**
     * "metre, a length"; "pound-force per square inch, a pressure: 1 psi = 6894.757 Pa";
     * "degree Fahrenheit, a temperature". A suggestion written as a compound ("km/h") is
     * described by its parts' kind.
     */
    static String describe(AtomUnit atom) {
        if (atom.offset() != 0) {
            return atom.name() + ", " + kind(atom.dimension());
        }
        return atom.name() + ", " + kindAndSize(atom.symbol(), atom.factor(), atom.dimension());
    }

    /** "a pressure: 1 psi = 6894.757 Pa", or just "a length" for a coherent SI unit. */
    private static String kindAndSize(String symbol, double factor, Dimension d) {
        if (factor == 1) {
            return kind(d);
        }
        DimensionNames.Entry entry = DimensionNames.lookup(d);
        String si = entry == null ? d.siUnits() : entry.symbol();
        return kind(d) + ": 1 " + symbol + " = " + QuantityFormat.number(factor, 7)
                + (si.isEmpty() ? "" : " " + si);
    }

    private static String kind(Dimension d) {
        String name = DimensionNames.nameOf(d);
        if (name == null) {
            return "a quantity in " + d.siUnits();
        }
        return (startsWithVowel(name) ? "an " : "a ") + name;
    }

    private static boolean startsWithVowel(String word) {
        return "aeiou".indexOf(word.charAt(0)) >= 0;
    }

    List<String> spellings(String unknown) {
        String lower = unknown.toLowerCase(Locale.ROOT);
        Set<String> out = new LinkedHashSet<>();
        pool.stream().filter(s -> s.toLowerCase(Locale.ROOT).equals(lower))
                .sorted(Comparator.comparingInt((String s) -> distance(s, unknown)))
                .forEach(out::add);
        String word = WORDS.get(lower);
        if (word != null) {
            out.add(word);
        }
        if (unknown.length() > LONGEST_WORTH_MATCHING) {
            return out.stream().limit(MAX).toList();
        }
        int limit = unknown.length() == 1 ? 0 : unknown.length() == 2 ? 1 : 2;
        List<String> near = new ArrayList<>();
        for (String s : pool) {
            if (Math.abs(s.length() - unknown.length()) <= limit
                    && distance(s.toLowerCase(Locale.ROOT), lower) <= limit) {
                near.add(s);
            }
        }
        // A prefixed spelling costs one more edit: "mtr" more likely meant "m" than "mT".
        near.sort(Comparator
                .comparingInt((String s) -> distance(s, unknown) + (unprefixed.contains(s) ? 0 : 1))
                .thenComparing(s -> sameFirstLetter(s, unknown) ? 0 : 1)
                .thenComparingInt(s -> distance(s, unknown))
                .thenComparingInt(String::length)
                .thenComparing(Comparator.naturalOrder()));
        out.addAll(near);
        return out.stream().limit(MAX).toList();
    }

    private static boolean sameFirstLetter(String a, String b) {
        return !a.isEmpty() && !b.isEmpty()
                && Character.toLowerCase(a.charAt(0)) == Character.toLowerCase(b.charAt(0));
    }

    static int distance(String a, String b) {
        return EditDistance.between(a, b);
    }
}
