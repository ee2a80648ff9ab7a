package dev.plumb.analysis;

import java.util.function.BooleanSupplier;

/**
 * How much work one analysis may do, so that no calc, however written, runs for ever: a number of
 * evaluation steps per statement (a step is one node of an expression evaluated, trials of a
 * solve included) and a wall-clock limit for the whole run. Both are far beyond what any real
 * calc needs; a formula that reaches them is reported (`limit.budget`) and its value is unknown.
 * It also stops a run nobody wants any more (a newer edit, a closed document). One per run, on
 * one thread.
 */
final class Budget {
    /** Steps one statement may take: some seconds of work; a large calc's statement takes thousands. */
    static final long STEPS_PER_STATEMENT = 20_000_000L;
    /** Seconds a whole analysis may take. */
    static final long SECONDS = 30;
    /** How often (in steps) the clock and the caller are asked: cheap enough to be unnoticed. */
    private static final long ASK_EVERY = 1 << 14;

    /** Why work was cut short. */
    enum Limit { STEPS, TIME }

    /** Thrown where the work is cut short; caught per statement by the evaluation pass. */
    static final class Exhausted extends RuntimeException {
        final Limit limit;

        Exhausted(Limit limit) {
            super(null, null, false, false);
            this.limit = limit;
        }
    }

    private final long stepsPerStatement;
    private final long deadline;
    private final BooleanSupplier superseded;
    private long steps;
    /** Piecewise formulas found to agree in dimension in this run, by their pieces' identity. */
    private final java.util.Map<Object, java.util.Set<java.util.List<Object>>> agreed = new java.util.IdentityHashMap<>();

    Budget(long stepsPerStatement, long seconds, BooleanSupplier superseded) {
        this.stepsPerStatement = stepsPerStatement;
        this.deadline = System.nanoTime() + seconds * 1_000_000_000L;
        this.superseded = superseded;
    }

    /** The standard budget for a run. */
    static Budget standard(BooleanSupplier superseded) {
        return new Budget(STEPS_PER_STATEMENT, SECONDS, superseded);
    }

    /** A budget of its own for a small evaluation outside any run (a block's accuracy line). */
    static Budget standalone() {
        return standard(() -> false);
    }

    /** Whether these pieces were found to agree in dimension, with this piece applying and these parameters. */
    boolean agreed(Object pieces, int applying, java.util.List<Object> dimensions) {
        java.util.Set<java.util.List<Object>> seen = agreed.get(pieces);
        return seen != null && seen.contains(key(applying, dimensions));
    }

    void rememberAgreed(Object pieces, int applying, java.util.List<Object> dimensions) {
        agreed.computeIfAbsent(pieces, p -> new java.util.HashSet<>()).add(key(applying, dimensions));
    }

    private static java.util.List<Object> key(int applying, java.util.List<Object> dimensions) {
        java.util.List<Object> key = new java.util.ArrayList<>(dimensions.size() + 1);
        key.add(applying);
        key.addAll(dimensions);
        return key;
    }

    /** One step of evaluation. */
    void step() {
        if (++steps > stepsPerStatement) throw new Exhausted(Limit.STEPS);
        if ((steps & (ASK_EVERY - 1)) == 0) ask();
    }

    /** A new statement starts: its steps are counted afresh, the run's clock goes on. */
    void nextStatement() {
        steps = 0;
        ask();
    }

    private void ask() {
        if (superseded.getAsBoolean()) throw new Workspace.Superseded();
        if (System.nanoTime() - deadline > 0) throw new Exhausted(Limit.TIME);
    }
}
