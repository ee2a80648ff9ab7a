package dev.plumb.analysis;

import java.util.List;

/**
 * How a {@code seek} was solved, for the reviewer: the root's residual (LHS − RHS, SI, in the
 * equation's dimension) and every evaluation of the refinement with the bracket after it. For an
 * unknown of a several-unknown solve, {@code system} holds the whole system's record (the same
 * for each of its unknowns), {@code residual} its largest scaled residual and {@code steps} is
 * empty; null for a one-unknown solve.
 */
public record Solution(double residual, dev.plumb.units.Dimension residualDimension, List<Step> steps,
                       SystemSolution system) {
    public Solution {
        steps = List.copyOf(steps);
    }

    /** A one-unknown solve's record. */
    public Solution(double residual, dev.plumb.units.Dimension residualDimension, List<Step> steps) {
        this(residual, residualDimension, steps, null);
    }

    /** One evaluation: the trial value and residual (SI), and the bracket known after it. */
    public record Step(int n, double x, double residual, double low, double high) {
    }

    public int iterations() {
        return system != null ? system.iterations() : steps.size();
    }
}
