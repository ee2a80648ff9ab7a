package dev.plumb.analysis;

import dev.plumb.diagnostics.Code;
import dev.plumb.syntax.Expr;
import dev.plumb.units.Dimension;

/** {@code v(2 s)}: a state of a motion at a time inside it, read from the integrator's dense output. */
final class MotionCalls {
    private MotionCalls() {
    }

    static Value stateAt(Evaluator evaluator, Reporter reporter, Expr.Call c, Binding.ValueBinding v, String name) {
        Trajectory tr = v.trajectory();
        int j = tr.names().indexOf(name) - 1;
        if (c.args().size() != 1) {
            reporter.report(Code.CALL_ARITY, c.span(), name + "(time) takes one time, the moment of the motion to read "
                + name + " at; it was given " + c.args().size());
            return Value.UNKNOWN;
        }
        Value t = evaluator.eval(c.args().get(0));
        if (!t.known() || !v.value().known()) return Value.UNKNOWN;
        if (!t.dimension().equals(Dimension.TIME)) {
            reporter.report(Code.UNIT_MISMATCH, c.args().get(0).span(), name + "(…) reads " + name + " at a time of the "
                + "motion, but this is " + t.dimension().describe() + ": give a time, such as `2 s`");
            return Value.UNKNOWN;
        }
        double at = t.si();
        if (!(at >= 0) || at > tr.end()) {
            reporter.report(Code.MATH_DOMAIN, c.args().get(0).span(), name + " is known from " + Shown.value(Value.of(0,
                Dimension.TIME), tr.units().get(0), 4) + " to " + Shown.value(Value.of(tr.end(), Dimension.TIME),
                tr.units().get(0), 4) + ", where the motion stopped; " + Shown.value(t, tr.units().get(0), 4)
                + " is outside it: read a time inside the motion, or let it run longer");
            return Value.UNKNOWN;
        }
        return Value.of(tr.stateAt(j, at), tr.dimensions().get(j + 1)).asAngle(v.value().angle());
    }
}
