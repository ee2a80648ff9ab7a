package dev.plumb.analysis;

import java.util.List;

/**
 * How a {@code seek} was solved, for the reviewer: the root's residual (LHS − RHS, SI, in the
 * equation's dimension) and every evaluation of the refinement with the bracket after it.
 */
public record Solution(double residual, dev.plumb.units.Dimension residualDimension, List<Step> steps) {
    public Solution {
        steps = List.copyOf(steps);
    }

    /** One evaluation: the trial value and residual (SI), and the bracket known after it. */
    public record Step(int n, double x, double residual, double low, double high) {
    }

    public int iterations() {
        return steps.size();
    }
}
