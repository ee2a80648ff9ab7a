package dev.plumb.present;

import dev.plumb.analysis.Trajectory;
import dev.plumb.analysis.Value;
import java.util.ArrayList;
import java.util.List;

/** How a motion's trajectory reads for people: column heads with units, cells in display units, a summary. */
public final class TrajectoryText {
    private TrajectoryText() {
    }

    /** "t (s)", "v (m/s)", "n" for a plain number: each column's head. */
    public static List<String> heads(Trajectory t) {
        List<String> out = new ArrayList<>();
        for (int j = 0; j < t.names().size(); j++) {
            String unit = t.units().get(j).symbol();
            out.add(t.names().get(j) + (unit.isEmpty() ? "" : " (" + unit + ")"));
        }
        return out;
    }

    /** Column {@code j} (0 the time) of table row {@code i}, a number in the column's unit, to {@code sig} figures. */
    public static String cell(Trajectory t, int i, int j, int sig) {
        double si = j == 0 ? t.times()[i] : t.rows()[i][j - 1];
        return ValueText.parts(Value.of(si, t.dimensions().get(j)), t.units().get(j), sig).number();
    }

    /** The same cell's number in its display unit, unrounded, for machine formats. */
    public static double number(Trajectory t, int i, int j) {
        double si = j == 0 ? t.times()[i] : t.rows()[i][j - 1];
        return t.units().get(j).fromSi(si);
    }

    /** "evolved in 143 steps, stopped when y <= 0 m" */
    public static String summary(Trajectory t) {
        return "evolved in " + t.steps() + " step" + (t.steps() == 1 ? "" : "s") + ", stopped " + t.stop();
    }
}
