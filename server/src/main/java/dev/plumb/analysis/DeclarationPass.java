package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.nio.file.Path;
import java.util.Collections;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;

/**
 * The second pass: which statement defines each name. The first definition of a name counts; a
 * second one, a name the imports or the built-ins already hold, and a repeated parameter are
 * reported. A table's numbers are read here (its columns become functions in the scope); the
 * other blocks' declarations are checked.
 */
final class DeclarationPass {
    /**
     * @param own the statement defining each name, in source order (the first definition wins)
     * @param duplicates statements that define a name already defined, in source order (so their
     *     findings and calls come out in the same order on every run); they are evaluated for
     *     their own findings but bind nothing
     */
    record Declarations(Map<String, Statement> own, java.util.List<Statement> duplicates) {
        Declarations {
            own = Collections.unmodifiableMap(own);
            duplicates = Collections.unmodifiableList(duplicates);
        }

        /** The statements that define names: every first definition, then the duplicates. */
        java.util.List<Statement> all() {
            java.util.List<Statement> out = new java.util.ArrayList<>(own.values());
            out.addAll(duplicates);
            return out;
        }
    }

    private final Path file;
    private final String text;
    private final Scope scope;
    private final Reporter reporter;
    private final UnitRegistry units;
    private final Map<String, Statement> own = new LinkedHashMap<>();
    // Statements are records whose hash walks the whole syntax tree: key them by identity.
    private final java.util.List<Statement> duplicates = new java.util.ArrayList<>();

    /** @param scope the document's scope, holding its imports; table columns are added to it */
    DeclarationPass(Path file, String text, Scope scope, Reporter reporter, UnitRegistry units) {
        this.file = file;
        this.text = text;
        this.scope = scope;
        this.reporter = reporter;
        this.units = units;
    }

    Declarations run(Iterable<Statement> statements) {
        for (Statement s : statements) declare(s);
        return new Declarations(own, duplicates);
    }

    private void declare(Statement s) {
        Ident name = definedName(s);
        if (name == null) return;
        String n = name.text();
        if (Builtins.isBuiltin(n)) {
            reporter.report(Code.NAME_DUPLICATE, name.span(), n + " is built in: choose another name");
            duplicates.add(s);
            return;
        }
        Binding imported = scope.all().get(n);
        if (imported != null && !own.containsKey(n)) {
            reporter.add(Diagnostic.of(Code.NAME_DUPLICATE, name.span(), n + " is already defined in "
                    + ImportPass.fileName(imported.file()) + ": rename it here or there")
                .withRelated(new Related(String.valueOf(imported.file()), imported.span(), "defined here")));
            duplicates.add(s);
            return;
        }
        Statement first = own.get(n);
        if (first != null) {
            Ident firstName = definedName(first);
            reporter.add(Diagnostic.of(Code.NAME_DUPLICATE, name.span(), n + " is already defined on line "
                    + lineOf(firstName.span()) + ": rename one of them or delete one")
                .withRelated(new Related(file.toString(), firstName.span(), "first defined here")));
            duplicates.add(s);
            return;
        }
        own.put(n, s);
        if (s instanceof Statement.Correlation c) new BlockChecks(reporter, units).correlation(c);
        if (s instanceof Statement.Table t) {
            for (Binding.TableBinding column : new BlockChecks(reporter, units).table(t, file, scope)) {
                if (!column.name().equals(n) && (own.containsKey(column.name()) || scope.all().containsKey(column.name()))) {
                    reporter.report(Code.NAME_DUPLICATE, t.name().span(), column.name() + " is already defined");
                    continue;
                }
                scope.put(column.name(), column);
            }
        }
        if (s instanceof Statement.Function f) {
            Set<String> seen = new HashSet<>();
            for (Ident p : f.params()) {
                if (!seen.add(p.text())) {
                    reporter.report(Code.NAME_DUPLICATE, p.span(), "parameter " + p.text() + " is listed twice");
                }
            }
        }
    }

    /** The name a statement defines, or null. */
    static Ident definedName(Statement s) {
        if (s instanceof Statement.Definition d) return d.name();
        if (s instanceof Statement.Function f) return f.name();
        if (s instanceof Statement.Correlation c) return c.name();
        if (s instanceof Statement.Table t) return t.name();
        if (s instanceof Statement.Seek f) return f.name();
        if (s instanceof Statement.SeekSystem k) return k.name();
        if (s instanceof Statement.Evolve k) return k.name();
        if (s instanceof Statement.Broken b) return b.name();
        return null;
    }

    private int lineOf(Span span) {
        return (int) text.substring(0, Math.min(span.start(), text.length())).chars().filter(c -> c == '\n').count() + 1;
    }
}
