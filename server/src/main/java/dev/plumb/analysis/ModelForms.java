package dev.plumb.analysis;

import dev.plumb.syntax.Expr;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Finds the model-form uncertainty of each definition whose formula is a call of a correlation
 * or table with a family: the family's other entries that cover the call's arguments (as the
 * range advice finds them) are evaluated there, quietly, with the same arguments; two or more
 * values make a {@link ModelForm}.
 */
final class ModelForms {
    private ModelForms() {
    }

    static Map<String, ModelForm> of(List<Statement> statements, Map<String, Statement> own, Environment base, Scope scope,
                                     String text, UnitRegistry units, Budget budget) {
        Map<String, ModelForm> out = new LinkedHashMap<>();
        Evaluator quiet = new Evaluator(scope, base, Map.of(), Reporter.discarding(), text, units, budget);
        RangeAdvice advice = new RangeAdvice(quiet, Reporter.discarding(), units);
        for (Statement s : statements) {
            if (!(s instanceof Statement.Definition d) || !(Expr.inner(d.expr()) instanceof Expr.Call call)) continue;
            if (own.get(d.name().text()) != d) continue;
            Binding callee = scope.lookup(call.callee().text());
            if (!(callee instanceof Binding.CorrelationBinding || callee instanceof Binding.TableBinding)) continue;
            Binding.ValueBinding here = base.get(d.name().text());
            if (here == null || !here.value().known()) continue;
            try {
                budget.nextStatement();
                ModelForm m = of(call, callee, here, quiet, advice);
                if (m != null) out.put(d.name().text(), m);
            } catch (Budget.Exhausted e) {
                // Only an extra look: a value whose alternatives cost more than a statement may shows none.
                continue;
            }
        }
        return out;
    }

    /**
     * The model forms {@code direct} (each at its call) carried on to the own values computed from
     * those calls: the document evaluated again with each other entry's value in place of the one
     * called. A value that several choices reach keeps the widest range and counts the others; a
     * value with a model form of its own keeps that. Within the budget: a choice whose runs cost
     * more than it allows is carried nowhere.
     */
    static Map<String, ModelForm> downstream(Map<String, ModelForm> direct, StudyRun study) {
        Map<String, ModelForm> out = new LinkedHashMap<>();
        Map<String, Integer> reached = new LinkedHashMap<>();
        for (var source : direct.entrySet()) {
            Binding.ValueBinding at = study.base().get(source.getKey());
            if (at == null || !at.value().known()) continue;
            List<ModelForm.Entry> choices = source.getValue().entries();
            List<Environment> runs = new ArrayList<>();
            try {
                for (ModelForm.Entry e : choices.subList(1, choices.size())) {
                    Value v = at.value();
                    StudyRun.Outcome o = study.run(Map.of(source.getKey(), new Value(e.si(), v.dimension(), v.temperature(),
                        v.notes(), v.angle())), false);
                    if (o.stopped()) throw new Budget.Exhausted(Budget.Limit.TIME);
                    runs.add(o.values());
                }
            } catch (Budget.Exhausted e) {
                continue;
            }
            for (String name : study.dependentsOf(source.getKey())) {
                Binding.ValueBinding base = study.base().get(name);
                if (base == null || !base.value().known() || direct.containsKey(name)) continue;
                List<ModelForm.Entry> values = new ArrayList<>();
                values.add(new ModelForm.Entry(choices.get(0).name(), base.value().si()));
                for (int i = 0; i < runs.size(); i++) {
                    Binding.ValueBinding there = runs.get(i).get(name);
                    if (there == null || !there.value().known() || !Double.isFinite(there.value().si())) {
                        values = null;
                        break;
                    }
                    values.add(new ModelForm.Entry(choices.get(i + 1).name(), there.value().si()));
                }
                if (values == null) continue;
                ModelForm m = ModelForm.of(values, source.getKey());
                if (m.high() == m.low()) continue;
                reached.merge(name, 1, Integer::sum);
                ModelForm kept = out.get(name);
                if (kept == null || m.relativeWidth() > kept.relativeWidth()) out.put(name, m);
            }
        }
        out.replaceAll((name, m) -> m.withOthers(reached.get(name) - 1));
        return out;
    }

    /** The model form at one call: the entry called and each valid alternative there; null with fewer than two. */
    private static ModelForm of(Expr.Call call, Binding callee, Binding.ValueBinding here, Evaluator quiet,
                                RangeAdvice advice) {
        List<Value> args = new ArrayList<>();
        for (Expr a : call.args()) args.add(quiet.eval(a));
        if (args.stream().anyMatch(v -> !v.known())) return null;
        List<ModelForm.Entry> entries = new ArrayList<>();
        entries.add(new ModelForm.Entry(call.callee().text(), here.value().si()));
        for (String other : advice.alternatives(callee, args).names()) {
            Value v = quiet.eval(new Expr.Call(call.span(), new Ident(other, call.callee().span()), call.args()));
            if (v.known() && Double.isFinite(v.si()) && v.dimension().equals(here.value().dimension())) {
                entries.add(new ModelForm.Entry(other, v.si()));
            }
        }
        return entries.size() > 1 ? ModelForm.of(entries) : null;
    }
}
