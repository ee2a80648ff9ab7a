package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.diagnostics.Diagnostic;
import dev.plumb.diagnostics.Related;
import dev.plumb.diagnostics.Span;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Runs one {@code case}: evaluates its right sides over the base values, evaluates the document
 * again with them through the {@link StudyRun}, and makes its {@link Row.CaseRow}. Every finding of
 * the case that the base calc does not have is reported again at the case's name, with its code
 * and severity and the words "in case NAME:", pointing to where it arose; a case that changes
 * nothing is {@code case.no-change}.
 */
final class CaseRunner extends StudyRunner {
    private final java.nio.file.Path file;

    CaseRunner(StudyRun study, Map<String, Statement> own, List<Statement> statements, Scope scope, List<Diagnostic> base,
               Reporter reporter, String text, UnitRegistry units, Budget budget, int digits, java.nio.file.Path file) {
        super(study, own, statements, scope, base, reporter, text, units, budget, digits);
        this.file = file;
    }

    Row.CaseRow run(Statement.Case c) {
        String label = c.name().text();
        Evaluator sides = overBase();
        Map<String, Value> given = new LinkedHashMap<>();
        boolean usable = true;
        for (Statement.Setting s : c.settings()) {
            String name = s.name().text();
            Binding.ValueBinding base = study.base().get(name);
            if (!(own.get(name) instanceof Statement.Definition) || base == null) {
                // A name defined nowhere was reported where it is written (name.unknown): once is enough.
                if (own.containsKey(name) || scope.lookup(name) != null) {
                    reporter.report(Code.CASE_INVALID, s.name().span(), refusal(name));
                }
                usable = false;
                continue;
            }
            if (given.containsKey(name)) {
                reporter.report(Code.CASE_INVALID, s.name().span(), "case " + label + " sets " + name + " twice: keep one");
                usable = false;
                continue;
            }
            Value v = sides.eval(s.expr());
            if (!v.known()) {
                usable = false;
                continue;
            }
            if (base.value().known() && !v.dimension().equals(base.value().dimension())) {
                reporter.report(Code.UNIT_MISMATCH, s.expr().span(), "case " + label + " gives " + name + " "
                    + v.dimension().describe() + ", but it is " + base.value().dimension().describe());
                usable = false;
                continue;
            }
            given.put(name, base.value().known() ? new Value(v.si(), v.dimension(), v.temperature(), base.value().notes(),
                base.value().angle()) : v);
        }
        List<Row.CaseValue> set = new ArrayList<>();
        given.forEach((n, v) -> set.add(new Row.CaseValue(n, study.base().get(n).value(), v, study.base().get(n).display())));
        if (!usable) return new Row.CaseRow(c.span(), label, set, List.of(), List.of(), c.note());
        if (given.entrySet().stream().allMatch(e -> same(study.base().get(e.getKey()).value(), e.getValue()))) {
            List<String> each = new ArrayList<>();
            for (Row.CaseValue v : set) each.add(v.name() + " is " + Shown.value(v.base(), v.display(), digits));
            reporter.report(Code.CASE_NO_CHANGE, c.name().span(), "case " + label + " changes nothing: "
                + String.join(", ", each) + " already; give it the values the case is about, or remove it");
        }
        StudyRun.Outcome o = study.withSpreads(study.run(given, true), statements);
        for (Diagnostic d : o.findings()) {
            if (d.code() == Code.INPUT_UNUSED || inBase(d)) continue;
            List<Related> related = new ArrayList<>();
            related.add(new Related(file == null ? null : file.toString(), d.span(), "where it arises"));
            related.addAll(d.related());
            reporter.add(new Diagnostic(d.code(), d.severity(), c.name().span(), "in case " + label + ": " + d.message(),
                related, List.of()));
        }
        List<Row.CaseValue> changed = new ArrayList<>(set);
        for (Statement s : statements) {
            var defined = DeclarationPass.definedName(s);
            if (defined == null || own.get(defined.text()) != s || given.containsKey(defined.text())) continue;
            Binding.ValueBinding base = study.base().get(defined.text());
            Binding.ValueBinding here = o.values().get(defined.text());
            if (base == null || here == null || same(base.value(), here.value())) continue;
            changed.add(new Row.CaseValue(defined.text(), base.value(), here.value(), base.display()));
        }
        return new Row.CaseRow(c.span(), label, set, changed, o.checks(), c.note());
    }

    /** Whether two values are the same value: both unknown, or equal to a relative 10⁻¹². */
    private static boolean same(Value a, Value b) {
        if (!a.known() || !b.known()) return a.known() == b.known();
        return a.dimension().equals(b.dimension()) && Math.abs(a.si() - b.si()) <= 1e-12 * Math.max(Math.abs(a.si()),
            Math.abs(b.si()));
    }

    private String refusal(String name) {
        Statement st = own.get(name);
        if (st instanceof Statement.Seek) {
            return name + " is solved by its `seek`, so a case cannot set it: set an input its equation uses";
        }
        if (st != null && !(st instanceof Statement.Definition)) return name + " is not a value: a case sets values";
        return name + " is defined in another file: a case sets the calc's own values (its inputs, usually)";
    }
}
