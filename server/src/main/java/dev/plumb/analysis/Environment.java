package dev.plumb.analysis;

import java.util.HashMap;
import java.util.Map;

/**
 * The values of one document's own definitions at one point of an evaluation, keyed by name,
 * each with how it is shown (its display unit, tag, origin); immutable. The names a document imports or takes from the library are not here: they are
 * final and live in its {@link Scope}. An environment made {@link #over} another holds only what
 * differs (a solver's trial value and what was recomputed from it), so many trials stay cheap.
 */
final class Environment {
    /** No own values: what a function of another file sees of the file that calls it. */
    static final Environment NONE = new Environment(null, null, Map.of());

    /** The scope whose own definitions these are; null for {@link #NONE}. */
    private final Scope owner;
    private final Environment below;
    private final Map<String, Binding.ValueBinding> values;

    private Environment(Scope owner, Environment below, Map<String, Binding.ValueBinding> values) {
        this.owner = owner;
        this.below = below;
        this.values = values;
    }

    /** An own definition's value, or null when the name is not one (look it up in the scope). */
    Binding.ValueBinding get(String name) {
        for (Environment e = this; e != null; e = e.below) {
            Binding.ValueBinding v = e.values.get(name);
            if (v != null) return v;
        }
        return null;
    }

    /** Whether these are the values of {@code scope}'s own definitions. */
    boolean of(Scope scope) {
        return owner == scope;
    }

    /** This environment with {@code changed} values laid over it. */
    Environment over(Map<String, Binding.ValueBinding> changed) {
        return changed.isEmpty() ? this : new Environment(owner, this, Map.copyOf(changed));
    }

    /** A hash map's initial capacity that holds {@code n} entries without growing. */
    static int capacityFor(int n) {
        return (int) (n / 0.75f) + 1;
    }

    /** Builds the environment of one evaluation run, definition by definition, then freezes it. */
    static final class Builder {
        private final Scope owner;
        private final Environment below;
        private final Map<String, Binding.ValueBinding> values;

        Builder(Scope owner) {
            this(owner, null);
        }

        /** A builder for about {@code expected} values: a document's whole run, made without growing. */
        Builder(Scope owner, int expected) {
            this.owner = owner;
            this.below = null;
            this.values = new HashMap<>(capacityFor(expected));
        }

        /** A builder whose values lie over {@code below}'s (a trial run over the real one). */
        Builder(Environment below) {
            this(below.owner, below);
        }

        private Builder(Scope owner, Environment below) {
            this.owner = owner;
            this.below = below;
            this.values = new HashMap<>();
        }

        void put(String name, Binding.ValueBinding v) {
            values.put(name, v);
        }

        /** What the values built so far and those below give: the environment to evaluate the next one in. */
        Environment now() {
            return new Environment(owner, below, java.util.Collections.unmodifiableMap(values));
        }

        /** The values built, read-only; the builder is not used after this. */
        Environment build() {
            return new Environment(owner, below, java.util.Collections.unmodifiableMap(values));
        }
    }
}
