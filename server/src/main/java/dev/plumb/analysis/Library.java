package dev.plumb.analysis;

import java.util.List;
import java.util.function.Function;

/**
 * What every document sees besides its own and imported names: the standard library's names,
 * and its correlations by family (offered where a call is out of range). Passed to each
 * analysis explicitly, so what a warning offers depends on the library the workspace was given,
 * never on what some other code has loaded.
 *
 * @param names the library's names; null for none
 * @param families the library's members of a family; none while the library itself loads
 */
record Library(LibraryNames names, Function<String, List<Binding>> families) {
    /** No library at all. */
    static final Library NONE = new Library(null, family -> List.of());

    /** The names read so far, with no families: what the library's own files see while it loads. */
    static Library loading(LibraryNames soFar) {
        return new Library(soFar, family -> List.of());
    }
}
