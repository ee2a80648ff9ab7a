package dev.plumb.ide;

import dev.plumb.analysis.Analysis;
import dev.plumb.analysis.Binding;
import dev.plumb.analysis.Row;
import dev.plumb.diagnostics.Span;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/** Where a name occurs in a document — its definition and every use — for references, highlights and rename. */
public final class Occurrences {
    private static final Pattern NAME = Pattern.compile("[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private Occurrences() {
    }

    /** The name at an offset: a use, or a definition's name. */
    public static String nameAt(Analysis a, int offset) {
        Analysis.Reference r = a.referenceAt(offset);
        if (r != null) return r.name();
        for (Row row : a.rows()) {
            if (!row.span().contains(offset)) continue;
            String name = row instanceof Row.ValueRow v ? v.name()
                : row instanceof Row.FunctionRow f ? f.signature().substring(0, f.signature().indexOf('(')) : null;
            Binding b = name == null ? null : a.scope().lookup(name);
            if (b != null && b.span().start() <= offset && offset <= b.span().end()) return name;
        }
        return null;
    }

    /** The definition (when in this document) and every use, in order. */
    public static List<Span> of(Analysis a, String name) {
        List<Span> out = new ArrayList<>();
        Binding b = a.scope().lookup(name);
        if (b != null && a.file().equals(b.file())) out.add(b.span());
        for (Analysis.Reference r : a.references()) {
            if (r.name().equals(name)) out.add(r.span());
        }
        out.sort(java.util.Comparator.comparingInt(Span::start));
        return out;
    }

    /**
     * Edits that rename a name defined in this document, or why not: the new name must be a name,
     * must not be defined already (here, by a used file, the library or the built-ins).
     */
    public static Renaming rename(Analysis a, int offset, String newName) {
        String name = nameAt(a, offset);
        if (name == null) return Renaming.refused("there is no name here to rename");
        Binding b = a.scope().lookup(name);
        if (b == null || !a.file().equals(b.file())) {
            return Renaming.refused(name + " is not defined in this file: rename it where it is defined");
        }
        if (!NAME.matcher(newName).matches() || newName.equals("in") || newName.equals("as")) {
            return Renaming.refused("'" + newName + "' is not a name: use letters, digits and _ and start with a letter");
        }
        if (a.scope().lookup(newName) != null) return Renaming.refused(newName + " is already defined: choose another name");
        List<Edit> edits = new ArrayList<>();
        for (Span s : of(a, name)) edits.add(new Edit(s.start(), s.length(), newName));
        return new Renaming(edits, null);
    }

    /** The edits of a rename, or the reason it was refused. */
    public record Renaming(List<Edit> edits, String refusal) {
        static Renaming refused(String why) {
            return new Renaming(List.of(), why);
        }
    }
}
