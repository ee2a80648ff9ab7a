package dev.plumb.analysis;

import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Fix;
import dev.plumb.syntax.ParsedSource;
import dev.plumb.syntax.SourceParser;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Analyses one document by wiring the passes together, each returning an immutable value:
 * parse → {@link ImportPass} → {@link DeclarationPass} → {@link ResolutionPass} → {@link Planner}
 * (the {@link Plan}) → {@link EvaluationPass} → checks and lints → the {@link Analysis}. Every
 * pass reports to one {@link Reporter}. One instance per run.
 */
final class Analyzer {
    private final Workspace workspace;
    private final Path file;
    private final String text;
    /** An earlier parse of this document, to reparse from; null for none. */
    private final ParsedSource earlier;
    /**
     * What an earlier run of this document left for this one to take over ({@link ReusableValues#NONE}
     * for a first editor run); null for a run that keeps nothing for a next one (the command line).
     */
    private final ReusableValues reusable;
    private final List<Path> chain;
    private final Settings settings;
    private final UnitRegistry units;
    /** Asked between statements: true once nobody wants this run's result. */
    private final java.util.function.BooleanSupplier superseded;

    Analyzer(Workspace workspace, Path file, String text, ParsedSource earlier, ReusableValues reusable, List<Path> chain,
             Settings settings, UnitRegistry units, java.util.function.BooleanSupplier superseded) {
        this.reusable = reusable;
        this.superseded = superseded;
        this.workspace = workspace;
        this.file = file;
        this.text = text;
        this.earlier = earlier;
        this.chain = chain;
        this.settings = settings;
        this.units = units;
    }

    Analysis run() {
        Reporter reporter = new Reporter();
        ParsedSource parsed = earlier == null ? SourceParser.parse(text) : SourceParser.reparse(earlier, text);
        parsed.diagnostics().forEach(reporter::add);
        List<Statement> statements = parsed.statements();

        Double transition = Transitions.of(statements, reporter, Stdlib.isLibrary(file));
        Scope scope = new Scope(text, workspace.library(), transition != null ? transition : settings.criticalReynolds());
        ImportPass.Imports imports = new ImportPass(workspace, file, chain, reporter, superseded).run(statements);
        imports.names().forEach(scope::put);
        DeclarationPass.Declarations declared = new DeclarationPass(file, text, scope, reporter, units).run(statements);
        ResolutionPass.Resolution resolved = new ResolutionPass(scope, declared.own(), reporter, units).run(statements);
        Planner planner = new Planner(reporter);
        Plan plan = planner.run(declared.own(), resolved.uses(), new Definitions(file, text, scope, units),
            reusable == null ? null : reusable.order());
        bindBlocks(scope, plan);

        Budget budget = Budget.standard(superseded);
        EvaluationPass pass = new EvaluationPass(plan, scope, text, reporter, units, budget);
        // Only an editor's run keeps what the next run may take over: a `plumb check` never reuses it.
        if (reusable != null) {
            boolean fits = reusable.fits(file, settings, transition, workspace.library().names(), imports.names());
            pass.reusing(fits ? reusable : ReusableValues.NONE, resolved.uses());
        }
        EvaluationPass.Evaluated evaluated = pass.run(declared.duplicates());
        Map<Statement, Row> checkRows = new java.util.IdentityHashMap<>();
        CheckRunner checks = new CheckRunner(scope, evaluated.values(), reporter, text, settings, units, budget);
        for (Statement s : statements) {
            if (s instanceof Statement.Check c) checkRows.put(c, checks.withinBudget(c));
        }
        Map<Statement.Check, Row.CheckRow> checksInOrder = new LinkedHashMap<>();
        for (Statement s : statements) {
            if (s instanceof Statement.Check c) checksInOrder.put(c, (Row.CheckRow) checkRows.get(c));
        }
        StudyRun study = new StudyRun(plan, scope, evaluated.values(), resolved.uses(), checksInOrder, text, settings, units,
            budget);
        Map<Statement, Row> studyRows = Studies.run(statements, study, declared.own(), scope, reporter, text, units,
            budget, settings.significantFigures(), file);
        Map<String, Spread> spreads = Studies.spreads(statements, study, plan, scope, reporter, text, units, budget, settings,
            checkRows);
        UnusedInputs.report(resolved.used(), statements, declared.all(), text, reporter);
        UnitNameClash.report(statements, name -> declared.own().containsKey(name)
            ? evaluated.values().get(name) : null, scope, units, reporter);

        // The document's own values join its names: what hover, completion and importing files read.
        for (String name : plan.order()) {
            Binding.ValueBinding v = evaluated.values().get(name);
            if (v != null) scope.put(name, v);
        }
        Map<Statement, Row> shown = new java.util.IdentityHashMap<>(evaluated.rows());
        shown.putAll(studyRows);
        if (!spreads.isEmpty()) {
            shown.replaceAll((st, row) -> row instanceof Row.ValueRow v && spreads.containsKey(v.name())
                && declared.own().get(v.name()) == st ? v.withSpread(spreads.get(v.name())) : row);
        }
        Map<String, ModelForm> modelForms = new LinkedHashMap<>(ModelForms.of(statements, declared.own(), evaluated.values(),
            scope, text, units, budget));
        ModelForms.downstream(modelForms, study).forEach(modelForms::putIfAbsent);
        if (!modelForms.isEmpty()) {
            shown.replaceAll((st, row) -> row instanceof Row.ValueRow v && modelForms.containsKey(v.name())
                && declared.own().get(v.name()) == st ? v.withModelForm(modelForms.get(v.name())) : row);
        }
        List<Row> inOrder = rowsInOrder(statements, shown, checkRows);
        List<Diagnostic> diagnostics = Acceptances.apply(statements, declared.own(),
            reporter.all(request -> resolve(request, declared.own(), inOrder)));
        Map<String, String> headers = headers(statements);
        Transitions.describe(statements, transition).ifPresent(t -> headers.put("transition", t));
        List<Diagnostic> findings = sorted(diagnostics);
        return new Analysis(file, text, parsed, headers, inOrder, findings, scope,
            resolved.importedUses(), imports.files(), resolved.references(), reporter.calls(), settings,
            new DefinitionGraph(file, resolved.uses(), findingsByDefinition(declared.own(), findings),
                reusable == null ? ReusableValues.NONE : new ReusableValues(file, text, settings, transition,
                    workspace.library().names(), imports.names(), evaluated.reusable(), evaluated.takenOver(),
                    planner.ordered())));
    }

    /**
     * Each own definition's findings: those within the span of the statement that defines it.
     * {@code findings} are sorted by where they start, so each statement's are one run of them.
     */
    private static Map<String, List<Diagnostic>> findingsByDefinition(Map<String, Statement> own, List<Diagnostic> findings) {
        Map<String, List<Diagnostic>> out = new LinkedHashMap<>();
        if (findings.isEmpty()) return out;
        for (var e : own.entrySet()) {
            dev.plumb.diagnostics.Span s = e.getValue().span();
            List<Diagnostic> on = new ArrayList<>();
            for (int i = firstStartingAtOrAfter(findings, s.start()); i < findings.size(); i++) {
                Diagnostic d = findings.get(i);
                if (d.span().start() > s.end()) break;
                if (d.span().end() <= s.end()) on.add(d);
            }
            if (!on.isEmpty()) out.put(e.getKey(), List.copyOf(on));
        }
        return out;
    }

    /** The index of the first finding that starts at or after {@code offset} (findings sorted by start). */
    private static int firstStartingAtOrAfter(List<Diagnostic> findings, int offset) {
        int low = 0;
        int high = findings.size();
        while (low < high) {
            int mid = (low + high) >>> 1;
            if (findings.get(mid).span().start() < offset) low = mid + 1;
            else high = mid;
        }
        return low;
    }

    /** A repair a finding asked for, as edits of this document; none when it cannot be made here. */
    private static List<Fix> resolve(FixRequest request, Map<String, Statement> own, List<Row> rows) {
        if (request instanceof FixRequest.Formula f) {
            return own.get(f.name()) instanceof Statement.Definition d && !d.input()
                ? List.of(new Fix(f.title(), d.expr().span(), f.formula())) : List.of();
        }
        FixRequest.TaggedDensity t = (FixRequest.TaggedDensity) request;
        List<Fix> out = new ArrayList<>();
        for (Row r : rows) {
            // A tag stays on a definition only when its value is a density.
            if (r instanceof Row.ValueRow v && t.tag().equals(v.basis())) {
                out.add(new Fix("Use " + v.name() + " (tagged " + t.tag() + ")", t.argument(), v.name()));
            }
        }
        return out;
    }

    /** Functions and correlations join the scope once the plan knows which of them lie on a circle. */
    private void bindBlocks(Scope scope, Plan plan) {
        for (var entry : plan.own().entrySet()) {
            boolean circular = plan.inCycle().contains(entry.getKey());
            if (entry.getValue() instanceof Statement.Function f) {
                scope.put(entry.getKey(), new Binding.FunctionBinding(file, f.name().span(), f, scope, circular));
            } else if (entry.getValue() instanceof Statement.Correlation c) {
                scope.put(entry.getKey(), new Binding.CorrelationBinding(file, c.name().span(), c, scope, circular));
            }
        }
    }

    private static Map<String, String> headers(List<Statement> statements) {
        Map<String, String> headers = new LinkedHashMap<>();
        for (Statement s : statements) {
            if (s instanceof Statement.Header h) headers.putIfAbsent(h.key(), h.text());
        }
        return headers;
    }

    private static List<Row> rowsInOrder(List<Statement> statements, Map<Statement, Row> rows, Map<Statement, Row> checks) {
        List<Row> out = new ArrayList<>(statements.size());
        for (Statement s : statements) {
            if (s instanceof Statement.Section sec) out.add(new Row.SectionRow(sec.span(), sec.title()));
            else if (s instanceof Statement.Narrative n) out.add(new Row.NarrativeRow(n.span(), n.text()));
            else if (s instanceof Statement.Check) out.add(checks.get(s));
            else {
                Row r = rows.get(s);
                if (r != null) out.add(r);
            }
        }
        return out;
    }

    private static List<Diagnostic> sorted(List<Diagnostic> all) {
        List<Diagnostic> out = new ArrayList<>(all);
        out.sort(Comparator.comparingInt((Diagnostic d) -> d.span().start()).thenComparing(d -> d.code().id()));
        return out;
    }
}
