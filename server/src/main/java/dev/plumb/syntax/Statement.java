package dev.plumb.syntax;

import dev.plumb.diagnostics.Span;
import java.util.List;

/** One statement of a document, in source order. Optional parts are null when absent. */
public sealed interface Statement {
    Span span();

    /** {@code title "…"}, {@code author "…"}, {@code reviewer "…"}, {@code revision "…"}. */
    record Header(Span span, String key, String text) implements Statement {
    }

    /** A line of prose starting with '#'; text is without the '#'. */
    record Narrative(Span span, String text) implements Statement {
    }

    record Section(Span span, String title) implements Statement {
    }

    record Use(Span span, String path, Span pathSpan) implements Statement {
    }

    /**
     * {@code [input] NAME = EXPR [± AMOUNT] [in UNIT] [as BASIS] ["note"]}; {@code tolerance} is null
     * when none is written (only an input may have one).
     */
    record Definition(Span span, boolean input, Ident name, Expr expr, UnitText displayUnit,
                      Ident basis, String note, Tolerance tolerance) implements Statement {
        /** A definition without a tolerance. */
        public Definition(Span span, boolean input, Ident name, Expr expr, UnitText displayUnit, Ident basis, String note) {
            this(span, input, name, expr, displayUnit, basis, note, null);
        }
    }

    /** {@code ± AMOUNT} after an input's value: {@code span} covers the sign and the amount. */
    record Tolerance(Span span, Expr amount) {
    }

    /** {@code NAME(P1, P2) = EXPR ["note"]}. */
    record Function(Span span, Ident name, List<Ident> params, Expr body, String note) implements Statement {
        public Function {
            params = List.copyOf(params);
        }
    }

    /**
     * {@code check A op B [op C] [with spread] ["note"]}: operands.size() == comparators.size() + 1;
     * {@code withSpread} asks that it hold at the sides' bounds, their spreads counted against it.
     */
    record Check(Span span, List<Expr> operands, List<Comparator> comparators, String note, boolean withSpread)
        implements Statement {
        public Check {
            operands = List.copyOf(operands);
            comparators = List.copyOf(comparators);
        }

        /** A check on the values alone. */
        public Check(Span span, List<Expr> operands, List<Comparator> comparators, String note) {
            this(span, operands, comparators, note, false);
        }
    }

    /**
     * {@code seek NAME in LOW .. HIGH where LHS = RHS} (or {@code from START} instead of the
     * range): NAME is the value that makes both sides equal. low/high or start is null.
     */
    record Seek(Span span, Ident name, Expr low, Expr high, Expr start, Expr lhs, Expr rhs, Span equation,
                UnitText displayUnit, Ident basis, String note) implements Statement {
    }

    /**
     * One unknown of {@code seek A, B, … (from S1, S2, … | in L1 .. H1, …) where E1, E2, …}: the
     * parser gives one such statement per unknown, in order, each with the whole statement's span
     * and the same {@code system}, so every unknown is a name defined by a statement of its own
     * (outline, rename, dependency graph). The first ({@code index} 0) solves the system; the
     * others take their values from it.
     */
    record SeekSystem(Span span, Ident name, int index, Equations system) implements Statement {
    }

    /**
     * What a several-unknown solve writes: the unknowns, their start values (or brackets: lows and
     * highs, empty otherwise) and the equations, each {@code LHS = RHS}. The counts are as written;
     * the engine reports a mismatch.
     */
    record Equations(List<Ident> unknowns, List<Expr> starts, List<Expr> lows, List<Expr> highs,
                     List<Equation> equations, String note) {
        public Equations {
            unknowns = List.copyOf(unknowns);
            starts = List.copyOf(starts);
            lows = List.copyOf(lows);
            highs = List.copyOf(highs);
            equations = List.copyOf(equations);
        }

        /** Whether the unknowns are given brackets rather than start values. */
        public boolean bracketed() {
            return !lows.isEmpty();
        }
    }

    /** One equation {@code LHS = RHS} of a several-unknown solve; span covers both sides. */
    record Equation(Span span, Expr lhs, Expr rhs) {
    }

    /**
     * One name of {@code evolve S1, S2, … from A1, A2, … over T rates R1, R2, … until L op R [every DT]}:
     * the parser gives one such statement for the time T ({@code index} 0, which integrates the
     * motion) and one per state, each with the whole statement's span and the same {@code motion}.
     */
    record Evolve(Span span, Ident name, int index, Motion motion) implements Statement {
    }

    /**
     * What a motion statement writes: the states with their start values, the name of the time,
     * each state's rate of change, the stop condition ({@code stopLeft stop stopRight}, spanning
     * {@code until}), the interval of the trajectory table (null: none written), the states the
     * report plots ({@code draw v, z}; empty: all of them) and the note.
     */
    record Motion(Ident time, List<Ident> states, List<Expr> starts, List<Expr> rates, Expr stopLeft, Comparator stop,
                  Expr stopRight, Span until, Expr every, List<Ident> drawn, String note) {
        public Motion {
            states = List.copyOf(states);
            drawn = List.copyOf(drawn);
            starts = List.copyOf(starts);
            rates = List.copyOf(rates);
        }

        /** The names the statement defines: the time first, then the states. */
        public List<Ident> names() {
            List<Ident> out = new java.util.ArrayList<>();
            out.add(time);
            out.addAll(states);
            return out;
        }
    }

    /**
     * {@code correlation NAME(PARAMS) … end}: a published formula with what a reviewer needs to
     * trust it. Optional parts are null when absent; {@code pieces} has one entry for a single
     * {@code = EXPR}; {@code flow} is the flow direction its basis faces ({@code basis frontal
     * crossflow}); {@code domain} holds the physical domain of its parameters ({@code domain Re > 0}),
     * apart from the fitted {@code valid} range.
     */
    record Correlation(Span span, Ident name, List<Param> params, String title, String source, Ident family,
                       Ident basis, List<Bound> valid, Ident regime, Expr accuracy, List<Piece> pieces,
                       Ident flow, List<Bound> domain)
        implements Statement {
        public Correlation {
            params = List.copyOf(params);
            valid = List.copyOf(valid);
            domain = List.copyOf(domain);
            pieces = List.copyOf(pieces);
        }
    }

    /** {@code table NAME(X) … end}: columns of data; each output column is a function. */
    record Table(Span span, Ident name, Param param, String title, String source, Ident family, Ident basis,
                 List<Bound> valid, Expr accuracy, Ident interpolate, List<Column> columns, List<Row> rows,
                 Ident flow, List<Bound> domain)
        implements Statement {
        public Table {
            valid = List.copyOf(valid);
            domain = List.copyOf(domain);
            columns = List.copyOf(columns);
            rows = List.copyOf(rows);
        }
    }

    /**
     * A parameter, with the dimension it must have when one is declared ({@code T: temperature})
     * and, for a density, whose density it is ({@code rho: density as fluid}); null when absent.
     */
    record Param(Ident name, Ident dimension, Ident role) {
        /** As written in the head, without spacing quirks: {@code rho: density as fluid}. */
        public String written() {
            return name.text() + (dimension == null ? "" : ": " + dimension.text()) + (role == null ? "" : " as " + role.text());
        }
    }

    /** A chained comparison: {@code valid 0 < Re <= 800}, or a piece's {@code when} condition. */
    record Bound(Span span, List<Expr> operands, List<Comparator> comparators) {
        public Bound {
            operands = List.copyOf(operands);
            comparators = List.copyOf(comparators);
        }
    }

    /** {@code = EXPR [when CONDITION | otherwise]}; condition is null for otherwise or a lone formula. */
    record Piece(Span span, Expr expr, Bound condition, boolean otherwise) {
    }

    /** A table column: its name and the unit of its numbers (null: plain numbers). */
    record Column(Ident name, UnitText unit) {
    }

    /** A row of a table, the numbers as written. */
    record Row(Span span, List<Double> numbers) {
        public Row {
            numbers = List.copyOf(numbers);
        }
    }

    /**
     * `accept CODE at NAME "reason"`: a reviewer has accepted the finding {@code code} (as written)
     * on the statement that defines {@code target}, for the stated reason.
     */
    record Accept(Span span, String code, Span codeSpan, Ident target, String reason) implements Statement {
    }

    /**
     * {@code transition Re = 3e5 ["note"]}: the Reynolds number at which this calc's boundary
     * layers turn turbulent, for the regime checks of its correlations (the library's default
     * otherwise). {@code quantity} is the word written before `=` (it must be Re).
     */
    record Transition(Span span, Ident quantity, double value, Span valueSpan, String note) implements Statement {
    }

    /**
     * {@code sweep NAME over FROM .. TO by STEP show A in UNIT, B} (or {@code in N steps}, {@code in
     * N log steps}): the calc evaluated again for each value of NAME, with the shown results
     * tabulated. Exactly one of {@code step} and {@code count} is set; {@code spacing} is the word
     * before {@code steps} (it must be {@code log}), null when none is written.
     */
    record Sweep(Span span, Ident name, Expr from, Expr to, Expr step, Integer count, Span countSpan, Ident spacing,
                 SweepAxis across, List<Shown> shown, String note) implements Statement {
        public Sweep {
            shown = List.copyOf(shown);
        }

        /** The value varied first (the rows of a one-way sweep), as an axis. */
        public SweepAxis axis() {
            return new SweepAxis(name, from, to, step, count, countSpan, spacing);
        }
    }

    /**
     * One value a sweep varies and how: from, to, and a step ({@code by}) or a count of values
     * ({@code in N [log] steps}: count, where it is written, and the spacing word); {@code across}
     * of a {@link Sweep} is the second value of a grid (null for none).
     */
    record SweepAxis(Ident name, Expr from, Expr to, Expr step, Integer count, Span countSpan, Ident spacing) {
    }

    /** A result a study shows, with the unit to show it in (null: its own display unit). */
    record Shown(Ident name, UnitText unit) {
    }

    /**
     * {@code case NAME: A = EXPR, B = EXPR ["note"]}: a named variation of the calc, evaluated
     * again with these values in place of their definitions; the right sides see the base values.
     */
    record Case(Span span, Ident name, List<Setting> settings, String note) implements Statement {
        public Case {
            settings = List.copyOf(settings);
        }
    }

    /** One value a case sets: {@code V = 45 m/s}. */
    record Setting(Ident name, Expr expr) {
    }

    /**
     * A statement with a syntax error. Its name, when it had one, still counts as defined so that
     * later uses do not add "unknown name" noise to the syntax error already reported.
     */
    record Broken(Span span, Ident name) implements Statement {
    }
}
