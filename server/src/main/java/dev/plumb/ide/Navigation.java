package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;

/** Go to definition: from a name used in the document to where it is defined. */
public final class Navigation {
    private Navigation() {
    }

    /** The definition of the name at an offset, or null (not a name, or a built-in). */
    public static Target definitionAt(Analysis a, int offset) {
        Analysis.Reference r = a.referenceAt(offset);
        if (r == null) return null;
        Binding b = a.scope().lookup(r.name());
        if (b == null || b.file() == null) return null;
        return new Target(b.file(), b.span());
    }
}
