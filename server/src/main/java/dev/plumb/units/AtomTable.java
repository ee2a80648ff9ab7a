package dev.plumb.units;

import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Every spelling of every unit atom, prefixed forms included, built once. Exact spellings win
 * over prefix splits: "min" is the minute (not milli-inch), "cd" the candela, "Pa" the pascal,
 * "P" the poise while "PW" is the petawatt.
 */
final class AtomTable {

    private final Map<String, AtomUnit> bySpelling;
    private final Set<String> sortedSpellings;

    private AtomTable(Map<String, AtomUnit> bySpelling) {
        this.bySpelling = Map.copyOf(bySpelling);
        this.sortedSpellings = Collections.unmodifiableSet(new TreeSet<>(bySpelling.keySet()));
    }

    static AtomTable build(List<AtomDefinition> definitions, List<SiPrefixes.Prefix> prefixes) {
        Map<String, AtomUnit> map = new HashMap<>();
        for (AtomDefinition def : definitions) {
            for (String spelling : def.spellings()) {
                if (map.put(spelling, def.unit()) != null) {
                    throw new IllegalStateException("unit spelled twice: " + spelling);
                }
            }
        }
        for (AtomDefinition def : definitions) {
            if (!def.prefixable()) {
                continue;
            }
            for (String spelling : def.spellings()) {
                for (SiPrefixes.Prefix prefix : prefixes) {
                    map.putIfAbsent(prefix.spelling() + spelling, prefixed(prefix, def.unit()));
                }
            }
        }
        return new AtomTable(map);
    }

    private static AtomUnit prefixed(SiPrefixes.Prefix prefix, AtomUnit base) {
        return new AtomUnit(prefix.canonical() + base.symbol(), prefix.name() + base.name(),
                prefix.apply(base.factor()),
                0, base.dimension());
    }

    /** The atom spelled exactly so, or null. */
    AtomUnit find(String spelling) {
        return bySpelling.get(spelling);
    }

    /** All spellings, sorted. */
    Set<String> spellings() {
        return sortedSpellings;
    }
}
