package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Severity;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import dev.plumb.units.DisplayUnits;
import dev.plumb.units.Unit;
import dev.plumb.units.UnitRegistry;
import dev.plumb.units.UnitResult;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Analyses one document: imports, names, dependency order, evaluation, checks. One instance per
 * run; the result is an immutable {@link Analysis}.
 */
final class FileAnalyzer {
    private static final java.util.regex.Pattern WORD = java.util.regex.Pattern.compile("[\\p{L}_][\\p{L}\\p{Nd}_]*");

    private final Workspace workspace;
    private final Path file;
    private final String text;
    /** An earlier parse of this document, to reparse from; null for none. */
    private final ParsedSource earlier;
    private final List<Path> chain;
    private final Settings settings;
    private final UnitRegistry units = UnitRegistry.standard();
    private final Reporter reporter = new Reporter();
    private final Scope scope;
    private final Map<Path, Set<String>> importedUses = new HashMap<>();
    private final List<Path> imports = new ArrayList<>();
    /** Own statements that define a name, by name (the first definition wins). */
    private final Map<String, Statement> own = new LinkedHashMap<>();
    // Statements are records whose hash walks the whole syntax tree: key them by identity.
    private final Set<Statement> duplicates = java.util.Collections.newSetFromMap(new java.util.IdentityHashMap<>());
    private final Set<String> used = new HashSet<>();
    private final List<Analysis.Reference> references = new ArrayList<>();
    private final Map<Statement, Row> rows = new java.util.IdentityHashMap<>();
    /** For each `seek`, the definitions re-evaluated with each trial value, in order. */
    private final Map<String, List<Statement.Definition>> dependents = new HashMap<>();

    FileAnalyzer(Workspace workspace, Path file, String text, ParsedSource earlier, List<Path> chain, Settings settings) {
        this.workspace = workspace;
        this.file = file;
        this.text = text;
        this.earlier = earlier;
        this.chain = chain;
        this.settings = settings;
        this.scope = new Scope(text, workspace.library());
        this.scope.setCriticalReynolds(settings.criticalReynolds());
    }

    Analysis run() {
        ParsedSource parsed = earlier == null ? SourceParser.parse(text) : SourceParser.reparse(earlier, text);
        parsed.diagnostics().forEach(reporter::add);
        Map<String, String> headers = new LinkedHashMap<>();
        for (Statement s : parsed.statements()) {
            if (s instanceof Statement.Header h) headers.putIfAbsent(h.key(), h.text());
            if (s instanceof Statement.Use u) importFile(u);
        }
        for (Statement s : parsed.statements()) declare(s);
        Map<String, Set<String>> uses = resolveNames(parsed.statements());
        Map<String, Set<String>> solvedWith = SeekDependents.adjust(own, uses);
        DependencyOrder.Result order = DependencyOrder.of(uses);
        for (var entry : solvedWith.entrySet()) {
            List<Statement.Definition> inOrder = new ArrayList<>();
            for (String n : order.order()) {
                if (entry.getValue().contains(n) && own.get(n) instanceof Statement.Definition d) inOrder.add(d);
            }
            dependents.put(entry.getKey(), inOrder);
        }
        Set<String> inCycle = reportCycles(order.cycles());
        for (String name : order.order()) {
            workspace.checkSuperseded();
            evaluate(own.get(name), inCycle.contains(name));
        }
        for (Statement s : parsed.statements()) {
            if (duplicates.contains(s)) evaluate(s, false);
            if (s instanceof Statement.Check c) rows.put(c, new CheckRunner(scope, reporter, text, settings).run(c));
        }
        reportUnusedInputs();
        return new Analysis(file, text, parsed, headers, rowsInOrder(parsed.statements()), sorted(reporter.all()),
            scope, importedUses, imports, references, reporter.calls());
    }

    // ---- imports ---------------------------------------------------------------------

    private void importFile(Statement.Use u) {
        Path folder = file.toAbsolutePath().getParent();
        Path target;
        try {
            target = folder.resolve(u.path()).normalize();
        } catch (java.nio.file.InvalidPathException e) {
            reporter.report(Code.USE_NOT_FOUND, u.pathSpan(), "cannot use \"" + u.path().replace("\0", "\\0")
                + "\": it is not a file path here (" + e.getReason() + "): write the path of a .plumb file");
            return;
        }
        Path root = workspace.sources().workspaceRoot(file);
        if (!target.startsWith(root)) {
            reporter.report(Code.USE_OUTSIDE_WORKSPACE, u.pathSpan(), "\"" + u.path() + "\" leads outside the workspace ("
                + root + ", the nearest folder holding .git or plumb.toml): copy the file into the workspace");
            return;
        }
        Path self = file.toAbsolutePath().normalize();
        if (chain.contains(target) || target.equals(self)) {
            // The loop as seen from this file: this file, the target, … back to this file.
            List<Path> loop = new ArrayList<>(chain.subList(Math.max(0, chain.indexOf(target)), chain.size()));
            loop.add(self);
            java.util.Collections.rotate(loop, -loop.indexOf(self));
            imports.add(target);
            reportUseCycle(u, loop);
            return;
        }
        List<Path> nextChain = new ArrayList<>(chain);
        nextChain.add(file.toAbsolutePath().normalize());
        Workspace.Imported imported = workspace.analyzeImport(target, nextChain);
        if (imported.analysis() == null) {
            reporter.report(Code.USE_NOT_FOUND, u.pathSpan(), "cannot use \"" + u.path() + "\": " + imported.problem()
                + " (looked for " + target + ")");
            return;
        }
        imports.add(target);
        Analysis a = imported.analysis();
        List<Path> back = workspace.importPath(target, self);
        if (back != null) {
            List<Path> loop = new ArrayList<>();
            loop.add(self);
            loop.addAll(back.subList(0, back.size() - 1));
            reportUseCycle(u, loop);
        } else {
            reportImportedErrors(u, a);
        }
        for (var entry : a.scope().all().entrySet()) {
            Binding existing = scope.all().get(entry.getKey());
            if (existing == null) {
                scope.put(entry.getKey(), entry.getValue());
            } else if (!sameOrigin(existing, entry.getValue())) {
                reporter.report(Code.NAME_DUPLICATE, u.pathSpan(), entry.getKey() + " is defined both in "
                    + name(existing.file()) + " and in " + name(entry.getValue().file()) + ": rename one of them");
            }
        }
    }

    private void reportUseCycle(Statement.Use u, List<Path> loop) {
        List<String> names = new ArrayList<>();
        for (Path p : loop) names.add(p.getFileName().toString());
        names.add(loop.get(0).getFileName().toString());
        reporter.report(Code.USE_CYCLE, u.pathSpan(), "files use each other in a circle (" + String.join(" → ", names)
            + "): move the shared definitions into a file of their own");
    }

    /**
     * Errors in a used file leave values unknown here: an error. Failed checks there leave every
     * value intact, so they are a warning here (the file's own check reports them as errors).
     */
    private void reportImportedErrors(Statement.Use u, Analysis a) {
        List<Diagnostic> errors = a.diagnostics().stream().filter(d -> d.severity() == Severity.ERROR).toList();
        if (errors.isEmpty()) return;
        List<Diagnostic> blocking = errors.stream().filter(d -> d.code() != Code.CHECK_FAILED).toList();
        Diagnostic first = blocking.isEmpty() ? errors.get(0) : blocking.get(0);
        String where = "; the first, on line " + a.lines().line(first.span().start()) + ": " + first.message();
        if (blocking.isEmpty()) {
            reporter.add(new Diagnostic(Code.USE_HAS_ERRORS, Severity.WARNING, u.pathSpan(), "\"" + u.path() + "\" has "
                + plural(errors.size(), "failing check") + where + ". Its values are computed; review the check there",
                List.of()));
            return;
        }
        reporter.report(Code.USE_HAS_ERRORS, u.pathSpan(), "\"" + u.path() + "\" has " + plural(blocking.size(), "error")
            + where + ". Fix them there: values here that depend on them are unknown");
    }

    private static String plural(int n, String word) {
        return n + " " + word + (n == 1 ? "" : "s");
    }

    private static boolean sameOrigin(Binding a, Binding b) {
        return a.file() != null && a.file().equals(b.file()) && a.span().equals(b.span());
    }

    private static String name(Path p) {
        return p == null ? "the built-ins" : p.getFileName().toString();
    }

    // ---- names -----------------------------------------------------------------------

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
                    + name(imported.file()) + ": rename it here or there")
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
        if (s instanceof Statement.Correlation c) {
            scope.put(n, new Binding.CorrelationBinding(file, c.name().span(), c, scope, false));
            new BlockChecks(reporter, units).correlation(c);
        }
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
            scope.put(n, new Binding.FunctionBinding(file, f.name().span(), f, scope, false));
            Set<String> seen = new HashSet<>();
            for (Ident p : f.params()) {
                if (!seen.add(p.text())) {
                    reporter.report(Code.NAME_DUPLICATE, p.span(), "parameter " + p.text() + " is listed twice");
                }
            }
        }
    }

    static Ident definedName(Statement s) {
        if (s instanceof Statement.Definition d) return d.name();
        if (s instanceof Statement.Function f) return f.name();
        if (s instanceof Statement.Correlation c) return c.name();
        if (s instanceof Statement.Table t) return t.name();
        if (s instanceof Statement.Seek f) return f.name();
        if (s instanceof Statement.Broken b) return b.name();
        return null;
    }

    private int lineOf(Span span) {
        return (int) text.substring(0, Math.min(span.start(), text.length())).chars().filter(c -> c == '\n').count() + 1;
    }

    /** Reports unknown names and returns, for each own definition, the own names it uses. */
    private Map<String, Set<String>> resolveNames(List<Statement> statements) {
        Map<String, Set<String>> uses = new LinkedHashMap<>();
        for (String n : own.keySet()) uses.put(n, new LinkedHashSet<>());
        for (Statement s : statements) {
            Set<String> deps = own.get(nameOf(s)) == s ? uses.get(nameOf(s)) : new LinkedHashSet<>();
            Set<String> params = new HashSet<>();
            List<Expr> exprs = new ArrayList<>();
            if (s instanceof Statement.Definition d) exprs.add(d.expr());
            if (s instanceof Statement.Check c) exprs.addAll(c.operands());
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
                // The unknown is not a dependency of its own equation.
                params.add(f.name().text());
                used.add(f.name().text());
                for (Expr e : new Expr[] {f.low(), f.high(), f.start(), f.lhs(), f.rhs()}) {
                    if (e != null) exprs.add(e);
                }
            }
            for (Expr e : exprs) {
                References.each(e, (n, span) -> {
                    if (params.contains(n)) return;
                    used.add(n);
                    references.add(new Analysis.Reference(n, span));
                    if (own.containsKey(n)) {
                        deps.add(n);
                        return;
                    }
                    Binding b = scope.lookup(n);
                    if (b == null) {
                        unknownName(n, span);
                    } else if (b.file() != null) {
                        importedUses.computeIfAbsent(b.file(), k -> new HashSet<>()).add(n);
                    }
                });
            }
        }
        return uses;
    }

    private static String nameOf(Statement s) {
        Ident i = definedName(s);
        return i == null ? "" : i.text();
    }

    private void unknownName(String n, Span span) {
        Set<String> known = new HashSet<>(scope.visibleNames());
        known.addAll(own.keySet());
        List<String> close = Suggestions.closest(n, known, 3);
        String message = "unknown name '" + n + "'" + Suggestions.didYouMean(close);
        if (units.resolve(n) instanceof UnitResult.Ok) {
            message += "; '" + n + "' is a unit: write it right after a number, e.g. `3 " + n + "`";
        } else {
            message += ": define it, or `use` the file that defines it";
        }
        reporter.report(Code.NAME_UNKNOWN, span, message);
    }

    private Set<String> reportCycles(List<List<String>> cycles) {
        Set<String> members = new HashSet<>();
        for (List<String> cycle : cycles) {
            List<String> loop = new ArrayList<>(cycle);
            loop.add(cycle.get(0));
            for (String member : cycle) {
                members.add(member);
                if (own.get(member) instanceof Statement.Function f) {
                    scope.put(member, new Binding.FunctionBinding(file, f.name().span(), f, scope, true));
                }
                if (own.get(member) instanceof Statement.Correlation c) {
                    scope.put(member, new Binding.CorrelationBinding(file, c.name().span(), c, scope, true));
                }
                String message = cycle.size() == 1
                    ? "circular definition: " + member + " uses itself; "
                        + (own.get(member) instanceof Statement.Definition ? "give it a value that does not depend on itself"
                            : "a function or correlation may not call itself")
                    : "circular definition: " + String.join(" → ", loop)
                        + "; one of them must be given a value that does not depend on the others";
                reporter.report(Code.NAME_CYCLE, definedName(own.get(member)).span(), message);
            }
        }
        return members;
    }

    // ---- evaluation ------------------------------------------------------------------

    private void evaluate(Statement s, boolean inCycle) {
        if (s instanceof Statement.Broken b) {
            if (!duplicates.contains(s) && b.name() != null) {
                scope.put(b.name().text(), new Binding.ValueBinding(file, b.name().span(), Value.UNKNOWN, null, null, false, null));
            }
            rows.put(s, new Row.ValueRow(b.span(), b.name() == null ? "?" : b.name().text(), false, Value.UNKNOWN, "?", null,
                null, null, null));
            return;
        }
        if (s instanceof Statement.Function f) {
            String signature = f.name().text() + "(" + String.join(", ", f.params().stream().map(Ident::text).toList()) + ")";
            rows.put(s, new Row.FunctionRow(f.span(), signature, "function", f.note()));
            return;
        }
        if (s instanceof Statement.Correlation c) {
            String signature = c.name().text() + "(" + String.join(", ", c.params().stream().map(p -> p.name().text())
                .toList()) + ")";
            rows.put(s, new Row.FunctionRow(c.span(), signature, "correlation", c.title()));
            new BlockChecks(reporter, units).accuracy(c, scope, text);
            return;
        }
        if (s instanceof Statement.Table t) {
            String signature = t.name().text() + "(" + t.param().name().text() + ")";
            rows.put(s, new Row.FunctionRow(t.span(), signature, "table", t.title()));
            return;
        }
        if (s instanceof Statement.Seek f) {
            evaluateSeek(f, inCycle);
            return;
        }
        if (!(s instanceof Statement.Definition d)) return;
        Evaluator evaluator = new Evaluator(scope, reporter, text, units);
        Value v = evaluator.eval(d.expr());
        if (inCycle) v = Value.UNKNOWN;
        Unit display = displayUnit(d, v, evaluator);
        Tagged tagged = tagged(d.name(), d.basis(), v);
        v = tagged.value();
        String basis = tagged.tag();
        Origin origin = BlockChecks.origin(d.expr(), scope, units);
        if (!duplicates.contains(s)) {
            scope.put(d.name().text(), new Binding.ValueBinding(file, d.name().span(), v, display, basis, d.input(), origin));
        }
        String shown = Shown.value(v, display, settings.significantFigures());
        rows.put(s, new Row.ValueRow(d.span(), d.name().text(), d.input(), v, shown, basis, d.note(), origin, null));
    }

    /** A value with the tag its `as` gave it; the tag is null when there is none or it was refused. */
    private record Tagged(Value value, String tag) {
    }

    /** Applies `as TAG` (the word, or null) to a value; a tag that does not fit what the value is, is reported. */
    private Tagged tagged(Ident named, Ident word, Value v) {
        String tag = basisOf(word);
        if (tag == null || !v.known()) return new Tagged(v, tag);
        String name = named.text();
        boolean density = BlockChecks.DENSITY_TAGS.contains(tag);
        if (v.dimension().equals(density ? BasisRules.DENSITY : BasisRules.AREA)) {
            return new Tagged(v.noted(density ? BasisRules.densityTagged(v, tag, name) : BasisRules.tagged(v, tag, name)),
                tag);
        }
        reporter.report(density ? Code.BASIS_DENSITY : Code.BASIS_AREA, word.span(), "`as " + tag + "` "
            + (density ? "says whose density a value is" : "tags areas") + ", but " + name + " is "
            + v.dimension().describe() + ": remove the tag");
        return new Tagged(v, null);
    }

    private void evaluateSeek(Statement.Seek f, boolean inCycle) {
        String name = f.name().text();
        if (inCycle || duplicates.contains(f)) {
            rows.put(f, new Row.ValueRow(f.span(), name, false, Value.UNKNOWN, "?", null, f.note(), null, null));
            return;
        }
        SeekRunner.Outcome outcome = new SeekRunner(scope, reporter, text, file, units)
            .run(f, dependents.getOrDefault(name, List.of()));
        Value v = outcome.value();
        Evaluator evaluator = new Evaluator(scope, reporter, text, units);
        Unit display = v.known() ? displayUnit(f, v, evaluator) : null;
        Tagged tagged = tagged(f.name(), f.basis(), v);
        v = tagged.value();
        String basis = tagged.tag();
        scope.put(name, new Binding.ValueBinding(file, f.name().span(), v, display, basis, false, null));
        String shown = Shown.value(v, display, settings.significantFigures());
        rows.put(f, new Row.ValueRow(f.span(), name, false, v, shown, basis, f.note(), null, outcome.solution()));
    }

    private Unit displayUnit(Statement.Seek f, Value v, Evaluator evaluator) {
        if (f.displayUnit() != null) {
            Unit u = evaluator.resolveUnit(f.displayUnit(), false);
            if (u != null && u.dimension().equals(v.dimension())) return u;
            if (u != null) {
                reporter.report(Code.UNIT_MISMATCH, f.displayUnit().span(), "`in " + f.displayUnit().text() + "` shows "
                    + u.dimension().describe() + ", but " + f.name().text() + " is " + v.dimension().describe());
            }
            return DisplayUnits.defaultFor(v.dimension());
        }
        Expr end = f.low() != null ? f.low() : f.start();
        if (end instanceof Expr.Unary u) end = u.operand();
        if (end instanceof Expr.Quantity q && q.unit() != null && units.resolve(q.unit().text()) instanceof UnitResult.Ok ok
            && ok.unit().dimension().equals(v.dimension())) {
            return ok.unit();
        }
        return DisplayUnits.defaultFor(v.dimension());
    }

    private Unit displayUnit(Statement.Definition d, Value v, Evaluator evaluator) {
        Unit fallback = v.known() ? DisplayUnits.defaultFor(v.dimension()) : null;
        if (d.displayUnit() != null) {
            Unit u = evaluator.resolveUnit(d.displayUnit(), false);
            if (u == null || !v.known()) return fallback;
            if (!u.dimension().equals(v.dimension())) {
                String fix = v.dimensionless()
                    ? ": a plain number has no unit to show; drop `in " + d.displayUnit().text() + "`, or give a number"
                        + " in the expression its unit (write `5 mm`, not `5 in mm`)"
                    : ": use a unit of that dimension, such as " + fallback.symbol();
                reporter.report(Code.UNIT_MISMATCH, d.displayUnit().span(), "`in " + d.displayUnit().text() + "` shows "
                    + u.dimension().describe() + ", but " + d.name().text() + " is " + v.dimension().describe() + fix);
                return fallback;
            }
            return u;
        }
        Expr e = d.expr();
        if (e instanceof Expr.Unary u) e = u.operand();
        if (e instanceof Expr.Quantity q && q.unit() != null && v.known()
            && units.resolve(q.unit().text()) instanceof UnitResult.Ok ok) {
            return ok.unit();
        }
        return fallback;
    }

    private String basisOf(Ident word) {
        if (word == null) return null;
        String b = word.text();
        if (BlockChecks.BASES.contains(b) || BlockChecks.DENSITY_TAGS.contains(b)) return b;
        Set<String> tags = new HashSet<>(BlockChecks.BASES);
        tags.addAll(BlockChecks.DENSITY_TAGS);
        reporter.report(Code.BASIS_UNKNOWN, word.span(), "unknown tag '" + b + "'"
            + Suggestions.didYouMean(Suggestions.closest(b, tags, 1))
            + ": an area is frontal, wetted or planform; a density is fluid or body");
        return null;
    }

    private void reportUnusedInputs() {
        // A line with a syntax error still mentions the names it meant to use.
        for (Statement s : allStatements()) {
            if (s instanceof Statement.Broken b) {
                java.util.regex.Matcher m = WORD.matcher(text.substring(b.span().start(), b.span().end()));
                while (m.find()) used.add(m.group());
            }
        }
        for (Statement s : own.values()) {
            if (s instanceof Statement.Definition d && d.input() && !used.contains(d.name().text())) {
                reporter.report(Code.INPUT_UNUSED, d.name().span(), "input " + d.name().text()
                    + " is not used by any value or check: use it, or remove it");
            }
        }
    }

    // ---- results ---------------------------------------------------------------------

    private List<Statement> allStatements() {
        List<Statement> all = new ArrayList<>(own.values());
        all.addAll(duplicates);
        return all;
    }

    private List<Row> rowsInOrder(List<Statement> statements) {
        List<Row> out = new ArrayList<>();
        for (Statement s : statements) {
            if (s instanceof Statement.Section sec) out.add(new Row.SectionRow(sec.span(), sec.title()));
            else if (s instanceof Statement.Narrative n) out.add(new Row.NarrativeRow(n.span(), n.text()));
            else if (rows.containsKey(s)) out.add(rows.get(s));
        }
        return out;
    }

    private static List<Diagnostic> sorted(List<Diagnostic> all) {
        List<Diagnostic> out = new ArrayList<>(all);
        out.sort(java.util.Comparator.comparingInt((Diagnostic d) -> d.span().start()).thenComparing(d -> d.code().id()));
        return out;
    }
}
