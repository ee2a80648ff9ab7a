package dev.plumb.analysis;

import dev.plumb.units.Dimension;
import dev.plumb.units.Unit;
import java.util.List;
import org.apache.commons.math3.ode.ContinuousOutputModel;

/**
 * A motion's result over time, for the reader and for the calc: the time's and the states' names,
 * dimensions and display units, a table at the chosen interval and a finer sampling for plots (both
 * made once, so readers only read arrays), how it stopped, and the integrator's dense output, which
 * answers a state at any time inside the motion ({@code v(2 s)} in a formula). The dense output is
 * Commons Math's, a mutable object: it is only touched under its own lock, so a trajectory can be
 * shared between threads like the rest of an {@code Analysis}.
 *
 * @param names the time first, then the states
 * @param units the unit each is shown in
 * @param times the table's times (SI), starting at 0 and ending at the stop
 * @param rows for each table time, the states (SI)
 * @param plotTimes finer times for plots
 * @param plotRows the states at those times
 * @param stop how the motion ended, in words ("when y <= 0 m")
 * @param steps accepted integration steps
 * @param evaluations evaluations of the rates
 * @param visited for each correlation argument used in the rates: where it went over the motion, in words
 * @param widened whether the table's interval was widened to keep it within {@link #MAX_ROWS} rows
 * @param drawn the states the report plots, by their place in {@code names} (1 the first state)
 */
public record Trajectory(List<String> names, List<Dimension> dimensions, List<Unit> units, double[] times,
                         double[][] rows, double[] plotTimes, double[][] plotRows, String stop, int steps,
                         int evaluations, List<String> visited, boolean widened, List<Integer> drawn, Dense dense) {
    /** The most rows a trajectory table holds. */
    public static final int MAX_ROWS = 1000;

    public Trajectory {
        names = List.copyOf(names);
        dimensions = List.copyOf(dimensions);
        units = List.copyOf(units);
        visited = List.copyOf(visited);
        drawn = List.copyOf(drawn);
    }

    /** The time at which the motion stopped (SI). */
    public double end() {
        return times[times.length - 1];
    }

    /** The integrator's dense output, read under its own lock. */
    static final class Dense {
        private final ContinuousOutputModel model;

        Dense(ContinuousOutputModel model) {
            this.model = model;
        }

        /** State {@code j} (0-based among the states) at time {@code t} (SI), inside the motion. */
        double state(int j, double t) {
            synchronized (model) {
                model.setInterpolatedTime(t);
                return model.getInterpolatedState()[j];
            }
        }
    }

    /** State {@code j} at time {@code t} (SI); NaN outside 0 .. end or without dense output. */
    double stateAt(int j, double t) {
        if (dense == null || !(t >= 0) || t > end()) return Double.NaN;
        return dense.state(j, t);
    }
}
