package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Ident;
import dev.plumb.syntax.Statement;
import dev.plumb.units.UnitRegistry;
import java.util.IdentityHashMap;
import java.util.Map;

/**
 * The fifth pass, the real run: evaluates the plan in order, each definition once, each solve
 * statement by its {@link SeekRunner}, and makes the result row of every statement that defines
 * a name. What it returns is immutable.
 *
 * @see Plan#evaluate the same evaluation, for many runs
 */
final class EvaluationPass {
    /**
     * The document's own values, the row of each statement that defines a name (by identity), and
     * what the next run of the document may take over.
     */
    record Evaluated(Environment values, Map<Statement, Row> rows, Map<String, ReusableValues.Entry> reusable, int takenOver) {
        Evaluated {
            rows = java.util.Collections.unmodifiableMap(rows);
        }
    }

    private final Plan plan;
    private final Scope scope;
    private final String text;
    private final Reporter reporter;
    private final UnitRegistry units;
    private final Budget budget;
    /** Set once the run's time is up: what is left is not evaluated (one finding said so). */
    private boolean outOfTime;
    /** The rows made; a study's re-run makes none (see {@link #rerun}). */
    private Map<Statement, Row> rows;
    /** The run before this one, when its values may be taken over (else {@link ReusableValues#NONE}). */
    private ReusableValues earlier = ReusableValues.NONE;
    /** For each own name, the own names its statement uses. */
    private Map<String, java.util.Set<String>> uses = Map.of();
    /** Whether this run keeps what a next run may take over (an editor's run; see {@link #reusing}). */
    private boolean keeps;
    /** The values a several-unknown solve gave its later unknowns, waiting for their turn in the plan. */
    private final Map<String, Binding.ValueBinding> solvedAhead = new java.util.HashMap<>();
    private final Map<String, Solution> solvedAheadHow = new java.util.HashMap<>();

    EvaluationPass(Plan plan, Scope scope, String text, Reporter reporter, UnitRegistry units, Budget budget) {
        this.plan = plan;
        this.scope = scope;
        this.text = text;
        this.reporter = reporter;
        this.units = units;
        this.budget = budget;
        this.rows = new IdentityHashMap<>();
    }

    /**
     * Takes over what {@code earlier} (the document's previous run, already judged to fit this one)
     * left that this run would compute again: see {@link ReusableValues}.
     *
     * @param uses for each own name, the own names its statement uses
     */
    EvaluationPass reusing(ReusableValues earlier, Map<String, java.util.Set<String>> uses) {
        this.earlier = earlier;
        this.uses = uses;
        this.keeps = true;
        return this;
    }

    /** @param duplicates statements defining a name a second time: evaluated for their findings, bound to nothing */
    Evaluated run(Iterable<Statement> duplicates) {
        // Sized for every statement at once (a re-run for a study keeps no rows and skips this).
        rows = new IdentityHashMap<>(plan.own().size() * 2);
        Environment.Builder values = new Environment.Builder(scope, plan.order().size());
        if (!keeps) {
            for (String name : plan.order()) {
                Binding.ValueBinding bound = withinBudget(plan.own().get(name), values.now(), plan.inCycle().contains(name));
                if (bound != null) values.put(name, bound);
            }
            Environment done = values.build();
            for (Statement s : duplicates) withinBudget(s, done, false);
            return new Evaluated(done, rows, Map.of(), 0);
        }
        Map<String, ReusableValues.Entry> reusable = new java.util.HashMap<>(Environment.capacityFor(plan.order().size()));
        // The own names whose values (or, for a function or a table, whose statements) are as in the earlier run.
        java.util.Set<String> same = new java.util.HashSet<>(Environment.capacityFor(plan.order().size()));
        int takenOver = 0;
        ReusableValues.Moves moves = new ReusableValues.Moves();
        for (String name : plan.order()) {
            Statement s = plan.own().get(name);
            boolean inCycle = plan.inCycle().contains(name);
            java.util.Set<String> used = uses.getOrDefault(name, java.util.Set.of());
            boolean written = !inCycle && earlier.unchanged(name, s, text, used);
            boolean unchanged = written && same.containsAll(used);
            ReusableValues.Entry before = earlier.entry(name);
            if (written) moves.add(before.span(), s.span());
            // The earlier value, moved to where the statement is now (null when it cannot be).
            Binding.ValueBinding was = before == null || before.binding() == null ? null
                : moves.moved(before.binding(), DeclarationPass.definedName(s).span());
            if (unchanged && before.quiet() && before.statement() == s && was == before.binding() && !outOfTime) {
                // The very statement of the earlier run, in its place: everything it left stands as it was.
                rows.put(s, before.row());
                values.put(name, was);
                same.add(name);
                reusable.put(name, before);
                takenOver++;
                continue;
            }
            Binding.ValueBinding bound;
            boolean quiet;
            if (unchanged && before.quiet() && was != null && s instanceof Statement.Definition d && !outOfTime) {
                bound = takenOver(d, was);
                quiet = true;
                takenOver++;
            } else {
                int said = reporter.said();
                bound = withinBudget(s, values.now(), inCycle);
                quiet = reporter.said() == said && !outOfTime;
            }
            if (bound != null) values.put(name, bound);
            // A name with a value (a definition, a solved unknown, a state of a motion) is the same when
            // its value is; a function, a correlation or a table when its statement and what it uses are.
            if (bound != null ? ReusableValues.sameValue(bound, was) : unchanged) same.add(name);
            if (!inCycle) {
                reusable.put(name, new ReusableValues.Entry(s.span(), used, bound,
                    quiet && s instanceof Statement.Definition && bound != null, s, rows.get(s)));
            }
        }
        Environment done = values.build();
        for (Statement s : duplicates) withinBudget(s, done, false);
        return new Evaluated(done, rows, reusable, takenOver);
    }

    /** An earlier run's value of an unchanged definition, already moved to where the definition is written now. */
    private Binding.ValueBinding takenOver(Statement.Definition d, Binding.ValueBinding bound) {
        rows.put(d, new Row.ValueRow(d.span(), d.name().text(), d.input(), bound.value(), bound.basis(), d.note(),
            bound.origin(), null, bound.display(), d));
        return bound;
    }

    /**
     * The run again for a study: over {@code base} (the real run's values), with {@code overrides}
     * bound in place of their definitions (shown as those were) and only the names in {@code which}
     * evaluated again, in plan order; the rest keep their base values. Solve statements among
     * them are solved again. No rows are kept: a study reads the values (a sweep of a thousand
     * rows would otherwise file a thousand rows of every statement only to drop them).
     */
    Evaluated rerun(Environment base, Map<String, Value> overrides, java.util.Set<String> which) {
        rows = new java.util.AbstractMap<>() {
            @Override
            public Row put(Statement key, Row value) {
                return null;
            }

            @Override
            public java.util.Set<Map.Entry<Statement, Row>> entrySet() {
                return java.util.Set.of();
            }
        };
        Environment.Builder values = new Environment.Builder(base);
        for (String name : plan.order()) {
            Value given = overrides.get(name);
            if (given != null) {
                Binding.ValueBinding was = base.get(name);
                values.put(name, was == null ? plan.definitions().bare(given) : new Binding.ValueBinding(was.file(),
                    was.span(), given, was.display(), was.basis(), was.input(), was.origin(), was.note()));
            } else if (which.contains(name)) {
                Binding.ValueBinding bound = withinBudget(plan.own().get(name), values.now(), plan.inCycle().contains(name));
                if (bound != null) values.put(name, bound);
            }
        }
        return new Evaluated(values.build(), rows, Map.of(), 0);
    }

    /** Whether the run's time ran out during this pass (what was left is unknown for that reason alone). */
    boolean outOfTime() {
        return outOfTime;
    }

    /** A statement's evaluation, cut short with one finding when it takes more than its budget. */
    private Binding.ValueBinding withinBudget(Statement s, Environment env, boolean inCycle) {
        if (outOfTime) return unknown(s);
        try {
            budget.nextStatement();
            return evaluate(s, env, inCycle);
        } catch (Budget.Exhausted e) {
            outOfTime = e.limit == Budget.Limit.TIME;
            reporter.report(Code.LIMIT_BUDGET, where(s), e.limit == Budget.Limit.TIME
                ? "the check was stopped here after " + Budget.SECONDS + " s: this statement and those after it are not "
                    + "evaluated (their values are unknown); a calc needs far less: look for a formula that does "
                    + "repeated work, such as a function that calls another twice at every level"
                : "this statement was stopped after " + String.format(java.util.Locale.ROOT, "%,d", Budget.STEPS_PER_STATEMENT)
                    + " evaluation steps, more than any calc needs: its value is unknown. Look for a formula that does "
                    + "repeated work, such as a function that calls another twice at every level (the work doubles "
                    + "with each level)");
            return unknown(s);
        }
    }

    /** Where a finding about a statement goes: the name it defines, else the statement. */
    private static dev.plumb.diagnostics.Span where(Statement s) {
        Ident name = DeclarationPass.definedName(s);
        return name != null ? name.span() : s.span();
    }

    /** A statement not evaluated: its row and binding say its value is unknown. */
    private Binding.ValueBinding unknown(Statement s) {
        Ident name = DeclarationPass.definedName(s);
        if (name == null) return null;
        rows.put(s, new Row.ValueRow(s.span(), name.text(), s instanceof Statement.Definition d && d.input(), Value.UNKNOWN,
            null, null, null, null, null, s));
        return s instanceof Statement.Definition || s instanceof Statement.Seek || s instanceof Statement.SeekSystem
            || s instanceof Statement.Evolve || s instanceof Statement.Broken
            ? new Binding.ValueBinding(plan.definitions().bare(Value.UNKNOWN).file(), name.span(), Value.UNKNOWN, null, null,
                false, null, null)
            : null;
    }

    /** Makes the statement's row; returns the binding of the value it defines, or null when it defines none. */
    private Binding.ValueBinding evaluate(Statement s, Environment env, boolean inCycle) {
        Definitions definitions = plan.definitions();
        if (s instanceof Statement.Broken b) {
            rows.put(s, new Row.ValueRow(b.span(), b.name() == null ? "?" : b.name().text(), false, Value.UNKNOWN, null,
                null, null, null, null, s));
            return b.name() == null ? null : new Binding.ValueBinding(definitions.bare(Value.UNKNOWN).file(),
                b.name().span(), Value.UNKNOWN, null, null, false, null, null);
        }
        if (s instanceof Statement.Function f) {
            String signature = f.name().text() + "(" + String.join(", ", f.params().stream().map(Ident::text).toList()) + ")";
            rows.put(s, new Row.FunctionRow(f.span(), signature, Row.Callable.FUNCTION, f.note()));
            return null;
        }
        if (s instanceof Statement.Correlation c) {
            String signature = c.name().text() + "(" + String.join(", ", c.params().stream().map(p -> p.name().text())
                .toList()) + ")";
            rows.put(s, new Row.FunctionRow(c.span(), signature, Row.Callable.CORRELATION, c.title()));
            new BlockChecks(reporter, units).accuracy(c, scope, text);
            return null;
        }
        if (s instanceof Statement.Table t) {
            String signature = t.name().text() + "(" + t.param().name().text() + ")";
            rows.put(s, new Row.FunctionRow(t.span(), signature, Row.Callable.TABLE, t.title()));
            return null;
        }
        if (s instanceof Statement.Seek f) return seek(f, env, inCycle);
        if (s instanceof Statement.SeekSystem k) return seekSystem(k, env, inCycle);
        if (s instanceof Statement.Evolve k) return evolve(k, env, inCycle);
        if (!(s instanceof Statement.Definition d)) return null;
        Binding.ValueBinding bound = definitions.evaluate(d, env, reporter, inCycle, budget);
        rows.put(s, new Row.ValueRow(d.span(), d.name().text(), d.input(), bound.value(), bound.basis(), d.note(),
            bound.origin(), null, bound.display(), s));
        return bound;
    }

    private Binding.ValueBinding seek(Statement.Seek f, Environment env, boolean inCycle) {
        String name = f.name().text();
        if (inCycle || plan.own().get(name) != f) {
            rows.put(f, new Row.ValueRow(f.span(), name, false, Value.UNKNOWN, null, f.note(), null, null, null, f));
            return inCycle ? plan.definitions().bare(Value.UNKNOWN) : null;
        }
        SeekRunner.Outcome outcome = new SeekRunner(plan, scope, env, reporter, text, units, budget).run(f);
        Binding.ValueBinding bound = plan.definitions().solved(f, outcome.value(), env, reporter, budget);
        rows.put(f, new Row.ValueRow(f.span(), name, false, bound.value(), bound.basis(), f.note(), null,
            outcome.solution(), bound.display(), f));
        return bound;
    }

    /**
     * The time's statement integrates the motion and keeps the states' values until the plan
     * reaches them (they use the time, so they come after it).
     */
    private Binding.ValueBinding evolve(Statement.Evolve k, Environment env, boolean inCycle) {
        String name = k.name().text();
        String note = k.motion().note();
        if (inCycle || plan.own().get(name) != k) {
            rows.put(k, new Row.ValueRow(k.span(), name, false, Value.UNKNOWN, null, note, null, null, null, k));
            return inCycle ? plan.definitions().bare(Value.UNKNOWN) : null;
        }
        if (k.index() > 0) {
            Binding.ValueBinding bound = solvedAhead.remove(name);
            if (bound == null) bound = plan.definitions().evolved(k, Value.UNKNOWN, null, null);
            rows.put(k, new Row.ValueRow(k.span(), name, false, bound.value(), null, note, null, null, bound.display(), k));
            return bound;
        }
        MotionRunner.Outcome outcome = new MotionRunner(plan, scope, env, reporter, text, units, budget).run(k);
        java.util.List<Ident> names = k.motion().names();
        for (int j = 1; j < names.size(); j++) {
            Ident other = names.get(j);
            if (plan.own().get(other.text()) instanceof Statement.Evolve mine && mine.motion().equals(k.motion())) {
                solvedAhead.put(other.text(), plan.definitions().evolved(mine, outcome.values().get(j),
                    outcome.units().get(j), outcome.trajectory()));
            }
        }
        Binding.ValueBinding bound = plan.definitions().evolved(k, outcome.values().get(0), outcome.units().get(0),
            outcome.trajectory());
        rows.put(k, new Row.ValueRow(k.span(), name, false, bound.value(), null, note, null, null, bound.display(), k));
        return bound;
    }

    /**
     * The first unknown's statement solves the whole system and keeps the others' values until
     * the plan reaches them (they use the first, so they come after it).
     */
    private Binding.ValueBinding seekSystem(Statement.SeekSystem k, Environment env, boolean inCycle) {
        String name = k.name().text();
        String note = k.system().note();
        if (inCycle || plan.own().get(name) != k) {
            rows.put(k, new Row.ValueRow(k.span(), name, false, Value.UNKNOWN, null, note, null, null, null, k));
            return inCycle ? plan.definitions().bare(Value.UNKNOWN) : null;
        }
        if (k.index() > 0) {
            Binding.ValueBinding bound = solvedAhead.remove(name);
            if (bound == null) bound = plan.definitions().solvedInSystem(k, Value.UNKNOWN, null);
            rows.put(k, new Row.ValueRow(k.span(), name, false, bound.value(), null, note, null, solvedAheadHow.remove(name),
                bound.display(), k));
            return bound;
        }
        SeekSystemRunner.Outcome outcome = new SeekSystemRunner(plan, scope, env, reporter, text, units, budget).run(k);
        java.util.List<String> names = SeekSystems.unknowns(k);
        for (int j = 1; j < names.size(); j++) {
            Ident other = k.system().unknowns().get(j);
            if (plan.own().get(other.text()) instanceof Statement.SeekSystem mine && mine.system().equals(k.system())) {
                solvedAhead.put(other.text(), plan.definitions().solvedInSystem(mine, outcome.values().get(j),
                    outcome.units().get(j)));
                if (outcome.solution() != null) solvedAheadHow.put(other.text(), outcome.solution());
            }
        }
        Binding.ValueBinding bound = plan.definitions().solvedInSystem(k, outcome.values().get(0), outcome.units().get(0));
        rows.put(k, new Row.ValueRow(k.span(), name, false, bound.value(), null, note, null, outcome.solution(),
            bound.display(), k));
        return bound;
    }
}
