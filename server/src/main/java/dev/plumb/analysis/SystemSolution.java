package dev.plumb.analysis;

import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import java.util.List;

/**
 * How a several-unknown solve was solved: the unknowns (each with the unit it is shown in), each
 * equation's residual at the solution, the method that finished it, the iterations (accepted
 * steps) and evaluations of the equations it took, and each accepted iterate.
 *
 * @param unknowns the unknowns' names, in the order written
 * @param units the unit each unknown is shown in
 * @param dimensions each unknown's dimension
 * @param residuals per equation, as written, LHS − RHS at the solution (SI)
 */
public record SystemSolution(List<String> unknowns, List<Unit> units, List<Dimension> dimensions,
                             List<Residual> residuals, String method, int evaluations, List<Iterate> record) {
    public SystemSolution {
        unknowns = List.copyOf(unknowns);
        units = List.copyOf(units);
        dimensions = List.copyOf(dimensions);
        residuals = List.copyOf(residuals);
        record = List.copyOf(record);
    }

    /** One equation's residual: its text as written, LHS − RHS (SI) and its dimension. */
    public record Residual(String equation, double si, Dimension dimension) {
    }

    /** An accepted iterate: the unknowns and each equation's residual, SI. */
    public record Iterate(int n, List<Double> x, List<Double> residual) {
        public Iterate {
            x = List.copyOf(x);
            residual = List.copyOf(residual);
        }
    }

    /** Accepted steps after the start. */
    public int iterations() {
        return Math.max(0, record.size() - 1);
    }
}
