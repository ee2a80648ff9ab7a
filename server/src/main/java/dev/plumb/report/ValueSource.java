package dev.plumb.report;

import java.util.Map;
import java.util.Optional;

/**
 * Where the typesetter finds the value to show in place of a name, for the formula with its
 * values written in. A name without a value here stays a symbol, so a reader sees what was not
 * substituted.
 */
@FunctionalInterface
public interface ValueSource {
    Optional<ShownValue> find(String name);

    /** No values: every name stays a symbol (the formula as written). */
    static ValueSource none() {
        return name -> Optional.empty();
    }

    /** The values of a fixed table of names. */
    static ValueSource of(Map<String, ShownValue> values) {
        Map<String, ShownValue> copy = Map.copyOf(values);
        return name -> Optional.ofNullable(copy.get(name));
    }
}
