package dev.plumb.units;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Resolves unit expressions to {@link Unit}s. The unit library is consulted once, when the
 * shared registry is first used; after that resolving is table look-ups and double arithmetic,
 * and each distinct expression is parsed only once.
 */
public final class UnitRegistry {

    /** An editor may send many distinct half-typed units; past this many, start afresh. */
    private static final int CACHE_LIMIT = 4096;

    private final AtomTable atoms;
    private final UnitSuggestions suggestions;
    private final ConcurrentHashMap<String, UnitResult> cache = new ConcurrentHashMap<>();

    private UnitRegistry(List<AtomDefinition> definitions) {
        List<SiPrefixes.Prefix> prefixes = SiPrefixes.all();
        this.atoms = AtomTable.build(definitions, prefixes);
        Set<String> unprefixed = new HashSet<>();
        definitions.forEach(d -> unprefixed.addAll(d.spellings()));
        unprefixed.add("kg"); // prefixed in form only: it is the SI base unit of mass
        this.suggestions = new UnitSuggestions(atoms.spellings(), unprefixed);
    }

    /** Initialization-on-demand: built on first use, safely published to every thread. */
    private static final class Holder {
        static final UnitRegistry STANDARD = new UnitRegistry(standardDefinitions());
    }

    private static List<AtomDefinition> standardDefinitions() {
        // The unit library's units as the build wrote them out: reading the library itself is slow to start.
        List<AtomDefinition> all = new ArrayList<>(LibraryUnitTable.read());
        all.addAll(TradeUnits.all());
        return all;
    }

    /** The one shared, immutable registry of every unit Plumb knows. */
    public static UnitRegistry standard() {
        return Holder.STANDARD;
    }

    /** Resolves a unit expression such as "kg/m^3"; never throws for bad input. */
    public UnitResult resolve(String unitExpression) {
        if (unitExpression == null) {
            return new UnitResult.Error("empty unit", 0, 0, List.of());
        }
        UnitResult cached = cache.get(unitExpression);
        if (cached != null) {
            return cached;
        }
        UnitResult result = UnitExpressionParser.parse(unitExpression, atoms, suggestions);
        if (cache.size() >= CACHE_LIMIT) {
            cache.clear();
        }
        cache.put(unitExpression, result);
        return result;
    }

    /** Every known atom spelling, prefixed forms included, sorted; for completion. */
    public Set<String> symbols() {
        return atoms.spellings();
    }
}
