package dev.plumb.analysis;

import java.util.Collection;

/**
 * The standard library's names as a document sees them (or, while the library loads, as one of
 * its own files sees those before it). A name the library does not define falls through to the
 * built-ins, as it always has.
 */
interface LibraryNames {
    /** The binding of {@code name}, or null when neither the library nor the built-ins define it. */
    Binding lookup(String name);

    /** Every name visible through this view, for suggestions and completion. */
    Collection<String> visibleNames();
}
