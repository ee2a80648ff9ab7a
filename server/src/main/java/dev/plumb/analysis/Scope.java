package dev.plumb.analysis;

import java.util.Collection;
import java.util.HashMap;
import java.util.Map;

/**
 * The names visible in one document: built-ins, then imported names, then its own.
 * Filled while the document is analysed, read-only afterwards.
 */
public final class Scope {
    private final Map<String, Binding> names = new HashMap<>();
    private final String text;

    Scope(String text) {
        this.text = text;
    }

    /** The source text of the document this scope belongs to (for messages about its functions). */
    String text() {
        return text;
    }

    public Binding lookup(String name) {
        Binding own = names.get(name);
        return own != null ? own : Builtins.lookup(name);
    }

    void put(String name, Binding binding) {
        names.put(name, binding);
    }

    boolean definesOwn(String name) {
        return names.containsKey(name);
    }

    /** Every name a document can use, for suggestions. */
    public Collection<String> visibleNames() {
        var all = new java.util.TreeSet<>(names.keySet());
        all.addAll(Builtins.names());
        return all;
    }

    Map<String, Binding> all() {
        return names;
    }
}
