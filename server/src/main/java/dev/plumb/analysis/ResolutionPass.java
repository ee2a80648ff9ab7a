package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Fix;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The third pass: what every name in the document's formulas stands for. Builds the side table
 * of references (for hover, go-to-definition, rename) and the dependency graph of the own
 * definitions, and reports names that are defined nowhere.
 */
final class ResolutionPass {
    /**
     * @param uses for each own definition, the own names it uses, in source order: the dependency graph
     * @param references every name used, where
     * @param used every name used anywhere, own or not (for the unused-input hint)
     * @param importedUses for each used file, the names of it this document uses
     */
    record Resolution(Map<String, Set<String>> uses, List<Analysis.Reference> references, Set<String> used,
                      Map<Path, Set<String>> importedUses) {
        /** Read-only views of what the pass built and handed over (it keeps no reference): no copies. */
        Resolution {
            uses.replaceAll((k, v) -> Collections.unmodifiableSet(v));
            uses = Collections.unmodifiableMap(uses);
            references = Collections.unmodifiableList(references);
            used = Collections.unmodifiableSet(used);
            importedUses.replaceAll((k, v) -> Collections.unmodifiableSet(v));
            importedUses = Collections.unmodifiableMap(importedUses);
        }
    }

    private final Scope scope;
    private final Map<String, Statement> own;
    private final Reporter reporter;
    private final UnitRegistry units;
    private final Set<String> used = new HashSet<>();
    private final List<Analysis.Reference> references = new ArrayList<>();
    private final Map<Path, Set<String>> importedUses = new HashMap<>();

    ResolutionPass(Scope scope, Map<String, Statement> own, Reporter reporter, UnitRegistry units) {
        this.scope = scope;
        this.own = own;
        this.reporter = reporter;
        this.units = units;
    }

    Resolution run(List<Statement> statements) {
        Map<String, Set<String>> uses = new LinkedHashMap<>();
        for (String n : own.keySet()) uses.put(n, new LinkedHashSet<>());
        for (Statement s : statements) {
            Set<String> deps = own.get(nameOf(s)) == s ? uses.get(nameOf(s)) : new LinkedHashSet<>();
            Set<String> params = new HashSet<>();
            List<Expr> exprs = new ArrayList<>();
            collect(s, exprs, params);
            named(s);
            for (Expr e : exprs) {
                References.each(e, (n, span) -> {
                    // The unknown a solve statement solves for is used in its own equation: a
                    // reference (rename and references must see it), though not a dependency.
                    if (s instanceof Statement.Seek seek && n.equals(seek.name().text())) {
                        references.add(new Analysis.Reference(n, span));
                        return;
                    }
                    if (s instanceof Statement.SeekSystem k && SeekSystems.unknowns(k).contains(n)) {
                        references.add(new Analysis.Reference(n, span));
                        return;
                    }
                    if (s instanceof Statement.Evolve k && Motions.names(k).contains(n)) {
                        references.add(new Analysis.Reference(n, span));
                        return;
                    }
                    if (params.contains(n)) return;
                    used.add(n);
                    references.add(new Analysis.Reference(n, span));
                    if (own.containsKey(n)) {
                        deps.add(n);
                        return;
                    }
                    Binding b = scope.lookup(n);
                    if (b == null) {
                        unknownName(n, span, nameOf(s));
                    } else if (b.file() != null) {
                        importedUses.computeIfAbsent(b.file(), k -> new HashSet<>()).add(n);
                    }
                });
            }
            // The other unknowns of a several-unknown solve take their values from the first's statement.
            if (s instanceof Statement.SeekSystem k && k.index() > 0 && own.get(nameOf(s)) == s) {
                deps.add(SeekSystems.leader(k));
            }
            // The states a motion draws are references to them (rename, references), checked by the motion.
            if (s instanceof Statement.Evolve k && k.index() == 0) {
                for (Ident d : k.motion().drawn()) {
                    used.add(d.text());
                    references.add(new Analysis.Reference(d.text(), d.span()));
                }
            }
            // A motion's states take their values from its time's statement, which integrates it.
            if (s instanceof Statement.Evolve k && k.index() > 0 && own.get(nameOf(s)) == s) deps.add(Motions.leader(k));
        }
        // A study names its value before its formulas and its results after: keep the table in source order.
        references.sort(java.util.Comparator.comparingInt(r -> r.span().start()));
        return new Resolution(uses, references, used, importedUses);
    }

    /**
     * The names a study statement names outright (the value a sweep varies and the results it
     * shows, the values a case sets): used and referenced like a name in a formula, never a dependency.
     */
    private void named(Statement s) {
        List<Ident> names = new ArrayList<>();
        if (s instanceof Statement.Sweep w) {
            names.add(w.name());
            if (w.across() != null) names.add(w.across().name());
            w.shown().forEach(x -> names.add(x.name()));
        }
        if (s instanceof Statement.Case c) c.settings().forEach(x -> names.add(x.name()));
        for (Ident n : names) {
            used.add(n.text());
            references.add(new Analysis.Reference(n.text(), n.span()));
            if (own.containsKey(n.text())) continue;
            Binding b = scope.lookup(n.text());
            if (b == null) unknownName(n.text(), n.span(), "");
            else if (b.file() != null) importedUses.computeIfAbsent(b.file(), k -> new HashSet<>()).add(n.text());
        }
    }

    /** The expressions of a statement, and the names that are its own parameters there. */
    private void collect(Statement s, List<Expr> exprs, Set<String> params) {
        if (s instanceof Statement.Definition d) {
            exprs.add(d.expr());
            if (d.tolerance() != null) exprs.add(d.tolerance().amount());
        }
        if (s instanceof Statement.Check c) exprs.addAll(c.operands());
        if (s instanceof Statement.Sweep || s instanceof Statement.Case) exprs.addAll(dev.plumb.syntax.ExprWalk.of(s));
        if (s instanceof Statement.Function f) {
            exprs.add(f.body());
            f.params().forEach(p -> params.add(p.text()));
        }
        if (s instanceof Statement.Correlation c) {
            c.params().forEach(p -> params.add(p.name().text()));
            for (Statement.Piece piece : c.pieces()) {
                exprs.add(piece.expr());
                if (piece.condition() != null) exprs.addAll(piece.condition().operands());
            }
            c.valid().forEach(b -> exprs.addAll(b.operands()));
            c.domain().forEach(b -> exprs.addAll(b.operands()));
            if (c.accuracy() != null) exprs.add(c.accuracy());
        }
        if (s instanceof Statement.Table t) {
            params.add(t.param().name().text());
            t.valid().forEach(b -> exprs.addAll(b.operands()));
            t.domain().forEach(b -> exprs.addAll(b.operands()));
        }
        if (s instanceof Statement.Seek f) {
            // The unknown is not a dependency of its own equation, but it is used.
            params.add(f.name().text());
            used.add(f.name().text());
            for (Expr e : new Expr[] {f.low(), f.high(), f.start(), f.lhs(), f.rhs()}) {
                if (e != null) exprs.add(e);
            }
        }
        if (s instanceof Statement.SeekSystem k && k.index() == 0) {
            // The unknowns are not dependencies of their own equations, but they are used.
            for (String n : SeekSystems.unknowns(k)) {
                params.add(n);
                used.add(n);
            }
            exprs.addAll(dev.plumb.syntax.ExprWalk.of(k));
        }
        if (s instanceof Statement.Evolve k && k.index() == 0) {
            // The time and the states are bound by the motion itself, not dependencies of its formulas.
            for (String n : Motions.names(k)) {
                params.add(n);
                used.add(n);
            }
            exprs.addAll(dev.plumb.syntax.ExprWalk.of(k));
        }
    }

    private static String nameOf(Statement s) {
        Ident i = DeclarationPass.definedName(s);
        return i == null ? "" : i.text();
    }

    /** @param self the name the statement defines: offering it would make the definition use itself */
    private void unknownName(String n, Span span, String self) {
        Set<String> known = new HashSet<>(scope.visibleNames());
        known.addAll(own.keySet());
        known.remove(self);
        List<String> close = Suggestions.closest(n, known, 3);
        String message = "unknown name '" + n + "'" + Suggestions.didYouMean(close);
        if (units.resolve(n) instanceof UnitResult.Ok) {
            message += "; '" + n + "' is a unit: write it right after a number, e.g. `3 " + n + "`";
        } else {
            message += ": define it, or `use` the file that defines it";
        }
        List<Fix> fixes = new ArrayList<>();
        for (String name : close) fixes.add(new Fix("Change to '" + name + "'", span, name));
        reporter.report(Code.NAME_UNKNOWN, span, message, fixes, List.of());
    }
}
