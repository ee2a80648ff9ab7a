package dev.plumb.present;

import dev.plumb.analysis.SystemSolution;
import dev.plumb.analysis.Value;
import dev.plumb.units.DisplayUnits;
import java.util.ArrayList;
import java.util.List;

/** How a several-unknown solve reads for people: with what, how, and the residual of each equation. */
public final class SystemText {
    private SystemText() {
    }

    /** "with theta: 5 iterations (Newton), residuals 1.1e-13 N, 0 N": for the row of {@code name}. */
    public static String summary(SystemSolution s, String name) {
        List<String> others = new ArrayList<>(s.unknowns());
        others.remove(name);
        return "with " + String.join(", ", others) + ": " + s.iterations() + " iteration" + (s.iterations() == 1 ? "" : "s")
            + " (" + s.method() + "), residuals " + String.join(", ", residuals(s));
    }

    /** Each equation's residual LHS − RHS at the solution, in SI, to two figures. */
    public static List<String> residuals(SystemSolution s) {
        List<String> out = new ArrayList<>();
        for (SystemSolution.Residual r : s.residuals()) out.add(residual(r.si(), r.dimension()));
        return out;
    }

    /** A residual in the SI unit of its dimension, to two figures. */
    public static String residual(double si, dev.plumb.units.Dimension d) {
        return ValueText.of(Value.of(si, d), DisplayUnits.defaultFor(d), 2);
    }

    /** An unknown's value at an iterate, in the unit the solution is shown in. */
    public static String unknown(SystemSolution s, int j, double si, int sig) {
        return ValueText.of(Value.of(si, s.dimensions().get(j)), s.units().get(j), sig);
    }
}
