package dev.plumb.units;

import java.util.ArrayList;
import java.util.List;

/**
 * A unit as the registry learns it: its spellings (the first is canonical), its value, and
 * whether SI prefixes attach to it.
 */
record AtomDefinition(List<String> spellings, AtomUnit unit, boolean prefixable) {

    AtomDefinition {
        spellings = List.copyOf(spellings);
    }

    static AtomDefinition of(String canonical, String name, double factor, Dimension dimension) {
        return new AtomDefinition(List.of(canonical),
                new AtomUnit(canonical, name, factor, 0, dimension), false);
    }

    AtomDefinition alias(String... more) {
        List<String> all = new ArrayList<>(spellings);
        all.addAll(List.of(more));
        return new AtomDefinition(all, unit, prefixable);
    }

    AtomDefinition withPrefixes() {
        return new AtomDefinition(spellings, unit, true);
    }
}
