package dev.plumb.analysis;

import java.util.Collection;
import java.util.HashMap;
import java.util.Map;

/**
 * The names visible in one document: built-ins, then imported names, then its own.
 * Filled while the document is analysed, read-only afterwards.
 */
public final class Scope implements LibraryNames {
    private final Map<String, Binding> names = new HashMap<>();
    private final String text;
    /** The standard library (or, while it loads, its files read so far). */
    private final Library library;
    /** A critical Reynolds number set for this analysis (settings), used where the library's would be; null for none. */
    private final Double criticalReynolds;

    Scope(String text) {
        this(text, Library.NONE, null);
    }

    Scope(String text, Library library, Double criticalReynolds) {
        this.text = text;
        this.library = library;
        this.criticalReynolds = criticalReynolds;
    }

    /** The source text of the document this scope belongs to (for messages about its functions). */
    String text() {
        return text;
    }

    /** A document's own and imported names first (they shadow the library), then the library, then built-ins. */
    @Override
    public Binding lookup(String name) {
        Binding own = names.get(name);
        if (own != null) return own;
        Binding fromLibrary = library.names() == null ? null : library.names().lookup(name);
        return fromLibrary != null ? fromLibrary : Builtins.lookup(name);
    }

    /** The library's correlations and tables of a family (none while the library loads). */
    java.util.List<Binding> family(String family) {
        return library.families().apply(family);
    }

    Double criticalReynolds() {
        return criticalReynolds;
    }

    /** The library's binding of a name, whatever this document defines under it; null for none. */
    Binding fromLibraryOnly(String name) {
        return library.names() == null ? null : library.names().lookup(name);
    }

    /** True when the name comes from the standard library (not defined or imported here). */
    boolean fromLibrary(String name) {
        return !names.containsKey(name) && library.names() != null && library.names().lookup(name) != null;
    }

    void put(String name, Binding binding) {
        names.put(name, binding);
    }

    boolean definesOwn(String name) {
        return names.containsKey(name);
    }

    /** Every name a document can use, for suggestions. */
    @Override
    public Collection<String> visibleNames() {
        var all = new java.util.TreeSet<>(names.keySet());
        if (library.names() != null) all.addAll(library.names().visibleNames());
        all.addAll(Builtins.names());
        return all;
    }

    Map<String, Binding> all() {
        return names;
    }
}
